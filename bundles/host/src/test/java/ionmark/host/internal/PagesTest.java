package ionmark.host.internal;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;

import ionmark.host.api.Entry;

/** Entry text reaches the page escaped, whatever a user typed into it. */
class PagesTest {
    static final String EVIL = "<script>alert(1)</script><img src=x onerror=alert(2)>\"'";

    @Test
    void everyEntryFieldIsEscaped() {
        Entry e = Workspace.parse("evil", "# " + EVIL + "\n\n" + EVIL + "\n\n## " + EVIL + "\n\n| " + EVIL + " |\n\n"
                + "```smiles\n" + EVIL + "\n```\n");
        String html = Pages.page(e.title(), Pages.entry(e, Map.of(), List.of()));
        assertFalse(html.contains("<script>alert"), html);
        assertFalse(html.contains("<img src=x"), html);
        assertTrue(html.contains("&lt;script&gt;"));
    }

    @Test
    void editorEscapesTheTextAndTheToken() {
        String html = Pages.editor("e1", "</textarea>" + EVIL, "tok\"en");
        assertFalse(html.contains("</textarea><script>"), html);
        assertFalse(html.contains("tok\"en"), html);
    }

    @Test
    void entryListEscapesIds() {
        String html = EntryPages.list(List.of(new EntryPages.Row("ok-id", "Ok", "", "")), "", false);
        assertTrue(html.contains("/entry/ok-id"));
    }
}
