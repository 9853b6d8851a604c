package ionmark.console.internal;

import java.io.PrintStream;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import ionmark.acidity.api.TableService;
import ionmark.calibration.api.TableCalibration;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Speciation;
import ionmark.speciation.api.TableRegression;
import ionmark.speciation.measured.MeasuredImport;
import ionmark.store.api.TableStore;

/**
 * The command line: dispatches to one {@link Command} per command ({@code check}, {@code batch},
 * {@code table}, {@code accuracy}, {@code annotate}) and owns the usage text and the argument parser.
 * Exit codes: 0 done, 1 the input could not be analysed or the table has errors, 2 usage.
 *
 * <p>{@code accuracy} and {@code table calibrate} need the calibration bundle ({@code ionmark.calibration}); the
 * console imports its API optionally, so that the notebook runtime resolves without it. Built with no
 * calibration service, the console does not touch a calibration class, and those two commands say what is missing.
 */
public final class Cli {
    static final String USAGE = """
            usage: ionmark check SMILES|FILE [--ph X] [--temp C] [--ionic M] [--format text|json]
                   ionmark batch --in FILE [--out FILE] [--ph X] [--temp C] [--ionic M] [--brief]
                   ionmark accuracy --truth FILE [--out DIR] [--fold K/N] [--subset open|frozen]
                   ionmark accuracy --series --truth FILE [--series-fold K/N] [--half] [--members FILE]
                                    [--radius R] [--threshold T] [--prior P] [--kernel linear|quadratic] [--detail]
                                    [--family F] [--huber C] [--near-prior P] [--global G]
                                    [--assign nearest|titrating|split] [--annular on|off]
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

    private final Map<String, Command> commands;
    private final PrintStream err;

    /**
     * The commands that need only the speciation service and the table ({@code check}, {@code batch},
     * {@code annotate}, {@code table validate|export}); {@code table check} reports validation only, and
     * {@code table calibrate} and {@code accuracy} say that the calibration bundle is missing when
     * {@code calibration} is null.
     */
    public Cli(Speciation speciation, TableService tables, TableCalibration calibration, TableStore store,
            PrintStream out, PrintStream err) {
        this(speciation, null, tables, calibration, store, null, out, err);
    }

    /**
     * Every command, each given what it needs. {@code regression} (the reference-set check of a draft), {@code
     * calibration}, {@code store} and {@code imports} may be null: the commands that need them then leave their part
     * out or say what is missing.
     */
    public Cli(Speciation speciation, TableRegression regression, TableService tables, TableCalibration calibration,
            TableStore store, MeasuredImport imports, PrintStream out, PrintStream err) {
        // no calibration class is loaded unless the calibration service is there
        Command calibrate = calibration == null ? missingCalibration("table calibrate", err)
                : new CalibrateCommand(speciation, tables, calibration, regression, out, err);
        Command accuracy = calibration == null ? missingCalibration("accuracy", err)
                : new AccuracyCommand(speciation, tables, out, err);
        this.commands = Map.of(
                "check", new CheckCommand(speciation, out, err),
                "batch", new BatchCommand(speciation, out, err),
                "table", new TableCommand(tables, store, imports, calibrate,
                        new TableCheckCommand(tables, store, regression, imports, out, err), out, err),
                "accuracy", accuracy,
                "annotate", raw -> AnnotateCommand.inFramework(out, err).run(raw));
        this.err = err;
    }

    /** The message of a command that needs the calibration bundle in a runtime without it (exit 1). */
    static Command missingCalibration(String name, PrintStream err) {
        return raw -> {
            err.println("ionmark: " + name + " needs the calibration bundle (ionmark.calibration), which this runtime"
                    + " does not include; ./ionmark runs it in the runtime that does (features/app/calibration.bndrun)");
            return 1;
        };
    }

    /** Runs one command line; never throws for bad arguments. */
    public int run(List<String> args) {
        if (args.isEmpty()) {
            return usage("no command given");
        }
        Command command = commands.get(args.get(0));
        if (command == null) {
            return usage("unknown command '" + args.get(0) + "'");
        }
        try {
            return command.run(args.subList(1, args.size()));
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
}
