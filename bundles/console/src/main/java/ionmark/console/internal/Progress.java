package ionmark.console.internal;

import java.io.PrintStream;

/** A progress bar on standard error for long batches (more than 50 records). */
final class Progress {
    private final PrintStream err;
    private final int total;
    private final long start = System.nanoTime();
    private int lastPercent = -1;

    Progress(PrintStream err, int total) {
        this.err = err;
        this.total = total;
    }

    void step(int done) {
        if (total <= 50) {
            return;
        }
        int percent = (int) (100L * done / total);
        if (percent != lastPercent) {
            lastPercent = percent;
            int bars = percent / 4;
            double secs = (System.nanoTime() - start) / 1e9;
            err.print("\r[" + "#".repeat(bars) + " ".repeat(25 - bars) + "] " + done + "/" + total + String.format(
                    java.util.Locale.ROOT, "  %.0f s", secs));
        }
    }

    void done() {
        if (total > 50) {
            err.println();
        }
    }
}
