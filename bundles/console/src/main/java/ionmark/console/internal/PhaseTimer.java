package ionmark.console.internal;

/**
 * Where the command line's time goes: with {@code IONMARK_DEBUG_TIMING=1} each {@link #mark} prints the time since
 * the JVM started and since the previous mark to stderr ({@code ionmark timing: table 812 ms (+640)}); otherwise
 * it does nothing.
 */
final class PhaseTimer {
    private final boolean on = "1".equals(System.getenv("IONMARK_DEBUG_TIMING"));
    private final long start = on ? ProcessHandle.current().info().startInstant()
            .map(java.time.Instant::toEpochMilli).orElse(System.currentTimeMillis()) : 0;
    private long last = start;

    void mark(String phase) {
        if (on) {
            long now = System.currentTimeMillis();
            System.err.println("ionmark timing: " + phase + " " + (now - start) + " ms (+" + (now - last) + ")");
            last = now;
        }
    }
}
