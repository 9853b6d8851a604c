package ionmark.notebook.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

/** SMILES inline in running text: taken only where unambiguous. */
class InlineStructuresTest {

    @ParameterizedTest(name = "\"{0}\" → {1}")
    @CsvSource(delimiter = '|', value = {
        "the acid CC(=O)O was added | CC(=O)O",
        "then NCC(=O)O (glycine) was dissolved | NCC(=O)O",
        "quenched with Oc1ccccc1. | Oc1ccccc1",
        "amine CN1CCN(CC1)c1ccccc1, washed | CN1CCN(CC1)c1ccccc1",
        "TRIS, NC(CO)(CO)CO, at pH 8 | NC(CO)(CO)CO",
    })
    void takesStructuresFromText(String text, String smiles) {
        assertEquals(List.of(smiles), InlineStructures.find(text));
    }

    @ParameterizedTest(name = "nothing in \"{0}\"")
    @ValueSource(strings = {"washed with NaCl and HCl", "CO2 was released", "at pH 7.4", "2 M HCl",
        "compound KX-7 was weighed", "see entry 2026-11-30", "yield 85%", "phenol", "H2O", "CDCl3 (NMR)",
        "(see above)", "step 4a", "NH4Cl"})
    void leavesOrdinaryTextAlone(String text) {
        assertTrue(InlineStructures.find(text).isEmpty(), () -> text + " → " + InlineStructures.find(text));
    }
}
