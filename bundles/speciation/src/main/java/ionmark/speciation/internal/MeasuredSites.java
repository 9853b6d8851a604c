package ionmark.speciation.internal;

import java.util.ArrayList;
import java.util.List;

import ionmark.acidity.api.MeasuredCompound;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Term;
import ionmark.speciation.internal.estimate.AnalogCorrection;
import ionmark.speciation.internal.estimate.AnalogSettings;
import ionmark.speciation.internal.estimate.EstimatedSite;
import ionmark.speciation.internal.estimate.SiteAnalogIndex;
import ionmark.speciation.internal.estimate.SiteEnvironment;
import ionmark.speciation.internal.sites.RootedPattern;
import ionmark.speciation.internal.structure.StructureException;

/**
 * Builds the {@link SiteAnalogIndex} of an engine's table: each measured compound goes through the
 * engine as an exact match, whose fit gives every site that carries a measured value its residual
 * (the fitted shift: measured − model).
 */
final class MeasuredSites {
    private MeasuredSites() {
    }

    static SiteAnalogIndex index(Engine engine, List<MeasuredCompound> measured, AnalogSettings settings) {
        List<SiteAnalogIndex.MeasuredSite> out = new ArrayList<>();
        for (MeasuredCompound m : measured) {
            try {
                Engine.Problem p = engine.prepare(m.smiles(), Conditions.noPh());
                if (p.measured().isEmpty() || !p.measured().get().id().equals(m.id())) {
                    continue; // a duplicate structure: the first record of it is the one that counts
                }
                RootedPattern.Target target = new RootedPattern.Target(p.prepared().molecule());
                for (EstimatedSite s : p.sites()) {
                    if (!"measured".equals(s.basis()) || s.terms().isEmpty() || AnalogCorrection.heldByPairRule(s)) {
                        continue;
                    }
                    Term fit = s.terms().get(s.terms().size() - 1);
                    out.add(new SiteAnalogIndex.MeasuredSite(m, s.site().group().id(), s.site().group().type(),
                            SiteEnvironment.of(target, s.site(), settings.radius()), s.pka() - fit.value(),
                            fit.value(), engine.table().citation(m.source())));
                }
            } catch (StructureException | RuntimeException e) {
                // the validator has read every measured structure; one that fails here serves as no analog
            }
        }
        return new SiteAnalogIndex(out, settings);
    }
}
