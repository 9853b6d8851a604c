package ionmark.notebook.internal;

import java.util.List;

import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Profile;

/** An analysis's profile, or an empty one for an analysis that has none (failed or brief): nothing to show. */
final class FullProfile {
    static final Profile NONE = new Profile(List.of(), null, Double.NaN, null, List.of(), List.of());

    private FullProfile() {
    }

    static Profile of(Analysis a) {
        return a.hasProfile() ? a.profile() : NONE;
    }
}
