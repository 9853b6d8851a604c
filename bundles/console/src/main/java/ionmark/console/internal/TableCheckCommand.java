package ionmark.console.internal;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

import ionmark.acidity.api.TableService;
import ionmark.acidity.api.ValidationReport;
import ionmark.speciation.api.TableRegression;
import ionmark.speciation.measured.MeasuredImport;
import ionmark.store.api.TableStore;

/** {@code table check DRAFT}: validation of a draft and the regression report over the reference set, head against draft. */
final class TableCheckCommand implements Command {
    private final TableService tables;
    private final TableStore store;
    private final TableRegression regression;
    private final MeasuredImport imports;
    private final PrintStream out;
    private final PrintStream err;

    /** {@code store}, {@code regression} and {@code imports} may be null: their part of the report is left out. */
    TableCheckCommand(TableService tables, TableStore store, TableRegression regression, MeasuredImport imports,
            PrintStream out, PrintStream err) {
        this.tables = tables;
        this.store = store;
        this.regression = regression;
        this.imports = imports;
        this.out = out;
        this.err = err;
    }

    @Override
    public int run(List<String> raw) {
        if (raw.size() != 1) {
            throw new Cli.UsageException("table check takes one draft FILE");
        }
        String text;
        try {
            text = Files.readString(Path.of(raw.get(0)), StandardCharsets.UTF_8);
        } catch (IOException e) {
            err.println("ionmark: cannot read " + raw.get(0) + ": " + e.getMessage());
            return 1;
        }
        ValidationReport r = tables.validate(text);
        r.problems().forEach(out::println);
        out.println(String.format(Locale.ROOT, "%d errors, %d warnings", r.errors().size(), r.warnings().size()));
        if (store != null) {
            store.audit(System.getProperty("user.name", "unknown"), "validate", 0, r.ok() ? "ok" : "rejected",
                    raw.get(0) + " (table check)");
        }
        if (!r.ok() || regression == null) {
            return r.ok() ? 0 : 1;
        }
        TableRegression.Report rep = regression.compare(tables.current(), r.table().orElseThrow());
        out.println(String.format(Locale.ROOT, "reference set: %d compounds; MAE against handbook values: head %.3f, "
                + "draft %.3f", rep.compounds(), rep.maeHead(), rep.maeDraft()));
        out.println("touched: " + (rep.classesTouched().isEmpty() ? "nothing" : String.join(", ", rep.classesTouched())));
        for (TableRegression.Shift sh : rep.shifts()) {
            out.println(String.format(Locale.ROOT, "  %-28s reference %s  head %s  draft %s%s%s", sh.name(), sh.reference(),
                    sh.head(), sh.draft(), sh.sitesGained().isEmpty() ? "" : "  gained " + sh.sitesGained(),
                    sh.sitesLost().isEmpty() ? "" : "  lost " + sh.sitesLost()));
        }
        if (imports != null) {
            new AddMeasured(imports, tables, out, err).printMoves(tables.current(), r.table().orElseThrow());
        }
        return 0;
    }
}
