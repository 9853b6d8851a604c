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
                    sb.append(render("adminRebased", "head", head.number(), "applied", r.applied(), "conflicts",
                            r.conflicts()));
                }
                case "rollback" -> {
                    sb.append(rollback(params, user));
                    draft = "";
                }
                default -> draft = task(action, params, draft, task);
            }
        } else if (action.equals("export")) {
            store.audit(user.name(), "export", head.number(), "ok", "head shown for download");
            return render("adminExport", "version", head.number(), "json", store.content(head.number()).orElse(""));
        } else if (action.equals("diff")) {
            int from = parse(params.get("from"), 1);
            int to = parse(params.get("to"), head.number());
            sb.append(render("adminDiff", "from", from, "to", to, "lines", store.diff(from, to)));
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
            sb.append(notice("error", false, null, "The draft has errors: fix them in the raw JSON below, then the forms "
                    + "come back.", List.of()));
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
        return render("adminDraftChanges", "base", base, "changes", changes);
    }

    /** A refused publish: the draft stays, with both sides' changes and the offer to rebase. */
    private String conflict(int base, String draft, String csrf) {
        VersionInfo head = store.head().orElseThrow();
        List<RecordChanges.Change> theirs = RecordChanges.between(store.content(base).orElseThrow(),
                store.content(head.number()).orElseThrow());
        List<RecordChanges.Change> mine = RecordChanges.between(store.content(base).orElseThrow(), draft);
        return render("adminConflict", "head", head, "base", base, "csrf", csrf, "theirs", theirs, "mine", mine);
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
            return notice("ok", true, null, "Published v" + v.number() + ". Every notebook uses it from now on.", List.of());
        } catch (StoreConflictException e) {
            return notice("error", true, "conflict", "Not published: " + e.getMessage(), List.of());
        } catch (StoreRejectedException e) {
            return notice("error", true, null, "Not published:", e.problems());
        } catch (NumberFormatException e) {
            return notice("error", false, null, "The base version is missing.", List.of());
        }
    }

    private String rollback(Map<String, String> params, HostUser user) {
        try {
            VersionInfo v = store.rollback(Integer.parseInt(params.getOrDefault("to", "-1")),
                    Integer.parseInt(params.getOrDefault("base", "-1")), user.name(), params.getOrDefault("comment", ""));
            return notice("ok", true, null, "Published v" + v.number() + " with the content of v" + params.get("to") + ".",
                    List.of());
        } catch (StoreConflictException | StoreRejectedException e) {
            return notice("error", true, null, e.getMessage(), List.of());
        } catch (NumberFormatException e) {
            return notice("error", false, null, "Version numbers are missing.", List.of());
        }
    }

    private String check(VersionInfo head, String draft, String thresholdText) {
        ValidationReport r = tables.validate(draft);
        StringBuilder sb = new StringBuilder(render("adminCheckTitle")).append(problems(r, draft));
        if (!r.ok()) {
            return sb.toString();
        }
        AcidityTable current = tables.validate(store.content(head.number()).orElseThrow()).table().orElseThrow();
        AcidityTable next = sealed(draft).orElseThrow();
        List<MeasuredCompound> added = next.measured().stream().filter(m -> !current.measured().contains(m)).toList();
        if (!added.isEmpty()) {
            sb.append(render("adminMeasuredAdded", "names", String.join(", ", added.stream().map(MeasuredCompound::name)
                    .toList())));
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

    /** A validation problem as the page lists it: error or warning, the draft line it points at (0: none). */
    record Shown(boolean error, int line, String path, String message) {
    }

    /** Problems with their JSON path and the line of the draft they point at (a link that selects it). */
    static String problems(ValidationReport r, String draft) {
        JsonLines lines = JsonLines.of(draft == null ? "" : draft);
        return render("adminProblems", "errors", r.errors().size(), "warnings", r.warnings().size(), "errorList",
                shown(r.errors(), lines), "warningList", shown(r.warnings(), lines));
    }

    private static List<Shown> shown(List<Problem> problems, JsonLines lines) {
        return problems.stream().map(p -> new Shown(p.severity() == Problem.Severity.ERROR, lines.lineOf(p.path(),
                p.message()), p.path(), p.message())).toList();
    }

    private static String editor(VersionInfo head, int base, String draft, String csrf) {
        return render("adminEditor", "head", head.number(), "base", base, "draft", draft, "csrf", csrf, "threshold",
                EntryImpact.DEFAULT_THRESHOLD);
    }

    private String history(VersionInfo head, String csrf) {
        return render("adminHistory", "versions", store.history(), "head", head.number(), "csrf", csrf);
    }

    /** One message: kind "ok" or "error"; {@code alert} gives it its role (status or alert); id may be null. */
    static String notice(String kind, boolean alert, String id, String text, List<String> details) {
        Map<String, Object> p = new java.util.HashMap<>();
        p.put("kind", kind);
        p.put("alert", alert);
        p.put("id", id);
        p.put("text", text);
        p.put("details", details);
        return Html.TEMPLATES.render("adminNotice", p).strip();
    }

    /** Renders a template with name-value pairs. */
    static String render(String name, Object... pairs) {
        Map<String, Object> p = new java.util.HashMap<>();
        for (int i = 0; i < pairs.length; i += 2) {
            p.put((String) pairs[i], pairs[i + 1]);
        }
        return Html.TEMPLATES.render(name, p).strip();
    }
}
