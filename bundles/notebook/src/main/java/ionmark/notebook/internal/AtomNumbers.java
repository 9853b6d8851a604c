package ionmark.notebook.internal;

import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * One atom numbering on every card: from 1, in the order of the analysed structure's heavy atoms. The solver
 * reports site atoms from 0 ({@code Site.atom()}) and names them so in its warnings and derivation lines; the
 * card shows every such number plus one, so the drawing, the site table, the derivation and the messages agree.
 * Structure-reading errors already count from 1 and pass unchanged.
 */
final class AtomNumbers {
    private static final Pattern SOLVER = Pattern.compile("(^atom |on atom )(\\d+)(?= \\()");

    private AtomNumbers() {
    }

    static int shown(int solverIndex) {
        return solverIndex + 1;
    }

    /** A solver warning or derivation label with its 0-based atom numbers shown from 1. */
    static String solverText(String s) {
        if (s == null) {
            return null;
        }
        Matcher m = SOLVER.matcher(s);
        StringBuilder sb = new StringBuilder();
        while (m.find()) {
            m.appendReplacement(sb, m.group(1) + (Integer.parseInt(m.group(2)) + 1));
        }
        m.appendTail(sb);
        return sb.toString();
    }

    /** An error message from reading a structure: already from 1. */
    static String text(String s) {
        return s;
    }
}
