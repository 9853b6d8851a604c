package ionmark.notebook.api;

import java.util.List;

import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Curve;

/**
 * One structure of an entry and what the notebook says about it.
 *
 * @param block      index of the entry block it belongs to (its card goes after that block)
 * @param words      the text the structure was read from
 * @param source     "smiles", "molfile", "name" or "reaction"
 * @param structure  the structure as given to the solver (SMILES or molfile)
 * @param conditions the conditions applied and where they came from
 * @param analyses   one analysis per pH (two for a stated range), or one without pH; empty when {@code error}
 * @param curve      site protonation over pH 0–14, or null
 * @param phases     the work-up answer per analysed pH, empty when the step mentions no two phases
 * @param error      why the structure was not annotated (a bad condition, an unreadable structure), else null
 */
public record AnnotatedStructure(int block, String words, String source, String structure,
        ConditionsUsed conditions, List<Analysis> analyses, Curve curve, List<Partition> phases, String error) {
    public AnnotatedStructure {
        analyses = List.copyOf(analyses);
        phases = List.copyOf(phases);
    }

    public boolean ok() {
        return error == null && !analyses.isEmpty() && analyses.get(0).ok();
    }
}
