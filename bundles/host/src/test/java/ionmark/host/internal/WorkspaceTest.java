package ionmark.host.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import ionmark.host.api.Block;
import ionmark.host.api.Entry;

/** The reference host's page store: Markdown in, blocks out, and no entry lost on a failed save. */
class WorkspaceTest {
    @TempDir
    Path dir;

    @Test
    void fencedStructuresBecomeStructureBlocksWithTheirOwnPh() {
        Entry e = Workspace.parse("x", """
                # Title

                Some text at pH 7.4.

                ```smiles ph=2.5
                CC(=O)O
                ```

                ## Next section

                | a | b |
                """);
        assertEquals("Title", e.title());
        Block s = e.blocks().stream().filter(b -> b.kind() == Block.Kind.STRUCTURE).findFirst().orElseThrow();
        assertEquals("CC(=O)O", s.content());
        assertEquals(2.5, s.ph(), 1e-9);
        assertTrue(e.blocks().stream().anyMatch(b -> b.kind() == Block.Kind.TABLE));
        int sectionOfText = e.blocks().stream().filter(b -> b.content().contains("pH 7.4")).findFirst().orElseThrow()
                .section();
        int sectionOfTable = e.blocks().stream().filter(b -> b.kind() == Block.Kind.TABLE).findFirst().orElseThrow()
                .section();
        assertTrue(sectionOfTable > sectionOfText, "a heading starts a new section");
    }

    @Test
    void molfileBlocksKeepTheirLines() {
        Entry e = Workspace.parse("x", "```molfile\n\n  x\n\n  0  0  0  0  0  0  0  0  0  0999 V2000\nM  END\n```\n");
        assertTrue(e.blocks().get(0).content().contains("V2000"));
        assertTrue(e.blocks().get(0).content().contains("\n"));
    }

    @Test
    void saveReplacesTheEntryWhole() throws IOException {
        Workspace w = new Workspace(dir);
        w.save("e1", "first", "ana");
        w.save("e1", "second", "ben");
        assertEquals("second", w.text("e1"));
        try (var s = Files.list(dir)) {
            assertEquals(1, s.filter(Files::isRegularFile).count(), "no temporary files left behind");
        }
    }

    @Test
    void everySaveIsKeptWithItsAuthorAndTime() throws IOException {
        Workspace w = new Workspace(dir);
        w.save("e1", "first", "ana");
        w.save("e1", "second", "ben");
        var saves = w.history().saves("e1");
        assertEquals(2, saves.size());
        assertEquals("ana", saves.get(0).author());
        assertEquals("ben", saves.get(1).author());
        assertTrue(!saves.get(1).time().isBefore(saves.get(0).time()));
        assertEquals("first", w.history().text("e1", 1), "the earlier text is still there");
    }

    @Test
    void anUnclosedFenceIsReportedWithItsLine() {
        Entry e = Workspace.parse("x", "# T\n\nat pH 7\n\n```smiles\nCCN\n\nmore text\n");
        assertEquals(1, e.notices().size(), e.notices().toString());
        assertTrue(e.notices().get(0).contains("line 5"), e.notices().toString());
        assertTrue(e.notices().get(0).contains("never closed"), e.notices().toString());
    }

    @Test
    void anEmptyStructureBlockIsReported() {
        Entry e = Workspace.parse("x", "```smiles\n```\n");
        assertTrue(e.notices().get(0).contains("empty"), e.notices().toString());
    }

    @Test
    void aBlockPhThatIsNotANumberIsReported() {
        Entry e = Workspace.parse("x", "```smiles ph=high\nCCN\n```\n");
        assertTrue(e.notices().get(0).contains("'ph=high'"), e.notices().toString());
        assertEquals(null, e.blocks().get(0).ph());
    }

    @Test
    void aFailedSaveLeavesTheOldEntry() throws IOException {
        Workspace w = new Workspace(dir);
        w.save("e1", "kept", "ana");
        // make the target a directory so the rename fails: the old text must survive
        Path target = dir.resolve("e2.md");
        Files.createDirectories(target.resolve("blocker"));
        assertThrows(IOException.class, () -> w.save("e2", "new", "ana"));
        assertEquals("kept", w.text("e1"));
        try (var s = Files.list(dir)) {
            assertTrue(s.noneMatch(p -> p.getFileName().toString().endsWith(".tmp")), "temporary file cleaned up");
        }
    }

    @Test
    void idsThatCouldEscapeTheFolderAreRefused() {
        Workspace w = new Workspace(dir);
        assertThrows(IllegalArgumentException.class, () -> w.save("../evil", "x", "ana"));
        assertThrows(IllegalArgumentException.class, () -> w.text("a/b"));
    }

    @Test
    void demoEntriesAreSeededIntoAnEmptyFolder() throws IOException {
        Workspace w = new Workspace(dir.resolve("ws"));
        w.seedDemo();
        assertEquals(Workspace.DEMO, w.ids());
        for (String id : w.ids()) {
            assertTrue(w.entry(id).blocks().stream().anyMatch(b -> b.kind() == Block.Kind.STRUCTURE), id);
        }
    }
}
