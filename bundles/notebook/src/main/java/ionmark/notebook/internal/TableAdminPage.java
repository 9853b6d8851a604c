package ionmark.notebook.internal;

import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.osgi.service.component.annotations.Activate;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.Problem;
import ionmark.acidity.api.TableService;
import ionmark.acidity.api.ValidationReport;
import ionmark.host.api.AdminPage;
import ionmark.host.api.HostUser;
import ionmark.speciation.api.TableRegression;
import ionmark.store.api.StoreConflictException;
import ionmark.store.api.StoreRejectedException;
import ionmark.store.api.TableStore;
import ionmark.store.api.VersionInfo;

/**
 * The admin page for the shared table: edit (validated as you type, errors by JSON path), check
 * (validation and the regression report over the reference set), publish with a comment, history,
 * diff between versions, rollback. Only for users with the admin role (the host enforces it).
 */
@Component(service = AdminPage.class)
public final class TableAdminPage implements AdminPage {
    private final TableStore store;
    private final TableService tables;
    private final TableRegression regression;

    @Activate
    public TableAdminPage(@Reference TableStore store, @Reference TableService tables,
            @Reference TableRegression regression) {
        this.store = store;
        this.tables = tables;
        this.regression = regression;
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
        StringBuilder sb = new StringBuilder();
        if (post) {
            switch (action) {
                case "validate" -> {
                    ValidationReport r = tables.validate(draft);
                    store.audit(user.name(), "validate", head.number(), r.ok() ? "ok" : "rejected",
                            r.errors().size() + " errors, " + r.warnings().size() + " warnings (as you type)");
                    return problems(r);
                }
                case "check" -> {
                    store.audit(user.name(), "validate", head.number(), "ok", "validate and compare");
                    sb.append(check(head, draft));
                }
                case "publish" -> sb.append(publish(draft, params, user));
                case "rollback" -> sb.append(rollback(params, user));
                default -> sb.append("<p class=\"im-error\">Unknown action.</p>");
            }
        } else if (action.equals("export")) {
            store.audit(user.name(), "export", head.number(), "ok", "head shown for download");
            return "<p>Table v" + head.number() + " as JSON (select all and save, or use <code>./ionmark table export</code>):"
                    + "</p><pre class=\"im-export\">" + Html.esc(store.content(head.number()).orElse("")) + "</pre>";
        } else if (action.equals("diff")) {
            int from = Integer.parseInt(params.getOrDefault("from", "1"));
            int to = Integer.parseInt(params.getOrDefault("to", String.valueOf(head.number())));
            sb.append("<h2>Changes from v").append(from).append(" to v").append(to).append("</h2><ul class=\"im-diff\">");
            store.diff(from, to).forEach(l -> sb.append("<li>").append(Html.esc(l)).append("</li>"));
            sb.append("</ul>");
        }
        store.audit(user.name(), "read", head.number(), "ok", "table admin page" + (action.isEmpty() ? "" : ": " + action));
        head = store.head().orElseThrow();
        if (draft.isBlank() || action.equals("publish") || action.equals("rollback")) {
            draft = store.content(head.number()).orElse("");
        }
        sb.append(editor(head, draft, csrf)).append(history(head, csrf));
        return sb.toString();
    }

    private String check(VersionInfo head, String draft) {
        ValidationReport r = tables.validate(draft);
        StringBuilder sb = new StringBuilder("<h2>Check of the draft</h2>").append(problems(r));
        if (!r.ok()) {
            return sb.toString();
        }
        AcidityTable current = tables.validate(store.content(head.number()).orElseThrow()).table().orElseThrow();
        TableRegression.Report rep = regression.compare(current, r.table().orElseThrow());
        sb.append(String.format(Locale.ROOT, "<p>Reference set: %d compounds. Mean absolute error against the handbook "
                + "values: head %.3f, draft %.3f.</p>", rep.compounds(), rep.maeHead(), rep.maeDraft()));
        sb.append("<p>Touched: ").append(rep.classesTouched().isEmpty() ? "nothing"
                : Html.esc(String.join(", ", rep.classesTouched()))).append("</p>");
        sb.append("<table class=\"im-sites\"><caption>Compounds whose prediction changes</caption><thead><tr>"
                + "<th>compound</th><th>reference</th><th>head</th><th>draft</th><th>sites gained / lost</th></tr></thead><tbody>");
        for (TableRegression.Shift s : rep.shifts()) {
            sb.append("<tr><td>").append(Html.esc(s.name())).append("</td><td>").append(s.reference()).append("</td><td>")
                    .append(s.head()).append("</td><td>").append(s.draft()).append("</td><td>")
                    .append(Html.esc(String.join(" ", s.sitesGained().stream().map(x -> "+" + x).toList())))
                    .append(' ').append(Html.esc(String.join(" ", s.sitesLost().stream().map(x -> "−" + x).toList())))
                    .append("</td></tr>");
        }
        return sb.append("</tbody></table>").toString();
    }

    private String publish(String draft, Map<String, String> params, HostUser user) {
        try {
            VersionInfo v = store.publish(draft, Integer.parseInt(params.getOrDefault("base", "-1")), user.name(),
                    params.getOrDefault("comment", ""));
            return "<p class=\"im-ok\" role=\"status\">Published v" + v.number() + ". Every notebook uses it from now on.</p>";
        } catch (StoreConflictException e) {
            return "<p class=\"im-error\" role=\"alert\">" + Html.esc(e.getMessage()) + "</p>";
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

    static String problems(ValidationReport r) {
        StringBuilder sb = new StringBuilder("<div id=\"problems\">");
        List<Problem> ps = r.problems();
        sb.append("<p>").append(r.errors().size()).append(" errors, ").append(r.warnings().size()).append(" warnings</p><ul>");
        for (Problem p : ps) {
            sb.append("<li class=\"").append(p.severity() == Problem.Severity.ERROR ? "im-error" : "im-warn").append("\">")
                    .append(p.severity() == Problem.Severity.ERROR ? "✖ " : "△ ").append("<code>").append(Html.esc(p.path()))
                    .append("</code> ").append(Html.esc(p.message())).append("</li>");
        }
        return sb.append("</ul></div>").toString();
    }

    private static String editor(VersionInfo head, String draft, String csrf) {
        String t = Html.esc(csrf);
        return "<h2>Draft based on v" + head.number() + "</h2><form method=\"post\" action=\"/admin/table\">"
                + "<input type=\"hidden\" name=\"token\" value=\"" + t + "\"><input type=\"hidden\" name=\"base\" value=\""
                + head.number() + "\"><textarea id=\"draft\" name=\"draft\" rows=\"18\" cols=\"110\" spellcheck=\"false\">"
                + Html.esc(draft) + "</textarea><div id=\"live\" aria-live=\"polite\"></div>"
                + "<p><label>Or load a table file <input type=\"file\" id=\"upload\" accept=\".json,application/json\">"
                + "</label> <a href=\"/admin/table?action=export\">Export the head</a></p>"
                + "<p><label>Why (required to publish) <input name=\"comment\" size=\"70\"></label></p>"
                + "<p><button name=\"action\" value=\"check\">Validate and compare</button> "
                + "<button name=\"action\" value=\"publish\">Publish</button></p></form><script>"
                + "const d=document.getElementById('draft'),l=document.getElementById('live');let h,seq=0;"
                + "d.addEventListener('input',()=>{clearTimeout(h);h=setTimeout(()=>{const my=++seq;"
                + "fetch('/admin/table',{method:'POST',headers:{'Content-Type':'application/x-www-form-urlencoded'},"
                + "body:new URLSearchParams({token:'" + t + "',action:'validate',draft:d.value})}).then(x=>x.text())"
                + ".then(x=>{if(my===seq){const doc=new DOMParser().parseFromString(x,'text/html');"
                + "const p=doc.getElementById('problems');l.innerHTML=p?p.innerHTML:'';}});},600);});"
                + "document.getElementById('upload').addEventListener('change',e=>{const f=e.target.files[0];if(f){"
                + "f.text().then(t=>{d.value=t;d.dispatchEvent(new Event('input'));});}});</script>";
    }

    private String history(VersionInfo head, String csrf) {
        StringBuilder sb = new StringBuilder("<h2>History</h2><table class=\"im-sites\"><thead><tr><th>version</th>"
                + "<th>author</th><th>time</th><th>why</th><th></th></tr></thead><tbody>");
        for (VersionInfo v : store.history()) {
            sb.append("<tr><td>v").append(v.number()).append(" <code>").append(v.hash(), 0, 8).append("</code></td><td>")
                    .append(Html.esc(v.author())).append("</td><td>").append(v.time()).append("</td><td>")
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
