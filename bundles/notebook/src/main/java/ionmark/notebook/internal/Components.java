package ionmark.notebook.internal;

import java.util.ArrayList;
import java.util.List;

/**
 * Splits what a chemist writes as one structure field into the structures to annotate: the components of a
 * reaction SMILES ({@code A.B>C>D}), of a multi-component SMILES (each component with carbon; counter-ions
 * such as {@code [Na+]} or {@code Cl-} are left to the solver's salt stripping), and the molfiles of an RXN
 * block.
 */
final class Components {
    private Components() {
    }

    /** True for a reaction SMILES or an RXN block. */
    static boolean isReaction(String text) {
        String t = text.strip();
        return t.startsWith("$RXN") || (!t.contains("\n") && t.matches("[^>\\s]*>[^>\\s]*>[^>\\s]+.*"));
    }

    static List<String> ofReaction(String text) {
        String t = text.strip();
        if (t.startsWith("$RXN")) {
            return ofRxn(text);
        }
        String first = t.split("\\s+")[0];
        List<String> out = new ArrayList<>();
        for (String role : first.split(">", -1)) {
            for (String c : role.split("\\.")) {
                if (!c.isBlank() && hasCarbon(c)) {
                    out.add(c);
                }
            }
        }
        return out;
    }

    /** The components of a SMILES with carbon, in order; one entry for a single component. */
    static List<String> ofSmiles(String smiles) {
        String first = smiles.strip().split("\\s+")[0];
        if (!first.contains(".")) {
            return List.of(smiles.strip());
        }
        List<String> out = new ArrayList<>();
        for (String c : first.split("\\.")) {
            if (!c.isBlank() && hasCarbon(c)) {
                out.add(c);
            }
        }
        return out.isEmpty() ? List.of(smiles.strip()) : out;
    }

    /** The molfiles of an RXN block (V2000): each starts after a line {@code $MOL}. */
    static List<String> ofRxn(String rxn) {
        List<String> out = new ArrayList<>();
        String[] parts = rxn.replace("\r\n", "\n").split("\n\\$MOL\n");
        for (int i = 1; i < parts.length; i++) {
            String mol = parts[i].endsWith("\n") ? parts[i] : parts[i] + "\n";
            if (!mol.contains("M  END")) {
                mol = mol + "M  END\n";
            }
            out.add(mol);
        }
        return out;
    }

    /** Carbon in a SMILES component: an aliphatic C (not Cl, Ca, Cs, Cu…), an aromatic c, or [C…]/[13C…]. */
    static boolean hasCarbon(String smiles) {
        return smiles.matches(".*(C(?![laroudsn])|c|\\[\\d*C(?![laroudsn])).*");
    }
}
