package ionmark.speciation.internal.estimate;

import java.util.Optional;

import ionmark.acidity.api.ClassFit;

/**
 * The part of a site's sd that stands for the chance of a wrong class: estimation errors have heavier tails
 * than a normal distribution with the class sd (on held-out folds about one value in ten lies beyond two
 * stated sd, against one in twenty for a normal), and the tail is heavier where the class is less likely
 * to describe the site. Two signs of that are added in quadrature to the sd:
 * <ul>
 * <li>{@link #BARE_CLASS}: no substituent term at all, the class value alone. The estimate then rests on the
 * class pattern matching the whole environment of the site; on held-out fold 0 of 5 of the open development
 * set such values fell within two stated sd clearly less often than the rest (about 0.84 against 0.90).</li>
 * <li>{@link #THIN_CLASS}: a class fitted on few compounds (count from the table's fit record, where the table
 * keeps one): {@code THIN_CLASS² / (n + 1)}, so a class fitted on one compound gains about 0.35 and one fitted
 * on a hundred next to nothing.</li>
 * </ul>
 * Both constants were chosen on held-out fold 0 of 5 of the open development set (the folds of
 * {@code ./ionmark accuracy --fold}; the frozen part never seen), from a grid of 0.5-1.5 and 0.5-3, for within
 * one sd near 0.68 and within two sd as high as possible, and checked on fold 1; see docs/tautomer-speed.md
 * for the figures. Not fitted to single compounds, and not stored in the table: a recalibration does not move
 * them.
 */
final class TailTerm {
    /** sd added in quadrature when no substituent term applies to the site. */
    static final double BARE_CLASS = 1.0;
    /** sd scale of the thin-class term, {@code THIN_CLASS² / (n + 1)} in variance. */
    static final double THIN_CLASS = 0.5;

    private TailTerm() {
    }

    /** The variance to add to a site's sd². */
    static double variance(double correction, Optional<ClassFit> fit) {
        double v = 0;
        if (correction == 0) {
            v += BARE_CLASS * BARE_CLASS;
        }
        if (fit.isPresent() && fit.get().n() > 0) {
            v += THIN_CLASS * THIN_CLASS / (fit.get().n() + 1);
        }
        return v;
    }
}
