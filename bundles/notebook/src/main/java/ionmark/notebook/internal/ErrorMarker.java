package ionmark.notebook.internal;

import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.ErrorPosition;

/** The SMILES of an unreadable structure with the character the reader stopped at marked, for the card. */
final class ErrorMarker {
    private ErrorMarker() {
    }

    /** The marked SMILES as HTML, or "" when the reader gave no character position. */
    static String html(Analysis a) {
        ErrorPosition at = a.errorPosition();
        if (at == null || at.unit() != ErrorPosition.Unit.CHARACTER) {
            return "";
        }
        String smiles = ErrorPosition.smilesAsRead(a.input());
        int i = Math.min(at.index(), smiles.length());
        String bad = i < smiles.length() ? smiles.substring(i, smiles.offsetByCodePoints(i, 1)) : " ";
        String after = i < smiles.length() ? smiles.substring(i + bad.length()) : "";
        java.util.Map<String, Object> p = new java.util.HashMap<>();
        p.put("at", i + 1);
        p.put("before", smiles.substring(0, i));
        p.put("bad", bad);
        p.put("after", after);
        return Html.TEMPLATES.render("errorMarker", p).strip();
    }
}
