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
        MicrostateSolver s = new MicrostateSolver(cutoff);
        boolean[] none = new boolean[m.size()];
        double[] poly = {0.0}; // log10 coefficients, index = protons lost
        for (int[] c : s.clusters(m, none)) {
            double[] p = c.length <= MicrostateSolver.EXACT_LIMIT ? clusterPoly(m, c) : independentPoly(m, c);
            poly = multiply(poly, p);
        }
        List<Double> out = new ArrayList<>();
        for (int d = 1; d < poly.length; d++) {
            out.add(poly[d - 1] - poly[d]);
        }
        out.sort(Double::compare);
        return out;
    }

    static double[] clusterPoly(SiteModel m, int[] c) {
        int k = c.length;
        double[] logD = new double[k + 1];
        Arrays.fill(logD, Double.NEGATIVE_INFINITY);
        for (long code = 0; code < (1L << k); code++) {
            double logw = 0;
            double[] q = new double[k];
            int d = 0;
            for (int a = 0; a < k; a++) {
                boolean dep = (code & (1L << a)) != 0;
                q[a] = m.charge(c[a], dep);
                if (dep) {
                    logw -= m.pka()[c[a]];
                    d++;
                }
                logw -= q[a] * m.background()[c[a]];
            }
            for (int a = 0; a < k; a++) {
                for (int b = a + 1; b < k; b++) {
                    logw -= m.w()[c[a]][c[b]] * q[a] * q[b];
                }
            }
            logD[d] = logAdd(logD[d], logw);
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
