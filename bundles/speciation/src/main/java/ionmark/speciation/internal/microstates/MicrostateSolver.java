package ionmark.speciation.internal.microstates;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
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

    /** The exact populations of a cluster ({@link ExactEnumeration}). */
    static ClusterResult exact(SiteModel m, int[] c, double[] phi, double ph) {
        return ExactEnumeration.of(m, c, phi, ph);
    }

    /** Sampled populations of a cluster too large to enumerate ({@link MonteCarloSampler}). */
    ClusterResult sample(SiteModel m, int[] c, double[] phi, double ph) {
        return new MonteCarloSampler(seed, sweeps).sample(m, c, phi, ph);
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
