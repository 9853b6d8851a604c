package ionmark.console.internal;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Speciation;

/**
 * {@code batch --in FILE}: one JSON line per record, in input order, analysed on every core. The input is read
 * whole, so it is capped: at most {@code ionmark.batch.maxBytes} bytes (64 MB) and {@code ionmark.batch.maxRecords}
 * records (100,000); larger sets go through the pipeline. At most {@link #AHEAD} records per core are in work or
 * waiting to be printed at once, so memory does not grow with the number of records.
 */
final class BatchCommand implements Command {
    static final long MAX_BYTES = Long.getLong("ionmark.batch.maxBytes", 64L << 20);
    static final int MAX_RECORDS = Integer.getInteger("ionmark.batch.maxRecords", 100_000);
    static final int AHEAD = 32;

    private final Speciation speciation;
    private final PrintStream out;
    private final PrintStream err;
    private final long maxBytes;
    private final int maxRecords;

    BatchCommand(Speciation speciation, PrintStream out, PrintStream err) {
        this(speciation, out, err, MAX_BYTES, MAX_RECORDS);
    }

    BatchCommand(Speciation speciation, PrintStream out, PrintStream err, long maxBytes, int maxRecords) {
        this.speciation = speciation;
        this.out = out;
        this.err = err;
        this.maxBytes = maxBytes;
        this.maxRecords = maxRecords;
    }

    @Override
    public int run(List<String> raw) {
        Cli.Args a = Cli.Args.parse(raw, Set.of("--in", "--out", "--ph", "--temp", "--ionic"), Set.of("--brief"));
        if (!a.flags().containsKey("--in")) {
            throw new Cli.UsageException("batch needs --in FILE");
        }
        Conditions c = a.conditions();
        List<Records.Item> items;
        Path in = Path.of(a.flags().get("--in"));
        try {
            long size = Files.size(in);
            if (size > maxBytes) {
                err.println("ionmark: " + in + " is too large for batch (" + size + " bytes; at most " + maxBytes
                        + "): split it, or run the pipeline (./ionmark pipeline) for large sets");
                return 1;
            }
            items = Records.read(in);
        } catch (IOException e) {
            err.println("ionmark: cannot read " + a.flags().get("--in") + ": " + e.getMessage());
            return 1;
        }
        if (items.size() > maxRecords) {
            err.println("ionmark: " + in + " holds too many structures for batch (" + items.size() + "; at most "
                    + maxRecords + "): split it, or run the pipeline (./ionmark pipeline) for large sets");
            return 1;
        }
        PrintStream target = out;
        try {
            if (a.flags().containsKey("--out")) {
                target = new PrintStream(Files.newOutputStream(Path.of(a.flags().get("--out"))), false,
                        StandardCharsets.UTF_8);
            }
            runBatch(items, c, target, a.flags().containsKey("--brief"));
        } catch (IOException e) {
            err.println("ionmark: cannot write " + a.flags().get("--out") + ": " + e.getMessage());
            return 1;
        } finally {
            if (target != out) {
                target.close();
            }
        }
        return 0;
    }

    private void runBatch(List<Records.Item> items, Conditions c, PrintStream target, boolean brief) {
        int cores = Math.max(1, Runtime.getRuntime().availableProcessors());
        ExecutorService pool = Executors.newFixedThreadPool(cores);
        try {
            List<Future<String>> futures = new ArrayList<>();
            int ahead = cores * AHEAD;
            Progress bar = new Progress(err, items.size());
            for (int i = 0; i < items.size(); i++) {
                // keep at most `ahead` records submitted and not yet printed
                for (int j = futures.size(); j < Math.min(items.size(), i + ahead); j++) {
                    Records.Item it = items.get(j);
                    futures.add(pool.submit(() -> it.error() != null
                            ? AnalysisJson.of(it.id(), Analysis.failed(it.structure(), c, "", it.error())).toString()
                            : brief ? AnalysisJson.of(it.id(), speciation.screen(it.structure(), c), true).toString()
                                    : AnalysisJson.of(it.id(), speciation.analyse(it.structure(), c)).toString()));
                }
                try {
                    target.println(futures.get(i).get());
                    futures.set(i, null);
                } catch (Exception e) {
                    target.println(AnalysisJson.of(items.get(i).id(), Analysis.failed(items.get(i).structure(), c, "",
                            "internal error: " + e)).toString());
                }
                bar.step(i + 1);
            }
            bar.done();
        } finally {
            pool.shutdownNow();
        }
    }
}
