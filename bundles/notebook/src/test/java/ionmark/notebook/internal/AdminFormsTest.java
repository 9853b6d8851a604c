package ionmark.notebook.internal;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

/** The table admin's task forms and messages are templates: searches and messages come back escaped. */
class AdminFormsTest {
    static final String EVIL = "\"><script>alert(1)</script><img src=x onerror=alert(2)>";

    @Test
    void theSearchBoxKeepsTheQueryEscaped() {
        String html = AdminForms.search("c0ffee", 31, EVIL);
        assertTrue(html.contains("<input type=\"hidden\" name=\"token\" value=\"c0ffee\"><input type=\"hidden\" "
                + "name=\"base\" value=\"31\">"), html);
        assertTrue(html.contains("name=\"q\" id=\"q\" size=\"40\" value=\"&#34;>&lt;script>"), html);
        assertFalse(html.contains("<script>alert") || html.contains("<img src=x"), html);
    }

    @Test
    void messagesAreEscapedAndEmptyListsLeaveNothing() {
        String html = AdminForms.messages(List.of(EVIL), List.of("saved"));
        assertTrue(html.startsWith("<ul class=\"im-error\" role=\"alert\" id=\"task-errors\"><li>&#34;&gt;&lt;script&gt;")
                || html.startsWith("<ul class=\"im-error\" role=\"alert\" id=\"task-errors\"><li>\"&gt;&lt;script&gt;"),
                html);
        assertTrue(html.contains("<ul class=\"im-ok\" role=\"status\" id=\"task-notes\"><li>saved</li></ul>"), html);
        assertTrue(AdminForms.messages(List.of(), List.of()).isBlank());
    }
}
