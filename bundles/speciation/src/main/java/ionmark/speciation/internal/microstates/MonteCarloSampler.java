package ionmark.speciation.internal.microstates;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;

/** Populations of a cluster too large to enumerate, by Metropolis Monte Carlo with a standard error. */
final class MonteCarloSampler {
    private static final double LN10 = Math.log(10);

    private final long seed;
    private final int sweeps;

    MonteCarloSampler(long seed, int sweeps) {
        this.seed = seed;
        this.sweeps = sweeps;
    }

    /**
     * Metropolis sampling with single-site flips. Site fractions use the Rao–Blackwell estimator (the
     * mean over samples of each site's protonation probability given the others), which has far
     * less variance than counting states; standard error from 20 batch means.
     *
     * <p>Couplings weaker than {@link MicrostateSolver#NEGLIGIBLE_COUPLING} are left out of the sampled energy. The
     * field they would add at a site is at most the sum of their sizes, which moves that site's
     * protonated fraction by at most ln10/4 times that sum; the largest such bound is added to the
     * reported standard error.
     */
    MicrostateSolver.ClusterResult sample(SiteModel m, int[] c, double[] phi, double ph) {
        int k = c.length;
        SplittableRandom rnd = new SplittableRandom(seed);
        boolean[] dep = new boolean[k];
        double[] q = new double[k];
        for (int a = 0; a < k; a++) {
            dep[a] = ph > m.pka()[c[a]];
            q[a] = m.charge(c[a], dep[a]);
        }
        double[] field = new double[k];
        int[][] nb = new int[k][];
        double[][] nw = new double[k][];
        double leftOut = 0; // largest summed size of the couplings left out at one site
        for (int a = 0; a < k; a++) {
            double f = phi[c[a]];
            int cnt = 0;
            double dropped = 0;
            for (int b = 0; b < k; b++) {
                if (a != b) {
                    double wab = m.w()[c[a]][c[b]];
                    if (Math.abs(wab) >= MicrostateSolver.NEGLIGIBLE_COUPLING) {
                        f += wab * q[b];
                        cnt++;
                    } else {
                        dropped += Math.abs(wab);
                    }
                }
            }
            leftOut = Math.max(leftOut, dropped);
            field[a] = f;
            nb[a] = new int[cnt];
            nw[a] = new double[cnt];
            int j = 0;
            for (int b = 0; b < k; b++) {
                double wab = m.w()[c[a]][c[b]];
                if (a != b && Math.abs(wab) >= MicrostateSolver.NEGLIGIBLE_COUPLING) {
                    nb[a][j] = b;
                    nw[a][j++] = wab;
                }
            }
        }
        double[] lpka = new double[k];
        for (int a = 0; a < k; a++) {
            lpka[a] = m.pka()[c[a]];
        }
        int[] partner = new int[k];
        for (int a = 0; a < k; a++) {
            partner[a] = -1;
            double strongest = 0.5; // pair moves only where the coupling is strong enough to slow single flips
            for (int j = 0; j < nb[a].length; j++) {
                if (Math.abs(nw[a][j]) > strongest) {
                    strongest = Math.abs(nw[a][j]);
                    partner[a] = nb[a][j];
                }
            }
        }
        int burn = Math.max(200, sweeps / 10);
        int batches = 20;
        int perBatch = Math.max(1, sweeps / batches);
        double[][] batchProt = new double[batches][k];
        // net charge of the cluster lies in −k…k: histogram offset by k
        double[] chargeCount = new double[2 * k + 1];
        int words = (k + 63) / 64;
        Map<StateKey, double[]> seen = new HashMap<>();
        long samples = 0;
        for (int sweep = 0; sweep < burn + batches * perBatch; sweep++) {
            ionmark.speciation.internal.work.Budget.check();
            for (int step = 0; step < k; step++) {
                int bit = rnd.nextInt(k);
                double d1 = flipDelta(lpka, dep, field, bit, ph);
                if (partner[bit] >= 0 && rnd.nextBoolean()) {
                    // pair move: flip the site and its most strongly coupled neighbour together
                    int other = partner[bit];
                    flip(dep, q, field, nb, nw, bit);
                    double d2 = flipDelta(lpka, dep, field, other, ph);
                    if (d1 + d2 >= 0 || rnd.nextDouble() < Math.exp((d1 + d2) * LN10)) {
                        flip(dep, q, field, nb, nw, other);
                    } else {
                        flip(dep, q, field, nb, nw, bit); // undo
                    }
                } else if (d1 >= 0 || rnd.nextDouble() < Math.exp(d1 * LN10)) {
                    flip(dep, q, field, nb, nw, bit);
                }
            }
            if (sweep >= burn) {
                int batch = (sweep - burn) / perBatch;
                int z = 0;
                for (int a = 0; a < k; a++) {
                    // P(protonated | others) = 1 / (1 + 10^((pH − pKa) + field)), field with this site's own
                    // charge excluded (field holds only the other sites and the background); taken every
                    // second sweep, as consecutive sweeps are correlated anyway
                    if ((sweep & 1) == 0) {
                        double x = (ph - lpka[a]) + field[a];
                        batchProt[batch][a] += 2.0 / (1 + Math.exp(x * LN10)) / perBatch;
                    }
                    z += (int) q[a];
                }
                chargeCount[z + k]++;
                if (sweep % 10 == 0) {
                    seen.computeIfAbsent(StateKey.of(dep, words), x -> new double[1])[0] += 10;
                }
                samples++;
            }
        }
        double[] prot = new double[k];
        double se = 0;
        for (int a = 0; a < k; a++) {
            double mean = 0;
            for (double[] b : batchProt) {
                mean += b[a] / batches;
            }
            double var = 0;
            for (double[] b : batchProt) {
                var += (b[a] - mean) * (b[a] - mean) / (batches - 1);
            }
            prot[a] = mean;
            se = Math.max(se, Math.sqrt(var / batches));
        }
        se += Math.log(10) / 4 * leftOut;
        final double total = samples;
        Map<Integer, Double> charge = new HashMap<>();
        for (int z = 0; z < chargeCount.length; z++) {
            if (chargeCount[z] > 0) {
                charge.put(z - k, chargeCount[z] / total);
            }
        }
        List<Populations.Microstate> top = new ArrayList<>();
        seen.entrySet().stream().sorted((x, y) -> Double.compare(y.getValue()[0], x.getValue()[0])).limit(MicrostateSolver.TOP)
                .forEach(e -> top.add(new Populations.Microstate(e.getKey().states(k), e.getValue()[0] / total)));
        return new MicrostateSolver.ClusterResult(prot, charge, top, true, se);
    }

    /** A sampled microstate as bit words (bit a set: site a deprotonated), for counting visits. */
    private record StateKey(long[] bits) {
        static StateKey of(boolean[] dep, int words) {
            long[] b = new long[words];
            for (int a = 0; a < dep.length; a++) {
                if (dep[a]) {
                    b[a >>> 6] |= 1L << a;
                }
            }
            return new StateKey(b);
        }

        boolean[] states(int k) {
            boolean[] d = new boolean[k];
            for (int a = 0; a < k; a++) {
                d[a] = (bits[a >>> 6] & (1L << a)) != 0;
            }
            return d;
        }

        @Override
        public boolean equals(Object o) {
            return o instanceof StateKey other && Arrays.equals(bits, other.bits);
        }

        @Override
        public int hashCode() {
            return Arrays.hashCode(bits);
        }
    }

    /** log10 weight change of flipping site {@code bit}: deprotonation lowers its charge by one. */
    private static double flipDelta(double[] pka, boolean[] dep, double[] field, int bit, double ph) {
        return dep[bit] ? -(ph - pka[bit]) - field[bit] : (ph - pka[bit]) + field[bit];
    }

    private static void flip(boolean[] dep, double[] q, double[] field, int[][] nb, double[][] nw, int bit) {
        double dq = dep[bit] ? 1 : -1;
        dep[bit] = !dep[bit];
        q[bit] += dq;
        int[] ns = nb[bit];
        double[] ws = nw[bit];
        for (int j = 0; j < ns.length; j++) {
            field[ns[j]] += ws[j] * dq;
        }
    }
}
