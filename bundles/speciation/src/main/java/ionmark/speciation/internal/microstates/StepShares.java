package ionmark.speciation.internal.microstates;

/**
 * Which sites titrate in one macroscopic step of a model: each site's share of the protons the molecule gives off
 * across the step, from the model's own microstate populations. The share of site i in the step at pK is
 * θᵢ(pK − 1) − θᵢ(pK + 1), θᵢ its protonated fraction, normalised over the sites: the two pH values bound the
 * 10–90 % range of a lone step (a lone site of pKa pK goes from 91 % to 9 % protonated between them). A site that
 * titrates on its own in the step takes a share near 1; two sites that give off the proton together (tautomeric
 * ring nitrogens, the two ends of a symmetric diacid's first step) share it; a site whose microscopic constant lies
 * near pK but that the step does not deprotonate (its partner, held by charge, takes the proton off first) takes
 * little. Indices are those of the {@link SiteModel} (titratable sites, permanent charges left out).
 */
public final class StepShares {
    /** pKa units either side of the macroscopic constant. */
    static final double HALF_WIDTH = 1.0;

    private StepShares() {
    }

    /** Each site's share of the step at {@code pk} (sums to 1; all 0 when no site titrates there). */
    public static double[] of(MicrostateSolver solver, SiteModel m, double pk) {
        double[] below = solver.solve(m, pk - HALF_WIDTH).protonated();
        double[] above = solver.solve(m, pk + HALF_WIDTH).protonated();
        double[] share = new double[m.size()];
        double sum = 0;
        for (int i = 0; i < share.length; i++) {
            share[i] = Math.max(0, below[i] - above[i]);
            sum += share[i];
        }
        if (sum > 0) {
            for (int i = 0; i < share.length; i++) {
                share[i] /= sum;
            }
        }
        return share;
    }
}
