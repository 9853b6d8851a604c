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

    static final String STYLE = ":root{--ink:#1d2433;--muted:#5b6475;--line:#d5d9e0;--paper:#ffffff;--wash:#f4f6f9;"
            + "--accent:#234e70;--acid:#6a3d9a;--base:#1b7837;--warn:#8a4b00;--err:#9b1c1c}"
            + "*{box-sizing:border-box}body{font:15px/1.5 'DejaVu Sans','Segoe UI',system-ui,sans-serif;max-width:1320px;"
            + "margin:0 auto;padding:0 1.2em 3em;color:var(--ink);background:var(--wash)}"
            + "body>header{display:flex;gap:1.2em;align-items:center;padding:.7em 0;border-bottom:3px solid var(--accent);"
            + "margin-bottom:1em}body>header a{color:var(--accent);font-weight:600;text-decoration:none}"
            + "body>header a:first-child{font-size:1.15em;letter-spacing:.02em}.im-right{margin-left:auto}"
            + "main{background:var(--paper);border:1px solid var(--line);border-radius:4px;padding:1em 1.6em}"
            + "h1{font-size:1.6em;margin:.3em 0 .5em;font-weight:600}h2{font-size:1.2em;margin:1.2em 0 .4em;"
            + "border-bottom:1px solid var(--line);padding-bottom:.2em}a{color:var(--accent)}"
            + ".im-button{display:inline-block;background:var(--accent);color:#fff;padding:.35em .9em;border-radius:3px;"
            + "text-decoration:none;font-weight:600}.im-listhead{display:flex;align-items:center;gap:1em;"
            + "justify-content:space-between}.im-search{margin:.5em 0 1em}.im-search input{width:22em;padding:.3em}"
            + ".im-entries{border-collapse:collapse;width:100%}.im-entries td,.im-entries th{text-align:left;"
            + "padding:.35em .6em;border-bottom:1px solid var(--line)}.im-entries th{color:var(--muted);font-weight:600}"
            + ".im-split{display:grid;grid-template-columns:minmax(0,1fr) minmax(0,1.25fr);gap:1.4em;align-items:start}"
            + ".im-split textarea{width:100%;min-height:70vh;font:13px/1.45 'DejaVu Sans Mono',monospace}"
            + ".im-previewpane{max-height:85vh;overflow:auto;border-left:1px solid var(--line);padding-left:1em}"
            + "@media (max-width:900px){.im-split{grid-template-columns:1fr}.im-previewpane{border:0;padding:0;"
            + "max-height:none}}"
            + ".im-errorpage{text-align:center;padding:2em 0}.im-status{font-size:3em;color:var(--muted);margin:0}"
            + ".im-loading{background:#fff8e1;border-left:4px solid var(--warn);padding:.5em .8em}"
            + ".im-notices{background:#fdecec;border-left:4px solid var(--err);padding:.5em .8em .5em 2em}"
            + ".im-error{color:var(--err);font-weight:600}pre.structure,pre.im-source{background:var(--wash);"
            + "padding:.5em;overflow:auto;font-size:12px}pre.table{font-size:13px}"
            + "cite{font-size:.8em;color:var(--muted)}.im-inline{display:inline}.im-ok{color:var(--base);font-weight:600}"
            // the notebook's cards
            + ".im-card{border:1px solid var(--line);border-top:4px solid var(--accent);border-radius:4px;padding:.8em 1.1em;"
            + "margin:.8em 0 1.6em;background:#fff;box-shadow:0 1px 3px rgba(29,36,51,.08)}.im-card:focus{outline:3px "
            + "solid var(--accent)}.im-cardhead{font-size:.95em;color:var(--muted);margin-bottom:.3em}.im-src{display:"
            + "inline-block;font-size:.75em;text-transform:uppercase;letter-spacing:.06em;background:var(--wash);border:"
            + "1px solid var(--line);border-radius:3px;padding:0 .4em}.im-words{font-family:'DejaVu Sans Mono',monospace;"
            + "color:var(--ink)}.im-cond{margin:.3em 0}.im-implied{font-size:.75em;border:1px dashed var(--warn);color:"
            + "var(--warn);padding:0 .35em;border-radius:3px}.im-notes,.im-entrywarn{background:#fff8e1;border-left:4px "
            + "solid var(--warn);padding:.4em .8em .4em 2em;margin:.4em 0;font-size:.92em}"
            + ".im-cardgrid{display:flex;flex-wrap:wrap;gap:1.2em;align-items:flex-start}.im-drawing{margin:0;flex:0 1 auto}"
            + ".im-drawing svg{max-width:100%;height:auto}.im-numbers{flex:1 1 420px;min-width:0;overflow-x:auto}"
            + ".im-legend{font-size:.85em;color:var(--muted)}.im-acid{color:var(--acid);font-weight:600}.im-base{color:"
            + "var(--base);font-weight:600}.im-sites{border-collapse:collapse;margin:.4em 0;font-size:.92em}.im-sites "
            + "caption{text-align:left;font-weight:600;padding-bottom:.2em}.im-sites td,.im-sites th{border-bottom:1px "
            + "solid var(--line);padding:.25em .55em;text-align:left;vertical-align:top}.im-sites th{color:var(--muted);"
            + "font-weight:600}.im-summary{margin:.3em 0 .8em}.im-species{display:flex;flex-wrap:wrap;gap:.6em;align-items:"
            + "flex-end}.im-species h4{flex-basis:100%;margin:.6em 0 0}.im-species figure{margin:0;text-align:center;"
            + "font-size:.85em;border:1px solid var(--line);border-radius:3px;padding:.2em}.im-plotfig{margin:.6em 0}"
            + ".im-plot{max-width:100%;height:auto}.im-workup{border-left:4px solid var(--accent);padding:.2em .8em;"
            + "margin:.6em 0;background:var(--wash)}.im-workup h4{margin:.2em 0}.im-small{font-size:.85em;color:"
            + "var(--muted)}.im-warn{font-size:.88em;color:var(--muted)}.im-caution{font-size:.85em;border-left:4px "
            + "solid var(--ink);padding-left:.6em;margin-bottom:0}.im-separations{border:1px solid var(--line);padding:"
            + ".6em 1em;border-radius:4px;background:#fff}.im-quick label{display:inline-block;margin:.3em 1em .3em 0}"
            + ".im-quick .im-wide{display:block}.im-quick textarea{width:100%;font-family:'DejaVu Sans Mono',monospace}"
            + "[aria-invalid=true]{border:2px solid var(--err)}"
            // a narrow page stacks each site row into labelled lines instead of scrolling the table sideways
            + "@media (max-width:700px){.im-sites thead{display:none}.im-sites,.im-sites tbody,.im-sites tr,"
            + ".im-sites td{display:block;width:auto}.im-sites tr{border-bottom:2px solid var(--line);padding:.3em 0}"
            + ".im-sites td{border:0;padding:.1em .3em;overflow-wrap:anywhere}.im-sites td::before{content:attr(data-label) \": \";"
            + "color:var(--muted);font-weight:600}}"
            + "@media print{.im-card{break-inside:avoid;box-shadow:none}}"
            + "@media print{body>header,.im-search,.im-button{display:none}body{background:#fff}main{border:0}}";
}
