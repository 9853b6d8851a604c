package ionmark.notebook.internal;

import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.TreeSet;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.GroupClass;
import ionmark.acidity.api.MeasuredCompound;
import ionmark.acidity.api.Substituent;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Site;
import ionmark.speciation.api.Speciation;
import ionmark.speciation.api.TableRegression;
import ionmark.speciation.api.Term;
import ionmark.store.api.AuditEvent;

/** Read-only views of the admin page: search results, the regression report, the audit trail. */
final class AdminReports {
    static final DateTimeFormatter READABLE = DateTimeFormatter.ofPattern("d MMM yyyy, HH:mm 'UTC'", Locale.ENGLISH)
            .withZone(ZoneOffset.UTC);

    private AdminReports() {
    }

    /** Classes, substituents and measured compounds whose id, name, SMARTS or SMILES contain the text. */
    static String search(AcidityTable t, String q, String csrf, int base) {
        String needle = q.strip().toLowerCase(Locale.ROOT);
        if (needle.isEmpty()) {
            return "<p class=\"im-error\">Type part of a name, an id or a SMARTS.</p>";
        }
        StringBuilder sb = new StringBuilder("<div id=\"search-results\"><h2>Found for “" + Html.esc(q) + "”</h2>");
        List<GroupClass> gs = t.groups().stream().filter(g -> hit(needle, g.id(), g.name(), g.smarts())).toList();
        List<Substituent> ss = t.substituents().stream().filter(s -> hit(needle, s.id(), s.name(), s.smarts())).toList();
        List<MeasuredCompound> ms = t.measured().stream().filter(m -> hit(needle, m.id(), m.name(), m.smiles())).toList();
        sb.append(classes(t, gs, csrf, base));
        if (!ss.isEmpty()) {
            sb.append("<table class=\"im-sites\"><caption>Substituents</caption><thead><tr><th>id</th><th>SMARTS</th>"
                    + "<th>σm</th><th>σp</th><th>σI</th></tr></thead><tbody>");
            ss.forEach(s -> sb.append("<tr><td>").append(Html.esc(s.id())).append("</td><td><code>").append(Html.esc(s.smarts()))
                    .append("</code></td><td>").append(AdminForms.num(s.sigmaMeta())).append("</td><td>")
                    .append(AdminForms.num(s.sigmaPara())).append("</td><td>").append(AdminForms.num(s.sigmaI()))
                    .append("</td></tr>"));
            sb.append("</tbody></table>");
        }
        sb.append(measured(ms, csrf, base));
        if (gs.isEmpty() && ss.isEmpty() && ms.isEmpty()) {
            sb.append("<p>Nothing matches.</p>");
        }
        return sb.append("</div>").toString();
    }

    private static boolean hit(String needle, String... fields) {
        for (String f : fields) {
            if (f != null && f.toLowerCase(Locale.ROOT).contains(needle)) {
                return true;
            }
        }
        return false;
    }

    private static String classes(AcidityTable t, List<GroupClass> gs, String csrf, int base) {
        if (gs.isEmpty()) {
            return "";
        }
        StringBuilder sb = new StringBuilder("<table class=\"im-sites\"><caption>Group classes</caption><thead><tr>"
                + "<th>id</th><th>name</th><th>type</th><th>pKa</th><th>ρ</th><th>sd</th><th>sources</th><th></th></tr>"
                + "</thead><tbody>");
        for (GroupClass g : gs) {
            sb.append("<tr><td>").append(Html.esc(g.id())).append("</td><td>").append(Html.esc(g.name())).append("</td><td>")
                    .append(g.type().label()).append("</td><td>").append(AdminForms.num(g.pka())).append("</td><td>")
                    .append(AdminForms.num(g.rho())).append("</td><td>").append(AdminForms.num(g.sd())).append("</td><td>")
                    .append(Html.esc(g.sources().toString())).append("</td><td>").append(button(csrf, base, "class-show",
                            "group", g.id(), "Change value")).append("</td></tr>");
        }
        return sb.append("</tbody></table>").toString();
    }

    private static String measured(List<MeasuredCompound> ms, String csrf, int base) {
        if (ms.isEmpty()) {
            return "";
        }
        StringBuilder sb = new StringBuilder("<table class=\"im-sites\"><caption>Measured compounds</caption><thead><tr>"
                + "<th>id</th><th>name</th><th>SMILES</th><th>pKa</th><th>source</th><th></th></tr></thead><tbody>");
        for (MeasuredCompound m : ms) {
            sb.append("<tr><td>").append(Html.esc(m.id())).append("</td><td>").append(Html.esc(m.name())).append("</td><td>")
                    .append(Html.esc(m.smiles())).append("</td><td>").append(m.pka()).append("</td><td>")
                    .append(Html.esc(m.source())).append("</td><td>").append(button(csrf, base, "measured-edit", "id",
                            m.id(), "Edit")).append("</td></tr>");
        }
        return sb.append("</tbody></table>").toString();
    }

    private static String button(String csrf, int base, String action, String key, String value, String label) {
        return "<form method=\"post\" action=\"/admin/table\" class=\"im-task im-inline\">" + AdminForms.hidden(csrf, base)
                + "<input type=\"hidden\" name=\"" + key + "\" value=\"" + Html.esc(value) + "\"><button name=\"action\" "
                + "value=\"" + action + "\" data-record=\"" + Html.esc(value) + "\">" + Html.esc(label) + "</button></form>";
    }

    /** Which classes and records apply to a structure under the draft: its sites, their basis and derivations. */
    static String structure(AcidityTable t, String smiles, Speciation speciation, String csrf, int base) {
        Analysis a = speciation.pinned(t).analyse(smiles, Conditions.noPh());
        if (!a.ok()) {
            return "<p class=\"im-error\" role=\"alert\">The structure cannot be read: " + Html.esc(a.error()) + "</p>";
        }
        StringBuilder sb = new StringBuilder("<div id=\"search-results\"><h2>What applies to " + Html.esc(smiles) + "</h2>");
        sb.append(sites(a.sites()));
        Set<String> ids = new TreeSet<>();
        a.sites().forEach(s -> ids.add(s.group()));
        sb.append(classes(t, t.groups().stream().filter(g -> ids.contains(g.id())).toList(), csrf, base));
        List<MeasuredCompound> ms = new ArrayList<>();
        for (MeasuredCompound m : t.measured()) {
            boolean cited = a.sites().stream().flatMap(s -> s.derivation().stream()).map(Term::label)
                    .anyMatch(l -> cites(l, m));
            if (cited) {
                ms.add(m);
            }
        }
        sb.append(measured(ms, csrf, base));
        return sb.append("</div>").toString();
    }

    /** A derivation line that rests on a measured compound: its exact match or its use as an analog. */
    static boolean cites(String label, MeasuredCompound m) {
        return label.startsWith("measured compound " + m.name() + ":") || label.startsWith("analog " + m.name() + " (");
    }

    static String sites(List<Site> sites) {
        StringBuilder sb = new StringBuilder("<table class=\"im-sites\" id=\"perceived-sites\"><caption>Perceived sites"
                + "</caption><thead><tr><th>atom</th><th>class</th><th>type</th><th>pKa</th><th>basis</th>"
                + "<th>derivation</th></tr></thead><tbody>");
        for (Site s : sites) {
            sb.append("<tr><td>").append(Html.esc(s.element())).append(s.atom() + 1).append("</td><td>")
                    .append(Html.esc(s.group())).append(" — ").append(Html.esc(s.groupName())).append("</td><td>")
                    .append(Html.esc(s.type().label())).append("</td><td>").append(AdminForms.num(s.pka())).append(" ± ")
                    .append(AdminForms.num(s.sd())).append("</td><td>").append(Html.esc(s.basis().label())).append("</td><td>")
                    .append(Html.esc(String.join("; ", s.derivation().stream().map(Term::label).toList())))
                    .append("</td></tr>");
        }
        return sb.append("</tbody></table>").toString();
    }

    /** The regression report: sortable, better or worse against the reference value, classes touched per compound. */
    static String regression(TableRegression.Report rep, AcidityTable draft, Speciation speciation,
            List<MeasuredCompound> added) {
        StringBuilder sb = new StringBuilder(String.format(Locale.ROOT, "<p id=\"regression-summary\">Reference set: %d "
                + "compounds, %d change. Mean absolute error against the handbook values: head %.3f, draft %.3f.</p>",
                rep.compounds(), rep.shifts().size(), rep.maeHead(), rep.maeDraft()));
        sb.append("<p>Records touched: ").append(rep.classesTouched().isEmpty() ? "nothing"
                : Html.esc(String.join(", ", rep.classesTouched()))).append("</p>");
        sb.append("<table class=\"im-sites\" id=\"regression\"><caption>Compounds whose prediction moves (click a heading "
                + "to sort)</caption><thead><tr><th data-sort>compound</th><th>reference</th><th>head</th><th>draft</th>"
                + "<th data-sort>largest move</th><th data-sort>error head</th><th data-sort>error draft</th>"
                + "<th data-sort>verdict</th><th>classes touched / measured analogs</th><th>sites gained / lost</th></tr></thead><tbody>");
        Set<String> touched = new TreeSet<>();
        rep.classesTouched().stream().filter(x -> x.startsWith("group ")).forEach(x -> touched.add(x.substring(6)));
        for (TableRegression.Shift s : rep.shifts()) {
            double eh = error(s.reference(), s.head());
            double ed = error(s.reference(), s.draft());
            String verdict = Double.isNaN(eh) || Double.isNaN(ed) ? "–" : ed < eh - 0.005 ? "better"
                    : ed > eh + 0.005 ? "worse" : "same";
            Set<String> classes = new TreeSet<>();
            Analysis a = speciation.pinned(draft).screen(s.smiles(), Conditions.noPh());
            if (a.ok()) {
                a.sites().stream().map(Site::group).filter(touched::contains).forEach(classes::add);
                for (MeasuredCompound m : added) {
                    if (a.sites().stream().flatMap(x -> x.derivation().stream()).map(Term::label)
                            .anyMatch(l -> cites(l, m))) {
                        classes.add("measured " + m.name());
                    }
                }
            }
            sb.append("<tr><td>").append(Html.esc(s.name())).append("</td><td>").append(list(s.reference())).append("</td><td>")
                    .append(list(s.head())).append("</td><td>").append(list(s.draft())).append("</td><td data-v=\"")
                    .append(Math.abs(s.largestShift())).append("\">").append(AdminForms.num(s.largestShift()))
                    .append("</td><td>").append(AdminForms.num(eh)).append("</td><td>").append(AdminForms.num(ed))
                    .append("</td><td class=\"im-").append(verdict).append("\">").append(verdict).append("</td><td>")
                    .append(Html.esc(String.join(", ", classes))).append("</td><td>")
                    .append(Html.esc(String.join(" ", s.sitesGained().stream().map(x -> "+" + x).toList()))).append(' ')
                    .append(Html.esc(String.join(" ", s.sitesLost().stream().map(x -> "−" + x).toList())))
                    .append("</td></tr>");
        }
        return sb.append("</tbody></table>").toString();
    }

    /** Mean over the reference values of the distance to the nearest predicted constant. */
    static double error(List<Double> reference, List<Double> predicted) {
        if (reference.isEmpty() || predicted.isEmpty()) {
            return Double.NaN;
        }
        double sum = 0;
        for (double r : reference) {
            sum += predicted.stream().mapToDouble(p -> Math.abs(p - r)).min().orElse(Double.NaN);
        }
        return sum / reference.size();
    }

    private static String list(List<Double> xs) {
        return String.join(", ", xs.stream().map(AdminForms::num).toList());
    }

    static String audit(List<AuditEvent> events) {
        StringBuilder sb = new StringBuilder("<h2 id=\"audit\">Audit trail</h2><table class=\"im-sites\" id=\"audit-table\">"
                + "<thead><tr><th>when</th><th>who</th><th>did</th><th>version</th><th>outcome</th><th>why / detail</th></tr>"
                + "</thead><tbody>");
        for (AuditEvent e : events) {
            sb.append("<tr><td>").append(READABLE.format(e.time())).append("</td><td>").append(Html.esc(e.user()))
                    .append("</td><td>").append(Html.esc(e.action())).append("</td><td>v").append(e.version())
                    .append("</td><td>").append(Html.esc(e.outcome())).append("</td><td>").append(Html.esc(e.detail()))
                    .append("</td></tr>");
        }
        return sb.append("</tbody></table>").toString();
    }
}
