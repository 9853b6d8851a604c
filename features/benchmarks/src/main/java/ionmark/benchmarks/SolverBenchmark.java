package ionmark.benchmarks;

import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

import ionmark.speciation.internal.microstates.MacroConstants;
import ionmark.speciation.internal.microstates.MicrostateSolver;
import ionmark.speciation.internal.microstates.Populations;
import ionmark.speciation.internal.microstates.SiteModel;

/**
 * The microstate solver: exact enumeration by number of fluctuating sites (all pKa values within
 * two units of the pH, all interacting), a 60-site peptide-like chain (sampled), and a full pH
 * curve (0–14, step 0.05) for 10 sites.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class SolverBenchmark {
    @Param({"4", "8", "12", "16", "20"})
    int sites;

    SiteModel fluctuating;
    SiteModel peptide;
    SiteModel tenSites;
    MicrostateSolver solver;

    /** Sites with pKa near 7 and interactions decaying with index distance (3 bonds per step). */
    static SiteModel chain(int n, double spread, long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        double[] pka = new double[n];
        boolean[] base = new boolean[n];
        double[][] w = new double[n][n];
        for (int i = 0; i < n; i++) {
            pka[i] = 7 + spread * (2 * r.nextDouble() - 1);
            base[i] = i % 3 == 0;
            for (int j = 0; j < i; j++) {
                double v = 2.45 * Math.pow(0.7, 3.0 * (i - j) - 3);
                w[i][j] = v;
                w[j][i] = v;
            }
        }
        return new SiteModel(pka, base, w, new double[n]);
    }

    @Setup
    public void setUp() {
        solver = new MicrostateSolver(0.02);
        fluctuating = chain(sites, 2.0, 1);
        peptide = chain(60, 3.0, 2);
        tenSites = chain(10, 4.0, 3);
    }

    @Benchmark
    public Populations exactAtOnePh() {
        return solver.solve(fluctuating, 7.0);
    }

    @Benchmark
    public Populations peptide60Sites() {
        return solver.solve(peptide, 7.0);
    }

    @Benchmark
    public double[] curve10Sites() {
        double[] mean = new double[281];
        for (int k = 0; k <= 280; k++) {
            mean[k] = solver.solve(tenSites, k * 0.05).meanCharge();
        }
        return mean;
    }

    @Benchmark
    public double[] macroConstants() {
        return MacroConstants.polynomial(fluctuating, 0.02);
    }
}
