package ionmark.benchmarks;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.ValidationReport;
import ionmark.acidity.internal.TableSnapshotService;
import ionmark.calibration.api.Observation;
import ionmark.calibration.api.TruthFile;
import ionmark.calibration.internal.CalibrationService;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Site;
import ionmark.speciation.internal.SpeciationService;
import ionmark.speciation.spi.MacroPairing;

/**
 * Does the stated sd cover held-out errors? Calibrates a base table without one fold of a truth file, or
 * scores one fold with a table: the share of paired values within 1, 2 and 3 stated sd, as {@code ./ionmark
 * accuracy} pairs them (macroscopic constants paired one to one by least total error, each with the sd of
 * the nearest site). Runs in a plain JVM, without the application.
 *
 * <pre>
 * java -cp features/benchmarks/target/benchmarks.jar ionmark.benchmarks.SdCoverage calibrate \
 *     bundles/acidity/table/curated.json /work/dev-open.tsv 0/5 /tmp/fold0.json
 * java -cp features/benchmarks/target/benchmarks.jar ionmark.benchmarks.SdCoverage score \
 *     /tmp/fold0.json /work/dev-open.tsv 0/5 [values.tsv]
 * java -cp features/benchmarks/target/benchmarks.jar ionmark.benchmarks.SdCoverage score shipped /work/dev-open.tsv all
 * </pre>
 * The optional TSV gets one row per paired value (error, sd, class, fit count, basis, sites), for looking at
 * where the tails are.
 */
public final class SdCoverage {
    private static final double LOW = -2;
    private static final double HIGH = 16;

    private SdCoverage() {
    }

    public static void main(String[] args) throws IOException {
        if (args.length < 4 && !(args.length >= 3 && args[0].equals("score"))) {
            System.err.println("usage: SdCoverage calibrate BASE.json TRUTH K/N OUT.json | score TABLE.json|shipped TRUTH K/N|all [OUT.tsv]");
            System.exit(2);
        }
        TableSnapshotService tables = new TableSnapshotService(null);
        AcidityTable table = args[1].equals("shipped") ? TableSnapshotService.shipped() : load(tables, Path.of(args[1]));
        List<Observation> truth = TruthFile.read(Path.of(args[2]));
        int[] fold = args[3].equals("all") ? null : new int[] {Integer.parseInt(args[3].split("/")[0]),
                Integer.parseInt(args[3].split("/")[1])};
        SpeciationService s = new SpeciationService(table, 300, 30_000);
        if (args[0].equals("calibrate")) {
            List<Observation> data = truth.stream().filter(o -> fold == null || !TruthFile.inFold(o.id(), fold[0], fold[1])).toList();
            var r = new CalibrationService(s).calibrate(table, data, "calibration", "Calibration data " + args[2] + ".");
            Files.writeString(Path.of(args[4]), tables.toJson(r.table()), StandardCharsets.UTF_8);
            System.out.println(r.fits().size() + " classes fitted on " + data.size() + " compounds");
            return;
        }
        List<Observation> data = truth.stream().filter(o -> fold == null || TruthFile.inFold(o.id(), fold[0], fold[1])).toList();
        PrintStream rows = args.length > 4 ? new PrintStream(Files.newOutputStream(Path.of(args[4])), true,
                StandardCharsets.UTF_8) : null;
        if (rows != null) {
            rows.println("id\terror\tsd\tgroup\tfit_n\tbasis\tsites\tpred\tclass_sd\tcorrection\tmacro");
        }
        List<Analysis> results = data.parallelStream().map(o -> s.screen(o.structure(), Conditions.noPh())).toList();
        int[] inside = new int[4];
        int n = 0;
        double abs = 0;
        for (int i = 0; i < data.size(); i++) {
            Analysis a = results.get(i);
            if (!a.ok()) {
                continue;
            }
            List<Double> pred = a.macroPka().stream().filter(v -> v >= LOW && v <= HIGH).sorted().toList();
            List<Site> sites = a.sites().stream().filter(x -> !x.permanent()).toList();
            for (int[] p : MacroPairing.assign(data.get(i).pka(), pred)) {
                double e = pred.get(p[1]) - data.get(i).pka().get(p[0]);
                Site near = sites.stream().min(Comparator.comparingDouble(x -> Math.abs(x.pka() - pred.get(p[1]))))
                        .orElse(null);
                if (near == null) {
                    continue;
                }
                n++;
                abs += Math.abs(e);
                for (int k = 1; k <= 3; k++) {
                    inside[k] += Math.abs(e) <= k * near.sd() ? 1 : 0;
                }
                if (rows != null) {
                    double classPka = near.derivation().isEmpty() ? near.pka() : near.derivation().get(0).value();
                    rows.printf(Locale.ROOT, "%s\t%.3f\t%.3f\t%s\t%d\t%s\t%d\t%.2f\t%.3f\t%.3f\t%d%n", data.get(i).id(), e,
                            near.sd(), near.group(), table.fit(near.group()).map(f -> f.n()).orElse(-1), near.basis().label(),
                            sites.size(), pred.get(p[1]), table.group(near.group()).map(g -> g.sd()).orElse(Double.NaN),
                            near.pka() - classPka, pred.size());
                }
            }
        }
        System.out.printf(Locale.ROOT, "%d paired values, MAE %.3f; within 1 sd %.3f, 2 sd %.3f, 3 sd %.3f%n", n,
                abs / Math.max(1, n), inside[1] / (double) n, inside[2] / (double) n, inside[3] / (double) n);
        if (rows != null) {
            rows.close();
        }
    }

    private static AcidityTable load(TableSnapshotService tables, Path p) throws IOException {
        ValidationReport r = tables.validate(Files.readString(p, StandardCharsets.UTF_8));
        if (!r.ok()) {
            throw new IllegalArgumentException(p + " does not validate: " + r.errors());
        }
        return r.table().orElseThrow();
    }
}
