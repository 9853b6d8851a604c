package ionmark.console.internal;

/**
 * Text from the store made safe for a terminal line: control characters (line breaks, escape sequences, other C0
 * and C1 codes, bidirectional overrides) are shown as {@code \\uXXXX}, so a stored value can neither start a line
 * of its own nor recolour or rewrite the terminal. A backslash is doubled so the escape cannot be forged.
 */
final class Printable {
    private Printable() {
    }

    static String of(String s) {
        if (s == null) {
            return "";
        }
        StringBuilder sb = new StringBuilder(s.length());
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c == '\\') {
                sb.append("\\\\");
            } else if (Character.isISOControl(c) || (c >= '\u202a' && c <= '\u202e') || (c >= '\u2066' && c <= '\u2069')
                    || c == '\u2028' || c == '\u2029') {
                sb.append(String.format("\\u%04x", (int) c));
            } else {
                sb.append(c);
            }
        }
        return sb.toString();
    }
}
