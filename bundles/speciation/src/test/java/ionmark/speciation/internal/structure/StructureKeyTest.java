package ionmark.speciation.internal.structure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import org.junit.jupiter.api.Test;

/** A cache key never joins two different structures (geometry, isotopes, charges) and ignores spelling. */
class StructureKeyTest {
    @Test
    void maleicAndFumaricAcidDiffer() {
        assertNotEquals(StructureKey.of("OC(=O)/C=C\\C(=O)O"), StructureKey.of("OC(=O)/C=C/C(=O)O"));
    }

    @Test
    void enantiomersDiffer() {
        assertNotEquals(StructureKey.of("C[C@H](N)C(=O)O"), StructureKey.of("C[C@@H](N)C(=O)O"));
    }

    @Test
    void isotopesAndChargesDiffer() {
        assertNotEquals(StructureKey.of("CC(=O)O"), StructureKey.of("[13CH3]C(=O)O"));
        assertNotEquals(StructureKey.of("CC(=O)O"), StructureKey.of("CC(=O)[O-]"));
    }

    @Test
    void ringDigitsTitlesAndSpacesDoNotCount() {
        assertEquals(StructureKey.of("C1CC1O"), StructureKey.of("  C2CC2O cyclopropanol"));
    }

    @Test
    void unreadableInputHasNoKey() {
        assertNull(StructureKey.of("C1CC("));
        assertNull(StructureKey.of(" "));
    }
}
