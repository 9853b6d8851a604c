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
            return TableAdminPage.notice("error", false, null, "Type part of a name, an id or a SMARTS.", List.of());
        }
        List<GroupClass> gs = t.groups().stream().filter(g -> hit(needle, g.id(), g.name(), g.smarts())).toList();
        List<Substituent> ss = t.substituents().stream().filter(s -> hit(needle, s.id(), s.name(), s.smarts())).toList();
        List<MeasuredCompound> ms = t.measured().stream().filter(m -> hit(needle, m.id(), m.name(), m.smiles())).toList();
        return TableAdminPage.render("adminFound", "q", q, "groups", gs, "substituents", ss, "measured", ms, "csrf", csrf,
                "base", base);
    }

    private static boolean hit(String needle, String... fields) {
        for (String f : fields) {
            if (f != null && f.toLowerCase(Locale.ROOT).contains(needle)) {
                return true;
            }
        }
        return false;
    }

    /** Which classes and records apply to a structure under the draft: its sites, their basis and derivations. */
    static String structure(AcidityTable t, String smiles, Speciation speciation, String csrf, int base) {
        Analysis a = speciation.pinned(t).analyse(smiles, Conditions.noPh());
        if (!a.ok()) {
            return TableAdminPage.notice("error", true, null, "The structure cannot be read: " + a.error(), List.of());
        }
        Set<String> ids = new TreeSet<>();
        a.sites().forEach(s -> ids.add(s.group()));
        List<MeasuredCompound> ms = new ArrayList<>();
        for (MeasuredCompound m : t.measured()) {
            boolean cited = a.sites().stream().flatMap(s -> s.derivation().stream()).map(Term::label)
                    .anyMatch(l -> cites(l, m));
            if (cited) {
                ms.add(m);
            }
        }
        return TableAdminPage.render("adminStructure", "smiles", smiles, "sites", a.sites(), "groups", t.groups().stream()
                .filter(g -> ids.contains(g.id())).toList(), "measured", ms, "csrf", csrf, "base", base);
    }

    /** A derivation line that rests on a measured compound: its exact match or its use as an analog. */
    static boolean cites(String label, MeasuredCompound m) {
        return label.startsWith("measured compound " + m.name() + ":")
                || label.startsWith("measured analog " + m.name() + " (");
    }

    static String sites(List<Site> sites) {
        return TableAdminPage.render("adminSites", "sites", sites);
    }

    /** A site's derivation in one line. */
    static String derivation(Site s) {
        return String.join("; ", s.derivation().stream().map(Term::label).toList());
    }

    /** One compound of the regression report, its numbers formatted. */
    record Row(String name, String reference, String head, String draft, double sortValue, String largest,
            String errorHead, String errorDraft, String verdict, String classes, String gainedLost) {
    }

    /** The regression report: sortable, better or worse against the reference value, classes touched per compound. */
    static String regression(TableRegression.Report rep, AcidityTable draft, Speciation speciation,
            List<MeasuredCompound> added) {
        String summary = String.format(Locale.ROOT, "Reference set: %d compounds, %d change. Mean absolute error "
                + "against the handbook values: head %.3f, draft %.3f.", rep.compounds(), rep.shifts().size(),
                rep.maeHead(), rep.maeDraft());
        List<Row> rows = new ArrayList<>();
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
            rows.add(new Row(s.name(), list(s.reference()), list(s.head()), list(s.draft()), Math.abs(s.largestShift()),
                    AdminForms.num(s.largestShift()), AdminForms.num(eh), AdminForms.num(ed), verdict,
                    String.join(", ", classes), String.join(" ", s.sitesGained().stream().map(x -> "+" + x).toList()) + ' '
                    + String.join(" ", s.sitesLost().stream().map(x -> "−" + x).toList())));
        }
        return TableAdminPage.render("adminRegression", "summary", summary, "touched", rep.classesTouched().isEmpty()
                ? "nothing" : String.join(", ", rep.classesTouched()), "rows", rows);
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
        return TableAdminPage.render("adminAudit", "events", events);
    }
}
