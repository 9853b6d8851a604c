package ionmark.benchmarks;

import java.util.Arrays;
import java.util.Locale;

import org.openscience.cdk.aromaticity.Aromaticity;
import org.openscience.cdk.aromaticity.ElectronDonation;
import org.openscience.cdk.exception.CDKException;
import org.openscience.cdk.graph.Cycles;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.silent.SilentChemObjectBuilder;
import org.openscience.cdk.smiles.SmilesParser;

import ionmark.acidity.internal.TableSnapshotService;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.internal.Engine;

/**
 * Brief end to end against the floor inside one JVM, alternating one second of each, so that both see the
 * same JIT, heap and machine state. JMH runs each benchmark in forks of its own, and on a small machine a
 * whole JVM can run a third slower than the next; the ratio inside one JVM is not moved by that. Prints the
 * median brief/floor ratio of the alternations after warm-up, with the median rates.
 *
 * <p>{@code java -cp features/benchmarks/target/benchmarks.jar ionmark.benchmarks.AlternatingRatio [pairs]}
 */
public final class AlternatingRatio {
    private final Engine engine = new Engine(TableSnapshotService.shipped(), 300);
    private final SmilesParser parser = new SmilesParser(SilentChemObjectBuilder.getInstance());
    // CDK 2.11 deprecates daylight() without a public replacement; the benchmark needs the engine's Daylight model
    @SuppressWarnings("deprecation")
    private final Aromaticity aromaticity = new Aromaticity(ElectronDonation.daylight(),
            Cycles.or(Cycles.all(), Cycles.all(6)));
    private final Conditions ph74 = Conditions.atPh(7.4);
    /** Keeps results reachable so that the work cannot be dropped. */
    static volatile Object sink;

    /** Molecules per second over about {@code seconds} of the floor or of brief end to end. */
    double rate(boolean floor, double seconds) throws CDKException {
        long n = 0;
        long start = System.nanoTime();
        long end = start + (long) (seconds * 1e9);
        while (System.nanoTime() < end) {
            for (String smi : Molecules.DRUG_LIKE) {
                one(floor, smi);
                n++;
            }
        }
        return n * 1e9 / (System.nanoTime() - start);
    }

    /** One molecule of the floor (parse, rings, aromaticity) or of brief end to end; {@link CpuRatio} uses it too. */
    void one(boolean floor, String smi) throws CDKException {
        if (floor) {
            IAtomContainer mol = parser.parseSmiles(smi);
            Cycles.markRingAtomsAndBonds(mol);
            aromaticity.apply(mol);
            sink = mol;
        } else {
            sink = engine.analyse(smi, ph74, true);
        }
    }

    public static void main(String[] args) throws CDKException {
        int pairs = args.length > 0 ? Integer.parseInt(args[0]) : 16;
        AlternatingRatio r = new AlternatingRatio();
        for (int i = 0; i < 8; i++) { // warm-up, both paths
            r.rate(true, 1.5);
            r.rate(false, 1.5);
        }
        double[] ratio = new double[pairs];
        double[] floor = new double[pairs];
        double[] brief = new double[pairs];
        for (int i = 0; i < pairs; i++) {
            floor[i] = r.rate(true, 1);
            brief[i] = r.rate(false, 1);
            ratio[i] = brief[i] / floor[i];
        }
        System.out.printf(Locale.ROOT, "brief/floor median %.3f (quartiles %.3f-%.3f); floor %.0f, brief %.0f molecules/s%n",
                median(ratio), quantile(ratio, 0.25), quantile(ratio, 0.75), median(floor), median(brief));
    }

    private static double median(double[] v) {
        return quantile(v, 0.5);
    }

    private static double quantile(double[] v, double q) {
        double[] s = v.clone();
        Arrays.sort(s);
        double pos = q * (s.length - 1);
        int lo = (int) Math.floor(pos);
        int hi = (int) Math.ceil(pos);
        return s[lo] + (s[hi] - s[lo]) * (pos - lo);
    }
}
