package ionmark.speciation.internal.microstates;

import java.util.List;
import java.util.Locale;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.GroupClass;
import ionmark.speciation.api.Term;
import ionmark.speciation.internal.AtomText;
import ionmark.speciation.internal.estimate.EstimatedSite;

/** The derivation lines a site gets for what the microstate model adds on top of its value. */
public final class Couplings {
    private final AcidityTable table;

    public Couplings(AcidityTable table) {
        this.table = table;
    }

    /**
     * Derivation lines, worth 0 in the site value, for what the microstate model adds on top of it: the
     * coupling with every other titratable site (distance rule at the bond count × both reach factors,
     * plus any pair rule) and the potential of permanent charges. They are why the macroscopic constants
     * differ from the site values.
     */
    public void describe(SiteModel model, double davies, int q0, int i, List<EstimatedSite> titr, int[][][] paths,
            List<Term> terms) {
        double cutoff = table.interaction().cutoff();
        String source = table.citation(table.interaction().source());
        for (int j = 0; j < model.size(); j++) {
            double w = model.w()[i][j] + 2 * davies; // the rule's part; SpeciesActivity adds −2k to every pair
            if (j == i || Math.abs(w) < cutoff) {
                continue;
            }
            EstimatedSite other = titr.get(j);
            terms.add(new Term(String.format(Locale.ROOT, "coupling with the %s site on atom %d: %.2f pKa units while "
                    + "both are charged (distance rule at %s, × both reach factors, with any pair rule); applied in "
                    + "the microstate model, not in this value", other.site().group().id(), AtomText.shown(other.site().atom()), w,
                    SitePaths.describe(paths[i][j])), 0.0,
                    source + reachSources(titr.get(i).site().group(), other.site().group()), List.of(other.site().atom())));
        }
        double phi = model.background()[i] + 2 * davies * q0;
        if (Math.abs(phi) >= cutoff) {
            // log weight −q·Φ: the site titrates as if its value were lower by Φ, acid or base
            terms.add(new Term(String.format(Locale.ROOT, "permanent charges in the molecule move this site by %+.2f "
                    + "pKa units in the microstate model, not in this value", -phi), 0.0,
                    source + reachSources(titr.get(i).site().group(), titr.get(i).site().group())));
        }
    }

    /**
     * "; reach factor r of X: citation" for each of the two classes (one when both are the same) whose
     * factor is not 1.
     */
    private String reachSources(GroupClass a, GroupClass b) {
        StringBuilder sb = new StringBuilder();
        for (GroupClass g : a.id().equals(b.id()) ? List.of(a) : List.of(a, b)) {
            double r = table.interaction().reachOf(g.id());
            if (r != 1.0 && !g.source("reach").isBlank()) {
                sb.append(String.format(Locale.ROOT, "; reach factor %.2f of %s: %s", r, g.id(),
                        table.citation(g.source("reach"))));
            }
        }
        return sb.toString();
    }
}
