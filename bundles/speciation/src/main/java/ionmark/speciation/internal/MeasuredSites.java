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
 * Builds the {@link SiteAnalogIndex} of an engine's table. A site's residual is a measured value minus the model's
 * macroscopic constant paired with it ({@link MacroPairing}), the model being the estimates without measured values
 * ({@code Engine.model}): the error the model makes there. Which site takes it is the settings'
 * {@link AnalogSettings.Assignment}: by default the site that titrates in the model's paired step
 * ({@link TitratingSites}); before, the site whose estimate lay nearest the value (as an exact match is fitted),
 * which in fused bicycles put a ring N's residual on its neighbour. (The fitted site shift is not used: where another
 * site dominates the same macroscopic step, the fit moves a site by several units to move the constant by a few
 * tenths.) A compound enters only when it is an exact match with one fitted site per measured value.
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
                MatchTarget target = new MatchTarget(p.prepared().molecule());
                // the whole molecule's features, once per compound and shared by its sites
                int[] whole = settings.global() > 0
                        ? SiteEnvironment.molecule(target, settings.radius(), settings.annular()) : new int[0];
                if (settings.assignment() == AnalogSettings.Assignment.NEAREST) {
                    List<Double> model = engine.modelConstants(m.smiles()).stream().filter(MeasuredSites::inRange)
                            .sorted().toList();
                    for (int[] pair : MacroPairing.assign(m.pka(), model)) {
                        out.add(site(engine, m, target, whole, fitted.get(pair[0]), model.get(pair[1]), pair[0], 1,
                                settings));
                    }
                    continue;
                }
                ModelSites model = engine.model(m.smiles());
                List<Double> constants = model.constants().stream().filter(MeasuredSites::inRange).sorted().toList();
                List<int[]> pairs = MacroPairing.assign(m.pka(), constants);
                List<TitratingSites.Placed> placed = settings.assignment() == AnalogSettings.Assignment.SPLIT
                        ? TitratingSites.split(model, pairs, constants)
                        : TitratingSites.dominant(model, pairs, constants);
                for (TitratingSites.Placed x : placed) {
                    // the model's site carries the same pair-rule lines as the fitted one: the same held bookkeeping
                    out.add(site(engine, m, target, whole, model.sites().get(x.site()), x.constant(), x.value(),
                            x.share(), settings));
                }
            } catch (StructureException | RuntimeException e) {
                // the validator has read every measured structure; one that fails here serves as no analog
            }
        }
        return new SiteAnalogIndex(out, settings);
    }

    private static SiteAnalogIndex.MeasuredSite site(Engine engine, MeasuredCompound m, MatchTarget target, int[] whole,
            EstimatedSite s, double constant, int value, double share, AnalogSettings settings) {
        return new SiteAnalogIndex.MeasuredSite(m, s.site().group().id(), s.site().group().type(),
                SiteEnvironment.of(target, s.site(), settings.radius(), settings.annular()), constant, m.pka().get(value) - constant,
                engine.table().citation(m.source()), AnalogCorrection.heldBy(s), share, whole);
    }

    private static boolean inRange(double v) {
        return v >= AnalysisBuilder.MACRO_LOW && v <= AnalysisBuilder.MACRO_HIGH;
    }

    /** The site's value before the measured fit: the fit is its derivation's last line. */
    private static double beforeFit(EstimatedSite s) {
        return s.pka() - s.terms().get(s.terms().size() - 1).value();
    }
}
