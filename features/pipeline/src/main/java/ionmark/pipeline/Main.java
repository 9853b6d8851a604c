package ionmark.pipeline;

import java.io.PrintStream;
import java.util.Arrays;
import java.util.Locale;

import org.apache.beam.runners.direct.DirectOptions;
import org.apache.beam.sdk.Pipeline;
import org.apache.beam.sdk.PipelineResult;
import org.apache.beam.sdk.metrics.DistributionResult;
import org.apache.beam.sdk.metrics.MetricQueryResults;
import org.apache.beam.sdk.metrics.MetricResult;
import org.apache.beam.sdk.metrics.MetricsFilter;
import org.apache.beam.sdk.options.PipelineOptionsFactory;
import org.joda.time.Duration;

/**
 * {@code ionmark pipeline [annotate|impact] --in=… --out=… [Beam options]}. The direct runner runs in this
 * JVM; {@code --runner=FlinkRunner} (embedded, or {@code --flinkMaster=host:port}) or {@code SparkRunner}
 * (under spark-submit) run the same graph. Exit codes: 0 done (records may carry errors), 1 failed, 2 usage.
 */
public final class Main {
    private Main() {
    }

    public static void main(String[] args) {
        System.exit(run(args, System.err));
    }

    public static int run(String[] raw, PrintStream err) {
        Phases phases = new Phases(err);
        String[] args = joined(raw);
        String job = args.length > 0 && !args[0].startsWith("-") ? args[0] : "annotate";
        String[] rest = args.length > 0 && !args[0].startsWith("-") ? Arrays.copyOfRange(args, 1, args.length) : args;
        if (!job.equals("annotate") && !job.equals("impact")) {
            err.println("ionmark pipeline: unknown job '" + job + "' (annotate or impact)");
            return 2;
        }
        PipelineOptionsFactory.register(IonmarkOptions.class);
        IonmarkOptions o;
        try {
            o = PipelineOptionsFactory.fromArgs(rest).withValidation().as(IonmarkOptions.class);
        } catch (IllegalArgumentException e) {
            err.println("ionmark pipeline: " + e.getMessage());
            return 2;
        }
        if (!Arrays.toString(rest).contains("--enforce")) {
            // the direct runner's checks re-encode every element; the job's DoFns do not mutate their input
            o.as(DirectOptions.class).setEnforceImmutability(false);
            o.as(DirectOptions.class).setEnforceEncodability(false);
        }
        // run() returns at once, so that the progress line can be printed while the direct runner works
        o.as(DirectOptions.class).setBlockOnRun(false);
        phases.mark("options");
        Pipeline p = Pipeline.create(o);
        java.util.List<BundleFiles> files;
        try {
            files = job.equals("impact") ? Jobs.impact(p, o) : Jobs.annotate(p, o);
        } catch (IllegalArgumentException | java.io.IOException e) {
            err.println("ionmark pipeline: " + e.getMessage());
            return 2;
        }
        phases.mark("graph");
        long start = System.nanoTime();
        PipelineResult r = p.run();
        PipelineResult.State s;
        try {
            while ((s = r.waitUntilFinish(Duration.standardSeconds(2))) == null || !s.isTerminal()) {
                progress(r, start, err, false);
            }
        } catch (UnsupportedOperationException e) {
            s = r.waitUntilFinish();
        }
        progress(r, start, err, true);
        phases.mark("run");
        if (s != PipelineResult.State.DONE) {
            err.println("ionmark pipeline: the run ended " + s);
            return 1;
        }
        try {
            for (BundleFiles f : files) {
                f.finish();
            }
        } catch (java.io.IOException e) {
            err.println("ionmark pipeline: cannot name the output files: " + e.getMessage());
            return 1;
        }
        phases.mark("files");
        return 0;
    }

    /** {@code --in FILE} as well as Beam's {@code --in=FILE}; switches ({@code --brief}, {@code --parquet}) stand alone. */
    static String[] joined(String[] args) {
        java.util.List<String> out = new java.util.ArrayList<>();
        for (int i = 0; i < args.length; i++) {
            String a = args[i];
            if (a.startsWith("--") && !a.contains("=") && !a.equals("--brief") && !a.equals("--parquet") && !a.equals("--help")
                    && i + 1 < args.length && !args[i + 1].startsWith("--")) {
                out.add(a + "=" + args[++i]);
            } else {
                out.add(a);
            }
        }
        return out.toArray(new String[0]);
    }

    /** The progress line: records, errors, rate; at the end the per-stage times too. */
    static void progress(PipelineResult r, long start, PrintStream err, boolean end) {
        double secs = (System.nanoTime() - start) / 1e9;
        MetricQueryResults m;
        try {
            m = r.metrics().queryMetrics(MetricsFilter.builder().build());
        } catch (RuntimeException e) {
            return;
        }
        long records = counter(m, "records");
        StringBuilder sb = new StringBuilder(String.format(Locale.ROOT, "\rionmark pipeline: %d structures read, %d "
                + "records, %d errors, %.0f s, %.1f records/s", counter(m, "structures"), records, counter(m, "errors"),
                secs, records / Math.max(secs, 1e-9)));
        long entries = counter(m, "entries");
        if (entries > 0) {
            sb.append(String.format(Locale.ROOT, " (%d entries)", entries));
        }
        long changed = counter(m, "changed");
        long pinned = counter(m, "changed-pinned");
        if (changed + pinned > 0) {
            sb.append(String.format(Locale.ROOT, ", %d changed, %d pinned changed", changed, pinned));
        }
        if (end) {
            for (String d : new String[] {"read-us-per-file", "analyse-us", "entry-us", "encode-us"}) {
                for (MetricResult<DistributionResult> x : m.getDistributions()) {
                    if (x.getName().getName().equals(d) && value(x).getCount() > 0) {
                        DistributionResult v = value(x);
                        sb.append(String.format(Locale.ROOT, "%n  %-16s n=%d mean %.1f ms max %.1f ms", d, v.getCount(),
                                v.getMean() / 1000, v.getMax() / 1000.0));
                    }
                }
            }
            sb.append(System.lineSeparator());
        }
        err.print(sb);
        err.flush();
    }

    private static long counter(MetricQueryResults m, String name) {
        long sum = 0;
        for (MetricResult<Long> c : m.getCounters()) {
            if (c.getName().getNamespace().equals(ReadFiles.NS) && c.getName().getName().equals(name)) {
                Long v = attemptedOrCommitted(c);
                sum += v == null ? 0 : v;
            }
        }
        return sum;
    }

    private static <T> T attemptedOrCommitted(MetricResult<T> c) {
        try {
            return c.getCommitted();
        } catch (UnsupportedOperationException e) {
            return c.getAttempted();
        }
    }

    private static DistributionResult value(MetricResult<DistributionResult> x) {
        DistributionResult v = attemptedOrCommitted(x);
        return v == null ? DistributionResult.IDENTITY_ELEMENT : v;
    }
}
