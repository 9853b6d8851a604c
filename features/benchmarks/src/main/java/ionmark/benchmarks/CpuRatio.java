package ionmark.benchmarks;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
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
 * {@link AlternatingRatio}'s two loops (the parse floor and the brief path over {@link Molecules#DRUG_LIKE}),
 * each round timed by the thread's CPU time instead of the wall clock: on a shared machine the wall clock
 * counts the time other processes had the core. 6 warm-up rounds of 0.5 CPU seconds per loop, then 6 timed
 * ones; prints the medians and their ratio. Load still moves the figures (caches, the JIT's own threads), so
 * compare two builds in alternated runs.
 *
 * <p>{@code java -cp features/benchmarks/target/benchmarks.jar ionmark.benchmarks.CpuRatio}
 */
public final class CpuRatio {
    private static final int ROUNDS = 6;
    private static final long ROUND_NANOS = 500_000_000L;
    /** Keeps results reachable so that the work cannot be dropped. */
    static volatile Object sink;

    private CpuRatio() {
    }

    // CDK 2.11 deprecates daylight() without a public replacement; the benchmark needs the engine's Daylight model
    @SuppressWarnings("deprecation")
    public static void main(String[] args) throws CDKException {
        Engine engine = new Engine(TableSnapshotService.shipped(), 300);
        SmilesParser parser = new SmilesParser(SilentChemObjectBuilder.getInstance());
        Aromaticity aromaticity = new Aromaticity(ElectronDonation.daylight(), Cycles.or(Cycles.all(), Cycles.all(6)));
        Conditions ph74 = Conditions.atPh(7.4);
        ThreadMXBean cpu = ManagementFactory.getThreadMXBean();
        double[] floor = new double[ROUNDS];
        double[] brief = new double[ROUNDS];
        for (int round = 0; round < 2 * ROUNDS; round++) {
            for (int side = 0; side < 2; side++) {
                long n = 0;
                long start = cpu.getCurrentThreadCpuTime();
                while (cpu.getCurrentThreadCpuTime() - start < ROUND_NANOS) {
                    for (String smi : Molecules.DRUG_LIKE) {
                        if (side == 0) {
                            IAtomContainer mol = parser.parseSmiles(smi);
                            Cycles.markRingAtomsAndBonds(mol);
                            aromaticity.apply(mol);
                            sink = mol;
                        } else {
                            sink = engine.analyse(smi, ph74, true);
                        }
                        n++;
                    }
                }
                double rate = n * 1e9 / (cpu.getCurrentThreadCpuTime() - start);
                if (round >= ROUNDS) {
                    (side == 0 ? floor : brief)[round - ROUNDS] = rate;
                }
            }
        }
        double f = median(floor);
        double b = median(brief);
        System.out.printf(Locale.ROOT, "per CPU second: floor %.0f, brief %.0f molecules (medians of %d rounds of "
                + "0.5 s CPU after %d warm-up rounds); brief/floor %.3f%n", f, b, ROUNDS, ROUNDS, b / f);
    }

    private static double median(double[] v) {
        double[] s = v.clone();
        Arrays.sort(s);
        return (s[(s.length - 1) / 2] + s[s.length / 2]) / 2;
    }
}
