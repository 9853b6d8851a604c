package ionmark.notebook.internal;

import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.openscience.cdk.exception.InvalidSmilesException;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.silent.SilentChemObjectBuilder;
import org.openscience.cdk.smiles.SmilesParser;

/**
 * SMILES written inline in running text, taken only where unambiguous: a token of SMILES characters
 * that shows structure (a bond symbol, brackets, branches or ring closures), is not an ordinary
 * word or number, parses, and has at least three heavy atoms. "NaCl", "pH", "HCl" and "CO2" are
 * left alone. A reaction SMILES ({@code A.B>>C}) gives each component with carbon.
 */
final class InlineStructures {
    /** A structure token and where it starts in the text. */
    record Token(String smiles, int start, boolean reaction) {
    }

    private static final Pattern TOKEN = Pattern.compile("(?<![\\w@+\\-\\[\\]()=#$/\\\\.%>])"
            + "([A-Za-z0-9@+\\-\\[\\]()=#$/\\\\%.>]{4,})(?![\\w@+\\-\\[\\]()=#$/\\\\%>])");
    private static final Pattern STRUCTURAL = Pattern.compile("[=#()\\[\\]]|[A-Za-z]\\d");

    private InlineStructures() {
    }

    static List<String> find(String text) {
        return tokens(text).stream().map(Token::smiles).toList();
    }

    static List<Token> tokens(String text) {
        List<Token> out = new ArrayList<>();
        Matcher m = TOKEN.matcher(text);
        while (m.find()) {
            String t = m.group(1);
            while (t.endsWith(".")) { // sentence end
                t = t.substring(0, t.length() - 1);
            }
            if (t.contains(">")) {
                if (t.matches("[^>]+>[^>]*>[^>]+")) {
                    for (String part : Components.ofReaction(t)) {
                        if (structure(part) && out.stream().noneMatch(x -> x.smiles().equals(part))) {
                            out.add(new Token(part, m.start(1), true));
                        }
                    }
                }
                continue;
            }
            for (String part : t.split("\\.")) {
                if (structure(part) && out.stream().noneMatch(x -> x.smiles().equals(part))) {
                    out.add(new Token(part, m.start(1), false));
                }
            }
        }
        return out;
    }

    private static boolean structure(String t) {
        if (t.length() < 4 || !STRUCTURAL.matcher(t).find() || t.matches("[A-Za-z]+|[0-9.]+")
                || !t.matches(".*[CcNnOoSs].*")) {
            return false;
        }
        try {
            IAtomContainer mol = new SmilesParser(SilentChemObjectBuilder.getInstance()).parseSmiles(t);
            return mol.getAtomCount() >= 3;
        } catch (InvalidSmilesException | RuntimeException e) {
            return false; // not a structure: ordinary text
        }
    }
}
