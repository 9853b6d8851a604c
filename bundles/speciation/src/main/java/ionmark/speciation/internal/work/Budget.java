package ionmark.speciation.internal.work;

/**
 * The time one structure may take, as a cancellation token the long loops check ({@link #check()}): tautomer
 * placement, site perception, path search between sites, microstate enumeration and sampling. The token of the
 * running structure is held per thread, so the stages need no extra parameter; code run without a budget (tools,
 * calibration) never stops. A check costs a thread-local read and a clock read.
 */
public final class Budget {
    private static final ThreadLocal<Budget> CURRENT = new ThreadLocal<>();

    private final long deadline;
    private final long millis;
    private volatile boolean cancelled;

    private Budget(long millis) {
        this.millis = millis;
        this.deadline = System.nanoTime() + millis * 1_000_000L;
    }

    /** A budget of {@code millis} starting now. */
    public static Budget of(long millis) {
        if (millis < 1) {
            throw new IllegalArgumentException("a time budget must be at least 1 ms, not " + millis);
        }
        return new Budget(millis);
    }

    public long millis() {
        return millis;
    }

    /** Asks the work under this budget to stop at its next check. */
    public void cancel() {
        cancelled = true;
    }

    public boolean over() {
        return cancelled || System.nanoTime() - deadline > 0;
    }

    /** Runs {@code work} on this thread under this budget; a nested call keeps the outer budget. */
    public <T> T run(java.util.function.Supplier<T> work) {
        Budget outer = CURRENT.get();
        if (outer != null) {
            return work.get();
        }
        CURRENT.set(this);
        try {
            return work.get();
        } finally {
            CURRENT.remove();
        }
    }

    /**
     * Runs {@code work} on this thread with no budget, whatever budget the caller runs under, and restores it
     * afterwards: for work done once for every later structure (the measured-analog index of a table snapshot),
     * which must not be cut short, and cached incomplete, because the structure that happened to ask first ran
     * out of time.
     */
    public static <T> T unbudgeted(java.util.function.Supplier<T> work) {
        Budget outer = CURRENT.get();
        CURRENT.remove();
        try {
            return work.get();
        } finally {
            if (outer != null) {
                CURRENT.set(outer);
            }
        }
    }

    /** Throws {@link OverBudgetException} when the structure in progress on this thread is over its budget. */
    public static void check() {
        Budget b = CURRENT.get();
        if (b != null && b.over()) {
            throw new OverBudgetException(b.millis);
        }
    }

    /** Whether the structure in progress on this thread is over its budget (false without one). */
    public static boolean exhausted() {
        Budget b = CURRENT.get();
        return b != null && b.over();
    }
}
