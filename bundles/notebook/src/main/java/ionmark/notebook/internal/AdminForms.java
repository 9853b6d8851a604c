package ionmark.notebook.internal;

import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.GroupClass;
import ionmark.acidity.api.MeasuredCompound;

/**
 * The record forms of the table admin page: search, measured compound, class value, reference.
 * Each is its own form; a script copies the draft into it on submit, so no task asks for JSON.
 */
final class AdminForms {
    /** The page's style sheet (table-admin.css: forms, the raw-JSON editor with its line numbers). */
    static final String STYLE = StaticFiles.TABLE_ADMIN;

    private AdminForms() {
    }

    /** Hidden fields every task form carries: the token, the draft's base and (filled on submit) the draft. */
    static String hidden(String csrf, int base) {
        return Html.TEMPLATES.render("adminHidden", Map.of("csrf", csrf, "base", base));
    }

    static String search(String csrf, int base, String query) {
        return Html.TEMPLATES.render("adminSearch", Map.of("csrf", csrf, "base", base, "query", query));
    }

    static String measured(String csrf, int base, AcidityTable t, MeasuredCompound m) {
        String v = m == null ? "" : String.join(", ", m.pka().stream().map(x -> String.format(Locale.ROOT, "%.2f", x))
                .toList());
        Map<String, Object> p = new HashMap<>();
        p.put("csrf", csrf);
        p.put("base", base);
        p.put("m", m);
        p.put("pka", v);
        p.put("references", t.references());
        return Html.TEMPLATES.render("adminMeasured", p);
    }

    static String classValue(String csrf, int base, AcidityTable t, GroupClass g, Set<String> calibrations) {
        String now = g == null ? "" : "Now: pKa " + num(g.pka()) + " (" + text(g.source("pka")) + "), ρ " + num(g.rho()) + " ("
                + text(g.source("rho")) + "), sd " + num(g.sd()) + " (" + text(g.source("sd")) + ")" + t.fit(g.id())
                        .map(f -> String.format(Locale.ROOT, "; fitted by %s on %s, n = %d, RMSE %s", text(f.source()), text(f.date()),
                                f.n(), Double.isNaN(f.rmse()) ? "–" : num(f.rmse()))).orElse("");
        Map<String, Object> p = new HashMap<>();
        p.put("csrf", csrf);
        p.put("base", base);
        p.put("groups", t.groups());
        p.put("g", g);
        p.put("now", now);
        p.put("sourceId", "source-" + (calibrations.isEmpty() ? "m" : "c"));
        p.put("references", t.references().stream().filter(r -> !calibrations.contains(r.id())).toList());
        return Html.TEMPLATES.render("adminClassValue", p);
    }

    static String reference(String csrf, int base) {
        return Html.TEMPLATES.render("adminReference", Map.of("csrf", csrf, "base", base));
    }

    /** Absent text (a missing source) as nothing, as the page always showed it. */
    private static String text(String s) {
        return s == null ? "" : s;
    }

    /** A citation short enough for a list of choices. */
    static String shortCitation(String citation) {
        return citation.length() > 70 ? citation.substring(0, 70) + "…" : citation;
    }

    static String num(double v) {
        return Double.isNaN(v) ? "–" : String.format(Locale.ROOT, "%.2f", v);
    }

    static String messages(List<String> errors, List<String> notes) {
        return Html.TEMPLATES.render("adminMessages", Map.of("errors", errors, "notes", notes));
    }

    /**
     * The page's script (table-admin.js): copies the draft into each task form on submit, numbers the raw text's
     * lines, validates it live, jumps to a problem's line, loads a file and sorts columns.
     */
    static String script() {
        return StaticFiles.TABLE_ADMIN_JS;
    }

    /** A change shortened for a list (a whole record can run to thousands of characters). */
    static String shorten(String s) {
        return s.length() > 600 ? s.substring(0, 600) + "…" : s;
    }

    static Map<String, String> with(Map<String, String> params, String key, String value) {
        var m = new java.util.HashMap<>(params);
        m.put(key, value);
        return m;
    }
}
