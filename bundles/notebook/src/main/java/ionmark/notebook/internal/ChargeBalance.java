package ionmark.notebook.internal;

import java.util.List;

/**
 * The pH of a solution of known composition from its charge balance: strong ions plus weak acid systems
 * with their pKa values, ideal solution (activities taken as concentrations), 25 °C, pKw 14.00.
 * Solved by bisection: the net charge falls monotonically as the pH rises.
 */
final class ChargeBalance {
    static final double PKW = 14.0;

    /**
     * A weak acid system: total concentration (M), pKa values ascending, and the charge of its most
     * protonated form (0 for acetic acid, +1 for ammonium).
     */
    record Weak(double molar, double[] pka, int topCharge) {
    }

    private ChargeBalance() {
    }

    /**
     * @param strongNet net charge concentration of the fully dissociated ions, M (Na⁺ positive, Cl⁻ negative)
     */
    static double ph(double strongNet, List<Weak> weak) {
        double lo = -2;
        double hi = 16;
        for (int i = 0; i < 200; i++) {
            double mid = (lo + hi) / 2;
            if (net(mid, strongNet, weak) > 0) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return (lo + hi) / 2;
    }

    static double net(double ph, double strongNet, List<Weak> weak) {
        double h = Math.pow(10, -ph);
        double sum = h - Math.pow(10, ph - PKW) + strongNet;
        for (Weak w : weak) {
            sum += w.molar() * meanCharge(ph, w.pka(), w.topCharge());
        }
        return sum;
    }

    /** Mean charge of one weak system at a pH: topCharge minus the mean number of protons lost. */
    static double meanCharge(double ph, double[] pka, int topCharge) {
        int n = pka.length;
        double[] logw = new double[n + 1];
        for (int i = 1; i <= n; i++) {
            logw[i] = logw[i - 1] + (ph - pka[i - 1]);
        }
        double max = Double.NEGATIVE_INFINITY;
        for (double l : logw) {
            max = Math.max(max, l);
        }
        double z = 0;
        double lost = 0;
        for (int i = 0; i <= n; i++) {
            double w = Math.pow(10, logw[i] - max);
            z += w;
            lost += i * w;
        }
        return topCharge - lost / z;
    }
}
