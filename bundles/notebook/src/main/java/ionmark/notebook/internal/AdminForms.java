package ionmark.notebook.internal;

import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.GroupClass;
import ionmark.acidity.api.MeasuredCompound;
import ionmark.acidity.api.Reference;

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
        return "<input type=\"hidden\" name=\"token\" value=\"" + Html.esc(csrf) + "\"><input type=\"hidden\" name=\"base\" "
                + "value=\"" + base + "\"><input type=\"hidden\" name=\"draft\" class=\"im-draft-copy\">";
    }

    static String search(String csrf, int base, String query) {
        return "<form method=\"post\" action=\"/admin/table\" class=\"im-task\" id=\"search-form\"><fieldset><legend>Find"
                + "</legend>" + hidden(csrf, base) + "<label>Name, id or SMARTS text <input name=\"q\" id=\"q\" size=\"40\" "
                + "value=\"" + Html.esc(query) + "\"></label> <button name=\"action\" value=\"search\">Search</button>"
                + " <label>or a structure (SMILES) <input name=\"structure\" id=\"structure\" size=\"40\"></label> "
                + "<button name=\"action\" value=\"search-structure\">What applies to it</button></fieldset></form>";
    }

    static String measured(String csrf, int base, AcidityTable t, MeasuredCompound m) {
        String v = m == null ? "" : String.join(", ", m.pka().stream().map(x -> String.format(Locale.ROOT, "%.2f", x))
                .toList());
        return "<form method=\"post\" action=\"/admin/table\" class=\"im-task\" id=\"measured-form\"><fieldset><legend>"
                + (m == null ? "Add a measured compound" : "Edit measured compound " + Html.esc(m.id())) + "</legend>"
                + hidden(csrf, base)
                + field("Name", "name", m == null ? "" : m.name(), 24) + field("Id (blank: from the name)", "id",
                        m == null ? "" : m.id(), 20)
                + field("Structure (SMILES)", "smiles", m == null ? "" : m.smiles(), 40) + "<br>"
                + field("pKa values (comma-separated)", "pka", v, 18)
                + field("Temperature °C", "temperature", m == null ? "25" : num(m.temperature()), 5)
                + field("Ionic strength mol/L", "ionicStrength", m == null ? "0" : num(m.ionicStrength()), 5)
                + field("Method", "method", m == null ? "" : m.method(), 20) + "<br>"
                + sources(t, "source", m == null ? "" : m.source(), Set.of())
                + "<br><button name=\"action\" value=\"measured-sites\">Show the sites</button> "
                + "<button name=\"action\" value=\"measured\">" + (m == null ? "Add to the draft" : "Save in the draft")
                + "</button></fieldset></form>";
    }

    static String classValue(String csrf, int base, AcidityTable t, GroupClass g, Set<String> calibrations) {
        StringBuilder opts = new StringBuilder();
        for (GroupClass x : t.groups()) {
            opts.append("<option value=\"").append(Html.esc(x.id())).append('"').append(g != null && g.id().equals(x.id())
                    ? " selected" : "").append('>').append(Html.esc(x.id() + " — " + x.name())).append("</option>");
        }
        String now = g == null ? "" : "<p>Now: pKa " + num(g.pka()) + " (" + Html.esc(g.source("pka")) + "), ρ "
                + num(g.rho()) + " (" + Html.esc(g.source("rho")) + "), sd " + num(g.sd()) + " (" + Html.esc(g.source("sd"))
                + ")" + t.fit(g.id()).map(f -> String.format(Locale.ROOT, "; fitted by %s on %s, n = %d, RMSE %s",
                        Html.esc(f.source()), Html.esc(f.date()), f.n(), Double.isNaN(f.rmse()) ? "–" : num(f.rmse())))
                        .orElse("") + "</p>";
        return "<form method=\"post\" action=\"/admin/table\" class=\"im-task\" id=\"class-form\"><fieldset><legend>"
                + "Change a class value</legend>" + hidden(csrf, base) + "<label>Class <select name=\"group\" id=\"group\">"
                + opts + "</select></label> <button name=\"action\" value=\"class-show\">Show</button>" + now + "<br>"
                + field("pKa", "pka", g == null ? "" : num(g.pka()), 7) + field("ρ", "rho", g == null ? "" : num(g.rho()), 7)
                + field("sd", "sd", g == null ? "" : num(g.sd()), 7) + "<br>" + sources(t, "source", "", calibrations)
                + "<label><input type=\"checkbox\" name=\"confirm\" value=\"yes\" id=\"confirm\"> the present source "
                + "gives the new value</label><br><small>A value set by hand cites where it comes from; a calibration's "
                + "citation cannot be chosen here.</small><br><button name=\"action\" value=\"class-value\">"
                + "Set in the draft</button></fieldset></form>";
    }

    static String reference(String csrf, int base) {
        return "<form method=\"post\" action=\"/admin/table\" class=\"im-task\" id=\"reference-form\"><fieldset><legend>"
                + "Add a reference</legend>" + hidden(csrf, base) + field("Id", "refid", "", 16)
                + field("Full citation", "citation", "", 80)
                + "<button name=\"action\" value=\"reference\">Add to the draft</button></fieldset></form>";
    }

    private static String sources(AcidityTable t, String name, String selected, Set<String> calibrations) {
        StringBuilder sb = new StringBuilder("<label>Source <select name=\"" + name + "\" id=\"" + name + "-"
                + (calibrations.isEmpty() ? "m" : "c") + "\"><option value=\"\">(choose the reference)</option>");
        for (Reference r : t.references()) {
            if (calibrations.contains(r.id())) {
                continue;
            }
            sb.append("<option value=\"").append(Html.esc(r.id())).append('"').append(r.id().equals(selected)
                    ? " selected" : "").append('>').append(Html.esc(r.id())).append(" — ")
                    .append(Html.esc(r.citation().length() > 70 ? r.citation().substring(0, 70) + "…" : r.citation()))
                    .append("</option>");
        }
        return sb.append("</select></label>").toString();
    }

    private static String field(String label, String name, String value, int size) {
        return "<label>" + Html.esc(label) + " <input name=\"" + name + "\" id=\"f-" + name + "\" size=\"" + size
                + "\" value=\"" + Html.esc(value) + "\"></label>";
    }

    static String num(double v) {
        return Double.isNaN(v) ? "–" : String.format(Locale.ROOT, "%.2f", v);
    }

    static String messages(List<String> errors, List<String> notes) {
        StringBuilder sb = new StringBuilder();
        if (!errors.isEmpty()) {
            sb.append("<ul class=\"im-error\" role=\"alert\" id=\"task-errors\">");
            errors.forEach(e -> sb.append("<li>").append(Html.esc(e)).append("</li>"));
            sb.append("</ul>");
        }
        if (!notes.isEmpty()) {
            sb.append("<ul class=\"im-ok\" role=\"status\" id=\"task-notes\">");
            notes.forEach(e -> sb.append("<li>").append(Html.esc(e)).append("</li>"));
            sb.append("</ul>");
        }
        return sb.toString();
    }

    /**
     * The page's script (table-admin.js): copies the draft into each task form on submit, numbers the raw text's
     * lines, validates it live, jumps to a problem's line, loads a file and sorts columns.
     */
    static String script() {
        return StaticFiles.TABLE_ADMIN_JS;
    }

    static String changesList(String id, String title, List<RecordChanges.Change> changes) {
        StringBuilder sb = new StringBuilder("<div id=\"" + id + "\"><h3>" + Html.esc(title) + " (" + changes.size()
                + ")</h3><ul class=\"im-changes\">");
        for (RecordChanges.Change c : changes) {
            sb.append("<li>").append(Html.esc(shorten(c.text()))).append("</li>");
        }
        return sb.append("</ul></div>").toString();
    }

    private static String shorten(String s) {
        return s.length() > 600 ? s.substring(0, 600) + "…" : s;
    }

    static Map<String, String> with(Map<String, String> params, String key, String value) {
        var m = new java.util.HashMap<>(params);
        m.put(key, value);
        return m;
    }
}
