package ionmark.acidity.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.GroupClass;
import ionmark.acidity.api.Problem;

/** The split into curated base and fitted overlay, and the build that joins them. */
class TableSplitterTest {
    static final AcidityTable SHIPPED = TableSnapshotService.shipped();
    static final AcidityTable BASE = TableSplitter.build(TableSnapshotService.resource(TableSnapshotService.CURATED), null,
            new ArrayList<>());

    @Test
    void aCalibrationLogAfterTheCuratorsNoteIsTakenApart() {
        assertEquals("calib fit (2026-12-03): n=3", TableSplitter.log("Working value.", "Working value.; calib fit (2026-12-03): n=3"));
        assertEquals("calib fit: n=3", TableSplitter.log("Working value.", "calib fit: n=3"));
        assertEquals("", TableSplitter.log("Working value.", "Working value."));
    }

    @Test
    void aFreshCalibrationNoteBecomesProvenance() {
        GroupClass phenol = BASE.group("phenol").orElseThrow();
        GroupClass fitted = new GroupClass(phenol.id(), phenol.name(), phenol.smarts(), phenol.type(), 9.5,
                phenol.relation(), phenol.rho(), phenol.attenuation(), phenol.resonance(), phenol.enthalpy(), phenol.sd(),
                phenol.permanent(), Map.of("pka", "ionmark-rule", "sd", phenol.source("sd"), "enthalpy",
                        phenol.source("enthalpy"), "rho", phenol.source("rho"), "attenuation", phenol.source("attenuation")),
                phenol.note() + "; ionmark-rule fit (2026-12-04): n=12, trimmed 0, RMSE 0.42; before pKa 9.99",
                phenol.matches(), phenol.misses());
        AcidityTable cal = BASE.withGroups(BASE.groups().stream().map(g -> g.id().equals("phenol") ? fitted : g).toList());
        TableSplitter.Split s = TableSplitter.split(BASE, cal, TableSplitter.DEFAULT_FRAGMENTS);
        AcidityTable built = TableSplitter.build(s.curated(), s.fitted(), new ArrayList<>());
        var fit = built.fit("phenol").orElseThrow();
        assertEquals(12, fit.n());
        assertEquals(0.42, fit.rmse());
        assertEquals("2026-12-04", fit.date());
        assertEquals(9.5, fit.after().get("pka"));
        assertEquals(phenol.pka(), fit.before().get("pka"));
        assertEquals(phenol.note(), built.group("phenol").orElseThrow().note());
        assertEquals(9.5, built.group("phenol").orElseThrow().pka());
    }

    @Test
    void anUnknownFragmentIsAnErrorNamingIt() {
        String curated = TableSnapshotService.resource(TableSnapshotService.CURATED)
                .replaceFirst("\\{not-beside-n-oxide}", "{not-beside-n-oxyde}");
        List<Problem> problems = new ArrayList<>();
        assertNull(TableSplitter.build(curated, null, problems));
        assertTrue(problems.stream().anyMatch(p -> p.message().contains("unknown fragment {not-beside-n-oxyde}")),
                problems.toString());
    }

    @Test
    void numbersForAClassTheBaseDoesNotHaveAreAnError() {
        // rename the first class the shipped overlay fits, whichever it is after a recalibration
        String shipped = TableSnapshotService.resource(TableSnapshotService.FITTED);
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("\"classes\"\\s*:\\s*\\{\\s*\"([^\"]+)\"")
                .matcher(shipped);
        assertTrue(m.find(), "the shipped overlay fits no class");
        String id = m.group(1);
        String fitted = shipped.replaceFirst("\"" + java.util.regex.Pattern.quote(id) + "\"", "\"" + id + "-renamed\"");
        List<Problem> problems = new ArrayList<>();
        assertNull(TableSplitter.build(TableSnapshotService.resource(TableSnapshotService.CURATED), fitted, problems));
        assertTrue(problems.stream().anyMatch(p -> p.path().contains(id + "-renamed")), problems.toString());
    }

    @Test
    void aSplitThatWouldNotGiveTheTableBackIsRefused() {
        // a measured compound only in the calibrated table: not a fitted number, so the split cannot carry it
        var extra = new ArrayList<>(SHIPPED.measured());
        extra.remove(0);
        AcidityTable cal = SHIPPED.withMeasured(extra);
        try {
            TableSplitter.split(BASE, cal, TableSplitter.DEFAULT_FRAGMENTS);
            throw new AssertionError("split accepted a table it cannot reproduce");
        } catch (IllegalStateException e) {
            assertTrue(e.getMessage().contains("does not give the calibrated table back"), e.getMessage());
        }
    }

    @Test
    void fragmentsAreExpandedToTheExactPatternText() {
        String smarts = "[nX2;!$(n1:a:[n+]([O-]):a:a:a1);!$(n1:a:a:[n+]([O-]):a:a1);!$(n1:[n+]([O-]):a:a:a:a1);$(n1ccncc1):1]";
        String short_ = SplitFormat.abbreviate(smarts, TableSplitter.DEFAULT_FRAGMENTS);
        assertEquals("[nX2;{not-beside-n-oxide};$(n1ccncc1):1]", short_);
    }
}
