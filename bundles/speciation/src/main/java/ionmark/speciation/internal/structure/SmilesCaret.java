package ionmark.speciation.internal.structure;

import ionmark.speciation.api.ErrorPosition;

/**
 * The character at which the SMILES parser stopped. CDK passes on Beam's message, which ends with the SMILES on
 * one line and a caret under the offending character on the next; that caret is the only position the parser
 * gives, so it is read from there and checked against the SMILES before it is believed.
 */
final class SmilesCaret {
    private SmilesCaret() {
    }

    /** The caret's offset into {@code smiles}, or null when the message carries none for this SMILES. */
    static ErrorPosition position(String message, String smiles) {
        if (message == null) {
            return null;
        }
        String[] lines = message.split("\n", -1);
        if (lines.length < 2) {
            return null;
        }
        String caret = lines[lines.length - 1].stripTrailing();
        String shown = lines[lines.length - 2];
        int at = caret.indexOf('^');
        if (at < 0 || !caret.substring(0, at).isBlank() || at > smiles.length() || !shown.strip().equals(smiles)) {
            return null;
        }
        return ErrorPosition.character(at);
    }
}
