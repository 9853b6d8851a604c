package ionmark.browsertests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.net.URI;
import java.net.URLEncoder;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Collectors;

import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The admin workflow over HTTP against the running application: a viewer is refused (403), failed
 * sign-ins lock a name, an admin signs in, checks a draft (validation and regression report) and
 * publishes it with a comment; a request without the session's CSRF token is refused.
 */
class AdminWorkflowHttpTest {
    static RunningApp app;
    static String base;
    static final HttpClient HTTP = HttpClient.newBuilder().followRedirects(HttpClient.Redirect.NEVER).build();

    @TempDir
    static Path workspace;

    @BeforeAll
    static void start() throws Exception {
        app = RunningApp.start(workspace, "admin-app");
        base = app.base;
        // the admin page registers once the table store has opened (after the annotations)
        long deadline = System.currentTimeMillis() + 60_000;
        while (get("/admin/table", null).statusCode() == 404 && System.currentTimeMillis() < deadline) {
            Thread.sleep(250);
        }
    }

    @AfterAll
    static void stop() {
        if (app != null) {
            app.close();
        }
    }

    static HttpResponse<String> get(String path, String cookie) throws Exception {
        return get(base, path, cookie);
    }

    /** A GET on the notebook at {@code base}, with the session cookie when there is one (other tests use it too). */
    static HttpResponse<String> get(String base, String path, String cookie) throws Exception {
        HttpRequest.Builder b = HttpRequest.newBuilder(URI.create(base + path));
        if (cookie != null) {
            b.header("Cookie", cookie);
        }
        return HTTP.send(b.build(), HttpResponse.BodyHandlers.ofString());
    }

    static HttpResponse<String> post(String path, String cookie, Map<String, String> form) throws Exception {
        return post(base, path, cookie, form);
    }

    /** A form POST to the notebook at {@code base}, with the session cookie when there is one. */
    static HttpResponse<String> post(String base, String path, String cookie, Map<String, String> form)
            throws Exception {
        String body = form.entrySet().stream().map(e -> e.getKey() + "=" + URLEncoder.encode(e.getValue(),
                StandardCharsets.UTF_8)).collect(Collectors.joining("&"));
        HttpRequest.Builder b = HttpRequest.newBuilder(URI.create(base + path))
                .header("Content-Type", "application/x-www-form-urlencoded").POST(HttpRequest.BodyPublishers.ofString(body));
        if (cookie != null) {
            b.header("Cookie", cookie);
        }
        return HTTP.send(b.build(), HttpResponse.BodyHandlers.ofString());
    }

    static String token(String html) {
        Matcher m = Pattern.compile("name=\"token\" value=\"([0-9a-f]+)\"").matcher(html);
        assertTrue(m.find(), "no CSRF token in the page");
        return m.group(1);
    }

    @Test
    void viewerIsRefusedAndAdminPublishesThroughTheBrowserWorkflow() throws Exception {
        assertEquals(403, get("/admin/table", null).statusCode(), "a viewer may not open the admin page");

        String signInToken = token(get("/signin", null).body());
        for (int i = 0; i < 4; i++) {
            post("/signin", null, Map.of("token", signInToken, "user", "mallory", "password", "guess" + i));
        }
        HttpResponse<String> locked = post("/signin", null, Map.of("token", signInToken, "user", "mallory",
                "password", "guess"));
        assertTrue(locked.body().contains("Too many failed attempts"), locked.body());

        String password = Files.readString(workspace.resolve(".ionmark/admin-password.txt")).strip();
        HttpResponse<String> ok = post("/signin", null, Map.of("token", signInToken, "user", "admin", "password",
                password));
        assertEquals(302, ok.statusCode());
        String setCookie = ok.headers().firstValue("Set-Cookie").orElseThrow();
        assertTrue(setCookie.contains("HttpOnly") && setCookie.contains("SameSite=Strict"), setCookie);
        String cookie = setCookie.substring(0, setCookie.indexOf(';'));

        HttpResponse<String> admin = get("/admin/table", cookie);
        assertEquals(200, admin.statusCode());
        String csrf = token(admin.body());
        Matcher draft = Pattern.compile("<textarea id=\"draft\"[^>]*>(.*?)</textarea>", Pattern.DOTALL)
                .matcher(admin.body());
        assertTrue(draft.find());
        String head = draft.group(1).replace("&quot;", "\"").replace("&lt;", "<").replace("&gt;", ">")
                .replace("&#39;", "'").replace("&amp;", "&");
        // a new store starts at the shipped table's own version number
        Matcher number = Pattern.compile("\"number\": ([0-9]+)").matcher(head);
        assertTrue(number.find(), "the head names its version");
        String v1 = number.group(1);
        String v2 = String.valueOf(Integer.parseInt(v1) + 1);
        assertTrue(admin.body().contains("History") && admin.body().contains("v" + v1), admin.body());
        String edited = head.replaceFirst("(\"id\": \"amine-primary\", [^\\n]*?\"pka\": )[0-9.]+", "$110.95");

        assertEquals(403, post("/admin/table", cookie, Map.of("action", "publish", "draft", edited, "base", v1,
                "comment", "no token")).statusCode(), "a publish without the session's CSRF token is refused");

        HttpResponse<String> check = post("/admin/table", cookie, Map.of("token", csrf, "action", "check", "draft",
                edited, "base", v1));
        assertTrue(check.body().contains("Reference set") && check.body().contains("group amine-primary"), check.body());

        HttpResponse<String> bad = post("/admin/table", cookie, Map.of("token", csrf, "action", "validate", "draft",
                edited.replace("[CX4:2][NX3;H2", "[CX4:2][NX3;H2[")));
        assertTrue(bad.body().contains("$.groups["), "validation points at the error by path");

        HttpResponse<String> published = post("/admin/table", cookie, Map.of("token", csrf, "action", "publish", "draft",
                edited, "base", v1, "comment", "primary amines raised for the test"));
        assertTrue(published.body().contains("Published v" + v2), published.body());

        // the notebook shows the new version within the poll interval
        long deadline = System.currentTimeMillis() + 10_000;
        String entry = "";
        while (System.currentTimeMillis() < deadline) {
            entry = get("/entry/04-buffer-preparation", null).body();
            if (entry.contains("Table v" + v2)) {
                break;
            }
            Thread.sleep(250);
        }
        assertTrue(entry.contains("Table v" + v2), "annotations did not move to v" + v2);
    }
}
