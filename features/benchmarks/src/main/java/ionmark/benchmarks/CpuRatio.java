package ionmark.benchmarks;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.Arrays;
import java.util.Locale;

import org.openscience.cdk.exception.CDKException;

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

    private CpuRatio() {
    }

    public static void main(String[] args) throws CDKException {
        AlternatingRatio work = new AlternatingRatio();
        ThreadMXBean cpu = ManagementFactory.getThreadMXBean();
        double[] floor = new double[ROUNDS];
        double[] brief = new double[ROUNDS];
        for (int round = 0; round < 2 * ROUNDS; round++) {
            for (int side = 0; side < 2; side++) {
                long n = 0;
                long start = cpu.getCurrentThreadCpuTime();
                while (cpu.getCurrentThreadCpuTime() - start < ROUND_NANOS) {
                    for (String smi : Molecules.DRUG_LIKE) {
                        work.one(side == 0, smi);
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
