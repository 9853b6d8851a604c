package ionmark.notebook.internal;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.osgi.service.component.annotations.Activate;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.GroupClass;
import ionmark.acidity.api.MeasuredCompound;
import ionmark.acidity.api.Problem;
import ionmark.acidity.api.TableService;
import ionmark.acidity.api.ValidationReport;
import ionmark.host.api.AdminPage;
import ionmark.host.api.HostUser;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Speciation;
import ionmark.speciation.api.TableRegression;
import ionmark.store.api.StoreConflictException;
import ionmark.store.api.StoreRejectedException;
import ionmark.store.api.TableStore;
import ionmark.store.api.VersionInfo;

/**
 * The admin page for the shared table: find records by text or structure, edit them in forms
 * (measured compounds, class values with their source, references), check (validation and the
 * regression report over the reference set), publish with a comment (a refused publish keeps the
 * draft and offers a rebase), history, audit, diff between versions, rollback; the raw JSON stays
 * for power users, validated as they type with errors linked to their lines. Only for users with the admin role (the host enforces it).
 */
@Component(service = AdminPage.class)
public final class TableAdminPage implements AdminPage {
    private final TableStore store;
    private final TableService tables;
    private final TableRegression regression;
    private final Speciation speciation;
    private final SeenEntries seen;

    @Activate
    public TableAdminPage(@Reference TableStore store, @Reference TableService tables,
            @Reference TableRegression regression, @Reference Speciation speciation, @Reference SeenEntries seen) {
        this.store = store;
        this.tables = tables;
        this.regression = regression;
        this.speciation = speciation;
        this.seen = seen;
    }

    @Override
    public String id() {
        return "table";
    }

    @Override
    public String title() {
        return "Shared pKa table";
    }

    @Override
    public String requiredRole() {
        return "admin";
    }

    @Override
    public String handle(Map<String, String> params, boolean post, HostUser user, String csrf) {
        String action = params.getOrDefault("action", "");
        VersionInfo head = store.head().orElseThrow(() -> new IllegalStateException("the store has no version"));
        String draft = params.getOrDefault("draft", "");
        int base = parse(params.get("base"), head.number());
        StringBuilder sb = new StringBuilder(AdminForms.STYLE);
        Task task = new Task();
        if (post) {
            switch (action) {
                case "validate" -> {
                    ValidationReport r = tables.validate(draft);
                    store.audit(user.name(), "validate", head.number(), r.ok() ? "ok" : "rejected",
                            r.errors().size() + " errors, " + r.warnings().size() + " warnings (as you type)");
                    return problems(r, draft);
                }
                case "check" -> {
                    store.audit(user.name(), "validate", head.number(), "ok", "validate and compare");
                    sb.append(check(head, draft, params.getOrDefault("threshold", "")));
                }
                case "publish" -> {
                    String out = publish(draft, params, user);
                    sb.append(out);
                    if (out.contains("im-ok")) {
                        draft = "";
                    } else if (out.contains("id=\"conflict\"")) {
                        sb.append(conflict(base, draft, csrf));
                    }
                }
                case "rebase" -> {
                    RecordChanges.Rebased r = RecordChanges.rebase(store.content(base).orElseThrow(), draft,
                            store.content(head.number()).orElseThrow());
                    ValidationReport v = tables.validate(r.text());
                    draft = v.table().map(tables::toJson).orElse(r.text());
                    base = head.number();
                    store.audit(user.name(), "rebase", head.number(), r.conflicts().isEmpty() ? "ok" : "conflicts",
                            r.applied().size() + " changes carried over, " + r.conflicts().size() + " collided");
                    sb.append("<div id=\"rebased\"><p class=\"im-ok\" role=\"status\">Your draft now rests on v")
                            .append(head.number()).append(".</p>")
                            .append(AdminForms.changesList("rebase-applied", "Your changes carried over", r.applied()))
                            .append(r.conflicts().isEmpty() ? "" : AdminForms.changesList("rebase-conflicts",
                                    "Your changes that collided with the new head (the head's value was kept)",
                                    r.conflicts()))
                            .append("</div>");
                }
                case "rollback" -> {
                    sb.append(rollback(params, user));
                    draft = "";
                }
                default -> draft = task(action, params, draft, task);
            }
        } else if (action.equals("export")) {
            store.audit(user.name(), "export", head.number(), "ok", "head shown for download");
            return "<p>Table v" + head.number() + " as JSON (select all and save, or use <code>./ionmark table export</code>):"
                    + "</p><pre class=\"im-export\">" + Html.esc(store.content(head.number()).orElse("")) + "</pre>";
        } else if (action.equals("diff")) {
            int from = parse(params.get("from"), 1);
            int to = parse(params.get("to"), head.number());
            sb.append("<h2>Changes from v").append(from).append(" to v").append(to).append("</h2><ul class=\"im-diff\">");
            store.diff(from, to).forEach(l -> sb.append("<li>").append(Html.esc(l)).append("</li>"));
            sb.append("</ul>");
        } else if (action.equals("audit")) {
            sb.append(AdminReports.audit(store.audit(200)));
        }
        store.audit(user.name(), "read", head.number(), "ok", "table admin page" + (action.isEmpty() ? "" : ": " + action));
        head = store.head().orElseThrow();
        if (draft.isBlank()) {
            draft = store.content(head.number()).orElse("");
            base = head.number();
        }
        sb.append(AdminForms.messages(task.errors, task.notes)).append(task.html);
        AcidityTable table = tables.validate(draft).table().orElse(null);
        if (table != null) {
            sb.append(draftChanges(base, draft));
            sb.append(AdminForms.search(csrf, base, params.getOrDefault("q", "")));
            sb.append(AdminForms.measured(csrf, base, table, task.measured));
            sb.append(AdminForms.classValue(csrf, base, table, task.group, DraftEdits.calibrations(table)));
            sb.append(AdminForms.reference(csrf, base));
        } else {
            sb.append("<p class=\"im-error\">The draft has errors: fix them in the raw JSON below, then the forms "
                    + "come back.</p>");
        }
        sb.append(editor(head, base, draft, csrf)).append(history(head, csrf)).append(AdminForms.script());
        return sb.toString();
    }

    /** What a record form produced: messages, extra output and which record to show in a form. */
    private static final class Task {
        final List<String> errors = new ArrayList<>();
        final List<String> notes = new ArrayList<>();
        final StringBuilder html = new StringBuilder();
        MeasuredCompound measured;
        GroupClass group;
    }

    /** Runs a record form on the draft; returns the draft after it. */
    /**
     * The draft as a table whose hash is its content's: speciation keeps engines per version hash, and a
     * hand-edited draft still carries the hash of the version it was copied from.
     */
    private java.util.Optional<AcidityTable> sealed(String text) {
        return tables.validate(text).table().flatMap(t -> tables.validate(tables.toJson(t)).table());
    }

    private String task(String action, Map<String, String> params, String draft, Task task) {
        ValidationReport r = tables.validate(draft);
        AcidityTable t = sealed(draft).orElse(null);
        if (t == null) {
            task.errors.add("The draft has errors; fix them in the raw JSON first (" + r.errors().size() + " errors).");
            return draft;
        }
        switch (action) {
            case "search" -> task.html.append(AdminReports.search(t, params.getOrDefault("q", ""),
                    params.getOrDefault("token", ""), parse(params.get("base"), 0)));
            case "search-structure" -> task.html.append(AdminReports.structure(t, params.getOrDefault("structure", ""),
                    speciation, params.getOrDefault("token", ""), parse(params.get("base"), 0)));
            case "measured-edit" -> task.measured = t.measured().stream()
                    .filter(m -> m.id().equals(params.getOrDefault("id", ""))).findFirst().orElse(null);
            case "measured-sites" -> {
                task.measured = prefill(params);
                List<DraftEdits.Assignment> a = DraftEdits.assign(t, params.getOrDefault("smiles", ""),
                        DraftEdits.numbers(params.getOrDefault("pka", ""), "pKa", new ArrayList<>()), speciation,
                        task.errors);
                a.forEach(x -> task.notes.add(String.format(java.util.Locale.ROOT, "pKa %.2f would go to %s (%s, "
                        + "estimated %.2f)", x.value(), x.site().groupName(), x.site().group(), x.site().pka())));
                Analysis an = speciation.pinned(t).analyse(params.getOrDefault("smiles", ""), Conditions.noPh());
                if (an.ok()) {
                    task.html.append(AdminReports.sites(an.sites()));
                }
            }
            case "class-show" -> task.group = t.group(params.getOrDefault("group", "")).orElse(null);
            default -> {
                DraftEdits.Result res = switch (action) {
                    case "measured" -> DraftEdits.measured(t, params, speciation);
                    case "class-value" -> DraftEdits.classValue(t, params);
                    case "reference" -> DraftEdits.reference(t, params);
                    default -> DraftEdits.Result.error("Unknown action.");
                };
                task.errors.addAll(res.errors());
                task.notes.addAll(res.notes());
                if (res.ok()) {
                    return tables.toJson(res.table());
                }
                if (action.equals("measured")) {
                    task.measured = prefill(params);
                } else if (action.equals("class-value")) {
                    task.group = t.group(params.getOrDefault("group", "")).orElse(null);
                }
            }
        }
        return draft;
    }

    private static MeasuredCompound prefill(Map<String, String> p) {
        List<Double> v = DraftEdits.numbers(p.getOrDefault("pka", ""), "pKa", new ArrayList<>()).stream()
                .filter(x -> !x.isNaN()).toList();
        List<String> ignored = new ArrayList<>();
        double temp = DraftEdits.number(p.getOrDefault("temperature", "25"), "", ignored);
        double ionic = DraftEdits.number(p.getOrDefault("ionicStrength", "0"), "", ignored);
        return new MeasuredCompound(p.getOrDefault("id", ""), p.getOrDefault("name", ""), p.getOrDefault("smiles", ""), v,
                Double.isNaN(temp) ? 25 : temp, Double.isNaN(ionic) ? 0 : ionic, p.getOrDefault("method", ""),
                p.getOrDefault("source", ""), List.of());
    }

    private String draftChanges(int base, String draft) {
        String baseText = store.content(base).orElse("");
        if (baseText.isEmpty()) {
            return "";
        }
        List<RecordChanges.Change> changes = RecordChanges.between(baseText, draft);
        return "<details id=\"draft-changes\"" + (changes.isEmpty() ? "" : " open") + "><summary>Draft based on v" + base
                + ": " + changes.size() + " change(s) not yet published</summary>"
                + AdminForms.changesList("draft-change-list", "Changes in the draft", changes) + "</details>";
    }

    /** A refused publish: the draft stays, with both sides' changes and the offer to rebase. */
    private String conflict(int base, String draft, String csrf) {
        VersionInfo head = store.head().orElseThrow();
        List<RecordChanges.Change> theirs = RecordChanges.between(store.content(base).orElseThrow(),
                store.content(head.number()).orElseThrow());
        List<RecordChanges.Change> mine = RecordChanges.between(store.content(base).orElseThrow(), draft);
        return "<div id=\"rebase-offer\"><p>Your draft is kept. v" + head.number() + " was published by "
                + Html.esc(head.author()) + " (" + Html.esc(head.comment()) + ") since your draft's base v" + base + ".</p>"
                + AdminForms.changesList("their-changes", "Their changes since v" + base, theirs)
                + AdminForms.changesList("my-changes", "Your changes", mine)
                + "<form method=\"post\" action=\"/admin/table\" class=\"im-task\">" + AdminForms.hidden(csrf, base)
                + "<button name=\"action\" value=\"rebase\" id=\"rebase\">Rebase my draft on v" + head.number()
                + "</button></form></div>";
    }

    private static int parse(String s, int otherwise) {
        try {
            return s == null || s.isBlank() ? otherwise : Integer.parseInt(s.strip());
        } catch (NumberFormatException e) {
            return otherwise;
        }
    }

    private String publish(String draft, Map<String, String> params, HostUser user) {
        try {
            VersionInfo v = store.publish(draft, Integer.parseInt(params.getOrDefault("base", "-1")), user.name(),
                    params.getOrDefault("comment", ""));
            return "<p class=\"im-ok\" role=\"status\">Published v" + v.number() + ". Every notebook uses it from now on.</p>";
        } catch (StoreConflictException e) {
            return "<p class=\"im-error\" role=\"alert\" id=\"conflict\">Not published: " + Html.esc(e.getMessage())
                    + "</p>";
        } catch (StoreRejectedException e) {
            return "<p class=\"im-error\" role=\"alert\">Not published:</p><ul>" + String.join("", e.problems().stream()
                    .map(p -> "<li>" + Html.esc(p) + "</li>").toList()) + "</ul>";
        } catch (NumberFormatException e) {
            return "<p class=\"im-error\">The base version is missing.</p>";
        }
    }

    private String rollback(Map<String, String> params, HostUser user) {
        try {
            VersionInfo v = store.rollback(Integer.parseInt(params.getOrDefault("to", "-1")),
                    Integer.parseInt(params.getOrDefault("base", "-1")), user.name(), params.getOrDefault("comment", ""));
            return "<p class=\"im-ok\" role=\"status\">Published v" + v.number() + " with the content of v"
                    + Html.esc(params.get("to")) + ".</p>";
        } catch (StoreConflictException | StoreRejectedException e) {
            return "<p class=\"im-error\" role=\"alert\">" + Html.esc(e.getMessage()) + "</p>";
        } catch (NumberFormatException e) {
            return "<p class=\"im-error\">Version numbers are missing.</p>";
        }
    }

    private String check(VersionInfo head, String draft, String thresholdText) {
        ValidationReport r = tables.validate(draft);
        StringBuilder sb = new StringBuilder("<h2>Check of the draft</h2>").append(problems(r, draft));
        if (!r.ok()) {
            return sb.toString();
        }
        AcidityTable current = tables.validate(store.content(head.number()).orElseThrow()).table().orElseThrow();
        AcidityTable next = sealed(draft).orElseThrow();
        List<MeasuredCompound> added = next.measured().stream().filter(m -> !current.measured().contains(m)).toList();
        if (!added.isEmpty()) {
            sb.append("<p id=\"measured-added\">Measured compounds added or changed: ").append(Html.esc(String.join(", ",
                    added.stream().map(MeasuredCompound::name).toList()))).append(". The reference compounds they "
                    + "move as analogs say so in the last columns.</p>");
        }
        sb.append(AdminReports.regression(regression.compare(current, next), next, speciation, added));
        double threshold = DraftEdits.number(thresholdText.isBlank() ? String.valueOf(EntryImpact.DEFAULT_THRESHOLD)
                : thresholdText, "threshold", new ArrayList<>());
        threshold = Double.isNaN(threshold) ? EntryImpact.DEFAULT_THRESHOLD : threshold;
        List<ionmark.host.api.Entry> entries = seen.all();
        sb.append(EntryImpact.html(EntryImpact.rows(entries, speciation, current, next,
                threshold), entries.size(), threshold));
        return sb.toString();
    }

    /** Problems with their JSON path and the line of the draft they point at (a link that selects it). */
    static String problems(ValidationReport r, String draft) {
        JsonLines lines = JsonLines.of(draft == null ? "" : draft);
        StringBuilder sb = new StringBuilder("<div id=\"problems\">");
        sb.append("<p>").append(r.errors().size()).append(" errors, ").append(r.warnings().size()).append(" warnings</p><ul>");
        List<Problem> warnings = r.warnings();
        for (Problem p : r.errors()) {
            problem(sb, p, lines);
        }
        boolean fold = warnings.size() > 10; // a long list of warnings must not hide the errors and the report
        if (fold) {
            sb.append("</ul><details><summary>").append(warnings.size()).append(" warnings</summary><ul>");
        }
        for (Problem p : warnings) {
            problem(sb, p, lines);
        }
        if (fold) {
            sb.append("</ul></details><ul>");
        }
        return sb.append("</ul></div>").toString();
    }

    private static void problem(StringBuilder sb, Problem p, JsonLines lines) {
        int line = lines.lineOf(p.path(), p.message());
        sb.append("<li class=\"").append(p.severity() == Problem.Severity.ERROR ? "im-error" : "im-warn").append("\">")
                .append(p.severity() == Problem.Severity.ERROR ? "✖ " : "△ ");
        if (line > 0) {
            sb.append("<a href=\"#draft\" data-line=\"").append(line).append("\">line ").append(line).append("</a> ");
        }
        sb.append("<code>").append(Html.esc(p.path())).append("</code> ").append(Html.esc(p.message())).append("</li>");
    }

    private static String editor(VersionInfo head, int base, String draft, String csrf) {
        String t = Html.esc(csrf);
        return "<h2>Check and publish</h2><form method=\"post\" action=\"/admin/table\" id=\"publish-form\">"
                + "<input type=\"hidden\" name=\"token\" value=\"" + t + "\"><input type=\"hidden\" name=\"base\" value=\""
                + base + "\">"
                + "<p><label>Why (required to publish) <input name=\"comment\" id=\"comment\" size=\"70\"></label> "
                + "<label>Report entries whose fraction neutral moves by more than <input name=\"threshold\" "
                + "id=\"threshold\" size=\"4\" value=\"" + EntryImpact.DEFAULT_THRESHOLD + "\"></label></p>"
                + "<p><button name=\"action\" value=\"check\" id=\"check\">Validate and compare</button> "
                + "<button name=\"action\" value=\"publish\" id=\"publish\">Publish</button> (the head is v" + head.number()
                + ", the draft is based on v" + base + ")</p>"
                + "<details id=\"raw\"><summary>Raw JSON (for power users)</summary>"
                + "<div class=\"im-raw\"><div class=\"im-gutter\" id=\"gutter\"></div>"
                + "<textarea id=\"draft\" name=\"draft\" rows=\"23\" cols=\"140\" spellcheck=\"false\" wrap=\"off\">"
                + Html.esc(draft) + "</textarea></div><div id=\"live\" aria-live=\"polite\"></div>"
                + "<p><label>Or load a table file <input type=\"file\" id=\"upload\" accept=\".json,application/json\">"
                + "</label> <a href=\"/admin/table?action=export\">Export the head</a></p></details></form>";
    }

    private String history(VersionInfo head, String csrf) {
        StringBuilder sb = new StringBuilder("<h2>History</h2><p><a href=\"/admin/table?action=audit\" id=\"audit-link\">"
                + "Audit trail: who did what, when, why</a></p><table class=\"im-sites\" id=\"history\"><thead><tr>"
                + "<th>version</th><th>author</th><th>time</th><th>why</th><th></th></tr></thead><tbody>");
        for (VersionInfo v : store.history()) {
            sb.append("<tr><td>v").append(v.number()).append(" <code>").append(v.hash(), 0, 8).append("</code></td><td>")
                    .append(Html.esc(v.author())).append("</td><td><time datetime=\"").append(v.time()).append("\">")
                    .append(AdminReports.READABLE.format(v.time())).append("</time></td><td>")
                    .append(Html.esc(v.comment())).append("</td><td>");
            if (v.number() > 1) {
                sb.append("<a href=\"/admin/table?action=diff&amp;from=").append(v.number() - 1).append("&amp;to=")
                        .append(v.number()).append("\">changes</a> ");
            }
            if (v.number() != head.number()) {
                sb.append("<form method=\"post\" action=\"/admin/table\" class=\"im-inline\"><input type=\"hidden\" "
                        + "name=\"token\" value=\"").append(Html.esc(csrf)).append("\"><input type=\"hidden\" name=\"to\" "
                        + "value=\"").append(v.number()).append("\"><input type=\"hidden\" name=\"base\" value=\"")
                        .append(head.number()).append("\"><input name=\"comment\" placeholder=\"why\" required> "
                        + "<button name=\"action\" value=\"rollback\">Roll back to this</button></form>");
            }
            sb.append("</td></tr>");
        }
        return sb.append("</tbody></table>").toString();
    }
}
