package ionmark.notebook.internal;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Set;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.internal.TableSnapshotService;
import ionmark.host.api.Block;
import ionmark.host.api.Entry;
import ionmark.host.api.HostUser;
import ionmark.store.internal.JdbcTableStore;

/** An entry pinned to a table version shows what that version gives, whatever the head is now. */
class PinnedEntryTest {
    @TempDir
    Path dir;

    @Test
    void aPinnedEntryIsAnnotatedWithItsTableVersion() throws Exception {
        TableSnapshotService tables = new TableSnapshotService(null);
        try (JdbcTableStore store = new JdbcTableStore(tables, "jdbc:h2:file:" + dir.resolve("s"), "sa", "")) {
            AcidityTable shipped = tables.current();
            store.publish(tables.toJson(shipped), 0, "t", "v1");
            var raised = shipped.groups().stream().map(g -> g.id().equals("amine-primary")
                    ? g.withPka(12.34, g.source("pka")) : g).toList();
            store.publish(tables.toJson(shipped.withGroups(raised)), 1, "t", "v2: primary amines raised");
            Annotator a = new Annotator(CardTest.SPECIATION, store, tables);
            List<Block> blocks = List.of(new Block(Block.Kind.TEXT, "at pH 7", null, 0),
                    new Block(Block.Kind.STRUCTURE, "CCCCCN", null, 0));
            HostUser u = new HostUser("t", Set.of("viewer"));
            String pinnedToV2 = a.decorate(new Entry("e", "e", blocks, 2), u).get(0).html();
            assertTrue(pinnedToV2.contains("Table v2 ("), "names the pinned version");
            assertTrue(pinnedToV2.contains("12.34"), "uses the pinned version's class value");
            String pinnedToV1 = a.decorate(new Entry("e", "e", blocks, 1), u).get(0).html();
            assertTrue(pinnedToV1.contains("Table v1 ("));
            assertFalse(pinnedToV1.contains("12.34"));
        }
    }
}
