package ionmark.notebook.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import ionmark.acidity.internal.TableSnapshotService;
import ionmark.host.api.MarkdownEntries;
import ionmark.speciation.internal.SpeciationService;

/** The plain-Java reading gives what the entry states, as the cards do. */
class EntryAnnotationsTest {
    static final EntryAnnotation NOTEBOOK = EntryAnnotations.of(new SpeciationService(TableSnapshotService.shipped(),
            300, 10_000));

    @Test
    void readsTheStatedConditionsOfEachStructure() {
        AnnotatedEntry a = NOTEBOOK.annotate(MarkdownEntries.parse("buffer", """
                # Buffer
                Phosphate buffer, I = 0.1 M, adjusted to pH 6.8 at 37 °C.

                ```smiles
                OP(=O)(O)O
                ```
                """));
        assertEquals(1, a.structures().size());
        ConditionsUsed c = a.structures().get(0).conditions();
        assertEquals(6.8, c.ph());
        assertEquals(37.0, c.temperatureC());
        assertEquals(0.1, c.ionicStrengthM());
        assertTrue(a.structures().get(0).ok());
    }

    @Test
    void aPinnedEntrySaysItWasReadWithTheGivenTable() {
        AnnotatedEntry a = NOTEBOOK.annotate(MarkdownEntries.parse("old", "# Old\nTable version: v2\n\n```smiles\nCCO\n```\n"));
        assertTrue(a.warnings().stream().anyMatch(w -> w.contains("pinned to table v2")), a.warnings().toString());
    }

    @Test
    void noEngineIsRejectedWithAMessage() {
        assertThrows(IllegalArgumentException.class, () -> EntryAnnotations.of(null));
    }
}
