package ionmark.speciation.internal;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Objects;
import java.util.Set;
import java.util.TreeSet;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.GroupClass;
import ionmark.acidity.api.Substituent;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Site;
import ionmark.speciation.api.TableRegression;

/** The regression report of a draft against the head over the shipped reference set. */
final class Regression {
    static final String REFERENCE_SET = "/ionmark/speciation/reference-set.tsv";

    record Compound(String name, String smiles, List<Double> pka) {
    }

    private Regression() {
    }

    static List<Compound> referenceSet() {
        try (InputStream in = Regression.class.getResourceAsStream(REFERENCE_SET)) {
            List<Compound> out = new ArrayList<>();
            for (String line : new String(in.readAllBytes(), StandardCharsets.UTF_8).split("\n")) {
                if (line.isBlank() || line.startsWith("#")) {
                    continue;
                }
                String[] f = line.split("\t");
                List<Double> v = new ArrayList<>();
                for (String x : f[2].split(";")) {
                    if (!x.strip().equals("-")) {
                        v.add(Double.parseDouble(x.strip()));
                    }
                }
                out.add(new Compound(f[0], f[1], v));
            }
            return out;
        } catch (IOException | RuntimeException e) {
            throw new IllegalStateException("the reference set is missing from the bundle", e);
        }
    }

    static TableRegression.Report compare(AcidityTable head, AcidityTable draft, int maxHeavyAtoms) {
        Engine eh = new Engine(head, maxHeavyAtoms);
        Engine ed = new Engine(draft, maxHeavyAtoms);
        List<Compound> set = referenceSet();
        List<TableRegression.Shift> shifts = new ArrayList<>();
        double errHead = 0;
        double errDraft = 0;
        int n = 0;
        for (Compound c : set) {
            Analysis a = eh.analyse(c.smiles(), Conditions.noPh());
            Analysis b = ed.analyse(c.smiles(), Conditions.noPh());
            for (double ref : c.pka()) {
                errHead += nearest(a.macroPka(), ref);
                errDraft += nearest(b.macroPka(), ref);
                n++;
            }
            List<String> sa = sites(a);
            List<String> sb = sites(b);
            List<String> gained = sb.stream().filter(x -> !sa.contains(x)).toList();
            List<String> lost = sa.stream().filter(x -> !sb.contains(x)).toList();
            double largest = largestShift(a.macroPka(), b.macroPka());
            if (largest > 0.005 || !gained.isEmpty() || !lost.isEmpty()) {
                shifts.add(new TableRegression.Shift(c.name(), c.smiles(), c.pka(), round(a.macroPka()),
                        round(b.macroPka()), gained, lost, largest));
            }
        }
        shifts.sort(Comparator.comparingDouble(TableRegression.Shift::largestShift).reversed());
        return new TableRegression.Report(set.size(), n == 0 ? 0 : errHead / n, n == 0 ? 0 : errDraft / n,
                touched(head, draft), shifts);
    }

    private static List<String> sites(Analysis a) {
        return a.sites().stream().map((Site s) -> s.atom() + ":" + s.group()).toList();
    }

    private static double nearest(List<Double> pred, double ref) {
        return pred.stream().mapToDouble(p -> Math.abs(p - ref)).min().orElse(Math.min(Math.abs(ref), 5.0));
    }

    private static double largestShift(List<Double> a, List<Double> b) {
        if (a.size() != b.size()) {
            return 99;
        }
        double m = 0;
        for (int i = 0; i < a.size(); i++) {
            m = Math.max(m, Math.abs(a.get(i) - b.get(i)));
        }
        return m;
    }

    private static List<Double> round(List<Double> v) {
        return v.stream().map(x -> Math.round(x * 100) / 100.0).toList();
    }

    static List<String> touched(AcidityTable head, AcidityTable draft) {
        Set<String> out = new TreeSet<>();
        for (GroupClass g : draft.groups()) {
            if (!Objects.equals(head.group(g.id()).orElse(null), g)) {
                out.add("group " + g.id());
            }
        }
        for (GroupClass g : head.groups()) {
            if (draft.group(g.id()).isEmpty()) {
                out.add("group " + g.id() + " (removed)");
            }
        }
        List<Substituent> hs = head.substituents();
        for (Substituent s : draft.substituents()) {
            if (!hs.contains(s)) {
                out.add("substituent " + s.id());
            }
        }
        if (!head.interaction().asMap().equals(draft.interaction().asMap())
                || !head.interaction().exempt().equals(draft.interaction().exempt())
                || !head.interaction().reach().equals(draft.interaction().reach())) {
            out.add("site interactions");
        }
        for (ionmark.acidity.api.PairRule r : draft.pairs()) {
            if (!head.pairs().contains(r)) {
                out.add("pair rule " + r.id());
            }
        }
        for (ionmark.acidity.api.PairRule r : head.pairs()) {
            if (draft.pairs().stream().noneMatch(x -> x.id().equals(r.id()))) {
                out.add("pair rule " + r.id() + " (removed)");
            }
        }
        return new ArrayList<>(out);
    }
}
