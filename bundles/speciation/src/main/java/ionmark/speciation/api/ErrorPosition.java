package ionmark.speciation.api;

import java.util.Objects;

/**
 * Where in the input a structure could not be read, as precisely as the reader can say it honestly.
 *
 * <pre>{@code
 * Analysis a = speciation.analyse("CC(=O)Ox", Conditions.noPh());
 * ErrorPosition at = a.errorPosition();            // CHARACTER 7: the x
 * System.out.println("CC(=O)Ox");
 * System.out.println(at.caret());                  // "       ^"
 * }</pre>
 *
 * <p>A SMILES the parser refuses gives the character where it stopped (for a branch or ring left open, the last
 * one). A structure that was read but cannot be
 * treated (an impossible valence, a radical, a metal …) gives the atom. CDK's molfile readers do not say which
 * line they stopped at, so a damaged molfile has no position.
 *
 * @param unit  what {@code index} counts
 * @param index for {@link Unit#CHARACTER} the offset from 0 into the SMILES as read (the first word of the input
 *              with surrounding blanks removed); for {@link Unit#ATOM} the heavy atom of the analysed parent
 *              structure, from 0 like {@link Site#atom()}
 */
public record ErrorPosition(Unit unit, int index) {

    /** What an {@link ErrorPosition#index()} counts. */
    public enum Unit {
        /** A character of the SMILES, from 0. */
        CHARACTER,
        /** A heavy atom of the analysed parent structure, from 0 like {@link Site#atom()}. */
        ATOM
    }

    public ErrorPosition {
        Objects.requireNonNull(unit, "unit");
        if (index < 0) {
            throw new IllegalArgumentException("no such position: " + unit + " " + index);
        }
    }

    public static ErrorPosition character(int offset) {
        return new ErrorPosition(Unit.CHARACTER, offset);
    }

    public static ErrorPosition atom(int atom) {
        return new ErrorPosition(Unit.ATOM, atom);
    }

    /**
     * The SMILES a character position counts in: the first word of the first line of {@code input}, blanks around it
     * removed (the reader ignores the rest, a name or an id after the SMILES).
     */
    public static String smilesAsRead(String input) {
        String s = input == null ? "" : input.strip();
        int eol = s.indexOf('\n');
        String first = (eol < 0 ? s : s.substring(0, eol)).strip();
        for (int i = 0; i < first.length(); i++) {
            if (Character.isWhitespace(first.charAt(i))) {
                return first.substring(0, i);
            }
        }
        return first;
    }

    /** For a character position, blanks and a caret to print under {@link #smilesAsRead}; otherwise "". */
    public String caret() {
        return unit == Unit.CHARACTER ? " ".repeat(index) + "^" : "";
    }
}
