package ionmark.speciation.internal;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

import ionmark.acidity.api.MeasuredCompound;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.internal.estimate.AnalogCorrection;
import ionmark.speciation.internal.estimate.AnalogSettings;
import ionmark.speciation.internal.estimate.EstimatedSite;
import ionmark.speciation.internal.estimate.SiteAnalogIndex;
import ionmark.speciation.internal.estimate.SiteEnvironment;
import ionmark.speciation.internal.microstates.Problem;
import ionmark.speciation.internal.sites.MatchTarget;
import ionmark.speciation.internal.structure.StructureException;
import ionmark.speciation.spi.MacroPairing;

/**
 * Builds the {@link SiteAnalogIndex} of an engine's table. Each measured compound goes through the
 * engine as an exact match, which assigns its values to sites (the k sites nearest the k values, in
 * order). A site's residual is its measured value minus the model's macroscopic constant paired with
 * that value ({@link MacroPairing}), the model being the estimates without measured values
 * ({@code Engine.modelConstants}): the error the model makes there. (The fitted site shift is not used: where another site dominates the same
 * macroscopic step, the fit moves a site by several units to move the constant by a few tenths.)
 */
final class MeasuredSites {
    private MeasuredSites() {
    }

    static SiteAnalogIndex index(Engine engine, List<MeasuredCompound> measured, AnalogSettings settings) {
        if (measured.isEmpty()) {
            return new SiteAnalogIndex(List.of(), settings);
        }
        List<SiteAnalogIndex.MeasuredSite> out = new ArrayList<>();
        for (MeasuredCompound m : measured) {
            try {
                Problem p = engine.prepare(m.smiles(), Conditions.noPh());
                if (p.measured().isEmpty() || !p.measured().get().id().equals(m.id())) {
                    continue; // a duplicate structure: the first record of it is the one that counts
                }
                List<EstimatedSite> fitted = p.sites().stream().filter(s -> s.basis() == ionmark.speciation.api.Basis.MEASURED)
                        .sorted(Comparator.comparingDouble(MeasuredSites::beforeFit)).toList();
                if (fitted.size() != m.pka().size()) {
                    continue;
                }
                List<Double> model = engine.modelConstants(m.smiles()).stream()
                        .filter(v -> v >= AnalysisBuilder.MACRO_LOW && v <= AnalysisBuilder.MACRO_HIGH).sorted().toList();
                MatchTarget target = new MatchTarget(p.prepared().molecule());
                for (int[] pair : MacroPairing.assign(m.pka(), model)) {
                    EstimatedSite s = fitted.get(pair[0]);
                    double residual = m.pka().get(pair[0]) - model.get(pair[1]);
                    out.add(new SiteAnalogIndex.MeasuredSite(m, s.site().group().id(), s.site().group().type(),
                            SiteEnvironment.of(target, s.site(), settings.radius()), model.get(pair[1]), residual,
                            engine.table().citation(m.source()), AnalogCorrection.heldBy(s)));
                }
            } catch (StructureException | RuntimeException e) {
                // the validator has read every measured structure; one that fails here serves as no analog
            }
        }
        return new SiteAnalogIndex(out, settings);
    }

    /** The site's value before the measured fit: the fit is its derivation's last line. */
    private static double beforeFit(EstimatedSite s) {
        return s.pka() - s.terms().get(s.terms().size() - 1).value();
    }
}
