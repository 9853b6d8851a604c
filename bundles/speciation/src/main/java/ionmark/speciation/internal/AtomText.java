package ionmark.speciation.internal;

import java.util.Locale;

/**
 * Atom numbers in the words the solver writes (warnings, derivation lines): from 1, as chemists count and as
 * structure-reading errors already do. Structured indices ({@code Site.atom()}, {@code Term.atoms()},
 * {@code Analysis.uncoveredAtoms()}) stay 0-based indices into the analysed structure; only text adds one,
 * here, where it is written.
 */
public final class AtomText {
    private AtomText() {
    }

    /** The number a reader sees for a 0-based atom index. */
    public static int shown(int index) {
        return index + 1;
    }

    /** The warning for an atom that looks ionizable but no class of the table covers. */
    public static String uncovered(int index, String symbol) {
        return String.format(Locale.ROOT, "atom %d (%s-H) looks ionizable but is outside the table: not estimated",
                shown(index), symbol);
    }
}
