package ionmark.acidity.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.stream.Collectors;

import org.junit.jupiter.api.Test;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.GroupClass;
import ionmark.acidity.api.ValidationReport;

/** The table shipped in the bundle: complete, sourced, and its own examples agree with its patterns. */
class ShippedTableTest {

    static String shippedText() throws IOException {
        try (InputStream in = TableSnapshotService.class.getResourceAsStream(TableSnapshotService.SHIPPED)) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
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
        String once = TableCodec.write(t);
        AcidityTable again = TableValidator.validate(once).table().orElseThrow();
        assertEquals(once, TableCodec.write(again));
        assertEquals(TableCodec.hash(t), TableCodec.hash(again));
        assertEquals(t.groups(), again.groups());
        assertEquals(t.measured(), again.measured());
        assertEquals(t.substituents().size(), again.substituents().size());
    }

    @Test
    void shippedTextIsAlreadyCanonical() throws IOException {
        String text = shippedText();
        AcidityTable t = TableValidator.validate(text).table().orElseThrow();
        assertEquals(TableCodec.write(t), text, "re-write the shipped table with the codec (see DEVELOPERS.md)");
    }

    /**
     * The shipped table is the calibration base with fitted numbers: same classes in the same order
     * with the same patterns, types and relations; same substituents, measured compounds,
     * interaction parameters and pair-rule patterns. A class or pair rule changed in one file and not
     * the other fails here.
     */
    @Test
    void shippedTableIsTheCalibrationBaseWithFittedNumbers() throws IOException {
        String json = java.nio.file.Files.readString(java.nio.file.Path.of("calibration/base-table.json"));
        ValidationReport r = TableValidator.validate(json);
        assertTrue(r.ok(), r.errors().toString());
        AcidityTable base = r.table().orElseThrow();
        AcidityTable shipped = TableSnapshotService.shipped();
        assertEquals(1, base.version().number());
        // the shipped table descends from the base: calibrated from it, possibly revised since
        assertTrue(shipped.version().parent() >= base.version().number(), "shipped parent " + shipped.version().parent());
        assertEquals(base.groups().size(), shipped.groups().size());
        for (int i = 0; i < base.groups().size(); i++) {
            GroupClass b = base.groups().get(i);
            GroupClass s = shipped.groups().get(i);
            assertEquals(b.id() + " " + b.smarts() + " " + b.type() + " " + b.relation() + " " + b.permanent(),
                    s.id() + " " + s.smarts() + " " + s.type() + " " + s.relation() + " " + s.permanent());
        }
        assertEquals(base.substituents(), shipped.substituents());
        assertEquals(base.measured(), shipped.measured());
        assertTrue(java.util.Arrays.deepEquals(base.interaction().shifts().toArray(), shipped.interaction().shifts().toArray()));
        assertEquals(base.interaction().decay(), shipped.interaction().decay());
        assertEquals(base.interaction().cutoff(), shipped.interaction().cutoff());
        assertEquals(base.pairs().stream().map(p -> p.id() + " " + p.smarts()).toList(),
                shipped.pairs().stream().map(p -> p.id() + " " + p.smarts()).toList());
    }
}
