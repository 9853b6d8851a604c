package ionmark.host.internal;

import java.util.List;
import java.util.Map;

import ionmark.host.api.Block;
import ionmark.host.api.Entry;
import ionmark.host.api.SidePanel;

/** HTML of the web shell. Everything from entries is escaped here; contributed HTML is placed as is. */
final class Pages {
    private Pages() {
    }

    static String esc(String s) {
        return s == null ? "" : s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;")
                .replace("\"", "&quot;").replace("'", "&#39;");
    }

    static String page(String title, String body) {
        return page(title, body, null);
    }

    /** @param signedIn the signed-in user's name, or null */
    static String page(String title, String body, String signedIn) {
        String who = signedIn == null ? "<a href=\"/signin\" class=\"im-right\">Sign in</a>"
                : "<span class=\"im-right\">" + esc(signedIn) + " · <a href=\"/signout\">Sign out</a></span>";
        return "<!doctype html><html lang=\"en\"><head><meta charset=\"utf-8\"><title>" + esc(title)
                + " · Ionmark notebook</title>" + HEAD + "</head><body><header><a href=\"/\">Ionmark "
                + "notebook</a> <a href=\"/panel/quick-check\">Quick check</a> " + who + "</header><main>" + body
                + "</main></body></html>";
    }

    static String signIn(String token, String message) {
        return "<h1>Sign in</h1>" + (message.isEmpty() ? "" : "<p class=\"im-error\" role=\"alert\">" + esc(message)
                + "</p>") + "<form method=\"post\" action=\"/signin\"><input type=\"hidden\" name=\"token\" value=\""
                + esc(token) + "\"><p><label>User <input name=\"user\" autocomplete=\"username\" required></label></p>"
                + "<p><label>Password <input type=\"password\" name=\"password\" autocomplete=\"current-password\" "
                + "required></label></p><p><button type=\"submit\">Sign in</button></p></form>";
    }

    static String list(List<String> ids, List<SidePanel> panels, List<ionmark.host.api.AdminPage> admin) {
        StringBuilder sb = new StringBuilder("<h1>Entries</h1><ul class=\"entries\">");
        for (String id : ids) {
            sb.append("<li><a href=\"/entry/").append(esc(id)).append("\">").append(esc(id)).append("</a></li>");
        }
        sb.append("</ul><h2>Panels</h2><ul>");
        for (SidePanel p : panels) {
            sb.append("<li><a href=\"/panel/").append(esc(p.id())).append("\">").append(esc(p.title()))
                    .append("</a></li>");
        }
        sb.append("</ul>");
        if (!admin.isEmpty()) {
            sb.append("<h2>Administration</h2><ul>");
            for (var p : admin) {
                sb.append("<li><a href=\"/admin/").append(esc(p.id())).append("\">").append(esc(p.title()))
                        .append("</a></li>");
            }
            sb.append("</ul>");
        }
        return sb.toString();
    }

    static String entry(Entry e, Map<Integer, List<String>> decorations, List<SidePanel> panels) {
        return "<article><p><a href=\"/entry/" + esc(e.id()) + "/edit\">Edit</a></p>" + body(e, decorations)
                + "</article>";
    }

    static String body(Entry e, Map<Integer, List<String>> decorations) {
        StringBuilder sb = new StringBuilder();
        List<Block> blocks = e.blocks();
        for (int i = 0; i < blocks.size(); i++) {
            Block b = blocks.get(i);
            switch (b.kind()) {
                case STRUCTURE -> structure(sb, b);
                case TABLE -> sb.append("<pre class=\"table\">").append(esc(b.content())).append("</pre>");
                default -> {
                    String c = b.content();
                    if (c.startsWith("# ")) {
                        sb.append("<h1>").append(esc(c.substring(2))).append("</h1>");
                    } else if (c.startsWith("#")) {
                        sb.append("<h2>").append(esc(c.replaceFirst("^#+\\s*", ""))).append("</h2>");
                    } else {
                        sb.append("<p>").append(esc(c)).append("</p>");
                    }
                }
            }
            for (String html : decorations.getOrDefault(i, List.of())) {
                sb.append(html);
            }
        }
        return sb.toString();
    }

    /** A structure block: SMILES as written; a molfile or RXN block folded under its title line. */
    private static void structure(StringBuilder sb, Block b) {
        String c = b.content().strip();
        String ph = b.ph() == null ? "" : "  [pH " + b.ph() + "]";
        if (c.contains("\n")) {
            String title = b.content().lines().findFirst().orElse("").strip();
            sb.append("<details class=\"structure\"><summary>").append(esc(title.isEmpty() ? "structure block" : title))
                    .append(esc(ph)).append("</summary><pre class=\"structure\">").append(esc(b.content()))
                    .append("</pre></details>");
        } else {
            sb.append("<pre class=\"structure\">").append(esc(c)).append(esc(ph)).append("</pre>");
        }
    }

    static String editor(String id, String text, String token) {
        return "<h1>Edit " + esc(id) + "</h1><form method=\"post\" action=\"/entry/" + esc(id) + "\">"
                + "<input type=\"hidden\" name=\"token\" value=\"" + esc(token) + "\"><textarea id=\"text\" name=\"text\" "
                + "rows=\"24\" cols=\"90\">" + esc(text) + "</textarea><p><button type=\"submit\">Save</button></p>"
                + "</form><h2>Preview</h2><div id=\"preview\" aria-live=\"polite\"></div>";
    }

    /** Style and behaviour come from static files (see docs/page-templates.md): the page policy allows no inline code. */
    static final String HEAD = "<link rel=\"stylesheet\" href=\"/static/host/ionmark.css\">"
            + "<script src=\"/static/host/ionmark.js\" defer></script>";
}
