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
                List<EstimatedSite> assigned = new ArrayList<>();
                List<double[]> steps = new ArrayList<>(); // per assigned site: model constant, residual
                for (int[] pair : MacroPairing.assign(m.pka(), model)) {
                    EstimatedSite s = fitted.get(pair[0]);
                    double residual = m.pka().get(pair[0]) - model.get(pair[1]);
                    out.add(site(engine, m, target, s, model.get(pair[1]), residual, settings, false));
                    assigned.add(s);
                    steps.add(new double[] {model.get(pair[1]), residual});
                }
                if (settings.sharedStep() > 0) {
                    sharers(engine, m, target, p.sites(), assigned, steps, settings, out);
                }
            } catch (StructureException | RuntimeException e) {
                // the validator has read every measured structure; one that fails here serves as no analog
            }
        }
        return new SiteAnalogIndex(out, settings);
    }

    private static SiteAnalogIndex.MeasuredSite site(Engine engine, MeasuredCompound m, MatchTarget target,
            EstimatedSite s, double model, double residual, AnalogSettings settings, boolean shared) {
        return new SiteAnalogIndex.MeasuredSite(m, s.site().group().id(), s.site().group().type(),
                SiteEnvironment.of(target, s.site(), settings.radius()), model, residual,
                engine.table().citation(m.source()), AnalogCorrection.heldBy(s),
                settings.fallbackRadius() > 0 ? SiteEnvironment.of(target, s.site(), settings.fallbackRadius())
                        : new int[0], shared);
    }

    /**
     * Sites that share a measured step: a site that took no measured value but whose model value lies within
     * {@code sharedStep} units of a site of the same type that took one carries that step's residual too. Two such
     * sites (a fused bicycle's two ring nitrogens) both feed the macroscopic constant, and the measurement says how
     * far the model is off for the pair, not which of the two is; without this, an analog whose own measured value
     * goes to the other site of the pair learns nothing.
     */
    private static void sharers(Engine engine, MeasuredCompound m, MatchTarget target, List<EstimatedSite> all,
            List<EstimatedSite> assigned, List<double[]> steps, AnalogSettings settings,
            List<SiteAnalogIndex.MeasuredSite> out) {
        for (EstimatedSite e : all) {
            if (e.basis() == ionmark.speciation.api.Basis.MEASURED || e.site().group().permanent()) {
                continue;
            }
            int best = -1;
            double gap = settings.sharedStep();
            for (int i = 0; i < assigned.size(); i++) {
                EstimatedSite a = assigned.get(i);
                double d = Math.abs(e.pka() - beforeFit(a));
                if (a.site().group().type() == e.site().group().type() && d <= gap) {
                    best = i;
                    gap = d;
                }
            }
            if (best >= 0) {
                out.add(site(engine, m, target, e, steps.get(best)[0], steps.get(best)[1], settings, true));
            }
        }
    }

    /** The site's value before the measured fit: the fit is its derivation's last line. */
    private static double beforeFit(EstimatedSite s) {
        return s.pka() - s.terms().get(s.terms().size() - 1).value();
    }
}
