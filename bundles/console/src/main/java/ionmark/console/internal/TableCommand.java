package ionmark.console.internal;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Set;

import ionmark.acidity.api.TableService;
import ionmark.acidity.api.ValidationReport;
import ionmark.speciation.measured.MeasuredImport;
import ionmark.store.api.TableStore;

/**
 * {@code table validate|export|add-measured} here; {@code table calibrate} ({@link CalibrateCommand}),
 * {@code table check} ({@link TableCheckCommand}) and the store's subcommands ({@link StoreCommands}) are
 * handed on.
 */
final class TableCommand implements Command {
    private final TableService tables;
    private final TableStore store;
    private final MeasuredImport imports;
    private final Command calibrate;
    private final Command check;
    private final PrintStream out;
    private final PrintStream err;

    TableCommand(TableService tables, TableStore store, MeasuredImport imports, Command calibrate, Command check,
            PrintStream out, PrintStream err) {
        this.tables = tables;
        this.store = store;
        this.imports = imports;
        this.calibrate = calibrate;
        this.check = check;
        this.out = out;
        this.err = err;
    }

    @Override
    public int run(List<String> raw) {
        if (raw.isEmpty()) {
            throw new Cli.UsageException("table needs a subcommand: validate FILE | export [--out FILE]");
        }
        switch (raw.get(0)) {
            case "validate" -> {
                if (raw.size() != 2) {
                    throw new Cli.UsageException("table validate takes one FILE");
                }
                String text;
                try {
                    text = Files.readString(Path.of(raw.get(1)), StandardCharsets.UTF_8);
                } catch (IOException e) {
                    err.println("ionmark: cannot read " + raw.get(1) + ": " + e.getMessage());
                    return 1;
                }
                ValidationReport r = tables.validate(text);
                if (store != null) {
                    store.audit(System.getProperty("user.name", "unknown"), "validate", 0, r.ok() ? "ok" : "rejected",
                            raw.get(1) + ": " + r.errors().size() + " errors");
                }
                r.problems().forEach(out::println);
                out.println(String.format(Locale.ROOT, "%d errors, %d warnings", r.errors().size(),
                        r.warnings().size()));
                return r.ok() ? 0 : 1;
            }
            case "export" -> {
                Cli.Args a = Cli.Args.parse(raw.subList(1, raw.size()), Set.of("--out"));
                String json = tables.toJson(tables.current());
                if (store != null) {
                    store.audit(System.getProperty("user.name", "unknown"), "export", tables.current().version().number(),
                            "ok", "command line" + (a.flags().containsKey("--out") ? " to " + a.flags().get("--out") : ""));
                }
                if (a.flags().containsKey("--out")) {
                    try {
                        Files.writeString(Path.of(a.flags().get("--out")), json, StandardCharsets.UTF_8);
                    } catch (IOException e) {
                        err.println("ionmark: cannot write: " + e.getMessage());
                        return 1;
                    }
                } else {
                    out.print(json);
                }
                return 0;
            }
            case "calibrate" -> {
                return calibrate.run(raw.subList(1, raw.size()));
            }
            case "check" -> {
                return check.run(raw.subList(1, raw.size()));
            }
            case "add-measured" -> {
                return addMeasured(raw.subList(1, raw.size()));
            }
            case "history", "publish", "rollback", "diff", "audit" -> {
                if (store == null) {
                    err.println("ionmark: no table store is available for '" + raw.get(0) + "'");
                    return 1;
                }
                return new StoreCommands(store, out, err).run(raw);
            }
            default -> throw new Cli.UsageException("unknown table subcommand '" + raw.get(0) + "'");
        }
    }

    private int addMeasured(List<String> raw) {
        Cli.Args a = Cli.Args.parse(raw, Set.of("--out", "--format", "--author"));
        if (a.positional().size() != 1 || !a.flags().containsKey("--out")) {
            throw new Cli.UsageException("table add-measured takes one FILE (TSV or SDF) and --out DRAFT");
        }
        String format = a.flags().get("--format");
        if (format != null && !format.equals("tsv") && !format.equals("sdf")) {
            throw new Cli.UsageException("--format must be tsv or sdf, not '" + format + "'");
        }
        if (imports == null) {
            err.println("ionmark: the measured-values import is not available");
            return 1;
        }
        return new AddMeasured(imports, tables, out, err).run(Path.of(a.positional().get(0)), Path.of(a.flags().get(
                "--out")), format, a.flags().getOrDefault("--author", System.getProperty("user.name", "unknown")));
    }
}
