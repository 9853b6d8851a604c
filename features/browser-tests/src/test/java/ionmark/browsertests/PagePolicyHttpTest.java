package ionmark.browsertests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.net.URI;
import java.net.URLEncoder;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Every page type of the running notebook is served under the strict page policy (no 'unsafe-inline', no
 * framing) and carries no inline script, event handler or style; its script and style files come from the same
 * origin with their content types; and text a user stored or typed (entry titles and text, searches, the quick
 * check, sign-in names, admin searches, paths) comes back escaped on every page that shows it.
 */
class PagePolicyHttpTest {
    static final HttpClient HTTP = HttpClient.newBuilder().followRedirects(HttpClient.Redirect.NEVER).build();
    /** A tag that carries inline code: a script without src, a style element, an on* handler or a style attribute. */
    static final Pattern INLINE = Pattern.compile("<script(?![^>]*\\bsrc=)[^>]*>|<style\\b|<[a-zA-Z][^>]*\\s(?:style"
            + "|on[a-z]+)\\s*=", Pattern.CASE_INSENSITIVE);
    static final List<String> PAYLOADS = List.of("<script>alert(1)</script>", "\"><img src=x onerror=alert(2)>",
            "javascript:alert(3)", "<svg onload=alert(4)><script>alert(5)</script></svg>", "'><a href='javascript:alert(6)'>x</a>");
    /** What must never come back as markup: a payload's tag, or a javascript: URL inside a real tag. */
    static final List<Pattern> LIVE = List.of(Pattern.compile("<script>alert"), Pattern.compile("<img src=x"),
            Pattern.compile("<svg onload"), Pattern.compile("<[a-zA-Z][^<>]*\\s(?:href|src|action)\\s*=\\s*[\"']?"
                    + "\\s*javascript:", Pattern.CASE_INSENSITIVE));
    static final String TITLE = "Batch " + String.join(" ", PAYLOADS);

    static RunningApp app;
    static String base;
    static String cookie;

    @TempDir
    static Path workspace;

    @BeforeAll
    static void start() throws Exception {
        app = RunningApp.start(workspace, "policy-app");
        base = app.base;
        long deadline = System.currentTimeMillis() + 60_000;
        while (get("/admin/table").statusCode() == 404 && System.currentTimeMillis() < deadline) {
            Thread.sleep(250);
        }
        String password = Files.readString(workspace.resolve(".ionmark/admin-password.txt")).strip();
        HttpResponse<String> ok = post("/signin", Map.of("token", token(get("/signin").body()), "user", "admin",
                "password", password));
        assertEquals(302, ok.statusCode(), ok.body());
        String c = ok.headers().firstValue("Set-Cookie").orElseThrow();
        cookie = c.substring(0, c.indexOf(';'));
    }

    @AfterAll
    static void stop() {
        if (app != null) {
            app.close();
        }
    }

    static HttpResponse<String> get(String path) throws Exception {
        return AdminWorkflowHttpTest.get(base, path, cookie);
    }

    static HttpResponse<String> post(String path, Map<String, String> form) throws Exception {
        return AdminWorkflowHttpTest.post(base, path, cookie, form);
    }

    static String token(String html) {
        return AdminWorkflowHttpTest.token(html);
    }

    static String q(String s) {
        return URLEncoder.encode(s, StandardCharsets.UTF_8);
    }

    /** The page's header and markup follow the strict policy. */
    static void strict(String what, HttpResponse<String> r) {
        String csp = r.headers().firstValue("Content-Security-Policy").orElse("");
        assertFalse(csp.contains("unsafe-inline"), what + ": " + csp);
        assertTrue(csp.contains("script-src 'self'") && csp.contains("style-src 'self'"), what + ": " + csp);
        assertTrue(csp.contains("frame-ancestors 'none'"), what + ": " + csp);
        assertTrue(r.body().contains("<link rel=\"stylesheet\" href=\"/static/host/ionmark.css\">"), what);
        Matcher m = INLINE.matcher(r.body());
        assertFalse(m.find(), () -> what + ": inline code at " + r.body().substring(Math.max(0, m.start() - 80),
                Math.min(r.body().length(), m.end() + 80)));
    }

    /** No payload came back as markup. */
    static void escaped(String what, HttpResponse<String> r) {
        for (Pattern live : LIVE) {
            Matcher m = live.matcher(r.body());
            assertFalse(m.find(), () -> what + " shows markup: " + r.body().substring(Math.max(0, m.start() - 80),
                    Math.min(r.body().length(), m.end() + 80)));
        }
    }

    @Test
    void everyPageTypeIsServedUnderTheStrictPolicy() throws Exception {
        String id = "05-assay-ph74";
        String signedIn = cookie;
        // one save through the notebook, so the entry has a history page and a saved text
        assertEquals(302, post("/entry/" + id, Map.of("token", token(get("/entry/" + id + "/edit").body()),
                "text", demoText(id))).statusCode());
        Map<String, HttpResponse<String>> pages = new LinkedHashMap<>();
        pages.put("entry list", get("/"));
        pages.put("search", get("/?q=acid"));
        pages.put("entry view", get("/entry/" + id));
        pages.put("editor", get("/entry/" + id + "/edit"));
        pages.put("history", get("/entry/" + id + "/history"));
        pages.put("saved text", get("/entry/" + id + "/history/1"));
        pages.put("new entry", get("/new"));
        pages.put("quick check", get("/panel/quick-check"));
        pages.put("quick check answer", post("/panel/quick-check", Map.of("structure", "NCC(=O)O", "ph", "7.4")));
        pages.put("table admin", get("/admin/table"));
        pages.put("table audit", get("/admin/table?action=audit"));
        pages.put("measured import", get("/admin/measured"));
        pages.put("not found", get("/entry/no-such-entry"));
        cookie = null;
        pages.put("sign-in", get("/signin"));
        pages.put("refused", get("/admin/table"));
        cookie = signedIn;
        pages.forEach((what, r) -> {
            assertTrue(r.statusCode() == 200 || what.equals("not found") || what.equals("refused"),
                    what + ": " + r.statusCode());
            strict(what, r);
        });
        assertTrue(pages.get("entry view").body().contains("class=\"im-card\""), "the entry view shows its cards");
        assertTrue(pages.get("quick check answer").body().contains("<script src=\"/static/notebook/quick-check.js\""));
        assertTrue(pages.get("table admin").body().contains("<script src=\"/static/notebook/table-admin.js\""));
    }

    static String demoText(String id) throws Exception {
        Matcher m = Pattern.compile("<textarea id=\"text\"[^>]*>(.*?)</textarea>", Pattern.DOTALL)
                .matcher(get("/entry/" + id + "/edit").body());
        assertTrue(m.find());
        return m.group(1).replace("&quot;", "\"").replace("&lt;", "<").replace("&gt;", ">").replace("&#39;", "'")
                .replace("&#x27;", "'").replace("&#34;", "\"").replace("&amp;", "&");
    }

    @Test
    void scriptsAndStylesComeFromTheSameOriginWithTheirTypes() throws Exception {
        for (String js : List.of("/static/host/ionmark.js", "/static/notebook/quick-check.js",
                "/static/notebook/table-admin.js", "/static/notebook/measured-import.js")) {
            HttpResponse<String> r = get(js);
            assertEquals(200, r.statusCode(), js);
            assertTrue(r.headers().firstValue("Content-Type").orElse("").matches("(text|application)/javascript.*"),
                    js + ": " + r.headers().firstValue("Content-Type"));
        }
        for (String css : List.of("/static/host/ionmark.css", "/static/notebook/table-admin.css")) {
            HttpResponse<String> r = get(css);
            assertEquals(200, r.statusCode(), css);
            assertTrue(r.headers().firstValue("Content-Type").orElse("").startsWith("text/css"), css);
        }
        assertEquals(404, get("/static/host/no-such.js").statusCode());
    }

    @Test
    void storedAndTypedPayloadsComeBackEscapedOnEveryPage() throws Exception {
        String signedIn = cookie;
        HttpResponse<String> created = post("/new", Map.of("token", token(get("/new").body()), "title", TITLE));
        assertEquals(302, created.statusCode(), created.body());
        String location = created.headers().firstValue("Location").orElseThrow();
        String id = location.replaceAll(".*/entry/([^/]+)/edit$", "$1");
        String text = "# " + TITLE + "\n\n" + String.join("\n\n", PAYLOADS) + "\n\n## " + PAYLOADS.get(3) + "\n\n| "
                + PAYLOADS.get(1) + " |\n\n```smiles\nCC(=O)O " + PAYLOADS.get(0) + "\n```\n\nAt pH 7 "
                + PAYLOADS.get(1) + " in water.\n";
        assertEquals(302, post("/entry/" + id, Map.of("token", token(get("/entry/" + id + "/edit").body()), "text", text))
                .statusCode());
        Map<String, HttpResponse<String>> pages = new LinkedHashMap<>();
        pages.put("entry list", get("/"));
        pages.put("search", get("/?q=" + q(PAYLOADS.get(0))));
        pages.put("search for a handler", get("/?q=" + q(PAYLOADS.get(1))));
        pages.put("entry view", get("/entry/" + id));
        pages.put("editor", get("/entry/" + id + "/edit"));
        pages.put("history", get("/entry/" + id + "/history"));
        pages.put("saved text", get("/entry/" + id + "/history/1"));
        pages.put("preview", HTTP.send(HttpRequest.newBuilder(URI.create(base + "/preview")).header("Cookie", cookie)
                .header("X-Ionmark-Token", token(get("/new").body())).POST(HttpRequest.BodyPublishers.ofString(text))
                .build(), HttpResponse.BodyHandlers.ofString()));
        pages.put("quick check", post("/panel/quick-check", Map.of("structure", PAYLOADS.get(3), "ph", PAYLOADS.get(1),
                "temp", PAYLOADS.get(0))));
        pages.put("quick check by name", get("/panel/quick-check?structure=" + q(PAYLOADS.get(1)) + "&ph=7"));
        pages.put("admin search", post("/admin/table", Map.of("token", token(get("/admin/table").body()), "action",
                "search", "q", PAYLOADS.get(1), "structure", PAYLOADS.get(0))));
        pages.put("measured import preview", post("/admin/measured", Map.of("token", token(get("/admin/measured").body()),
                "action", "preview", "format", "tsv", "data", "id\tsmiles\tpka_values\ttemperature\tionic_strength\tmethod"
                        + "\tsource\tname\nx1\tCC(=O)O\t4.76\t25\t0\t" + PAYLOADS.get(0) + "\t" + PAYLOADS.get(1) + "\t"
                        + PAYLOADS.get(3) + "\nx2\t" + PAYLOADS.get(0) + "\t4.0\t25\t0\tx\tx\tx\n")));
        pages.put("path", get("/" + q("<svg onload=alert(4)>").replace("+", "%20")));
        cookie = null;
        String signInToken = token(get("/signin").body());
        pages.put("sign-in", post("/signin", Map.of("token", signInToken, "user", PAYLOADS.get(1), "password", "x")));
        cookie = signedIn;
        pages.forEach((what, r) -> {
            assertTrue(r.statusCode() < 500, what + ": " + r.statusCode() + " " + r.body());
            escaped(what, r);
        });
        for (String what : List.of("entry list", "entry view", "editor", "saved text", "preview", "search")) {
            assertTrue(pages.get(what).body().contains("&lt;script&gt;alert(1)&lt;/script&gt;"), what
                    + " shows the stored text, escaped");
        }
        assertTrue(pages.get("entry view").body().contains("&lt;svg onload=alert(4)&gt;"), "SVG payload escaped");
        assertTrue(pages.get("measured import preview").body().contains("id=\"import-rows\""), "the rows were read");
        assertTrue(pages.get("search for a handler").body().contains("value=\"&#34;>&lt;img src=x"),
                "the search box keeps the query, escaped inside its attribute");
    }
}
