package ionmark.speciation.internal.microstates;

/**
 * The numeric problem: n titratable sites with pKa values, kinds, and pairwise interactions
 * between charged sites, plus fixed background charges. Immutable.
 *
 * <p>State of site i: 0 protonated, 1 deprotonated. Charge: acid 0/−1, base +1/0.
 * log10 weight of a microstate s at pH: Σ s_i (pH − pKa_i) − Σ_{i<j} W_ij q_i q_j − Σ_i q_i Φ_i,
 * where Φ_i = Σ_p W_ip q_p is the potential of the fixed charges at site i (pKa units).
 * The site pKa values are those with all other sites in their neutral reference form.
 *
 * @param pka        site pKa values
 * @param base       true for a base site (BH⁺ ⇌ B), false for an acid (HA ⇌ A⁻)
 * @param w          symmetric interaction matrix, pKa units per pair of unit charges
 * @param background Φ_i from permanent charges
 */
public record SiteModel(double[] pka, boolean[] base, double[][] w, double[] background) {
    public int size() {
        return pka.length;
    }

    public double charge(int i, boolean deprotonated) {
        return base[i] ? (deprotonated ? 0 : 1) : (deprotonated ? -1 : 0);
    }
}
