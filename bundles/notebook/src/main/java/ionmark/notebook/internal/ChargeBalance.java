package ionmark.notebook.internal;

import java.util.List;
import java.util.function.DoubleUnaryOperator;

/**
 * The pH of a solution of known composition from its charge balance: strong ions plus weak acid systems, each
 * given by its mean charge as a function of pH; ideal solution (activities taken as concentrations), 25 °C,
 * pKw 14.00 (the usual 25 °C value, common practice). Solved by bisection to 0.002 pH units: the net charge falls
 * monotonically as the pH rises.
 */
final class ChargeBalance {
    static final double PKW = 14.0;

    /** A weak acid system: total concentration (M) and its mean charge at a pH. */
    record Weak(double molar, DoubleUnaryOperator meanCharge) {
    }

    private ChargeBalance() {
    }

    /**
     * @param strongNet net charge concentration of the fully dissociated ions, M (Na⁺ positive, Cl⁻ negative)
     */
    static double ph(double strongNet, List<Weak> weak) {
        double lo = -2;
        double hi = 16;
        while (hi - lo > 0.002) { // 14 steps: each may be a call to the solver
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
        double sum = Math.pow(10, -ph) - Math.pow(10, ph - PKW) + strongNet;
        for (Weak w : weak) {
            sum += w.molar() * w.meanCharge().applyAsDouble(ph);
        }
        return sum;
    }

    /**
     * Mean charge of one weak system from its macroscopic constants: topCharge minus the mean number of protons
     * lost. Used only for a reagent the table does not hold, with the constants' source named.
     */
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
