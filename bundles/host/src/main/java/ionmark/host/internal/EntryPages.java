package ionmark.host.internal;

import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.List;
import java.util.Locale;

import ionmark.host.api.Entry;

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
        StringBuilder sb = new StringBuilder("<div class=\"im-listhead\"><h1>Entries</h1>");
        if (mayEdit) {
            sb.append("<a class=\"im-button\" id=\"new-entry\" href=\"/new\">New entry</a>");
        }
        sb.append("</div><form class=\"im-search\" method=\"get\" action=\"/\"><label>Search titles and text "
                + "<input type=\"search\" name=\"q\" value=\"").append(Pages.esc(query)).append("\"></label>"
                + "<button type=\"submit\">Search</button></form>");
        if (rows.isEmpty()) {
            sb.append("<p>").append(query.isBlank() ? "No entries yet." : "No entry mentions <q>" + Pages.esc(query)
                    + "</q>.").append("</p>");
            return sb.toString();
        }
        sb.append("<table class=\"im-entries\"><thead><tr><th>Title</th><th>Last saved</th><th>By</th></tr></thead>"
                + "<tbody>");
        for (Row r : rows) {
            sb.append("<tr><td><a href=\"/entry/").append(Pages.esc(r.id())).append("\">").append(Pages.esc(r.title()))
                    .append("</a></td><td>").append(Pages.esc(r.when())).append("</td><td>")
                    .append(Pages.esc(r.author())).append("</td></tr>");
        }
        return sb.append("</tbody></table>").toString();
    }

    static String newEntry(String token, String message) {
        return "<h1>New entry</h1>" + (message.isEmpty() ? "" : "<p class=\"im-error\" role=\"alert\">"
                + Pages.esc(message) + "</p>") + "<form method=\"post\" action=\"/new\"><input type=\"hidden\" "
                + "name=\"token\" value=\"" + Pages.esc(token) + "\"><p><label>Title <input name=\"title\" size=\"50\" "
                + "required></label></p><p><button type=\"submit\">Create and edit</button></p></form>";
    }

    static String history(String id, List<EntryHistory.Save> saves) {
        StringBuilder sb = new StringBuilder("<h1>History of ").append(Pages.esc(id)).append("</h1>");
        if (saves.isEmpty()) {
            return sb.append("<p>Not saved through the notebook yet (a seeded or copied file).</p>").toString();
        }
        sb.append("<table class=\"im-entries\"><thead><tr><th>Save</th><th>When</th><th>By</th></tr></thead><tbody>");
        for (int i = saves.size() - 1; i >= 0; i--) {
            EntryHistory.Save s = saves.get(i);
            sb.append("<tr><td><a href=\"/entry/").append(Pages.esc(id)).append("/history/").append(s.number())
                    .append("\">").append(s.number()).append("</a></td><td>").append(WHEN.format(s.time()))
                    .append("</td><td>").append(Pages.esc(s.author())).append("</td></tr>");
        }
        return sb.append("</tbody></table>").toString();
    }

    /** The editor with its live preview beside it (stacked on narrow screens). */
    static String editor(String id, String text, String token) {
        String old = Pages.editor(id, text, token);
        int preview = old.indexOf("<h2>Preview</h2>");
        return "<div class=\"im-split\"><div class=\"im-editpane\">" + old.substring(0, preview)
                + "</div><div class=\"im-previewpane\"><h2>Preview</h2>" + old.substring(preview + 16) + "</div></div>";
    }

    static String error(int status, String message, boolean signedIn) {
        String title = switch (status) {
            case 403 -> "Not allowed";
            case 404 -> "Not found";
            case 400 -> "Cannot use that request";
            default -> "Something went wrong";
        };
        return "<div class=\"im-errorpage\"><p class=\"im-status\">" + status + "</p><h1>" + title + "</h1><p>"
                + Pages.esc(message) + "</p><p>" + (status == 403 && !signedIn ? "<a href=\"/signin\">Sign in</a> · " : "")
                + "<a href=\"/\">Back to the entries</a></p></div>";
    }

    /** What the host could not read in the entry, and a word when no annotator is running yet. */
    static String notices(Entry e, boolean annotatorsReady) {
        StringBuilder sb = new StringBuilder();
        if (!annotatorsReady && e.blocks().stream().anyMatch(WebShell::isStructure)) {
            // ionmark.js reloads a page that carries data-im-reload when it loads (not a preview placed into the editor)
            sb.append("<p class=\"im-loading\" role=\"status\" data-im-reload=\"3000\">Annotations are loading (the "
                    + "solver is starting); this page refreshes itself in a few seconds.</p>");
        }
        if (!e.notices().isEmpty()) {
            sb.append("<ul class=\"im-notices\" role=\"alert\">");
            for (String n : e.notices()) {
                sb.append("<li>").append(Pages.esc(n)).append("</li>");
            }
            sb.append("</ul>");
        }
        return sb.toString();
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
