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
        return "<p class=\"im-errorat\">Stopped at character " + (i + 1) + ": <code>" + Html.esc(smiles.substring(0, i))
                + "<mark>" + Html.esc(bad) + "</mark>" + Html.esc(after) + "</code></p>";
    }
}
