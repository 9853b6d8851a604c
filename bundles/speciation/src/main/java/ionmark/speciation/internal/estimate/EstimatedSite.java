package ionmark.speciation.internal.estimate;

import java.util.List;

import ionmark.speciation.api.Basis;
import ionmark.speciation.api.Term;
import ionmark.speciation.internal.sites.PerceivedSite;

/**
 * A perceived site with its estimated pKa (25 °C, I = 0), its uncertainty and derivation.
 *
 * @param basis how the value was obtained
 */
public record EstimatedSite(PerceivedSite site, double pka, double sd, List<Term> terms, Basis basis) {
    public EstimatedSite {
        terms = List.copyOf(terms);
    }

    public EstimatedSite shifted(double delta, Term why, Basis newBasis, double newSd) {
        var t = new java.util.ArrayList<>(terms);
        t.add(why);
        return new EstimatedSite(site, pka + delta, newSd, t, newBasis);
    }

    /**
     * Position of {@code s} itself in {@code l}. Records compare by value, which walks every derivation
     * term; the same object is what is meant here.
     */
    public static int indexOf(List<EstimatedSite> l, EstimatedSite s) {
        for (int i = 0; i < l.size(); i++) {
            if (l.get(i) == s) {
                return i;
            }
        }
        return -1;
    }
}
