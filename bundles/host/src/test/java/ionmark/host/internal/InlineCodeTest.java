package ionmark.host.internal;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;

import ionmark.host.api.Entry;

/**
 * The page policy has no 'unsafe-inline': every page the shell builds links its style and script files and carries
 * no inline script, event handler or style. (The HTTP test in features/browser-tests checks the served pages.)
 */
class InlineCodeTest {
    static final Pattern INLINE = Pattern.compile("<script(?![^>]*\\bsrc=)[^>]*>|<style\\b|<[a-zA-Z][^>]*\\s(?:style|on[a-z]+)\\s*=",
            Pattern.CASE_INSENSITIVE);

    static void noInlineCode(String html) {
        assertFalse(INLINE.matcher(html).find(), () -> "inline code at: " + around(html));
    }

    static String around(String html) {
        var m = INLINE.matcher(html);
        return m.find() ? html.substring(Math.max(0, m.start() - 60), Math.min(html.length(), m.end() + 60)) : "";
    }

    @Test
    void everyShellPageLinksItsFilesAndHasNoInlineCode() {
        Entry e = Workspace.parse("e1", "# Title\n\nText\n\n```smiles\nCCO\n```\n");
        List<String> bodies = List.of(Pages.signIn("t", "Wrong user name or password."),
                EntryPages.list(List.of(new EntryPages.Row("e1", "Title", "2026-01-01 10:00 UTC", "admin")), "", true),
                EntryPages.list(List.of(), "nothing", false), EntryPages.newEntry("t", "Give the entry a title."),
                EntryPages.history("e1", List.of()), EntryPages.editor("e1", "# Title", "t"),
                EntryPages.error(404, "There is no such entry.", false),
                EntryPages.notices(e, false) + Pages.entry(e, Map.of(), List.of()));
        for (String body : bodies) {
            String html = Pages.page("Page", body, "admin");
            noInlineCode(html);
            assertTrue(html.contains("<link rel=\"stylesheet\" href=\"/static/host/ionmark.css\">"), html);
            assertTrue(html.contains("<script src=\"/static/host/ionmark.js\" defer></script>"), html);
        }
    }

    @Test
    void thePatternFindsEachKindOfInlineCode() {
        for (String bad : List.of("<script>x()</script>", "<SCRIPT type=\"module\">", "<b onclick=\"x()\">",
                "<svg onload='x()'>", "<style>b{}</style>", "<p style=\"color:red\">", "<rect style='fill:red'/>")) {
            assertTrue(INLINE.matcher(bad).find(), bad);
        }
        assertFalse(INLINE.matcher("<script src=\"/static/host/ionmark.js\" defer></script><p data-onload=\"x\">")
                .find());
    }

    @Test
    void thePolicyHasNoUnsafeInlineAndForbidsFraming() {
        assertFalse(WebShell.PAGE_POLICY.contains("unsafe-inline"), WebShell.PAGE_POLICY);
        assertTrue(WebShell.PAGE_POLICY.contains("script-src 'self'"), WebShell.PAGE_POLICY);
        assertTrue(WebShell.PAGE_POLICY.contains("style-src 'self'"), WebShell.PAGE_POLICY);
        assertTrue(WebShell.PAGE_POLICY.contains("frame-ancestors 'none'"), WebShell.PAGE_POLICY);
    }
}
