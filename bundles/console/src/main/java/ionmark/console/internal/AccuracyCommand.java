package ionmark.console.internal;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import java.util.function.Predicate;

import ionmark.acidity.api.TableService;
import ionmark.calibration.api.Observation;
import ionmark.calibration.api.TruthFile;
import ionmark.speciation.api.Speciation;

/**
 * {@code accuracy --truth FILE}: predictions scored against a truth file, with a Markdown report;
 * {@code accuracy --series}: the series experiment ({@link SeriesExperiment}).
 */
final class AccuracyCommand implements Command {
    private final Speciation speciation;
    private final TableService tables;
    private final PrintStream out;
    private final PrintStream err;

    AccuracyCommand(Speciation speciation, TableService tables, PrintStream out, PrintStream err) {
        this.speciation = speciation;
        this.tables = tables;
        this.out = out;
        this.err = err;
    }

    @Override
    public int run(List<String> raw) {
        if (raw.contains("--series")) {
            return new SeriesCommand(speciation, tables.current(), out, err).run(raw);
        }
        Cli.Args a = Cli.Args.parse(raw, Set.of("--truth", "--out", "--fold", "--subset"));
        int[] f = fold(a.flags().get("--fold"));
        String subset = a.flags().get("--subset");
        FrozenSplit.in(subset, ""); // a bad subset name is a usage error before any work
        Predicate<String> keep = id -> (f == null || TruthFile.inFold(id, f[0], f[1]))
                && FrozenSplit.in(subset, id);
        List<Observation> data = truth(a).stream().filter(o -> keep.test(o.id())).toList();
        List<ChargeStates.Truth> charges;
        try {
            charges = ChargeStates.read(Path.of(a.flags().get("--truth"))).stream().filter(t -> keep.test(t.id()))
                    .toList();
        } catch (IOException | RuntimeException e) {
            throw new Cli.UsageException("cannot read the z_top column of the truth file: " + e.getMessage());
        }
        Path dir = Path.of(a.flags().getOrDefault("--out", "accuracy-report"));
        try {
            Files.createDirectories(dir);
            try (PrintStream jsonl = new PrintStream(Files.newOutputStream(dir.resolve("predictions.jsonl")), false,
                    StandardCharsets.UTF_8)) {
                List<Accuracy.Scored> scored = Accuracy.run(speciation, data, jsonl, new Progress(err, data.size()));
                Accuracy.Summary sum = Accuracy.summarise(scored, speciation);
                String section = "";
                ChargeStates.Summary cs = null;
                if (!charges.isEmpty()) {
                    List<ChargeStates.Row> rows = ChargeStates.run(speciation, charges);
                    cs = ChargeStates.summarise(rows);
                    section = ChargeStates.markdown(rows, cs);
                }
                Accuracy.report(scored, sum, dir, a.flags().getOrDefault("--truth", "") + (f == null ? ""
                        : " (fold " + f[0] + "/" + f[1] + ")") + (subset == null ? "" : " (" + subset + " subset)")
                        + ", table " + tables.current().version().label(), section);
                out.println(sum.line());
                if (cs != null) {
                    out.println(cs.line());
                }
                out.println("report: " + dir.resolve("report.md"));
            }
        } catch (IOException e) {
            err.println("ionmark: cannot write the report: " + e.getMessage());
            return 1;
        }
        return 0;
    }

    /** "K/N" → {k, n}, or null when absent. */
    static int[] fold(String spec) {
        if (spec == null) {
            return null;
        }
        String[] kn = spec.split("/");
        try {
            int k = Integer.parseInt(kn[0]);
            int n = Integer.parseInt(kn[1]);
            if (n < 2 || k < 0 || k >= n) {
                throw new NumberFormatException();
            }
            return new int[] {k, n};
        } catch (RuntimeException e) {
            throw new Cli.UsageException("--fold needs K/N with 0 <= K < N, N >= 2, not '" + spec + "'");
        }
    }

    /** The observations of {@code --truth FILE}. */
    static List<Observation> truth(Cli.Args a) {
        if (!a.flags().containsKey("--truth")) {
            throw new Cli.UsageException("--truth FILE is required");
        }
        try {
            return TruthFile.read(Path.of(a.flags().get("--truth")));
        } catch (IOException | RuntimeException e) {
            throw new Cli.UsageException("cannot read truth file: " + e.getMessage());
        }
    }
}
