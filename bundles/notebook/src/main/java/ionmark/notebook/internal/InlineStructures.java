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
 * left alone.
 */
final class InlineStructures {
    private static final Pattern TOKEN = Pattern.compile("(?<![\\w@+\\-\\[\\]()=#$/\\\\.%])"
            + "([A-Za-z0-9@+\\-\\[\\]()=#$/\\\\%.]{4,})(?![\\w@+\\-\\[\\]()=#$/\\\\%])");
    private static final Pattern STRUCTURAL = Pattern.compile("[=#()\\[\\]]|[A-Za-z]\\d");

    private InlineStructures() {
    }

    static List<String> find(String text) {
        List<String> out = new ArrayList<>();
        Matcher m = TOKEN.matcher(text);
        while (m.find()) {
            String t = m.group(1);
            while (t.endsWith(".")) { // sentence end
                t = t.substring(0, t.length() - 1);
            }
            if (t.length() < 4 || !STRUCTURAL.matcher(t).find() || t.matches("[A-Za-z]+|[0-9.]+")
                    || !t.matches(".*[CcNnOoSs].*")) {
                continue;
            }
            try {
                IAtomContainer mol = new SmilesParser(SilentChemObjectBuilder.getInstance()).parseSmiles(t);
                if (mol.getAtomCount() >= 3 && !out.contains(t)) {
                    out.add(t);
                }
            } catch (InvalidSmilesException | RuntimeException e) {
                // not a structure: ordinary text
            }
        }
        return out;
    }
}
