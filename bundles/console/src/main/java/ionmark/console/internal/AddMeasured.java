package ionmark.console.internal;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.TableService;
import ionmark.acidity.api.ValidationReport;
import ionmark.speciation.measured.MeasuredImport;

/**
 * {@code table add-measured FILE --out DRAFT}: measured values in bulk into a draft of the current table,
 * every row checked and its problems printed with its row number; and the part of a draft's regression
 * report that lists what new measurements move through their analogs.
 */
final class AddMeasured {
    private final MeasuredImport imports;
    private final TableService tables;
    private final PrintStream out;
    private final PrintStream err;

    AddMeasured(MeasuredImport imports, TableService tables, PrintStream out, PrintStream err) {
        this.imports = imports;
        this.tables = tables;
        this.out = out;
        this.err = err;
    }

    /** Exit code: 0 every row went into the draft, 1 some rows have problems (the draft holds the others). */
    int run(Path file, Path draftFile, String format, String author) {
        String text;
        try {
            text = Files.readString(file, StandardCharsets.UTF_8);
        } catch (IOException e) {
            err.println("ionmark: cannot read " + file + ": " + e.getMessage());
            return 1;
        }
        String name = String.valueOf(file.getFileName()).toLowerCase(Locale.ROOT);
        MeasuredImport.Format f = format != null ? MeasuredImport.Format.valueOf(format.toUpperCase(Locale.ROOT))
                : name.endsWith(".sdf") || name.endsWith(".sd") ? MeasuredImport.Format.SDF : MeasuredImport.Format.TSV;
        AcidityTable head = tables.current();
        MeasuredImport.Result r = imports.read(text, f, head, author);
        for (MeasuredImport.Row row : r.rows()) {
            String id = row.compound() != null ? row.compound().id() : "";
            row.problems().forEach(p -> out.println(String.format(Locale.ROOT, "row %d: error: %s", row.line(), p)));
            row.notes().forEach(p -> out.println(String.format(Locale.ROOT, "row %d%s: note: %s", row.line(),
                    id.isEmpty() ? "" : " (" + id + ")", p)));
            if (row.ok()) {
                out.println(String.format(Locale.ROOT, "row %d (%s): pKa %s to %s", row.line(), id, row.compound().pka(),
                        row.sites()));
            }
        }
        long ok = r.rows().stream().filter(MeasuredImport.Row::ok).count();
        String json = tables.toJson(r.draft());
        ValidationReport v = tables.validate(json);
        v.errors().forEach(p -> out.println("draft: " + p));
        try {
            Files.writeString(draftFile, json, StandardCharsets.UTF_8);
        } catch (IOException e) {
            err.println("ionmark: cannot write " + draftFile + ": " + e.getMessage());
            return 1;
        }
        out.println(String.format(Locale.ROOT, "%d of %d rows ready; draft based on %s written to %s (%d validation "
                + "errors); check it with ./ionmark table check %s", ok, r.rows().size(), head.version().label(), draftFile,
                v.errors().size(), draftFile));
        printMoves(head, r.draft());
        return r.ok() && v.ok() ? 0 : 1;
    }

    /** The predictions of the reference set that the draft's measured compounds move, and by which. */
    void printMoves(AcidityTable head, AcidityTable draft) {
        List<MeasuredImport.Move> moves = imports.analogMoves(head, draft, List.of());
        out.println("moved by measured analogs: " + (moves.isEmpty() ? "nothing in the reference set" : moves.size()
                + " sites"));
        for (MeasuredImport.Move m : moves) {
            out.println(String.format(Locale.ROOT, "  %-28s %-26s head %6.2f  draft %6.2f  by %s", m.name(), m.site(),
                    m.head(), m.draft(), String.join(", ", m.movedBy())));
        }
    }
}
