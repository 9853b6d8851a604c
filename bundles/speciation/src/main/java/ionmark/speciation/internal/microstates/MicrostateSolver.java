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
    static final int TOP = 12;

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
        Map<Integer, List<Integer>> groups = new TreeMap<>();
        for (int i = 0; i < n; i++) {
            if (!isFixed[i]) {
                groups.computeIfAbsent(find(parent, i), k -> new ArrayList<>()).add(i);
            }
        }
        List<int[]> out = new ArrayList<>();
        groups.values().forEach(l -> out.add(l.stream().mapToInt(Integer::intValue).toArray()));
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

    /** Gray-code enumeration of all 2^k states of a cluster, in log space. */
    static ClusterResult exact(SiteModel m, int[] c, double[] phi, double ph) {
        int k = c.length;
        double[] q = new double[k];
        double[] field = new double[k]; // Σ_j W_ij q_j + Φ_i for each cluster site
        for (int a = 0; a < k; a++) {
            q[a] = m.charge(c[a], false);
        }
        for (int a = 0; a < k; a++) {
            double f = phi[c[a]];
            for (int b = 0; b < k; b++) {
                if (a != b) {
                    f += m.w()[c[a]][c[b]] * q[b];
                }
            }
            field[a] = f;
        }
        // log weight of the all-protonated state
        double logw = 0;
        for (int a = 0; a < k; a++) {
            logw -= q[a] * phi[c[a]];
            for (int b = a + 1; b < k; b++) {
                logw -= m.w()[c[a]][c[b]] * q[a] * q[b];
            }
        }
        long states = 1L << k;
        boolean[] dep = new boolean[k];
        // first pass: find the maximum log weight for a stable sum
        double[] logs = new double[(int) states];
        int[] charges = new int[(int) states];
        long[] codes = new long[(int) states];
        double max = Double.NEGATIVE_INFINITY;
        long gray = 0;
        for (long t = 0; t < states; t++) {
            if (t > 0) {
                int bit = Long.numberOfTrailingZeros(t);
                double dq = m.charge(c[bit], !dep[bit]) - q[bit];
                // flip: pH term and change of interaction energy
                logw += (dep[bit] ? -1 : 1) * (ph - m.pka()[c[bit]]) - dq * field[bit];
                dep[bit] = !dep[bit];
                q[bit] += dq;
                for (int b = 0; b < k; b++) {
                    if (b != bit) {
                        field[b] += m.w()[c[bit]][c[b]] * dq;
                    }
                }
                gray ^= 1L << bit;
            }
            logs[(int) t] = logw;
            int z = 0;
            for (int a = 0; a < k; a++) {
                z += (int) q[a];
            }
            charges[(int) t] = z;
            codes[(int) t] = gray;
            max = Math.max(max, logw);
        }
        double sum = 0;
        double[] protSum = new double[k];
        Map<Integer, Double> charge = new HashMap<>();
        PriorityQueue<double[]> best = new PriorityQueue<>(Comparator.comparingDouble(x -> x[0]));
        for (int t = 0; t < states; t++) {
            double w = Math.pow(10, logs[t] - max);
            sum += w;
            long code = codes[t];
            for (int a = 0; a < k; a++) {
                if ((code & (1L << a)) == 0) {
                    protSum[a] += w;
                }
            }
            charge.merge(charges[t], w, Double::sum);
            best.add(new double[] {w, code});
            if (best.size() > TOP) {
                best.poll();
            }
        }
        double[] prot = new double[k];
        for (int a = 0; a < k; a++) {
            prot[a] = protSum[a] / sum;
        }
        final double total = sum;
        charge.replaceAll((z, w) -> w / total);
        List<Populations.Microstate> top = new ArrayList<>();
        for (double[] b : best) {
            boolean[] d = new boolean[k];
            for (int a = 0; a < k; a++) {
                d[a] = (((long) b[1]) & (1L << a)) != 0;
            }
            top.add(new Populations.Microstate(d, b[0] / total));
        }
        top.sort(Comparator.comparingDouble(x -> -x.fraction()));
        return new ClusterResult(prot, charge, top, false, 0);
    }

    /** Metropolis sampling with single-site flips; standard error from batch means. */
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
        for (int a = 0; a < k; a++) {
            double f = phi[c[a]];
            for (int b = 0; b < k; b++) {
                if (a != b) {
                    f += m.w()[c[a]][c[b]] * q[b];
                }
            }
            field[a] = f;
        }
        int burn = Math.max(200, sweeps / 10);
        int batches = 20;
        int perBatch = Math.max(1, sweeps / batches);
        double[][] batchProt = new double[batches][k];
        Map<Integer, Double> charge = new HashMap<>();
        Map<String, double[]> seen = new HashMap<>();
        long samples = 0;
        for (int sweep = 0; sweep < burn + batches * perBatch; sweep++) {
            for (int step = 0; step < k; step++) {
                int bit = rnd.nextInt(k);
                double dq = m.charge(c[bit], !dep[bit]) - q[bit];
                double dlog = (dep[bit] ? -1 : 1) * (ph - m.pka()[c[bit]]) - dq * field[bit];
                if (dlog >= 0 || rnd.nextDouble() < Math.pow(10, dlog)) {
                    dep[bit] = !dep[bit];
                    q[bit] += dq;
                    for (int b = 0; b < k; b++) {
                        if (b != bit) {
                            field[b] += m.w()[c[bit]][c[b]] * dq;
                        }
                    }
                }
            }
            if (sweep >= burn) {
                int batch = (sweep - burn) / perBatch;
                int z = 0;
                for (int a = 0; a < k; a++) {
                    if (!dep[a]) {
                        batchProt[batch][a] += 1.0 / perBatch;
                    }
                    z += (int) q[a];
                }
                charge.merge(z, 1.0, Double::sum);
                String key = Arrays.toString(dep);
                seen.computeIfAbsent(key, x -> new double[1])[0] += 1;
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
        final double total = samples;
        charge.replaceAll((z, w) -> w / total);
        List<Populations.Microstate> top = new ArrayList<>();
        seen.entrySet().stream().sorted((x, y) -> Double.compare(y.getValue()[0], x.getValue()[0])).limit(TOP)
                .forEach(e -> {
                    String[] parts = e.getKey().substring(1, e.getKey().length() - 1).split(", ");
                    boolean[] d = new boolean[k];
                    for (int a = 0; a < k; a++) {
                        d[a] = Boolean.parseBoolean(parts[a]);
                    }
                    top.add(new Populations.Microstate(d, e.getValue()[0] / total));
                });
        return new ClusterResult(prot, charge, top, true, se);
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
