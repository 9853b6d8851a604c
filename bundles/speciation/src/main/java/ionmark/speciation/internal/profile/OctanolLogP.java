package ionmark.speciation.internal.profile;

import java.util.Map;

import org.openscience.cdk.aromaticity.Aromaticity;
import org.openscience.cdk.exception.CDKException;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.qsar.descriptors.molecular.JPlogPDescriptor;
import org.openscience.cdk.tools.CDKHydrogenAdder;
import org.openscience.cdk.tools.manipulator.AtomContainerManipulator;

/**
 * Octanol/water logP of the uncharged form: CDK's JPlogP (Plante &amp; Werner, J. Cheminform. 2018, 10, 61), with
 * the descriptor's own preparation and coefficients. The descriptor prints a line to standard output and answers
 * NaN when a molecule holds an atom type it has no coefficient for; this class asks the calculator's hologram
 * first and answers NaN itself in that case, so nothing is printed and standard output is never touched (it
 * belongs to the whole framework, and {@code check --format json} writes to it).
 */
public final class OctanolLogP {
    private OctanolLogP() {
    }

    /** The descriptor, only to reach its calculator (a protected inner class) with the default coefficients. */
    private static final class Descriptor extends JPlogPDescriptor {
        /** Sums the coefficients only when every atom type has one. */
        final class Calculator extends JPlogPCalculator {
            double logP(IAtomContainer prepared) {
                Map<Integer, Double> coefficients = getCoeffs();
                for (Integer type : getMappedHologram(prepared).keySet()) {
                    if (type == null || coefficients.get(type) == null) {
                        return Double.NaN; // no coefficient for this type: the descriptor would print and give NaN
                    }
                }
                return calcLogP(prepared);
            }
        }
    }

    /**
     * logP rounded to two decimals, or NaN when it cannot be computed; {@code mol} is not changed. The deprecated
     * legacy aromaticity model is the one the descriptor's coefficients were fitted with (its own preparation uses it).
     */
    @SuppressWarnings("deprecation")
    public static double of(IAtomContainer mol) {
        try {
            // the descriptor's preparation (JPlogPDescriptor.calculate), on a copy
            IAtomContainer m = mol.clone();
            AtomContainerManipulator.percieveAtomTypesAndConfigureUnsetProperties(m);
            CDKHydrogenAdder.getInstance(m.getBuilder()).addImplicitHydrogens(m);
            AtomContainerManipulator.convertImplicitToExplicitHydrogens(m);
            Aromaticity.cdkLegacy().apply(m);
            double v = new Descriptor().new Calculator().logP(m);
            return Double.isNaN(v) ? Double.NaN : Math.round(v * 100) / 100.0;
        } catch (CloneNotSupportedException | CDKException | RuntimeException e) {
            return Double.NaN;
        }
    }
}
