package ionmark.console.internal;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;

import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Speciation;
import ionmark.speciation.spi.MacroPairing;

/**
 * The charge-state measure: what a chemist reads on a card. For a truth file that also gives
 * {@code z_top}, the charge of the fully protonated form, the experimental net charge at a pH follows
 * from the macroscopic constants by sequential deprotonation (the form that has lost d protons has
 * charge z_top − d, and its share is ∝ 10^Σ_{j≤d}(pH − pK_j)). A compound agrees at a pH when the
 * predicted mean net charge is within {@link #TOLERANCE} of that. Predicted constants between 2 and
 * 12 left without an experimental partner are counted as spurious.
 */
final class ChargeStates {
    static final double[] PH = {2.0, 7.4, 10.0};
    static final double TOLERANCE = 0.3;

    /** One row of a truth file with a z_top column. */
    record Truth(String id, String smiles, List<Double> pka, int zTop) {
        Truth {
            pka = pka.stream().sorted().toList();
        }
    }

    /** One compound's outcome: experimental and predicted net charge per pH of {@link #PH}. */
    record Row(Truth t, double[] experimental, double[] predicted, List<Double> predictedPka, int spurious,
            String error) {
        boolean agrees(int k) {
            return error == null && Math.abs(experimental[k] - predicted[k]) <= TOLERANCE;
        }
    }

    record Summary(int compounds, int failed, int[] agree, int spurious) {
        double share(int k) {
            return compounds == 0 ? Double.NaN : (double) agree[k] / compounds;
        }

        double overall() {
            return compounds == 0 ? Double.NaN : (double) Arrays.stream(agree).sum() / (compounds * PH.length);
        }

        String line() {
            return String.format(Locale.ROOT, "charge states: compounds=%d failed=%d within%.1f pH2=%.3f pH7.4=%.3f "
                    + "pH10=%.3f overall=%.3f spurious_2to12=%d", compounds, failed, TOLERANCE, share(0), share(1),
                    share(2), overall(), spurious);
        }
    }

    private ChargeStates() {
    }

    /**
     * The rows of a truth file whose header names a {@code z_top} column (columns found by header
     * name: id, smiles, pka_values, z_top); empty when the file has no such column.
     */
    static List<Truth> read(Path p) throws IOException {
        List<String> lines = Files.readAllLines(p, StandardCharsets.UTF_8);
        if (lines.isEmpty()) {
            return List.of();
        }
        List<String> head = List.of(lines.get(0).split("\t"));
        int z = head.indexOf("z_top");
        if (z < 0) {
            return List.of();
        }
        int id = Math.max(0, head.indexOf("id"));
        int smi = head.indexOf("smiles") < 0 ? 1 : head.indexOf("smiles");
        int pk = head.indexOf("pka_values") < 0 ? 2 : head.indexOf("pka_values");
        List<Truth> out = new ArrayList<>();
        for (int n = 1; n < lines.size(); n++) {
            String line = lines.get(n);
            if (line.isBlank() || line.startsWith("#")) {
                continue;
            }
            String[] f = line.split("\t", -1);
            if (f.length <= Math.max(z, Math.max(smi, pk))) {
                throw new IOException("line " + (n + 1) + ": fewer columns than the header names");
            }
            List<Double> v = new ArrayList<>();
            for (String x : f[pk].split(";")) {
                if (!x.isBlank()) {
                    v.add(Double.parseDouble(x.strip()));
                }
            }
            out.add(new Truth(f[id], f[smi], v, Integer.parseInt(f[z].strip())));
        }
        return out;
    }

    /** Mean net charge at a pH from z_top and ascending macroscopic constants (sequential deprotonation). */
    static double experimentalCharge(List<Double> unsorted, int zTop, double ph) {
        List<Double> pka = unsorted.stream().sorted().toList();
        double[] log = new double[pka.size() + 1];
        double max = 0;
        for (int d = 1; d <= pka.size(); d++) {
            log[d] = log[d - 1] + ph - pka.get(d - 1);
            max = Math.max(max, log[d]);
        }
        double sum = 0;
        double lost = 0;
        for (int d = 0; d < log.length; d++) {
            double w = Math.pow(10, log[d] - max);
            sum += w;
            lost += d * w;
        }
        return zTop - lost / sum;
    }

    static List<Row> run(Speciation s, List<Truth> data) {
        return data.parallelStream().map(t -> row(s, t)).toList();
    }

    private static Row row(Speciation s, Truth t) {
        double[] exp = new double[PH.length];
        double[] pred = new double[PH.length];
        List<Double> macro = List.of();
        for (int k = 0; k < PH.length; k++) {
            exp[k] = experimentalCharge(t.pka(), t.zTop(), PH[k]);
            Analysis a = s.screen(t.smiles(), Conditions.atPh(PH[k]));
            if (!a.ok()) {
                return new Row(t, exp, pred, List.of(), 0, a.error());
            }
            pred[k] = a.netCharge();
            macro = a.macroPka().stream().filter(v -> v >= Accuracy.LOW && v <= Accuracy.HIGH).sorted().toList();
        }
        Set<Integer> paired = new HashSet<>();
        MacroPairing.assign(t.pka(), macro).forEach(p -> paired.add(p[1]));
        int spurious = 0;
        for (int j = 0; j < macro.size(); j++) {
            if (!paired.contains(j) && macro.get(j) >= 2 && macro.get(j) <= 12) {
                spurious++;
            }
        }
        return new Row(t, exp, pred, macro, spurious, null);
    }

    static Summary summarise(List<Row> rows) {
        int[] agree = new int[PH.length];
        int failed = 0;
        int spurious = 0;
        for (Row r : rows) {
            if (r.error() != null) {
                failed++;
                continue;
            }
            spurious += r.spurious();
            for (int k = 0; k < PH.length; k++) {
                agree[k] += r.agrees(k) ? 1 : 0;
            }
        }
        return new Summary(rows.size(), failed, agree, spurious);
    }

    /** The report section: the summary and every compound that disagrees at some pH or has a spurious constant. */
    static String markdown(List<Row> rows, Summary sum) {
        StringBuilder md = new StringBuilder("## Charge states (net charge within ").append(TOLERANCE)
                .append(" of the experimental constants' charge)\n\n```\n").append(sum.line()).append("\n```\n\n");
        md.append("| id | experimental pKa | z_top | predicted pKa | charge pH 2 exp/pred | pH 7.4 | pH 10 | spurious |\n"
                + "|---|---|---|---|---|---|---|---|\n");
        for (Row r : rows) {
            boolean bad = r.error() != null || r.spurious() > 0;
            for (int k = 0; k < PH.length; k++) {
                bad |= !r.agrees(k);
            }
            if (!bad) {
                continue;
            }
            md.append(String.format(Locale.ROOT, "| %s | %s | %+d | %s |", r.t().id(), r.t().pka(), r.t().zTop(),
                    r.error() != null ? "error: " + r.error() : round(r.predictedPka())));
            for (int k = 0; k < PH.length; k++) {
                md.append(String.format(Locale.ROOT, " %+.2f / %+.2f%s |", r.experimental()[k], r.predicted()[k],
                        r.agrees(k) ? "" : " ✗"));
            }
            md.append(' ').append(r.spurious()).append(" |\n");
        }
        return md.append('\n').toString();
    }

    private static List<Double> round(List<Double> v) {
        return v.stream().map(x -> Math.round(x * 100) / 100.0).toList();
    }
}
