package ionmark.pipeline;

import java.io.PrintStream;
import java.lang.management.ManagementFactory;
import java.util.Locale;

/**
 * With {@code -Dionmark.pipeline.phases=true}: the wall and process CPU seconds since the JVM started at each
 * phase of a run (options read, graph built, run done), to see where a run's time goes.
 */
final class Phases {
    private final PrintStream err;
    private final boolean on = Boolean.getBoolean("ionmark.pipeline.phases");

    Phases(PrintStream err) {
        this.err = err;
        mark("start");
    }

    void mark(String phase) {
        if (!on) {
            return;
        }
        double wall = (System.currentTimeMillis() - ManagementFactory.getRuntimeMXBean().getStartTime()) / 1000.0;
        double cpu = ManagementFactory.getOperatingSystemMXBean() instanceof com.sun.management.OperatingSystemMXBean os
                ? os.getProcessCpuTime() / 1e9 : Double.NaN;
        err.println(String.format(Locale.ROOT, "phase %-8s wall %6.2f s  cpu %6.2f s", phase, wall, cpu));
    }
}
