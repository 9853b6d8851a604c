package ionmark.acidity.api;

import java.util.List;

/**
 * Two sites of one kind (two acids or two bases) whose singly and doubly charged states the
 * charge-distance rule of {@link SiteInteraction} gets wrong: an intramolecular hydrogen bond holds
 * the singly charged state (the monoanion of a dialkylmalonic acid), and substituents that press the
 * two groups together make the doubly charged state dearer (3,3-dialkylglutaric acids).
 *
 * <p>In the site model the rule lowers both acids' values (raises both bases') by {@code singly} and
 * adds {@code 2·singly + doubly} to the pair's interaction. The neutral state keeps its energy, the
 * singly charged state gains {@code singly} and the doubly charged one loses {@code doubly}: the
 * first constant moves down by about {@code singly}, the second up by about {@code singly + doubly}.
 *
 * @param id       stable identifier
 * @param name     what the pair is, for people
 * @param smarts   pattern with the two site atoms mapped {@code :1} and {@code :2}
 * @param singly   stabilisation of the singly charged state, pKa units (0 or more)
 * @param doubly   destabilisation of the doubly charged state beyond the distance rule, pKa units (0 or more)
 * @param source   reference id of the values
 * @param note     how the values were obtained
 * @param matches  example SMILES the pattern must match
 */
public record PairRule(String id, String name, String smarts, double singly, double doubly, String source,
        String note, List<String> matches) {

    public PairRule {
        note = note == null ? "" : note;
        matches = matches == null ? List.of() : List.copyOf(matches);
    }

    /** What the rule adds to the pair's interaction: {@code 2·singly + doubly}. */
    public double interaction() {
        return 2 * singly + doubly;
    }

    /** A copy with other values, their source and a note on how they were obtained. */
    public PairRule withValues(double singlyValue, double doublyValue, String sourceId, String how) {
        return new PairRule(id, name, smarts, singlyValue, doublyValue, sourceId, how, matches);
    }
}
