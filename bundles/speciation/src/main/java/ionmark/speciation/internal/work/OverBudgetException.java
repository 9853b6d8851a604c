package ionmark.speciation.internal.work;

import java.util.Locale;

/** Thrown by {@link Budget#check()}: the structure in progress took longer than its budget. */
public final class OverBudgetException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    /** How every over-budget message starts: the card, the command line and the batch output show it. */
    public static final String PREFIX = "not annotated: over the time budget";

    public OverBudgetException(long millis) {
        super(message(millis), null, false, false);
    }

    /** The one-line reason a chemist reads. */
    public static String message(long millis) {
        return String.format(Locale.ROOT, "%s of %.1f s per structure (too many sites, ring systems or tautomers to "
                + "finish in time; the limit protects the notebook; it is the speciation setting timeoutMillis)",
                PREFIX, millis / 1000.0);
    }
}
