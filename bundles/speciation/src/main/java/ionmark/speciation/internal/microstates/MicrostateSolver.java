package ionmark.speciation.internal.microstates;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.PriorityQueue;
import java.util.SplittableRandom;
import java.util.TreeMap;

/**
 * Exact microstate populations by enumeration, reduced first:
 * <ol>
 * <li>a site whose pKa lies more than {@link #FIX_MARGIN} + Σ|W| units from the pH is held in its
 * dominant state while the others are solved (its minority fraction is below 1e−10 for any state of
 * the others, so no other fraction moves by more than that); its own fraction is then
 * Henderson–Hasselbalch in the mean field of the others, and it enters the charge distribution as
 * an independent two-state site;</li>
 * <li>the remaining sites split into clusters that interact above the cutoff; clusters are solved
 * separately and combined as independent;</li>
 * <li>a cluster larger than {@link #EXACT_LIMIT} sites is sampled by Metropolis Monte Carlo with a
 * reported standard error.</li>
 * </ol>
 */
public final class MicrostateSolver {
    public static final double FIX_MARGIN = 10.0;
    public static final int EXACT_LIMIT = 20;
    /** pKa units; weaker couplings are not sampled (see {@link #sample}). */
    static final double NEGLIGIBLE_COUPLING = 1e-5;
    static final int TOP = 12;
    private static final double LN10 = Math.log(10);

    private final double cutoff;
    private final long seed;
    private final int sweeps;

    public MicrostateSolver(double cutoff) {
        this(cutoff, 0x5eed, 20000);
    }

    public MicrostateSolver(double cutoff, long seed, int sweeps) {
        this.cutoff = cutoff;
        this.seed = seed;
        this.sweeps = sweeps;
    }

    public Populations solve(SiteModel m, double ph) {
        ionmark.speciation.internal.work.Budget.check();
        int n = m.size();
        boolean[] fixedState = new boolean[n];
        boolean[] isFixed = new boolean[n];
        for (int i = 0; i < n; i++) {
            double reach = 0;
            for (int j = 0; j < n; j++) {
                reach += Math.abs(m.w()[i][j]);
            }
            reach += Math.abs(m.background()[i]);
            if (ph - m.pka()[i] > FIX_MARGIN + reach) {
                isFixed[i] = true;
                fixedState[i] = true;
            } else if (m.pka()[i] - ph > FIX_MARGIN + reach) {
                isFixed[i] = true;
                fixedState[i] = false;
            }
        }
        // background potential at free sites includes fixed sites' charges
        double[] phi = m.background().clone();
        for (int i = 0; i < n; i++) {
            if (isFixed[i]) {
                double q = m.charge(i, fixedState[i]);
                for (int j = 0; j < n; j++) {
                    if (j != i) {
                        phi[j] += m.w()[i][j] * q;
                    }
                }
            }
        }
        List<int[]> clusters = clusters(m, isFixed);
        double[] prot = new double[n];
        Map<Integer, Double> dist = new TreeMap<>(Map.of(0, 1.0));
        List<Populations.Microstate> top = List.of(new Populations.Microstate(fixedState.clone(), 1.0));
        boolean sampled = false;
        double se = 0;
        for (int[] c : clusters) {
            ClusterResult r = c.length <= EXACT_LIMIT ? exact(m, c, phi, ph) : sample(m, c, phi, ph);
            sampled |= r.sampled;
            se = Math.max(se, r.stdError);
            for (int k = 0; k < c.length; k++) {
                prot[c[k]] = r.protonated[k];
            }
            dist = convolve(dist, r.charge);
            top = combine(top, c, r.top);
        }
        // held sites: Henderson–Hasselbalch in the mean field of all the others
        for (int i = 0; i < n; i++) {
            if (!isFixed[i]) {
                continue;
            }
            double field = m.background()[i];
            for (int j = 0; j < n; j++) {
                if (j == i) {
                    continue;
                }
                double qj = isFixed[j] ? m.charge(j, fixedState[j])
                        : prot[j] * m.charge(j, false) + (1 - prot[j]) * m.charge(j, true);
                field += m.w()[i][j] * qj;
            }
            prot[i] = 1 / (1 + Math.pow(10, ph - m.pka()[i] + field));
            Map<Integer, Double> two = new TreeMap<>();
            two.merge((int) m.charge(i, false), prot[i], Double::sum);
            two.merge((int) m.charge(i, true), 1 - prot[i], Double::sum);
            dist = convolve(dist, two);
        }
        double mean = 0;
        for (var e : dist.entrySet()) {
            mean += e.getKey() * e.getValue();
        }
        return new Populations(prot, dist, mean, top, sampled, se);
    }

    /** Sites connected by |W| above the cutoff, among the free ones. */
    List<int[]> clusters(SiteModel m, boolean[] isFixed) {
        int n = m.size();
        int[] parent = new int[n];
        for (int i = 0; i < n; i++) {
            parent[i] = i;
        }
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                if (!isFixed[i] && !isFixed[j] && Math.abs(m.w()[i][j]) > cutoff) {
                    parent[find(parent, i)] = find(parent, j);
                }
            }
        }
        // one cluster per root, in ascending order of root index
        int[] size = new int[n];
        for (int i = 0; i < n; i++) {
            if (!isFixed[i]) {
                size[find(parent, i)]++;
            }
        }
        int[][] byRoot = new int[n][];
        for (int r = 0; r < n; r++) {
            if (size[r] > 0) {
                byRoot[r] = new int[size[r]];
                size[r] = 0;
            }
        }
        for (int i = 0; i < n; i++) {
            if (!isFixed[i]) {
                int r = find(parent, i);
                byRoot[r][size[r]++] = i;
            }
        }
        List<int[]> out = new ArrayList<>();
        for (int[] c : byRoot) {
            if (c != null) {
                out.add(c);
            }
        }
        return out;
    }

    private static int find(int[] p, int i) {
        while (p[i] != i) {
            p[i] = p[p[i]];
            i = p[i];
        }
        return i;
    }

    record ClusterResult(double[] protonated, Map<Integer, Double> charge, List<Populations.Microstate> top,
            boolean sampled, double stdError) {
    }

    /**
     * Gray-code enumeration of all 2^k states of a cluster in one streaming pass. Per state: one
     * interaction row update, one exp, and two histogram adds (by the low and the high half of the
     * state's bits), from which each site's protonated sum is recovered exactly at the end. Sums are
     * kept relative to a reference weight that is raised (and everything rescaled) only when a state
     * exceeds it by e^50, so no overflow and no 2^k-sized arrays.
     */
    static ClusterResult exact(SiteModel m, int[] c, double[] phi, double ph) {
        final int k = c.length;
        final double ln10 = Math.log(10);
        final int loBits = k / 2;
        final int hiBits = k - loBits;
        final int loMask = (1 << loBits) - 1;
        double[][] w = new double[k][k];
        double[] q = new double[k];
        double[] field = new double[k]; // Σ_j W_ij q_j + Φ_i, in ln units below
        double[] step = new double[k]; // (pH − pKa_i)·ln10
        boolean[] dep = new boolean[k];
        for (int a = 0; a < k; a++) {
            q[a] = m.charge(c[a], false);
            step[a] = (ph - m.pka()[c[a]]) * ln10;
            for (int b = 0; b < k; b++) {
                w[a][b] = a == b ? 0 : m.w()[c[a]][c[b]] * ln10;
            }
        }
        double logw = 0;
        int zTop = 0;
        for (int a = 0; a < k; a++) {
            double f = phi[c[a]] * ln10;
            for (int b = 0; b < k; b++) {
                f += w[a][b] * q[b];
            }
            field[a] = f;
            logw -= q[a] * phi[c[a]] * ln10;
            for (int b = a + 1; b < k; b++) {
                logw -= w[a][b] * q[a] * q[b];
            }
            zTop += (int) q[a];
        }
        double ref = logw;
        double sum = 0;
        double[] lo = new double[1 << loBits];
        double[] hi = new double[1 << hiBits];
        double[] chargeSum = new double[k + 1]; // index: protons lost
        PriorityQueue<double[]> best = new PriorityQueue<>(Comparator.comparingDouble(x -> x[0]));
        double bestMin = 0;
        long gray = 0;
        int lost = 0;
        final long states = 1L << k;
        for (long t = 0; t < states; t++) {
            if ((t & 0xFFFF) == 0xFFFF) {
                ionmark.speciation.internal.work.Budget.check();
            }
            if (t > 0) {
                int bit = Long.numberOfTrailingZeros(t);
                boolean was = dep[bit];
                double dq = was ? 1 : -1; // deprotonation lowers the charge by one, protonation raises it
                logw += (was ? -step[bit] : step[bit]) - dq * field[bit];
                lost += was ? -1 : 1;
                dep[bit] = !was;
                q[bit] += dq;
                double[] row = w[bit];
                for (int b = 0; b < k; b++) {
                    field[b] += row[b] * dq;
                }
                gray ^= 1L << bit;
            }
            double rel = logw - ref;
            if (rel > 50) {
                double r = Math.exp(-rel);
                sum *= r;
                for (int i = 0; i < lo.length; i++) {
                    lo[i] *= r;
                }
                for (int i = 0; i < hi.length; i++) {
                    hi[i] *= r;
                }
                for (int d = 0; d <= k; d++) {
                    chargeSum[d] *= r;
                }
                for (double[] e : best) {
                    e[0] *= r;
                }
                bestMin *= r;
                ref = logw;
                rel = 0;
            }
            double wt = Math.exp(rel);
            sum += wt;
            lo[(int) (gray & loMask)] += wt;
            hi[(int) (gray >>> loBits)] += wt;
            chargeSum[lost] += wt;
            if (best.size() < TOP || wt > bestMin) {
                best.add(new double[] {wt, gray});
                if (best.size() > TOP) {
                    best.poll();
                }
                bestMin = best.peek()[0];
            }
        }
        double[] prot = new double[k];
        for (int a = 0; a < k; a++) {
            double p = 0;
            if (a < loBits) {
                for (int i = 0; i < lo.length; i++) {
                    if ((i & (1 << a)) == 0) {
                        p += lo[i];
                    }
                }
            } else {
                int bit = a - loBits;
                for (int i = 0; i < hi.length; i++) {
                    if ((i & (1 << bit)) == 0) {
                        p += hi[i];
                    }
                }
            }
            prot[a] = p / sum;
        }
        Map<Integer, Double> charge = new HashMap<>();
        for (int d = 0; d <= k; d++) {
            if (chargeSum[d] > 0) {
                charge.put(zTop - d, chargeSum[d] / sum);
            }
        }
        List<Populations.Microstate> top = new ArrayList<>();
        for (double[] e : best) {
            boolean[] dd = new boolean[k];
            for (int a = 0; a < k; a++) {
                dd[a] = (((long) e[1]) & (1L << a)) != 0;
            }
            top.add(new Populations.Microstate(dd, e[0] / sum));
        }
        top.sort(Comparator.comparingDouble(x -> -x.fraction()));
        return new ClusterResult(prot, charge, top, false, 0);
    }

    /**
     * Metropolis sampling with single-site flips. Site fractions use the Rao–Blackwell estimator (the
     * mean over samples of each site's protonation probability given the others), which has far
     * less variance than counting states; standard error from 20 batch means.
     *
     * <p>Couplings weaker than {@link #NEGLIGIBLE_COUPLING} are left out of the sampled energy. The
     * field they would add at a site is at most the sum of their sizes, which moves that site's
     * protonated fraction by at most ln10/4 times that sum; the largest such bound is added to the
     * reported standard error.
     */
    ClusterResult sample(SiteModel m, int[] c, double[] phi, double ph) {
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
                    if (Math.abs(wab) >= NEGLIGIBLE_COUPLING) {
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
                if (a != b && Math.abs(wab) >= NEGLIGIBLE_COUPLING) {
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
        seen.entrySet().stream().sorted((x, y) -> Double.compare(y.getValue()[0], x.getValue()[0])).limit(TOP)
                .forEach(e -> top.add(new Populations.Microstate(e.getKey().states(k), e.getValue()[0] / total)));
        return new ClusterResult(prot, charge, top, true, se);
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

    private static Map<Integer, Double> convolve(Map<Integer, Double> a, Map<Integer, Double> b) {
        Map<Integer, Double> out = new TreeMap<>();
        for (var x : a.entrySet()) {
            for (var y : b.entrySet()) {
                out.merge(x.getKey() + y.getKey(), x.getValue() * y.getValue(), Double::sum);
            }
        }
        return out;
    }

    /** Leading states of independent clusters: products of the leading states of each. */
    private static List<Populations.Microstate> combine(List<Populations.Microstate> sofar, int[] c,
            List<Populations.Microstate> cluster) {
        List<Populations.Microstate> out = new ArrayList<>();
        for (var s : sofar) {
            for (var t : cluster) {
                boolean[] d = s.deprotonated().clone();
                for (int a = 0; a < c.length; a++) {
                    d[c[a]] = t.deprotonated()[a];
                }
                out.add(new Populations.Microstate(d, s.fraction() * t.fraction()));
            }
        }
        out.sort(Comparator.comparingDouble(x -> -x.fraction()));
        return out.size() > TOP ? List.copyOf(out.subList(0, TOP)) : out;
    }
}
