package ionmark.host.internal;

import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import ionmark.host.api.AdminPage;
import ionmark.host.api.Entry;
import ionmark.host.api.SidePanel;

/**
 * The web shell's own pages beyond a single entry: the entry list with search, the new-entry form, an
 * entry's history, the side-by-side editor, styled error pages and the notices above an entry.
 */
final class EntryPages {
    static final DateTimeFormatter WHEN = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm 'UTC'", Locale.ROOT)
            .withZone(ZoneOffset.UTC);

    /** One row of the entry list. */
    record Row(String id, String title, String when, String author) {
    }

    private EntryPages() {
    }

    static String list(List<Row> rows, String query, boolean mayEdit) {
        return list(rows, query, mayEdit, List.of(), List.of());
    }

    /** The entry list with its search, then the side panels and the administration pages the user may open. */
    static String list(List<Row> rows, String query, boolean mayEdit, List<SidePanel> panels, List<AdminPage> admin) {
        return Pages.TEMPLATES.render("entries", Map.of("rows", rows, "query", query, "mayEdit", mayEdit, "panels", panels,
                "admin", admin));
    }

    static String newEntry(String token, String message) {
        return Pages.TEMPLATES.render("newEntry", Map.of("token", token, "message", message));
    }

    static String history(String id, List<EntryHistory.Save> saves) {
        List<EntryHistory.Save> newestFirst = new ArrayList<>(saves);
        Collections.reverse(newestFirst);
        return Pages.TEMPLATES.render("history", Map.of("id", id, "newestFirst", newestFirst));
    }

    /** One saved text of an entry. */
    static String savedText(String id, int number, String text) {
        return Pages.TEMPLATES.render("savedText", Map.of("id", id, "number", number, "text", text));
    }

    /** The editor with its live preview beside it (stacked on narrow screens). */
    static String editor(String id, String text, String token) {
        return Pages.editor(id, text, token);
    }

    static String error(int status, String message, boolean signedIn) {
        String title = switch (status) {
            case 403 -> "Not allowed";
            case 404 -> "Not found";
            case 400 -> "Cannot use that request";
            default -> "Something went wrong";
        };
        return Pages.TEMPLATES.render("error", Map.of("status", status, "title", title, "message", message, "signInLink",
                status == 403 && !signedIn));
    }

    /** What the host could not read in the entry, and a word when no annotator is running yet. */
    static String notices(Entry e, boolean annotatorsReady) {
        boolean loading = !annotatorsReady && e.blocks().stream().anyMatch(WebShell::isStructure);
        return Pages.TEMPLATES.render("notices", Map.of("loading", loading, "notices", e.notices()));
    }

    /** An id for a new entry from its title: lower-case words joined by hyphens, unique in the workspace. */
    static String idFor(String title, List<String> taken) {
        String base = title.toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9]+", "-").replaceAll("^-+|-+$", "");
        if (base.isEmpty()) {
            base = "entry";
        }
        base = base.length() > 60 ? base.substring(0, 60) : base;
        String id = base;
        for (int n = 2; taken.contains(id); n++) {
            id = base + "-" + n;
        }
        return id;
    }
}
