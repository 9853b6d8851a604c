package ionmark.speciation.internal.microstates;

import java.util.List;
import java.util.Optional;

import ionmark.acidity.api.MeasuredCompound;
import ionmark.speciation.internal.estimate.EstimatedSite;
import ionmark.speciation.internal.structure.StructureReader;

/**
 * The prepared problem for one structure: molecule, sites, numeric model at the conditions. What the
 * pipeline hands from the microstate stage to the profiles and the result.
 */
public record Problem(StructureReader.Prepared prepared, List<EstimatedSite> sites, List<Integer> uncovered,
        SiteModel model, double[] polynomial, int permanentCharge, List<String> notes,
        Optional<MeasuredCompound> measured, List<Double> measuredHere) {
    /** Net charge of the fully protonated form: every base site +1, plus permanent charges. */
    public int topCharge() {
        int z = permanentCharge;
        for (boolean b : model.base()) {
            z += b ? 1 : 0;
        }
        return z;
    }
}
