package ionmark.speciation.api;

import java.util.Locale;

/** How a site's value was obtained. {@link #label()} is the word the card, the JSON output and the reports print. */
public enum Basis {
    /** From the table's class value and its substituent terms (Hammett/Taft, pair rules, interactions). */
    ESTIMATED,
    /** The estimate moved by measured sites of similar compounds in the table (analog correction). */
    ANALOG,
    /** Fitted so that the model reproduces the measured constants of the structure itself. */
    MEASURED;

    /** "estimated", "analog" or "measured". */
    public String label() {
        return name().toLowerCase(Locale.ROOT);
    }
}
