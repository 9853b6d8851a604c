package ionmark.console.internal;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

import ionmark.acidity.api.TableService;
import ionmark.acidity.api.ValidationReport;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Observation;
import ionmark.speciation.api.Speciation;
import ionmark.speciation.api.TableCalibration;
import ionmark.speciation.api.TableRegression;
import ionmark.store.api.TableStore;

/**
 * The command line: {@code check}, {@code batch}, {@code table}. Exit codes: 0 done, 1 the input
 * could not be analysed or the table has errors, 2 usage.
 */
public final class Cli {
    static final String USAGE = """
            usage: ionmark check SMILES|FILE [--ph X] [--temp C] [--ionic M] [--format text|json]
                   ionmark batch --in FILE [--out FILE] [--ph X] [--temp C] [--ionic M] [--brief]
                   ionmark accuracy --truth FILE [--out DIR] [--fold K/N] [--subset open|frozen]
                   ionmark accuracy --series --truth FILE [--series-fold K/N] [--half] [--members FILE]
                                    [--radius R] [--threshold T] [--prior P] [--kernel linear|quadratic] [--detail]
                   ionmark annotate ENTRY.md [--format json|text]
                   ionmark table validate FILE | table export [--out FILE]
                   ionmark table calibrate --truth FILE --out FILE [--ref ID] [--citation TEXT] [--fold K/N] [--margin M]
                   ionmark table check DRAFT      (validation and the regression report against the head)
                   ionmark table add-measured FILE --out DRAFT [--format tsv|sdf] [--author NAME]
                   ionmark table history | table diff A B | table audit [--limit N]
                   ionmark table publish FILE --base N --comment TEXT [--author NAME]
                   ionmark table rollback N --base M --comment TEXT [--author NAME]""";

    /** Ionic strength above this is refused (mol/L): the Davies equation is a rough guide from 0.5 mol/L on. */
    static final double MAX_IONIC_STRENGTH = 1.0;

    private final Speciation speciation;
    private final TableService tables;
    private final TableCalibration calibration;
    private final TableStore store;
    private final TableRegression regression;
    private final ionmark.speciation.measured.MeasuredImport imports;
    private final PrintStream out;
    private final PrintStream err;

    public Cli(Speciation speciation, TableService tables, TableCalibration calibration, TableStore store,
            PrintStream out, PrintStream err) {
        this(speciation, tables, calibration, store, null, out, err);
    }

    /** With the bulk import of measured values ({@code table add-measured}). */
    public Cli(Speciation speciation, TableService tables, TableCalibration calibration, TableStore store,
            ionmark.speciation.measured.MeasuredImport imports, PrintStream out, PrintStream err) {
        this.imports = imports;
        this.speciation = speciation;
        this.tables = tables;
        this.calibration = calibration;
        this.store = store;
        this.regression = speciation instanceof TableRegression tr ? tr : null;
        this.out = out;
        this.err = err;
    }

    /** Runs one command line; never throws for bad arguments. */
    public int run(List<String> args) {
        if (args.isEmpty()) {
            return usage("no command given");
        }
        try {
            return switch (args.get(0)) {
                case "check" -> check(args.subList(1, args.size()));
                case "batch" -> batch(args.subList(1, args.size()));
                case "table" -> table(args.subList(1, args.size()));
                case "accuracy" -> accuracy(args.subList(1, args.size()));
                case "annotate" -> AnnotateCommand.inFramework(out, err).run(args.subList(1, args.size()));
                default -> usage("unknown command '" + args.get(0) + "'");
            };
        } catch (UsageException e) {
            return usage(e.getMessage());
        }
    }

    private int usage(String why) {
        err.println("ionmark: " + why);
        err.println(USAGE);
        return 2;
    }

    static final class UsageException extends RuntimeException {
        private static final long serialVersionUID = 1L;

        UsageException(String m) {
            super(m);
        }
    }

    /** Flags and positionals. */
    record Args(List<String> positional, java.util.Map<String, String> flags) {
        static Args parse(List<String> raw, java.util.Set<String> known) {
            return parse(raw, known, java.util.Set.of());
        }

        /** {@code switches} take no value; a given switch maps to "true". */
        static Args parse(List<String> raw, java.util.Set<String> known, java.util.Set<String> switches) {
            List<String> pos = new ArrayList<>();
            java.util.Map<String, String> flags = new java.util.HashMap<>();
            for (int i = 0; i < raw.size(); i++) {
                String a = raw.get(i);
                if (a.startsWith("--")) {
                    if (switches.contains(a)) {
                        flags.put(a, "true");
                        continue;
                    }
                    if (!known.contains(a)) {
                        throw new UsageException("unknown option '" + a + "'");
                    }
                    if (i + 1 >= raw.size()) {
                        throw new UsageException("option " + a + " needs a value");
                    }
                    flags.put(a, raw.get(++i));
                } else {
                    pos.add(a);
                }
            }
            return new Args(pos, flags);
        }

        Conditions conditions() {
            Double ph = flags.containsKey("--ph") ? number("--ph") : null;
            double t = flags.containsKey("--temp") ? number("--temp") : Conditions.STANDARD_TEMPERATURE;
            double i = flags.containsKey("--ionic") ? number("--ionic") : 0.0;
            if (i > MAX_IONIC_STRENGTH) {
                throw new UsageException("--ionic " + v("--ionic") + " mol/L is above " + MAX_IONIC_STRENGTH
                        + " mol/L: the activity correction (Davies equation) does not hold there; above 0.5 mol/L it"
                        + " is only a rough guide");
            }
            try {
                return new Conditions(ph, t, i);
            } catch (IllegalArgumentException e) {
                throw new UsageException(e.getMessage());
            }
        }

        String v(String flag) {
            return flags.get(flag);
        }

        double number(String flag) {
            String v = flags.get(flag);
            try {
                return Double.parseDouble(v);
            } catch (NumberFormatException e) {
                throw new UsageException(flag + " needs a number, not '" + v + "'");
            }
        }
    }

    private int check(List<String> raw) {
        boolean json = raw.contains("--format") && raw.indexOf("--format") + 1 < raw.size()
                && raw.get(raw.indexOf("--format") + 1).equals("json");
        if (!json) {
            return checkParsed(raw);
        }
        try {
            return checkParsed(raw);
        } catch (UsageException e) {
            // --format json: a usage problem is an answer in JSON too, so that a script never reads text
            out.println(AnalysisJson.error(e.getMessage()));
            err.println("ionmark: " + e.getMessage());
            return 2;
        }
    }

    private int checkParsed(List<String> raw) {
        Args a = Args.parse(raw, java.util.Set.of("--ph", "--temp", "--ionic", "--format"));
        if (a.positional().size() != 1) {
            throw new UsageException("check takes one structure (SMILES or file)");
        }
        String format = a.flags().getOrDefault("--format", "text");
        if (!format.equals("text") && !format.equals("json")) {
            throw new UsageException("--format must be text or json, not '" + format + "'");
        }
        Conditions c = a.conditions();
        String input = a.positional().get(0);
        Path p = Path.of(".");
        try {
            p = Path.of(input.length() < 250 && !input.contains("\n") ? input : ".");
        } catch (java.nio.file.InvalidPathException e) {
            // not a file name (a NUL, say): the text is the structure
        }
        if (!input.isBlank() && Files.isRegularFile(p)) {
            try {
                input = Files.readString(p, StandardCharsets.UTF_8);
            } catch (IOException e) {
                if (format.equals("json")) {
                    out.println(AnalysisJson.error("cannot read " + p + ": " + e.getMessage()));
                }
                err.println("ionmark: cannot read " + p + ": " + e.getMessage());
                return 1;
            }
        }
        Analysis r = speciation.analyse(input, c);
        if (format.equals("json")) {
            out.println(AnalysisJson.of(null, r).toString());
        } else {
            out.print(TextReport.of(r));
        }
        if (!r.ok()) {
            err.println("ionmark: " + r.error());
            return 1;
        }
        return 0;
    }

    private int batch(List<String> raw) {
        Args a = Args.parse(raw, java.util.Set.of("--in", "--out", "--ph", "--temp", "--ionic"), java.util.Set.of("--brief"));
        if (!a.flags().containsKey("--in")) {
            throw new UsageException("batch needs --in FILE");
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

    private int table(List<String> raw) {
        if (raw.isEmpty()) {
            throw new UsageException("table needs a subcommand: validate FILE | export [--out FILE]");
        }
        switch (raw.get(0)) {
            case "validate" -> {
                if (raw.size() != 2) {
                    throw new UsageException("table validate takes one FILE");
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
                Args a = Args.parse(raw.subList(1, raw.size()), java.util.Set.of("--out"));
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
                return calibrate(raw.subList(1, raw.size()));
            }
            case "check" -> {
                return checkDraft(raw.subList(1, raw.size()));
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
            default -> throw new UsageException("unknown table subcommand '" + raw.get(0) + "'");
        }
    }

    /** Validation of a draft and the regression report over the reference set, head against draft. */
    private int checkDraft(List<String> raw) {
        if (raw.size() != 1) {
            throw new UsageException("table check takes one draft FILE");
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

    private int addMeasured(List<String> raw) {
        Args a = Args.parse(raw, java.util.Set.of("--out", "--format", "--author"));
        if (a.positional().size() != 1 || !a.flags().containsKey("--out")) {
            throw new UsageException("table add-measured takes one FILE (TSV or SDF) and --out DRAFT");
        }
        String format = a.flags().get("--format");
        if (format != null && !format.equals("tsv") && !format.equals("sdf")) {
            throw new UsageException("--format must be tsv or sdf, not '" + format + "'");
        }
        if (imports == null) {
            err.println("ionmark: the measured-values import is not available");
            return 1;
        }
        return new AddMeasured(imports, tables, out, err).run(Path.of(a.positional().get(0)), Path.of(a.flags().get(
                "--out")), format, a.flags().getOrDefault("--author", System.getProperty("user.name", "unknown")));
    }

    /** "K/N" → {k, n}, or null when absent. */
    private static int[] fold(String spec) {
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
            throw new UsageException("--fold needs K/N with 0 <= K < N, N >= 2, not '" + spec + "'");
        }
    }

    private List<Observation> truth(Args a) {
        if (!a.flags().containsKey("--truth")) {
            throw new UsageException("--truth FILE is required");
        }
        try {
            return Accuracy.readTruth(Path.of(a.flags().get("--truth")));
        } catch (IOException | RuntimeException e) {
            throw new UsageException("cannot read truth file: " + e.getMessage());
        }
    }

    private int accuracy(List<String> raw) {
        if (raw.contains("--series")) {
            return new SeriesCommand(speciation, tables.current(), out, err).run(raw);
        }
        Args a = Args.parse(raw, java.util.Set.of("--truth", "--out", "--fold", "--subset"));
        int[] f = fold(a.flags().get("--fold"));
        String subset = a.flags().get("--subset");
        FrozenSplit.in(subset, ""); // a bad subset name is a usage error before any work
        java.util.function.Predicate<String> keep = id -> (f == null || Accuracy.inFold(id, f[0], f[1]))
                && FrozenSplit.in(subset, id);
        List<Observation> data = truth(a).stream().filter(o -> keep.test(o.id())).toList();
        List<ChargeStates.Truth> charges;
        try {
            charges = ChargeStates.read(Path.of(a.flags().get("--truth"))).stream().filter(t -> keep.test(t.id()))
                    .toList();
        } catch (IOException | RuntimeException e) {
            throw new UsageException("cannot read the z_top column of the truth file: " + e.getMessage());
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

    private int calibrate(List<String> raw) {
        Args a = Args.parse(raw, java.util.Set.of("--truth", "--out", "--ref", "--citation", "--fold", "--margin"));
        if (!a.flags().containsKey("--out")) {
            throw new UsageException("table calibrate needs --out FILE");
        }
        int[] f = fold(a.flags().get("--fold"));
        List<Observation> data = truth(a).stream().filter(o -> f == null || !Accuracy.inFold(o.id(), f[0], f[1]))
                .toList();
        String ref = a.flags().getOrDefault("--ref", "calibration");
        String citation = a.flags().getOrDefault("--citation", "Calibration data " + a.flags().get("--truth") + ".");
        TableCalibration.Result r = calibration.calibrate(tables.current(), data, ref, citation);
        for (var fit : r.fits()) {
            if (fit.group().startsWith("pair ")) { // a pair rule: its two values, fitted on the whole model only
                out.println(String.format(Locale.ROOT, "%-32s singly %.2f -> %.2f  doubly %.2f -> %.2f  (whole model on %d)",
                        fit.group(), fit.pkaBefore(), fit.pkaAfter(), fit.rhoBefore(), fit.rhoAfter(), fit.wholeModelN()));
                continue;
            }
            out.println(String.format(Locale.ROOT, "%-32s n=%4d trimmed=%3d pKa %6.2f -> %6.2f  rho %6.2f -> %6.2f  "
                    + "RMSE %.2f%s", fit.group(), fit.n(), fit.trimmed(), fit.pkaBefore(), fit.pkaAfter(), fit.rhoBefore(),
                    fit.rhoAfter(), fit.rmse(), fit.rejected() ? "  REJECTED (moves too far; class unchanged)"
                            : fit.wholeModelN() > 0 ? String.format(Locale.ROOT, "  (one-site %.2f, whole model on %d)",
                                    fit.pkaSingleSite(), fit.wholeModelN()) : ""));
        }
        if (regression != null && !CalibrationGuard.report(speciation, regression, tables.current(), r.table(), data,
                a.flags().containsKey("--margin") ? a.number("--margin") : CalibrationGuard.MARGIN, out, err).accepted()) {
            return 1;
        }
        try {
            Files.writeString(Path.of(a.flags().get("--out")), tables.toJson(r.table()), StandardCharsets.UTF_8);
        } catch (IOException e) {
            err.println("ionmark: cannot write: " + e.getMessage());
            return 1;
        }
        ValidationReport v = tables.validate(tables.toJson(r.table()));
        out.println(r.fits().size() + " classes fitted on " + data.size() + " compounds; " + v.errors().size()
                + " validation errors");
        return v.ok() ? 0 : 1;
    }
}
