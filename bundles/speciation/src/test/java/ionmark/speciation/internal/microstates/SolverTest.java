package ionmark.speciation.internal.microstates;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;

/** The microstate solver against closed-form results of the site-binding model. */
class SolverTest {
    static SiteModel model(double[] pka, boolean[] base, double[][] w) {
        return new SiteModel(pka, base, w, new double[pka.length]);
    }

    static SiteModel single(double pka, boolean base) {
        return model(new double[] {pka}, new boolean[] {base}, new double[1][1]);
    }

    @Test
    void singleAcidFollowsHendersonHasselbalch() {
        // Henderson–Hasselbalch: fraction protonated = 1 / (1 + 10^(pH − pKa)) (any physical chemistry text)
        MicrostateSolver s = new MicrostateSolver(0.02);
        SiteModel m = single(4.76, false);
        for (double ph = -2; ph <= 16.0001; ph += 0.01) {
            double expected = 1 / (1 + Math.pow(10, ph - 4.76));
            assertEquals(expected, s.solve(m, ph).protonated()[0], 1e-12, "pH " + ph);
        }
    }

    @Test
    void singleBaseFollowsHendersonHasselbalch() {
        MicrostateSolver s = new MicrostateSolver(0.02);
        SiteModel m = single(9.25, true);
        for (double ph = -2; ph <= 16.0001; ph += 0.01) {
            double expected = 1 / (1 + Math.pow(10, ph - 9.25));
            Populations p = s.solve(m, ph);
            assertEquals(expected, p.protonated()[0], 1e-12, "pH " + ph);
            assertEquals(expected, p.meanCharge(), 1e-12, "charge at pH " + ph);
        }
    }

    @Test
    void diproticMacroConstantsFollowTheTextbookRelations() {
        // For sites 1, 2 with microconstants k1, k2 (first loss) and k12, k21 (second loss):
        // K1 = k1 + k2 and 1/K2 = 1/k12 + 1/k21 (e.g. Ullmann, J. Phys. Chem. B 2003, 107, 1263; from memory)
        double pk1 = 3.1;
        double pk2 = 3.9;
        double w = 1.7;
        SiteModel m = model(new double[] {pk1, pk2}, new boolean[] {false, false}, new double[][] {{0, w}, {w, 0}});
        List<Double> macro = MacroConstants.of(m, 0.0);
        double k1 = Math.pow(10, -pk1);
        double k2 = Math.pow(10, -pk2);
        double k12 = Math.pow(10, -(pk2 + w)); // site 2 leaves after site 1
        double k21 = Math.pow(10, -(pk1 + w));
        assertEquals(-Math.log10(k1 + k2), macro.get(0), 1e-9);
        assertEquals(Math.log10(1 / k12 + 1 / k21), macro.get(1), 1e-9);
    }

    @Test
    void twoEquivalentIndependentSitesAreLogFourApart() {
        // statistical factor: pK2 − pK1 = log 4 = 0.602 for two equivalent non-interacting sites
        SiteModel m = model(new double[] {5, 5}, new boolean[] {false, false}, new double[2][2]);
        List<Double> macro = MacroConstants.of(m, 0.02);
        assertEquals(Math.log10(4), macro.get(1) - macro.get(0), 1e-12);
        assertEquals(5 - Math.log10(2), macro.get(0), 1e-12);
    }

    @Test
    void clusteredAndReducedSolverAgreesWithBruteForce() {
        SplittableRandom r = new SplittableRandom(42);
        for (int trial = 0; trial < 60; trial++) {
            int n = 1 + r.nextInt(12);
            double[] pka = new double[n];
            boolean[] base = new boolean[n];
            double[][] w = new double[n][n];
            for (int i = 0; i < n; i++) {
                pka[i] = -3 + 20 * r.nextDouble();
                base[i] = r.nextBoolean();
                for (int j = 0; j < i; j++) {
                    double v = r.nextDouble() < 0.5 ? 0 : 3 * r.nextDouble();
                    w[i][j] = v;
                    w[j][i] = v;
                }
            }
            SiteModel m = model(pka, base, w);
            double ph = -2 + 18 * r.nextDouble();
            Populations fast = new MicrostateSolver(0.02).solve(m, ph);
            double[] exact = bruteForce(m, ph);
            for (int i = 0; i < n; i++) {
                assertEquals(exact[i], fast.protonated()[i], 1e-9, "trial " + trial + " site " + i);
            }
        }
    }

    @Test
    void sampledSolverAgreesWithinItsReportedError() {
        SplittableRandom r = new SplittableRandom(7);
        int n = 10;
        double[] pka = new double[n];
        boolean[] base = new boolean[n];
        double[][] w = new double[n][n];
        for (int i = 0; i < n; i++) {
            pka[i] = 4 + 3 * r.nextDouble();
            base[i] = i % 3 == 0;
            for (int j = 0; j < i; j++) {
                w[i][j] = w[j][i] = 0.8 * r.nextDouble();
            }
        }
        SiteModel m = model(pka, base, w);
        double[] exact = bruteForce(m, 5.5);
        MicrostateSolver sampler = new MicrostateSolver(0.02, 11, 40000);
        int[] all = new int[n];
        for (int i = 0; i < n; i++) {
            all[i] = i;
        }
        MicrostateSolver.ClusterResult res = sampler.sample(m, all, new double[n], 5.5);
        assertTrue(res.sampled());
        assertTrue(res.stdError() > 0 && res.stdError() < 0.02, "standard error " + res.stdError());
        for (int i = 0; i < n; i++) {
            assertEquals(exact[i], res.protonated()[i], 4 * res.stdError() + 1e-3, "site " + i);
        }
    }

    @Test
    void sixtySitePeptideIsSampledWithinOneHundredthOfALongRun() {
        // a peptide-like chain: 60 interacting sites, too many to enumerate
        int n = 60;
        SplittableRandom r = new SplittableRandom(2);
        double[] pka = new double[n];
        boolean[] base = new boolean[n];
        double[][] w = new double[n][n];
        for (int i = 0; i < n; i++) {
            pka[i] = 7 + 3 * (2 * r.nextDouble() - 1);
            base[i] = i % 3 == 0;
            for (int j = 0; j < i; j++) {
                w[i][j] = w[j][i] = 2.45 * Math.pow(0.7, 3.0 * (i - j) - 3);
            }
        }
        SiteModel m = model(pka, base, w);
        Populations quick = new MicrostateSolver(0.02).solve(m, 7.0);
        Populations reference = new MicrostateSolver(0.02, 99, 400_000).solve(m, 7.0);
        assertTrue(quick.sampled());
        for (int i = 0; i < n; i++) {
            assertEquals(reference.protonated()[i], quick.protonated()[i], 0.01, "site " + i);
        }
    }

    @Test
    void chargeDistributionSumsToOne() {
        SiteModel m = model(new double[] {2.3, 9.6, 4.2}, new boolean[] {false, true, false},
                new double[][] {{0, 2, 1}, {2, 0, 1}, {1, 1, 0}});
        Populations p = new MicrostateSolver(0.02).solve(m, 6);
        assertEquals(1.0, p.chargeStates().values().stream().mapToDouble(Double::doubleValue).sum(), 1e-12);
        assertFalse(p.sampled());
        assertEquals(1.0, p.top().stream().mapToDouble(Populations.Microstate::fraction).sum(), 1e-9);
    }

    /** Every state, no reduction: the reference. */
    static double[] bruteForce(SiteModel m, double ph) {
        int n = m.size();
        double[] logw = new double[1 << n];
        double max = Double.NEGATIVE_INFINITY;
        for (int code = 0; code < (1 << n); code++) {
            double l = 0;
            double[] q = new double[n];
            for (int i = 0; i < n; i++) {
                boolean dep = (code & (1 << i)) != 0;
                q[i] = m.charge(i, dep);
                if (dep) {
                    l += ph - m.pka()[i];
                }
            }
            for (int i = 0; i < n; i++) {
                for (int j = i + 1; j < n; j++) {
                    l -= m.w()[i][j] * q[i] * q[j];
                }
            }
            logw[code] = l;
            max = Math.max(max, l);
        }
        double sum = 0;
        double[] prot = new double[n];
        for (int code = 0; code < (1 << n); code++) {
            double w = Math.pow(10, logw[code] - max);
            sum += w;
            for (int i = 0; i < n; i++) {
                if ((code & (1 << i)) == 0) {
                    prot[i] += w;
                }
            }
        }
        for (int i = 0; i < n; i++) {
            prot[i] /= sum;
        }
        return prot;
    }

    @Test
    void convolutionOfIndependentClustersIsExact() {
        // two non-interacting sites: charge distribution is the product of the single-site ones
        SiteModel m = model(new double[] {4, 9}, new boolean[] {false, true}, new double[2][2]);
        Map<Integer, Double> cs = new MicrostateSolver(0.02).solve(m, 6.5).chargeStates();
        double a = 1 / (1 + Math.pow(10, 6.5 - 4)); // acid protonated (0) fraction
        double b = 1 / (1 + Math.pow(10, 6.5 - 9)); // base protonated (+1) fraction
        assertEquals((1 - a) * b + a * (1 - b), cs.get(0), 1e-12); // (−1, +1) and (0, 0)
        assertEquals(a * b, cs.get(1), 1e-12);
        assertEquals((1 - a) * (1 - b), cs.get(-1), 1e-12);
    }
}
