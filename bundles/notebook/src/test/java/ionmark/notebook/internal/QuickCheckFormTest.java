package ionmark.notebook.internal;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;

import org.junit.jupiter.api.Test;

/** The quick check's form template: what was typed comes back escaped; a bad field is marked, a good one is not. */
class QuickCheckFormTest {
    static final String EVIL = "</textarea><script>alert(1)</script>\"><img src=x onerror=alert(2)>";

    @Test
    void aBadFieldIsMarkedAndNamedAndTheGoodOnesAreNot() {
        String html = QuickCheckForm.html(null, Map.of("ph", "hot"));
        assertTrue(html.contains("name=\"ph\" size=\"6\" value=\"hot\" aria-invalid=\"true\" aria-describedby=\"ph-error\""),
                html);
        assertTrue(html.contains("<span class=\"im-error\" id=\"ph-error\" role=\"alert\">pH must be a number from -2 to 16, "
                + "not &#39;hot&#39;</span>") || html.contains("not 'hot'</span>"), html);
        assertTrue(html.contains("name=\"temp\" size=\"6\" value=\"\">"), html);
    }

    @Test
    void typedTextComesBackEscapedInTheBoxAndInTheFields() {
        String html = QuickCheckForm.html(null, Map.of("structure", "", "ph", EVIL, "temp", EVIL));
        assertFalse(html.contains("<script>alert"), html);
        assertFalse(html.contains("<img src=x"), html);
        assertFalse(html.contains("</textarea><script>"), html);
        assertTrue(html.contains("Structure: give a SMILES, a chemical name or a molfile."), html);
        assertTrue(html.contains("<script src=\"/static/notebook/quick-check.js\" defer></script>"), html);
    }
}
