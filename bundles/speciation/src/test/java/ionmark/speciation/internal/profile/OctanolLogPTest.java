package ionmark.speciation.internal.profile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.qsar.descriptors.molecular.JPlogPDescriptor;
import org.openscience.cdk.qsar.result.DoubleResult;
import org.openscience.cdk.silent.SilentChemObjectBuilder;
import org.openscience.cdk.smiles.SmilesParser;

/** logP is CDK's JPlogP descriptor value (the reference library), without the descriptor's writing to standard output. */
class OctanolLogPTest {
    private static final SmilesParser SMILES = new SmilesParser(SilentChemObjectBuilder.getInstance());

    @ParameterizedTest
    @ValueSource(strings = {"OC(=O)c1ccccc1", "CC(C)Cc1ccc(cc1)C(C)C(=O)O", "Nc1ccccc1", "CN1CCN(CC1)c1ccccc1",
        "OB(O)c1ccccc1", "C[Si](C)(C)c1ccccc1", "c1cc[se]c1", "CC(=O)O[Hg]C", "[Na+].[O-]C(=O)C"}) // the last two have a type without a coefficient
    void givesTheDescriptorsValueAndPrintsNothing(String smiles) throws Exception {
        IAtomContainer mol = SMILES.parseSmiles(smiles);
        ByteArrayOutputStream seen = new ByteArrayOutputStream();
        PrintStream before = System.out;
        double reference;
        double ours;
        ByteArrayOutputStream printedByDescriptor = new ByteArrayOutputStream();
        try {
            System.setOut(new PrintStream(printedByDescriptor, true, StandardCharsets.UTF_8));
            reference = ((DoubleResult) new JPlogPDescriptor().calculate(mol.clone()).getValue()).doubleValue();
            System.setOut(new PrintStream(seen, true, StandardCharsets.UTF_8));
            ours = OctanolLogP.of(mol);
        } finally {
            System.setOut(before);
        }
        assertEquals("", seen.toString(StandardCharsets.UTF_8), "nothing written to standard output");
        if (Double.isNaN(reference)) {
            // the case the class exists for: the descriptor printed "<type> not found" to standard output
            assertTrue(printedByDescriptor.toString(StandardCharsets.UTF_8).contains("not found"));
            assertTrue(Double.isNaN(ours), "an atom type without a coefficient gives no logP, not 0");
        } else {
            assertEquals(Math.round(reference * 100) / 100.0, ours, 0.0);
        }
    }
}
