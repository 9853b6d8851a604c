package ionmark.notebook.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Diffs by record and field, and the rebase of a draft onto a newer head. */
class RecordChangesTest {
    static final String BASE = "{\"groups\": [{\"id\": \"a\", \"pka\": 4.0, \"sd\": 0.5}, {\"id\": \"b\", \"pka\": 9.0}],"
            + " \"measured\": [], \"interaction\": {\"decay\": 0.7}}";

    @Test
    void anAddedRecordIsShownWithItsValues() {
        var c = RecordChanges.between(BASE, BASE.replace("\"measured\": []", "\"measured\": [{\"id\": \"m\", \"pka\": [4.2]}]"));
        assertEquals(1, c.size());
        assertEquals("added measured m: {\"id\":\"m\",\"pka\":[4.2]}", c.get(0).text());
    }

    @Test
    void changesToOtherRecordsAreCarriedOntoTheNewHead() {
        String mine = BASE.replace("\"pka\": 4.0", "\"pka\": 4.2");
        String theirs = BASE.replace("\"pka\": 9.0", "\"pka\": 9.3");
        var r = RecordChanges.rebase(BASE, mine, theirs);
        assertTrue(r.conflicts().isEmpty());
        var after = RecordChanges.tree(r.text());
        assertEquals(4.2, after.path("groups").get(0).path("pka").asDouble());
        assertEquals(9.3, after.path("groups").get(1).path("pka").asDouble());
    }

    @Test
    void theSameFieldChangedOnBothSidesCollidesAndKeepsTheHeads() {
        var r = RecordChanges.rebase(BASE, BASE.replace("\"pka\": 4.0", "\"pka\": 4.2"),
                BASE.replace("\"pka\": 4.0", "\"pka\": 3.9"));
        assertEquals(1, r.conflicts().size());
        assertEquals(3.9, RecordChanges.tree(r.text()).path("groups").get(0).path("pka").asDouble());
    }

    @Test
    void aProblemPathPointsAtItsLine() {
        JsonLines l = JsonLines.of("{\n  \"groups\": [\n    {\"id\": \"a\", \"smarts\": \"C\"},\n    {\"id\": \"b\"}\n  ]\n}");
        assertEquals(4, l.lineOf("$.groups[1].id", "text is required"));
        assertEquals(3, l.lineOf("$.groups[0].smarts", ""));
        assertEquals(7, l.lineOf("$", "not valid JSON at line 7, column 2: x"));
    }
}
