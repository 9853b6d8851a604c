package ionmark.notebook.internal;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import ionmark.acidity.api.AcidityTable;
import ionmark.host.api.Entry;
import ionmark.notebook.api.AnnotatedStructure;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Speciation;

/**
 * Which notebook entries a draft changes: every structure at the pH its entry states, with the head
 * and with the draft; a row where the main charge state changes or the fraction neutral moves by more
 * than the threshold. A pinned entry keeps its version; the row says what it would show unpinned.
 */
final class EntryImpact {
    /** Fraction-neutral change reported by default: 0.10 (ten percentage points; a working choice). */
    static final double DEFAULT_THRESHOLD = 0.10;

    private EntryImpact() {
    }

    record Row(Entry entry, String structure, double ph, int chargeHead, int chargeDraft, double neutralHead,
            double neutralDraft) {
    }

    /** Reads every entry as the notebook does ({@link EntryReader}), once with the head and once with the draft. */
    static List<Row> rows(List<Entry> entries, Speciation speciation, AcidityTable head, AcidityTable draft,
            double threshold) {
        EntryReader h = new EntryReader(speciation.pinned(head));
        EntryReader d = new EntryReader(speciation.pinned(draft));
        List<Row> out = new ArrayList<>();
        for (Entry e : entries) {
            List<AnnotatedStructure> hs = h.read(e, List.of()).structures();
            List<AnnotatedStructure> ds = d.read(e, List.of()).structures();
            for (int i = 0; i < Math.min(hs.size(), ds.size()); i++) {
                AnnotatedStructure sh = hs.get(i);
                AnnotatedStructure sd = ds.get(i);
                if (!sh.ok() || !sd.ok()) {
                    continue;
                }
                for (int j = 0; j < Math.min(sh.analyses().size(), sd.analyses().size()); j++) {
                    Analysis a = sh.analyses().get(j);
                    Analysis b = sd.analyses().get(j);
                    if (!a.ok() || !b.ok() || a.fractionNeutral() == null || b.fractionNeutral() == null) {
                        continue;
                    }
                    int za = main(a.chargeStates());
                    int zb = main(b.chargeStates());
                    if (za != zb || Math.abs(a.fractionNeutral() - b.fractionNeutral()) > threshold) {
                        out.add(new Row(e, sh.structure(), a.conditions().ph(), za, zb, a.fractionNeutral(),
                                b.fractionNeutral()));
                    }
                }
            }
        }
        return out;
    }

    private static int main(Map<Integer, Double> states) {
        return states.entrySet().stream().max(Map.Entry.comparingByValue()).map(Map.Entry::getKey).orElse(0);
    }

    /** One row as the report shows it, its numbers formatted. */
    record Shown(String id, String title, String structure, String ph, String charge, double sortValue, String neutral,
            String pinned) {
    }

    static String html(List<Row> rows, int entriesSeen, double threshold) {
        rows.sort(Comparator.comparing((Row r) -> r.entry().id()));
        List<Shown> shown = new ArrayList<>();
        for (Row r : rows) {
            int pin = r.entry().pinnedTableVersion();
            shown.add(new Shown(r.entry().id(), r.entry().title(), r.structure().length() > 60
                    ? r.structure().substring(0, 60) + "…" : r.structure(), String.format(Locale.ROOT, "%.2f", r.ph()),
                    signed(r.chargeHead()) + " → " + signed(r.chargeDraft()), Math.abs(r.neutralDraft() - r.neutralHead()),
                    String.format(Locale.ROOT, "%.3f → %.3f", r.neutralHead(), r.neutralDraft()), pin > 0 ? "pinned to v"
                            + pin + ": keeps showing v" + pin + "; unpinned it would show the draft's"
                            : "no: shows the new version once published"));
        }
        return TableAdminPage.render("entryImpact", "seen", entriesSeen, "threshold", String.format(Locale.ROOT, "%.2f",
                threshold), "rows", shown);
    }

    private static String signed(int z) {
        return z > 0 ? "+" + z : z < 0 ? "−" + (-z) : "0";
    }
}
