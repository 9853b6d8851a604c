package ionmark.notebook.internal;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import java.util.Arrays;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;

import ionmark.acidity.api.SiteType;
import ionmark.notebook.api.Separation;
import ionmark.speciation.api.Basis;
import ionmark.speciation.api.Curve;
import ionmark.speciation.api.Site;
import ionmark.store.api.AuditEvent;

/**
 * The cards, the plot and the table admin's pages come from templates: text from an entry, a table record, a store
 * or a request is escaped wherever it lands, and the notebook keeps no escape function of its own.
 */
class TemplatedPagesTest {
    static final String EVIL = AdminFormsTest.EVIL;

    private static void escaped(String html) {
        assertFalse(html.contains("<script>alert") || html.contains("<img src=x"), html);
        assertTrue(html.contains("&lt;script&gt;alert(1)&lt;/script&gt;"), "shown, not dropped: " + html);
    }

    @Test
    void thePlotsLegendAndItsTooltipAreEscaped() {
        // the curve's tooltip (<title>) was written without escaping
        Site s = new Site(0, EVIL, "g", "group", SiteType.ACID, 4.2, 0.3, 0.5, List.of(), Basis.ESTIMATED, false);
        double[] ph = {0, 7, 14};
        double[] f = {1, 0.5, 0};
        Curve c = new Curve(ph, f, Map.of(0, f), Map.of(0, f));
        String svg = Plot.svg(c, List.of(s), 7.0, null);
        escaped(svg);
        int title = svg.indexOf("<title>");
        assertTrue(svg.substring(title, svg.indexOf("</title>")).contains("&lt;script&gt;"), svg);
    }

    @Test
    void theAuditTrailAndMessagesEscapeWhatUsersTyped() {
        escaped(AdminReports.audit(List.of(new AuditEvent(1, Instant.EPOCH, EVIL, "publish", 3, "ok", EVIL))));
        escaped(TableAdminPage.notice("error", true, "conflict", "Not published: " + EVIL, List.of(EVIL)));
        escaped(TableAdminPage.render("adminDiff", "from", 1, "to", 2, "lines", List.of(EVIL)));
        escaped(TableAdminPage.render("adminExport", "version", 2, "json", EVIL));
        escaped(TableAdminPage.render("adminEditor", "head", 2, "base", 2, "draft", "</textarea>" + EVIL, "csrf", "t",
                "threshold", 0.1));
    }

    @Test
    void separationsAndEntryWarningsEscapeTheEntrysWords() {
        escaped(Annotator.separations(List.of(new Separation(EVIL, "water", 2.0, 4.0))));
        escaped(Html.TEMPLATES.render("entryWarnings", "warnings", List.of(EVIL)));
    }

    @Test
    void theNotebookHasNoHandWrittenEscapeFunction() {
        assertTrue(Arrays.stream(Html.class.getDeclaredMethods()).noneMatch(m -> m.getName().equals("esc")),
                "HTML is escaped by the templates only");
    }
}
