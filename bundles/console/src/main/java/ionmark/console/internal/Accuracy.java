package ionmark.console.internal;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;

import ionmark.calibration.api.Observation;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Site;
import ionmark.speciation.api.Speciation;
import ionmark.speciation.spi.MacroPairing;

/**
 * The accuracy benchmark: predicts every compound of a truth file, scores macroscopic pKa values
 * one to one, and writes report.md, parity.svg and predictions.jsonl.
 */
final class Accuracy {
    static final double LOW = -2;
    static final double HIGH = 16;

    record Scored(Observation o, List<Double> pred, List<int[]> pairs, List<String> groups, List<Double> sds,
            String error) {
        double worst() {
            if (error != null || pairs.size() < o.pka().size()) {
                return 99;
            }
            return pairs.stream().mapToDouble(p -> Math.abs(pred.get(p[1]) - o.pka().get(p[0]))).max().orElse(0);
        }
    }

    record Summary(int molecules, int values, int matched, int failed, int extra, double within1, double mae,
            double rmse, double within1sd, double within2sd) {
        String line() {
            return String.format(Locale.ROOT, "molecules=%d values=%d matched=%d failed_molecules=%d extra_2to12=%d "
                    + "within1=%.3f MAE=%.3f RMSE=%.3f within_1sd=%.3f within_2sd=%.3f", molecules, values, matched,
                    failed, extra, within1, mae, rmse, within1sd, within2sd);
        }
    }

    private Accuracy() {
    }

    static List<Scored> run(Speciation s, List<Observation> data, PrintStream jsonl, Progress bar) {
        List<Scored> out = new ArrayList<>();
        List<Analysis> results = data.parallelStream().map(o -> s.screen(o.structure(), Conditions.noPh())).toList();
        for (int i = 0; i < data.size(); i++) {
            Observation o = data.get(i);
            Analysis a = results.get(i);
            if (jsonl != null) {
                jsonl.println(AnalysisJson.of(o.id(), a));
            }
            if (!a.ok()) {
                out.add(new Scored(o, List.of(), List.of(), List.of(), List.of(), a.error()));
                continue;
            }
            List<Double> pred = a.macroPka().stream().filter(v -> v >= LOW && v <= HIGH).sorted().toList();
            List<Site> sites = a.sites().stream().filter(x -> !x.permanent()).toList();
            List<String> groups = new ArrayList<>();
            List<Double> sds = new ArrayList<>();
            for (double p : pred) {
                Site near = sites.stream().min(Comparator.comparingDouble(x -> Math.abs(x.pka() - p))).orElse(null);
                groups.add(near == null ? "?" : near.group());
                sds.add(near == null ? Double.NaN : near.sd());
            }
            out.add(new Scored(o, pred, MacroPairing.assign(o.pka(), pred), groups, sds, null));
            bar.step(i + 1);
        }
        bar.done();
        return out;
    }

    static Summary summarise(List<Scored> all, Speciation s) {
        int values = 0;
        int matched = 0;
        int failed = 0;
        int extra = 0;
        int within1 = 0;
        double abs = 0;
        double sq = 0;
        int withSd = 0;
        int insideSd = 0;
        int inside2Sd = 0;
        for (Scored x : all) {
            values += x.o().pka().size();
            if (x.error() != null) {
                failed++;
                continue;
            }
            java.util.Set<Integer> usedPred = new java.util.HashSet<>();
            for (int[] p : x.pairs()) {
                double e = x.pred().get(p[1]) - x.o().pka().get(p[0]);
                matched++;
                abs += Math.abs(e);
                sq += e * e;
                within1 += Math.abs(e) <= 1.0 ? 1 : 0;
                usedPred.add(p[1]);
                double sd = x.sds().get(p[1]);
                if (!Double.isNaN(sd)) {
                    withSd++;
                    insideSd += Math.abs(e) <= sd ? 1 : 0;
                    inside2Sd += Math.abs(e) <= 2 * sd ? 1 : 0;
                }
            }
            for (int j = 0; j < x.pred().size(); j++) {
                if (!usedPred.contains(j) && x.pred().get(j) >= 2 && x.pred().get(j) <= 12) {
                    extra++;
                }
            }
        }
        return new Summary(all.size(), values, matched, failed, extra, values == 0 ? 0 : (double) within1 / values,
                matched == 0 ? Double.NaN : abs / matched, matched == 0 ? Double.NaN : Math.sqrt(sq / matched),
                withSd == 0 ? Double.NaN : (double) insideSd / withSd,
                withSd == 0 ? Double.NaN : (double) inside2Sd / withSd);
    }

    static void report(List<Scored> all, Summary sum, Path dir, String title) throws IOException {
        report(all, sum, dir, title, "");
    }

    /** {@code extra}: further Markdown sections (the charge-state measure) placed before the per-class table. */
    static void report(List<Scored> all, Summary sum, Path dir, String title, String extra) throws IOException {
        Files.createDirectories(dir);
        StringBuilder md = new StringBuilder("# Accuracy: ").append(title).append("\n\n");
        md.append("Scored as the team's reviewers score: predicted and experimental macroscopic pKa values paired one to "
                + "one by least total error; experimental values left without a partner are misses.\n\n```\n")
                .append(sum.line()).append("\n```\n\n");
        md.append(String.format(Locale.ROOT, "| share within 1.0 | MAE | RMSE | misses | failed molecules | extra "
                + "predictions (2–12) |%n|---|---|---|---|---|---|%n| %.1f %% | %.2f | %.2f | %d | %d | %d |%n%n",
                100 * sum.within1(), sum.mae(), sum.rmse(), sum.values() - sum.matched(), sum.failed(), sum.extra()));
        md.append(extra);
        Map<String, double[]> perClass = new TreeMap<>();
        for (Scored x : all) {
            for (int[] p : x.pairs()) {
                double e = x.pred().get(p[1]) - x.o().pka().get(p[0]);
                double[] acc = perClass.computeIfAbsent(x.groups().get(p[1]), k -> new double[4]);
                acc[0]++;
                acc[1] += Math.abs(e);
                acc[2] += e;
                acc[3] += Math.abs(e) <= 1 ? 1 : 0;
            }
        }
        md.append("## Per class (class of the site nearest each paired value)\n\n| class | n | MAE | bias | within 1.0 |\n"
                + "|---|---|---|---|---|\n");
        perClass.entrySet().stream().sorted((a, b) -> Double.compare(b.getValue()[0], a.getValue()[0])).forEach(e -> md
                .append(String.format(Locale.ROOT, "| %s | %d | %.2f | %+.2f | %.0f %% |%n", e.getKey(),
                        (int) e.getValue()[0], e.getValue()[1] / e.getValue()[0], e.getValue()[2] / e.getValue()[0],
                        100 * e.getValue()[3] / e.getValue()[0])));
        md.append("\n## The 25 worst compounds\n\n| id | SMILES | experimental | predicted | worst error |\n|---|---|---|---|"
                + "---|\n");
        all.stream().sorted(Comparator.comparingDouble(Scored::worst).reversed()).limit(25).forEach(x -> md.append(
                String.format(Locale.ROOT, "| %s | `%s` | %s | %s | %s |%n", x.o().id(), x.o().structure(), x.o().pka(),
                        x.error() != null ? "error: " + x.error() : round(x.pred()), x.worst() >= 99 ? "miss"
                                : String.format(Locale.ROOT, "%.2f", x.worst()))));
        md.append("\n![parity plot](parity.svg)\n");
        Files.writeString(dir.resolve("report.md"), md, StandardCharsets.UTF_8);
        Files.writeString(dir.resolve("parity.svg"), parity(all, sum), StandardCharsets.UTF_8);
    }

    private static List<Double> round(List<Double> v) {
        return v.stream().map(x -> Math.round(x * 100) / 100.0).toList();
    }

    static String parity(List<Scored> all, Summary sum) {
        int size = 480;
        int pad = 40;
        double lo = -2;
        double hi = 16;
        StringBuilder sb = new StringBuilder(String.format(Locale.ROOT,
                "<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"%d\" height=\"%d\" font-family=\"sans-serif\" "
                        + "font-size=\"11\"><rect width=\"100%%\" height=\"100%%\" fill=\"white\"/>", size, size));
        java.util.function.DoubleUnaryOperator x = v -> pad + (v - lo) / (hi - lo) * (size - 2 * pad);
        java.util.function.DoubleUnaryOperator y = v -> size - pad - (v - lo) / (hi - lo) * (size - 2 * pad);
        sb.append(String.format(Locale.ROOT, "<path d=\"M%.1f %.1fL%.1f %.1f\" stroke=\"#888\"/>", x.applyAsDouble(lo),
                y.applyAsDouble(lo), x.applyAsDouble(hi), y.applyAsDouble(hi)));
        for (double off : new double[] {-1, 1}) {
            sb.append(String.format(Locale.ROOT, "<path d=\"M%.1f %.1fL%.1f %.1f\" stroke=\"#bbb\" "
                    + "stroke-dasharray=\"4 3\"/>", x.applyAsDouble(lo), y.applyAsDouble(lo + off), x.applyAsDouble(hi),
                    y.applyAsDouble(hi + off)));
        }
        for (Scored s : all) {
            for (int[] p : s.pairs()) {
                double e = s.o().pka().get(p[0]);
                double pr = s.pred().get(p[1]);
                sb.append(String.format(Locale.ROOT, "<circle cx=\"%.1f\" cy=\"%.1f\" r=\"1.6\" fill=\"#234\" "
                        + "fill-opacity=\"0.35\"/>", x.applyAsDouble(e), y.applyAsDouble(Math.max(lo, Math.min(hi, pr)))));
            }
        }
        for (int t = -2; t <= 16; t += 2) {
            sb.append(String.format(Locale.ROOT, "<text x=\"%.1f\" y=\"%d\" text-anchor=\"middle\">%d</text>",
                    x.applyAsDouble(t), size - pad + 14, t));
            sb.append(String.format(Locale.ROOT, "<text x=\"%d\" y=\"%.1f\" text-anchor=\"end\">%d</text>", pad - 4,
                    y.applyAsDouble(t) + 4, t));
        }
        sb.append(String.format(Locale.ROOT, "<text x=\"%d\" y=\"%d\" text-anchor=\"middle\">experimental pKa</text>",
                size / 2, size - 6));
        sb.append(String.format(Locale.ROOT, "<text x=\"12\" y=\"%d\" transform=\"rotate(-90 12 %d)\" "
                + "text-anchor=\"middle\">predicted pKa</text>", size / 2, size / 2));
        sb.append(String.format(Locale.ROOT, "<text x=\"%d\" y=\"20\">within 1.0: %.1f %%, MAE %.2f, n = %d</text>", pad
                + 6, 100 * sum.within1(), sum.mae(), sum.matched()));
        return sb.append("</svg>\n").toString();
    }
}
