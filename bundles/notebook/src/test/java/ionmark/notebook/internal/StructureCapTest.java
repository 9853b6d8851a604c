package ionmark.notebook.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;

import ionmark.host.api.Block;
import ionmark.host.api.Entry;
import ionmark.notebook.api.AnnotatedEntry;
import ionmark.notebook.api.AnnotatedStructure;

/**
 * One entry, quick check or request annotates at most {@link EntryReader#MAX_STRUCTURES} structures and says so
 * (before, 300 structures in one entry were all analysed within one request, each with its own time budget).
 */
class StructureCapTest {
    static final Annotator ANNOTATOR = new Annotator(CardTest.SPECIATION);

    @Test
    void anEntryBeyondTheCapAnnotatesTheFirstStructuresAndNamesTheRest() {
        List<Block> blocks = new ArrayList<>(List.of(new Block(Block.Kind.TEXT, "at pH 7", null, 0)));
        int n = EntryReader.MAX_STRUCTURES + 3;
        for (int i = 0; i < n; i++) {
            blocks.add(new Block(Block.Kind.STRUCTURE, "CC(=O)O", null, 0));
        }
        AnnotatedEntry a = ANNOTATOR.annotate(new Entry("many", "many", blocks, 0));
        assertEquals(n, a.structures().size());
        assertEquals(EntryReader.MAX_STRUCTURES, a.structures().stream().filter(AnnotatedStructure::ok).count());
        AnnotatedStructure last = a.structures().get(n - 1);
        assertTrue(last.error().startsWith("not annotated: more than " + EntryReader.MAX_STRUCTURES + " structures"),
                last.error());
        assertTrue(a.warnings().stream().anyMatch(w -> w.contains("Split the entry")), a.warnings().toString());
    }

    @Test
    void aQuickCheckOfManyComponentsIsCappedToo() {
        String many = String.join(".", java.util.Collections.nCopies(EntryReader.MAX_STRUCTURES + 1, "CCO"));
        String html = QuickCheckForm.html(ANNOTATOR, Map.of("structure", many, "ph", "7"));
        assertTrue(html.contains("Not annotated: more than " + EntryReader.MAX_STRUCTURES + " structures"), html);
    }
}
