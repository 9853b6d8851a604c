package ionmark.notebook.internal;

import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.osgi.service.component.annotations.Activate;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.TableService;
import ionmark.host.api.AdminPage;
import ionmark.host.api.HostUser;
import ionmark.speciation.measured.MeasuredImport;
import ionmark.store.api.StoreConflictException;
import ionmark.store.api.StoreRejectedException;
import ionmark.store.api.TableStore;
import ionmark.store.api.VersionInfo;

/**
 * The admin page for measured values in bulk: paste or load a TSV or SDF file, see every row checked
 * (its problems with the row number, the sites its values go to, the head's prediction), see which
 * predictions the new values move through their analogs, then publish the draft with a comment.
 */
@Component(service = AdminPage.class)
public final class MeasuredImportPage implements AdminPage {
    private final TableStore store;
    private final TableService tables;
    private final MeasuredImport imports;

    @Activate
    public MeasuredImportPage(@Reference TableStore store, @Reference TableService tables,
            @Reference MeasuredImport imports) {
        this.store = store;
        this.tables = tables;
        this.imports = imports;
    }

    @Override
    public String id() {
        return "measured";
    }

    @Override
    public String title() {
        return "Import measured values";
    }

    @Override
    public String requiredRole() {
        return "admin";
    }

    @Override
    public String handle(Map<String, String> params, boolean post, HostUser user, String csrf) {
        VersionInfo head = store.head().orElseThrow(() -> new IllegalStateException("the store has no version"));
        String text = params.getOrDefault("data", "");
        MeasuredImport.Format format = "sdf".equals(params.get("format")) ? MeasuredImport.Format.SDF
                : MeasuredImport.Format.TSV;
        StringBuilder sb = new StringBuilder();
        String action = params.getOrDefault("action", "");
        if (post && !text.isBlank() && (action.equals("preview") || action.equals("publish"))) {
            AcidityTable current = tables.validate(store.content(head.number()).orElseThrow()).table().orElseThrow();
            MeasuredImport.Result r = imports.read(text, format, current, user.name());
            store.audit(user.name(), "validate", head.number(), r.ok() ? "ok" : "rejected",
                    "measured import: " + r.rows().size() + " rows, " + r.rows().stream().filter(x -> !x.ok()).count()
                            + " with problems");
            if (action.equals("publish") && r.ok()) {
                sb.append(publish(r, head, params, user));
                text = "";
            } else {
                sb.append(preview(r, current));
            }
        }
        return sb.append(form(head, text, format, csrf)).toString();
    }

    static String rows(MeasuredImport.Result r) {
        return Html.TEMPLATES.render("measuredRows", Map.of("rows", r.rows(), "ready", r.rows().stream()
                .filter(MeasuredImport.Row::ok).count(), "failing", r.rows().stream().filter(x -> !x.ok()).count()));
    }

    /** A ready row and a row with problems look different. */
    static String rowClass(MeasuredImport.Row row) {
        return row.ok() ? "im-ok" : "im-error";
    }

    /** Today's prediction for a row's sites, two decimals each. */
    static String predicted(MeasuredImport.Row row) {
        return row.predicted().stream().map(v -> String.format(Locale.ROOT, "%.2f", v)).toList().toString();
    }

    private String preview(MeasuredImport.Result r, AcidityTable current) {
        return TableAdminPage.render("measuredPreview", "rows", rows(r), "ok", r.ok(), "moves", r.ok()
                ? imports.analogMoves(current, r.draft(), List.of()) : List.of());
    }

    private String publish(MeasuredImport.Result r, VersionInfo head, Map<String, String> params, HostUser user) {
        try {
            VersionInfo v = store.publish(tables.toJson(r.draft()), Integer.parseInt(params.getOrDefault("base", "-1")),
                    user.name(), params.getOrDefault("comment", ""));
            return TableAdminPage.notice("ok", true, null, "Published v" + v.number() + " with " + r.rows().size()
                    + " measured compounds. Every notebook uses it from now on.", List.of());
        } catch (StoreConflictException e) {
            return TableAdminPage.notice("error", true, null, e.getMessage(), List.of());
        } catch (StoreRejectedException e) {
            return TableAdminPage.notice("error", true, null, "Not published:", e.problems());
        } catch (NumberFormatException e) {
            return TableAdminPage.notice("error", false, null, "The base version is missing.", List.of());
        }
    }

    private static String form(VersionInfo head, String text, MeasuredImport.Format format, String csrf) {
        return Html.TEMPLATES.render("measuredForm", Map.of("head", head.number(), "text", text, "sdf",
                format == MeasuredImport.Format.SDF, "csrf", csrf));
    }
}
