package ionmark.acidity.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.util.stream.Collectors;

import org.junit.jupiter.api.Test;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.GroupClass;
import ionmark.acidity.api.ValidationReport;

/** The table shipped in the bundle: complete, sourced, and its own examples agree with its patterns. */
class ShippedTableTest {

    static String shippedText() throws IOException {
        return TableWriter.write(TableSnapshotService.shipped());
    }

    @Test
    void validatesWithoutErrors() throws IOException {
        ValidationReport r = TableValidator.validate(shippedText());
        assertTrue(r.ok(), () -> r.errors().stream().map(Object::toString).collect(Collectors.joining("\n")));
    }

    @Test
    void coversTheContentTheDepartmentNeeds() {
        AcidityTable t = TableSnapshotService.shipped();
        assertTrue(t.groups().size() >= 60, "group classes: " + t.groups().size());
        assertTrue(t.substituents().size() >= 50, "substituents: " + t.substituents().size());
        assertTrue(t.measured().size() >= 40, "measured compounds: " + t.measured().size());
    }

    @Test
    void everyGroupClassHasPositiveExamples() {
        for (GroupClass g : TableSnapshotService.shipped().groups()) {
            assertTrue(!g.matches().isEmpty(), g.id() + " has no example it must match");
        }
    }

    @Test
    void everyGroupClassHasNegativeExamples() {
        // the validator checks that no class matches its own negative examples; every class must have some
        for (GroupClass g : TableSnapshotService.shipped().groups()) {
            assertTrue(!g.misses().isEmpty(), g.id() + " has no example it must not match");
        }
    }

    @Test
    void shippedTableHasNoOverlappingClasses() throws IOException {
        ValidationReport r = TableValidator.validate(shippedText());
        assertTrue(r.warnings().stream().noneMatch(w -> w.message().contains("overlaps")), r.warnings().toString());
    }

    @Test
    void everyNumberHasASource() {
        AcidityTable t = TableSnapshotService.shipped();
        for (GroupClass g : t.groups()) {
            if (!g.permanent()) {
                assertTrue(!g.source("pka").isEmpty(), g.id() + " pka");
            }
            assertTrue(!g.source("sd").isEmpty(), g.id() + " sd");
        }
        t.measured().forEach(m -> assertTrue(!t.citation(m.source()).equals(m.source()), m.id() + " source"));
    }

    @Test
    void writingAndReadingAgainLosesNothing() throws IOException {
        AcidityTable t = TableSnapshotService.shipped();
        String once = TableWriter.write(t);
        AcidityTable again = TableValidator.validate(once).table().orElseThrow();
        assertEquals(once, TableWriter.write(again));
        assertEquals(TableWriter.hash(t), TableWriter.hash(again));
        assertEquals(t.groups(), again.groups());
        assertEquals(t.measured(), again.measured());
        assertEquals(t.substituents().size(), again.substituents().size());
    }

    /**
     * The two files are written as the splitter writes them (pretty, stable order, fragments used
     * wherever their text occurs): splitting the built table again gives the same two texts.
     */
    @Test
    void curatedAndFittedFilesAreCanonical() {
        String curated = TableSnapshotService.resource(TableSnapshotService.CURATED);
        String fitted = TableSnapshotService.resource(TableSnapshotService.FITTED);
        AcidityTable base = TableSplitter.build(curated, null, new java.util.ArrayList<>());
        var fragments = SplitFormat.fragments(json(curated).path("fragments"), new java.util.ArrayList<>());
        TableSplitter.Split again = TableSplitter.split(base, TableSnapshotService.shipped(), fragments);
        assertEquals(curated, again.curated(), "re-write curated.json with the split command (docs/table-curation.md)");
        assertEquals(fitted, again.fitted(), "re-write fitted.json with the split command (docs/table-curation.md)");
    }

    /**
     * The built table is, number for number and pattern for pattern, the calibrated table the files
     * were split from: its fingerprint (everything but notes and fit provenance, see
     * {@link TableSplitter#fingerprint}) is the one the split recorded from that table (table v29
     * when the one-file table was retired). A change to either file that moves a number, a pattern or
     * a version field fails here until it is recorded by re-running the split on purpose.
     */
    @Test
    void builtTableIsTheTableTheFilesWereSplitFrom() {
        String recorded = json(TableSnapshotService.resource(TableSnapshotService.FITTED)).path("fingerprint").asText();
        assertEquals(recorded, TableSplitter.fingerprint(TableSnapshotService.shipped()));
    }

    @Test
    void curatedBaseAloneIsTheCalibrationBase() {
        var problems = new java.util.ArrayList<ionmark.acidity.api.Problem>();
        AcidityTable base = TableSplitter.build(TableSnapshotService.resource(TableSnapshotService.CURATED), null, problems);
        assertTrue(base != null, problems.toString());
        assertEquals(1, base.version().number());
        AcidityTable shipped = TableSnapshotService.shipped();
        assertTrue(shipped.version().parent() >= base.version().number(), "shipped parent " + shipped.version().parent());
        assertEquals(base.groups().stream().map(g -> g.id() + " " + g.smarts()).toList(),
                shipped.groups().stream().map(g -> g.id() + " " + g.smarts()).toList());
        assertEquals(base.substituents(), shipped.substituents());
        assertEquals(base.measured(), shipped.measured());
        assertTrue(base.fits().isEmpty(), "the curated base carries no fit provenance");
    }

    /** IONMARK_TABLE may name curated.json itself: calibration and cross-validation start from it. */
    @Test
    void theCuratedFileReadsAsATableByItself() {
        ValidationReport r = TableValidator.validate(TableSnapshotService.resource(TableSnapshotService.CURATED));
        assertTrue(r.ok(), r.errors().toString());
        AcidityTable base = TableSplitter.build(TableSnapshotService.resource(TableSnapshotService.CURATED), null,
                new java.util.ArrayList<>());
        assertEquals(TableSplitter.fingerprint(base), TableSplitter.fingerprint(r.table().orElseThrow()));
    }

    @Test
    void calibrationLogsStayOutOfTheCuratedNotes() {
        for (GroupClass g : TableSnapshotService.shipped().groups()) {
            assertTrue(!g.note().contains("whole-model refinement") && !g.note().matches(".*fit \\(\\d{4}.*"),
                    g.id() + ": " + g.note());
        }
        assertTrue(TableSnapshotService.shipped().fit("carboxylic-aliphatic").orElseThrow().n() > 0);
    }

    @Test
    void theNOxideExclusionIsWrittenOnce() {
        String curated = TableSnapshotService.resource(TableSnapshotService.CURATED);
        assertEquals(1, curated.split(java.util.regex.Pattern.quote("!$(n1:a:[n+]([O-]):a:a:a1)"), -1).length - 1);
        assertTrue(curated.split("\\{not-beside-n-oxide}", -1).length - 1 >= 8);
    }

    private static com.fasterxml.jackson.databind.JsonNode json(String text) {
        try {
            return new com.fasterxml.jackson.databind.ObjectMapper().readTree(text);
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }
}
