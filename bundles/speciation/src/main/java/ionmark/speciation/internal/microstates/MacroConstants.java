package ionmark.speciation.internal.microstates;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Macroscopic pKa values from the proton-binding polynomial: with D_d the summed weight (at pH 0)
 * of all microstates that have lost d protons, pKa_d = log10 D_(d−1) − log10 D_d. Independent
 * clusters multiply their polynomials.
 */
public final class MacroConstants {
    private MacroConstants() {
    }

    public static List<Double> of(SiteModel m, double cutoff) {
        return of(polynomial(m, cutoff));
    }

    /**
     * log10 of the proton-binding polynomial's coefficients at pH 0, index d = protons lost. Since a
     * microstate's net charge is (number of base sites) − d, this also gives the charge-state
     * distribution at every pH: fraction(d) ∝ 10^(log D_d + d·pH).
     */
    public static double[] polynomial(SiteModel m, double cutoff) {
        MicrostateSolver s = new MicrostateSolver(cutoff);
        boolean[] none = new boolean[m.size()];
        double[] poly = {0.0};
        for (int[] c : s.clusters(m, none)) {
            double[] p = c.length <= MicrostateSolver.EXACT_LIMIT ? clusterPoly(m, c) : independentPoly(m, c);
            poly = multiply(poly, p);
        }
        return poly;
    }

    /** Fraction of molecules that have lost d protons, at a pH, from the polynomial. */
    public static double[] fractions(double[] poly, double ph) {
        double max = Double.NEGATIVE_INFINITY;
        double[] l = new double[poly.length];
        for (int d = 0; d < poly.length; d++) {
            l[d] = poly[d] + d * ph;
            max = Math.max(max, l[d]);
        }
        double sum = 0;
        for (int d = 0; d < l.length; d++) {
            l[d] = Math.pow(10, l[d] - max);
            sum += l[d];
        }
        for (int d = 0; d < l.length; d++) {
            l[d] /= sum;
        }
        return l;
    }

    /** Macroscopic constants from a polynomial, ascending. */
    public static List<Double> of(double[] poly) {
        List<Double> out = new ArrayList<>();
        for (int d = 1; d < poly.length; d++) {
            out.add(poly[d - 1] - poly[d]);
        }
        out.sort(Double::compare);
        return out;
    }

    static double[] clusterPoly(SiteModel m, int[] c) {
        int k = c.length;
        // natural-log accumulation per d with a running maximum, Gray-code order: O(k) per state
        double[] maxL = new double[k + 1];
        double[] sum = new double[k + 1];
        Arrays.fill(maxL, Double.NEGATIVE_INFINITY);
        double[] q = new double[k];
        double[] field = new double[k];
        boolean[] dep = new boolean[k];
        for (int a = 0; a < k; a++) {
            q[a] = m.charge(c[a], false);
        }
        double logw = 0;
        for (int a = 0; a < k; a++) {
            field[a] = m.background()[c[a]];
            logw -= q[a] * m.background()[c[a]];
            for (int b = 0; b < k; b++) {
                if (b != a) {
                    field[a] += m.w()[c[a]][c[b]] * q[b];
                }
            }
            for (int b = a + 1; b < k; b++) {
                logw -= m.w()[c[a]][c[b]] * q[a] * q[b];
            }
        }
        int d = 0;
        final double ln10 = Math.log(10);
        for (long t = 0; t < (1L << k); t++) {
            if (t > 0) {
                int bit = Long.numberOfTrailingZeros(t);
                double dq = m.charge(c[bit], !dep[bit]) - q[bit];
                logw += (dep[bit] ? 1 : -1) * m.pka()[c[bit]] - dq * field[bit];
                d += dep[bit] ? -1 : 1;
                dep[bit] = !dep[bit];
                q[bit] += dq;
                for (int b = 0; b < k; b++) {
                    if (b != bit) {
                        field[b] += m.w()[c[bit]][c[b]] * dq;
                    }
                }
            }
            double l = logw * ln10;
            if (l > maxL[d]) {
                sum[d] = sum[d] * Math.exp(maxL[d] - l) + 1;
                maxL[d] = l;
            } else {
                sum[d] += Math.exp(l - maxL[d]);
            }
        }
        double[] logD = new double[k + 1];
        for (int i = 0; i <= k; i++) {
            logD[i] = maxL[i] == Double.NEGATIVE_INFINITY ? Double.NEGATIVE_INFINITY : (maxL[i] + Math.log(sum[i])) / ln10;
        }
        return logD;
    }

    /** Too large to enumerate: sites treated as independent (stated in the result as approximate). */
    static double[] independentPoly(SiteModel m, int[] c) {
        double[] poly = {0.0};
        for (int a : c) {
            poly = multiply(poly, new double[] {0.0, -m.pka()[a]});
        }
        return poly;
    }

    static double[] multiply(double[] a, double[] b) {
        double[] out = new double[a.length + b.length - 1];
        Arrays.fill(out, Double.NEGATIVE_INFINITY);
        for (int i = 0; i < a.length; i++) {
            for (int j = 0; j < b.length; j++) {
                out[i + j] = logAdd(out[i + j], a[i] + b[j]);
            }
        }
        return out;
    }

    static double logAdd(double x, double y) {
        if (x == Double.NEGATIVE_INFINITY) {
            return y;
        }
        if (y == Double.NEGATIVE_INFINITY) {
            return x;
        }
        double hi = Math.max(x, y);
        return hi + Math.log10(1 + Math.pow(10, Math.min(x, y) - hi));
    }
}
