package ionmark.notebook.internal;

import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import ionmark.host.api.Block;
import ionmark.host.api.Entry;

/**
 * Which stated condition applies to a structure. A statement applies to the structures named in its own
 * sentence and to those after it in its own section; a structure block's own {@code ph=} wins. Statements in
 * the entry's opening lines (before the first heading) apply to every section, and the card says it took them
 * from there. A statement of another section never applies; when the structure's section states none, the
 * card says which other statements were not used.
 */
final class ConditionScope {
    /** Where something stands: block, character offset in it, and sentence number in that block. */
    record Place(int block, int start, int sentence, int section) {
        boolean before(Place o) {
            return block < o.block || (block == o.block && start < o.start);
        }
    }

    /** A statement with its place; {@code value} is the statement itself. */
    record Stated<T>(Place place, T value) {
    }

    /** A found condition and the note a card must show about how it was found (or null). */
    record Pick<T>(T value, String note) {
    }

    private static final Pattern SENTENCE_END = Pattern.compile("(?<!\\b(?:sat|aq|conc|approx|ca|vs|e\\.g|i\\.e|"
            + "Fig|ref|equiv|soln|min|h|d))[.!?;](?=\\s+[A-Z0-9(\\[])|\\n\\s*\\n");

    /** A pH found in words: stated, or implied by a named reagent solution ({@code how} says how it was got). */
    record PhFound(double low, double high, String words, boolean implied, String how, String note) {
    }

    final List<Stated<PhFound>> phs = new ArrayList<>();
    final List<Stated<StatedConditions.Value>> temps = new ArrayList<>();
    final List<Stated<StatedConditions.Value>> ionic = new ArrayList<>();
    final List<Stated<StatedConditions.Value>> flagged = new ArrayList<>();
    private final List<Block> blocks;

    ConditionScope(Entry entry, SolutionPh solutions) {
        this.blocks = entry.blocks();
        for (int i = 0; i < blocks.size(); i++) {
            Block b = blocks.get(i);
            if (b.kind() == Block.Kind.STRUCTURE) {
                continue;
            }
            String t = b.content();
            int k = i;
            StatedConditions.ph(t).forEach(p -> phs.add(new Stated<>(place(k, p.start()), new PhFound(p.low(), p.high(),
                    p.words(), false, null, p.note()))));
            ReagentSolutions.find(t, solutions).forEach(p -> phs.add(new Stated<>(place(k, p.start()), new PhFound(p.ph(), p.ph(),
                    p.words(), true, p.how(), null))));
            StatedConditions.temperature(t).forEach(p -> temps.add(new Stated<>(place(k, p.start()), p)));
            StatedConditions.ionicStrength(t).forEach(p -> ionic.add(new Stated<>(place(k, p.start()), p)));
            StatedConditions.flagged(t).forEach(p -> flagged.add(new Stated<>(place(k, p.start()), p)));
        }
        phs.sort(java.util.Comparator.comparingInt((Stated<PhFound> x) -> x.place().block())
                .thenComparingInt(x -> x.place().start()));
    }

    /** The place of a character in a text block (or of a whole structure block, with start -1). */
    Place place(int block, int start) {
        Block b = blocks.get(block);
        if (start < 0 || b.kind() == Block.Kind.STRUCTURE) {
            return new Place(block, -1, 0, b.section());
        }
        Matcher m = SENTENCE_END.matcher(b.content());
        int sentence = 0;
        while (m.find() && m.start() < start) {
            sentence++;
        }
        return new Place(block, start, sentence, b.section());
    }

    /** The statement that applies at a place, and a note when it came from outside the structure's section. */
    <T> Pick<T> pick(List<Stated<T>> found, Place at, String what) {
        Stated<T> sameSentence = null;
        Stated<T> before = null;
        Stated<T> opening = null;
        for (Stated<T> s : found) {
            Place p = s.place();
            if (p.section() == at.section()) {
                if (at.start() >= 0 && p.block() == at.block() && p.sentence() == at.sentence()) {
                    boolean stated = !(s.value() instanceof PhFound f) || !f.implied();
                    boolean heldStated = sameSentence != null && (!(sameSentence.value() instanceof PhFound g)
                            || !g.implied());
                    // in one sentence a stated value beats one implied by a reagent, then the nearest before wins
                    if (sameSentence == null || (stated && !heldStated) || (stated == heldStated && p.before(at))) {
                        sameSentence = s;
                    }
                } else if (p.before(at)) {
                    // a reagent named in the same sentence as a stated pH does not override it ("acidified to
                    // pH 2.5 with 1 M HCl" is at pH 2.5)
                    boolean keep = before != null && before.place().block() == p.block()
                            && before.place().sentence() == p.sentence() && !implied(before) && implied(s);
                    if (!keep) {
                        before = s;
                    }
                }
            } else if (p.section() == 0 && p.before(at)) {
                opening = s;
            }
        }
        if (sameSentence != null) {
            return new Pick<>(sameSentence.value(), null);
        }
        if (before != null) {
            return new Pick<>(before.value(), null);
        }
        if (opening != null) {
            return new Pick<>(opening.value(), "the " + what + " was taken from the entry's opening lines, not from "
                    + "this section: check that it applies here");
        }
        long elsewhere = found.stream().filter(s -> s.place().section() != at.section()).count();
        return new Pick<>(null, elsewhere == 0 ? null : "no " + what + " is stated in this section; " + elsewhere
                + " stated in other sections " + (elsewhere == 1 ? "was" : "were") + " not applied here");
    }

    private static boolean implied(Stated<?> s) {
        return s.value() instanceof PhFound f && f.implied();
    }

    /** Statements in the structure's section before it (or in its sentence) that are out of range. */
    List<String> flaggedAt(Place at) {
        List<String> out = new ArrayList<>();
        for (Stated<StatedConditions.Value> s : flagged) {
            Place p = s.place();
            if (p.section() == at.section() && (p.before(at) || (p.block() == at.block() && p.sentence() == at.sentence()))) {
                out.add(s.value().note());
            }
        }
        return out;
    }
}
