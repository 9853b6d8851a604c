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

/** {@code batch --in FILE}: one JSON line per record, in input order, analysed on every core. */
final class BatchCommand implements Command {
    private final Speciation speciation;
    private final PrintStream out;
    private final PrintStream err;

    BatchCommand(Speciation speciation, PrintStream out, PrintStream err) {
        this.speciation = speciation;
        this.out = out;
        this.err = err;
    }

    @Override
    public int run(List<String> raw) {
        Cli.Args a = Cli.Args.parse(raw, Set.of("--in", "--out", "--ph", "--temp", "--ionic"), Set.of("--brief"));
        if (!a.flags().containsKey("--in")) {
            throw new Cli.UsageException("batch needs --in FILE");
        }
        Conditions c = a.conditions();
        List<Records.Item> items;
        try {
            items = Records.read(Path.of(a.flags().get("--in")));
        } catch (IOException e) {
            err.println("ionmark: cannot read " + a.flags().get("--in") + ": " + e.getMessage());
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
            for (Records.Item it : items) {
                futures.add(pool.submit(() -> it.error() != null
                        ? AnalysisJson.of(it.id(), Analysis.failed(it.structure(), c, "", it.error())).toString()
                        : brief ? AnalysisJson.of(it.id(), speciation.screen(it.structure(), c), true).toString()
                                : AnalysisJson.of(it.id(), speciation.analyse(it.structure(), c)).toString()));
            }
            Progress bar = new Progress(err, items.size());
            for (int i = 0; i < futures.size(); i++) {
                try {
                    target.println(futures.get(i).get());
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
