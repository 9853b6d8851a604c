package ionmark.speciation.internal.microstates;

/**
 * Activity of whole species at an ionic strength (Davies). A microstate of net charge Z (titratable
 * sites and permanent charges together) has log γ = −k·Z², k = A·(√I/(1+√I) − 0.3·I); with pH read as
 * activity, its concentration weight gains k·Z² (log10). Z depends on the whole molecule, so a site's
 * apparent constant depends on the charges elsewhere: a zwitterion's amine constant falls with salt,
 * phosphate's second constant falls by 3k (charges −1 → −2).
 *
 * <p>Two exact forms of the same term:
 * <ul>
 * <li>on the proton-binding polynomial, since a microstate that has lost d protons has Z = top − d:
 * log D_d gains k·(top − d)² ({@link #polynomial});</li>
 * <li>on the site model, by expanding Z² = Σ q_i² + 2Σ_{i<j} q_i q_j + 2QΣ q_i + Q² (q_i² = |q_i|):
 * each acid's pKa falls by k and each base's rises by k (the single-site Davies shift), every pair's
 * interaction W_ij falls by 2k, and the permanent charges' potential Φ_i falls by 2kQ ({@link #of}).</li>
 * </ul>
 * The second couples every pair of sites, so the solver treats the molecule as one cluster at I > 0.
 */
public final class SpeciesActivity {
    private SpeciesActivity() {
    }

    /** The site model with the whole-species Davies term; {@code q0} is the sum of permanent charges. */
    public static SiteModel of(SiteModel m, int q0, double k) {
        if (k == 0) {
            return m;
        }
        int n = m.size();
        double[] pka = new double[n];
        double[] bg = new double[n];
        double[][] w = new double[n][n];
        for (int i = 0; i < n; i++) {
            pka[i] = m.pka()[i] + (m.base()[i] ? k : -k);
            bg[i] = m.background()[i] - 2 * k * q0;
            for (int j = 0; j < n; j++) {
                w[i][j] = i == j ? 0 : m.w()[i][j] - 2 * k;
            }
        }
        return new SiteModel(pka, m.base().clone(), w, bg);
    }

    /**
     * The proton-binding polynomial (log10 coefficients, index d = protons lost) of the model at I = 0
     * moved to the ionic strength: coefficient d gains k·(top − d)², top = base sites + {@code q0}.
     */
    public static double[] polynomial(double[] atZero, SiteModel m, int q0, double k) {
        if (k == 0) {
            return atZero;
        }
        int top = q0;
        for (boolean b : m.base()) {
            top += b ? 1 : 0;
        }
        double[] out = atZero.clone();
        for (int d = 0; d < out.length; d++) {
            out[d] += k * (top - d) * (top - d);
        }
        return out;
    }
}
