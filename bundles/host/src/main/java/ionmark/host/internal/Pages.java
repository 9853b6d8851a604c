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
                + " · Ionmark notebook</title><style>" + STYLE + "</style></head><body><header><a href=\"/\">Ionmark "
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
                case STRUCTURE -> sb.append("<pre class=\"structure\">").append(esc(b.content().strip()))
                        .append(b.ph() == null ? "" : "  [pH " + b.ph() + "]").append("</pre>");
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

    static String editor(String id, String text, String token) {
        return "<h1>Edit " + esc(id) + "</h1><form method=\"post\" action=\"/entry/" + esc(id) + "\">"
                + "<input type=\"hidden\" name=\"token\" value=\"" + esc(token) + "\"><textarea id=\"text\" name=\"text\" "
                + "rows=\"24\" cols=\"90\">" + esc(text) + "</textarea><p><button type=\"submit\">Save</button></p>"
                + "</form><h2>Preview</h2><div id=\"preview\" aria-live=\"polite\"></div><script>"
                + "const t=document.getElementById('text'),p=document.getElementById('preview');let h,seq=0,last='';"
                // only the newest request may update the preview: answers can arrive out of order
                + "function r(){const my=++seq;fetch('/preview',{method:'POST',headers:{'X-Ionmark-Token':'"
                + esc(token) + "'},body:t.value}).then(x=>x.text()).then(x=>{if(my===seq&&x!==last){last=x;p.innerHTML=x;}});}"
                + "t.addEventListener('input',()=>{clearTimeout(h);h=setTimeout(r,300);});r();"
                // a published table, or annotations that were not ready at the last keystroke, reach an open
                // editor too: ask again every 10 s while the page is shown, and touch the preview only on change
                + "setInterval(()=>{if(document.visibilityState==='visible'){r();}},10000);</script>";
    }

    static final String STYLE = "body{font-family:sans-serif;max-width:980px;margin:0 auto;padding:0 1em;color:#1a1a1a}"
            + "header{padding:.6em 0;border-bottom:2px solid #333}header a{margin-right:1em;font-weight:bold}"
            + ".im-card{border:2px solid #444;border-radius:6px;padding:.6em;margin:.6em 0 1.4em;background:#fbfbf7}"
            + ".im-card:focus{outline:3px dashed #000}.im-sites{border-collapse:collapse;margin:.4em 0}"
            + ".im-sites td,.im-sites th{border:1px solid #999;padding:.2em .5em;text-align:left}"
            + ".im-caution{font-size:.85em;border-left:4px solid #333;padding-left:.5em}"
            + ".im-error{color:#8a0000;font-weight:bold}pre.structure{background:#eee;padding:.4em}"
            + "cite{font-size:.8em;color:#444}.im-right{float:right}.im-inline{display:inline}"
            + ".im-ok{color:#064;font-weight:bold}";
}
