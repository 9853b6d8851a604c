package ionmark.speciation.internal;

import java.util.List;

import ionmark.speciation.internal.estimate.EstimatedSite;
import ionmark.speciation.internal.microstates.MicrostateSolver;
import ionmark.speciation.internal.microstates.SiteModel;
import ionmark.speciation.internal.microstates.StepShares;

/**
 * The model of one structure without measured values or analogs, at 25 °C and I = 0 ({@code Engine.model}): its
 * sites, the numeric model and its macroscopic constants (all of them, ascending).
 */
record ModelSites(List<EstimatedSite> sites, SiteModel model, List<Double> constants, MicrostateSolver solver) {
    ModelSites {
        sites = List.copyOf(sites);
        constants = List.copyOf(constants);
    }

    /** Each site's share of the model's step at {@code pk} ({@link StepShares}); 0 for a permanent charge. */
    double[] shares(double pk) {
        double[] titratable = StepShares.of(solver, model, pk);
        double[] out = new double[sites.size()];
        int t = 0;
        for (int i = 0; i < out.length; i++) {
            if (!sites.get(i).site().group().permanent()) {
                out[i] = titratable[t++];
            }
        }
        return out;
    }
}
