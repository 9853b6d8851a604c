package ionmark.host.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;

import ionmark.host.templates.PageTemplates;

/** The precompiled templates load whatever the caller's context class loader is (as in OSGi) and escape by context. */
class TemplatesTest {
    @Test
    void templatesLoadWhenTheContextClassLoaderCannotSeeThem() {
        Thread t = Thread.currentThread();
        ClassLoader before = t.getContextClassLoader();
        t.setContextClassLoader(ClassLoader.getPlatformClassLoader());
        try {
            String html = PageTemplates.beside(Pages.class).render("signIn", Map.of("token", "t1", "message", ""));
            assertTrue(html.contains("name=\"token\" value=\"t1\""), html);
        } finally {
            t.setContextClassLoader(before);
        }
    }

    @Test
    void aValueInAnAttributeCannotCloseIt() {
        String html = EntryPages.list(List.of(), "\"><img src=x onerror=alert(1)>", false);
        // inside a quoted attribute the quote and '<' are escaped; '>' cannot end the attribute there
        assertTrue(html.contains("value=\"&#34;>&lt;img src=x onerror=alert(1)>\""), html);
    }

    @Test
    void aValueInTextCannotOpenATag() {
        assertEquals("<h1>a &lt;b&gt; &amp; c, save 2</h1><pre class=\"im-source\">&lt;/pre&gt;&lt;script&gt;</pre>",
                EntryPages.savedText("a <b> & c", 2, "</pre><script>").strip());
    }
}
