package ionmark.console.internal;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.MeasuredCompound;
import ionmark.acidity.api.Reference;
import ionmark.acidity.api.TableVersion;
import ionmark.calibration.api.Observation;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Speciation;

/**
 * What measured values teach a table about their analogs: compounds of a truth file grouped into
 * series (same ring framework, same site classes, four or more members). Two experiments:
 * <ul>
 * <li>half series: every other member (by id) of each series is added to the table as a measured
 * compound, and the other half is predicted before and after;</li>
 * <li>whole series held out: series fall into five folds by a hash of their key; the members of the
 * other folds' series are added, and the fold's series are predicted before and after (analogs from
 * other series must not make them worse).</li>
 * </ul>
 * Prints MAE before and after and the mean absolute bias of series biased beyond 0.7 units.
 */
final class SeriesExperiment {
    static final int MIN_SERIES = 4;
    static final double BIASED = 0.7;
    /** Series folds of {@code --members} when no {@code --series-fold} is given. */
    static final int FOLDS = 5;

    private final Speciation speciation;
    private final AcidityTable head;
    private final PrintStream out;
    private final PrintStream err;

    SeriesExperiment(Speciation speciation, AcidityTable head, PrintStream out, PrintStream err) {
        this.speciation = speciation;
        this.head = head;
        this.out = out;
        this.err = err;
    }

    /** The series of a data set, by key "framework | classes". */
    Map<String, List<Observation>> series(List<Observation> data) {
        List<Analysis> before = data.parallelStream().map(o -> speciation.screen(o.structure(), Conditions.noPh()))
                .toList();
        Map<String, List<Observation>> by = new TreeMap<>();
        for (int i = 0; i < data.size(); i++) {
            Analysis a = before.get(i);
            String frame = Scaffolds.framework(data.get(i).structure());
            if (!a.ok() || frame.isEmpty()) {
                continue;
            }
            String classes = String.join(",", a.sites().stream().filter(s -> !s.permanent()).map(s -> s.group())
                    .distinct().sorted().toList());
            if (!classes.isEmpty()) {
                by.computeIfAbsent(frame + " | " + classes, k -> new ArrayList<>()).add(data.get(i));
            }
        }
        by.values().removeIf(v -> v.size() < MIN_SERIES);
        by.values().forEach(v -> v.sort(Comparator.comparing(Observation::id)));
        return by;
    }

    /** The fold of a series among {@code n}: a hash of its key, so that the same series always fall together. */
    static int seriesFold(String key, int n) {
        return (int) (Long.parseLong(digest("ionmark-series-1:" + key).substring(0, 8), 16) % n);
    }

    /** Writes every series member as {@code id, series, fold} (tab-separated, one header line). */
    int members(List<Observation> data, Path file, int folds) {
        Map<String, List<Observation>> series = series(data);
        StringBuilder b = new StringBuilder("id\tseries\tfold\n");
        series.forEach((k, v) -> v.forEach(o -> b.append(o.id()).append('\t').append(k).append('\t')
                .append(seriesFold(k, folds)).append('\n')));
        try {
            Files.writeString(file, b, StandardCharsets.UTF_8);
        } catch (IOException e) {
            err.println("ionmark: cannot write " + file + ": " + e.getMessage());
            return 1;
        }
        int[] perFold = new int[folds];
        series.forEach((k, v) -> perFold[seriesFold(k, folds)] += v.size());
        out.println(String.format(Locale.ROOT, "%d series (%d compounds) written to %s; members per fold of %d: %s",
                series.size(), series.values().stream().mapToInt(List::size).sum(), file, folds,
                java.util.Arrays.toString(perFold)));
        return 0;
    }

    /**
     * Runs the experiments; with {@code fold} = {K, N} only the series of fold K take part, and with
     * {@code halfOnly} the whole-series experiment is skipped.
     */
    int run(List<Observation> data, Map<String, String> settings, int[] fold, boolean halfOnly) {
        settings.forEach(System::setProperty);
        Map<String, List<Observation>> series = series(data);
        if (fold != null) {
            series.keySet().removeIf(k -> seriesFold(k, fold[1]) != fold[0]);
        }
        int members = series.values().stream().mapToInt(List::size).sum();
        out.println(String.format(Locale.ROOT, "%d series of %d or more (%d compounds) from %d compounds%s; settings %s",
                series.size(), MIN_SERIES, members, data.size(), fold == null ? ""
                        : " (series fold " + fold[0] + "/" + fold[1] + ")", settings.isEmpty() ? "default" : settings));
        // half series
        List<Observation> measured = new ArrayList<>();
        Map<String, List<Observation>> predicted = new LinkedHashMap<>();
        series.forEach((k, v) -> {
            for (int i = 0; i < v.size(); i++) {
                (i % 2 == 0 ? measured : predicted.computeIfAbsent(k, x -> new ArrayList<>())).add(v.get(i));
            }
        });
        report("half series", predicted, measured, 0);
        if (halfOnly) {
            return 0;
        }
        // whole series held out
        double[] sums = new double[4];
        for (int f = 0; f < 5; f++) {
            List<Observation> taught = new ArrayList<>();
            Map<String, List<Observation>> held = new LinkedHashMap<>();
            for (var e : series.entrySet()) {
                if (Math.floorMod(e.getKey().hashCode(), 5) == f) {
                    held.put(e.getKey(), e.getValue());
                } else {
                    taught.addAll(e.getValue());
                }
            }
            double[] r = compare(held, taught, f + 1, false);
            for (int j = 0; j < 4; j++) {
                sums[j] += r[j];
            }
        }
        out.println(String.format(Locale.ROOT, "whole series held out (5 folds): %d values; MAE %.3f -> %.3f",
                (int) sums[2], sums[0] / sums[2], sums[1] / sums[2]));
        return 0;
    }

    private void report(String title, Map<String, List<Observation>> predicted, List<Observation> measured, int salt) {
        double[] r = compare(predicted, measured, salt, true);
        out.println(String.format(Locale.ROOT, "%s: %d measured, %d values predicted; MAE %.3f -> %.3f (ratio %.2f); "
                + "%d series biased > %.1f: mean |bias| %.3f -> %.3f", title, measured.size(), (int) r[2], r[0] / r[2],
                r[1] / r[2], r[1] / r[0], (int) r[3], BIASED, r[4], r[5]));
    }

    /** {sum |err| before, after, values, biased series, mean |bias| before, after} for the biased series. */
    private double[] compare(Map<String, List<Observation>> predicted, List<Observation> measured, int salt,
            boolean firing) {
        List<Observation> targets = predicted.values().stream().flatMap(List::stream).toList();
        Speciation taught = speciation.pinned(withMeasured(measured, salt));
        List<Accuracy.Scored> before = Accuracy.run(speciation, targets, null, new Progress(err, targets.size()));
        List<Accuracy.Scored> after = Accuracy.run(taught, targets, null, new Progress(err, targets.size()));
        if (firing) {
            AnalogFiring.Stats st = AnalogFiring.of(screen(speciation, targets), screen(taught, targets));
            out.println(st.line());
            if (Boolean.getBoolean("ionmark.series.detail")) {
                st.differences().forEach(d -> out.println("  not identical: " + d));
            }
        }
        double absB = 0;
        double absA = 0;
        int n = 0;
        Map<String, double[]> bias = new HashMap<>(); // series → {sum before, sum after, n}
        for (int i = 0; i < targets.size(); i++) {
            Accuracy.Scored b = before.get(i);
            Accuracy.Scored a = after.get(i);
            if (b.error() != null || a.error() != null) {
                continue;
            }
            String key = keyOf(predicted, targets.get(i));
            for (int[] p : b.pairs()) {
                double eb = b.pred().get(p[1]) - b.o().pka().get(p[0]);
                double ea = nearest(a, p[0]) - b.o().pka().get(p[0]);
                absB += Math.abs(eb);
                absA += Math.abs(ea);
                n++;
                if (firing && Boolean.getBoolean("ionmark.series.detail")) {
                    out.println(String.format(Locale.ROOT, "  value %s %.2f: error %+.2f -> %+.2f", b.o().id(),
                            b.o().pka().get(p[0]), eb, ea));
                }
                double[] s = bias.computeIfAbsent(key, k -> new double[3]);
                s[0] += eb;
                s[1] += ea;
                s[2]++;
            }
        }
        int biased = 0;
        double bb = 0;
        double ba = 0;
        for (var e : bias.entrySet()) {
            double[] s = e.getValue();
            if (Math.abs(s[0] / s[2]) > BIASED && Boolean.getBoolean("ionmark.series.detail")) {
                out.println(String.format(Locale.ROOT, "  biased series %s: %+.2f -> %+.2f over %d values", e.getKey(),
                        s[0] / s[2], s[1] / s[2], (int) s[2]));
                Observation first = predicted.get(e.getKey()).get(0);
                taught.analyse(first.structure(), Conditions.noPh()).sites().stream().filter(x -> !x.permanent())
                        .forEach(x -> x.derivation().stream().filter(t -> t.label().startsWith("measured analog"))
                                .forEach(t -> out.println("    " + first.id() + " " + x.group() + ": " + t.label())));
            }
            if (Math.abs(s[0] / s[2]) > BIASED) {
                biased++;
                bb += Math.abs(s[0] / s[2]);
                ba += Math.abs(s[1] / s[2]);
            }
        }
        return new double[] {absB, absA, n, biased, biased == 0 ? 0 : bb / biased, biased == 0 ? 0 : ba / biased};
    }

    private static List<Analysis> screen(Speciation s, List<Observation> data) {
        return data.parallelStream().map(o -> s.screen(o.structure(), Conditions.noPh())).toList();
    }

    private static String keyOf(Map<String, List<Observation>> predicted, Observation o) {
        for (var e : predicted.entrySet()) {
            if (e.getValue().contains(o)) {
                return e.getKey();
            }
        }
        return "";
    }

    /** The prediction paired with experimental value {@code k} (unpaired: the nearest constant). */
    private static double nearest(Accuracy.Scored s, int k) {
        for (int[] p : s.pairs()) {
            if (p[0] == k) {
                return s.pred().get(p[1]);
            }
        }
        double x = s.o().pka().get(k);
        return s.pred().stream().min(Comparator.comparingDouble(v -> Math.abs(v - x))).orElse(x);
    }

    /** The head with these compounds as measured compounds, under a version of its own (the pinned cache key). */
    private AcidityTable withMeasured(List<Observation> obs, int salt) {
        List<MeasuredCompound> m = new ArrayList<>(head.measured());
        for (Observation o : obs) {
            m.add(new MeasuredCompound("series-" + o.id(), o.id(), o.structure(), o.pka(), 25, 0,
                    "development set", "series-experiment", List.of()));
        }
        List<Reference> refs = new ArrayList<>(head.references());
        refs.add(new Reference("series-experiment", "Development-set values used as measured compounds in the "
                + "series experiment."));
        TableVersion v = head.version();
        String hash = digest(head.version().hash() + "|" + salt + "|" + System.getProperties().entrySet().stream()
                .filter(e -> String.valueOf(e.getKey()).startsWith("ionmark.analog.")).map(String::valueOf).sorted()
                .toList() + "|" + obs.stream().map(Observation::id).toList());
        return head.withMeasured(m).withReferences(refs)
                .withVersion(new TableVersion(v.number(), v.author(), v.time(), v.comment(), hash, v.parent()));
    }

    static String digest(String s) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(s.getBytes(StandardCharsets.UTF_8)));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }

    /** Whether a development-set id is in the frozen part, which no decision may see. */
    static boolean frozen(String id) {
        String h = digest("ionmark-frozen-1:" + id);
        return Long.parseLong(h.substring(0, 8), 16) % 100 < 15; // unsigned: a long, not an int
    }
}
