package ionmark.pipeline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.util.List;

import org.junit.jupiter.api.Test;

/** The pH a structure block is annotated at: its own, else the nearest before it in its section, else the first. */
class MarkdownStructureReaderTest {
    static final String ENTRY = """
            # Work-up
            Table version: v3

            The aqueous layer was brought to pH 2.5 with HCl.

            ```smiles
            CC(=O)O
            ```

            ```smiles ph=9
            CCN
            ```

            ## Second extraction

            ```smiles
            c1ccccc1O
            ```

            Then at pH = 11 it was washed.

            ```smiles
            OC(=O)c1ccccc1
            ```
            """;

    @Test
    void blocksTakeTheirOwnTheSectionsOrTheEntrysFirstPh() {
        MarkdownStructureReader.Entry e = MarkdownStructureReader.read(ENTRY);
        assertEquals(List.of(2.5, 9.0, 2.5, 11.0), e.blocks().stream().map(MarkdownStructureReader.Block::ph).toList());
        assertEquals(List.of("CC(=O)O", "CCN", "c1ccccc1O", "OC(=O)c1ccccc1"),
                e.blocks().stream().map(MarkdownStructureReader.Block::text).toList());
    }

    @Test
    void aTableVersionLinePinsTheEntry() {
        assertEquals(3, MarkdownStructureReader.read(ENTRY).pinnedVersion());
        assertEquals(0, MarkdownStructureReader.read("# x\n```smiles\nC\n```\n").pinnedVersion());
    }

    @Test
    void anEntryThatStatesNoPhHasNone() {
        assertNull(MarkdownStructureReader.read("# x\n```smiles\nCCO\n```\n").blocks().get(0).ph());
    }

    @Test
    void concentrationsAreNotPhValues() {
        assertNull(MarkdownStructureReader.read("# x\nbuffer pH 0.1 M phosphate\n```smiles\nCCO\n```\n").blocks()
                .get(0).ph());
    }
}
