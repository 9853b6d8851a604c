package ionmark.speciation.internal.microstates;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.PriorityQueue;

/** The exact populations of one cluster of interacting sites (at most {@link MicrostateSolver#EXACT_LIMIT} sites). */
final class ExactEnumeration {
    private ExactEnumeration() {
    }

    /**
     * Gray-code enumeration of all 2^k states of a cluster in one streaming pass. Per state: one
     * interaction row update, one exp, and two histogram adds (by the low and the high half of the
     * state's bits), from which each site's protonated sum is recovered exactly at the end. Sums are
     * kept relative to a reference weight that is raised (and everything rescaled) only when a state
     * exceeds it by e^50, so no overflow and no 2^k-sized arrays.
     */
    static MicrostateSolver.ClusterResult of(SiteModel m, int[] c, double[] phi, double ph) {
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
            if (best.size() < MicrostateSolver.TOP || wt > bestMin) {
                best.add(new double[] {wt, gray});
                if (best.size() > MicrostateSolver.TOP) {
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
        return new MicrostateSolver.ClusterResult(prot, charge, top, false, 0);
    }
}
