package ionmark.acidity.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The command line's lean path builds the snapshot service without a configuration and names the table file in a
 * system property (the launcher's IONMARK_TABLE): that file is the table, not a null-pointer failure.
 */
class TableFilePropertyTest {
    @Test
    void aTableFileNamedByThePropertyIsReadWithoutAConfiguration(@TempDir Path dir) throws Exception {
        TableSnapshotService shipped = new TableSnapshotService(null);
        var table = shipped.current();
        Path file = dir.resolve("t.json");
        Files.writeString(file, shipped.toJson(table));
        String before = System.getProperty(TableSnapshotService.TABLE_FILE_PROPERTY);
        System.setProperty(TableSnapshotService.TABLE_FILE_PROPERTY, file.toString());
        try {
            TableSnapshotService fromFile = new TableSnapshotService(null);
            assertEquals(table.version().number(), fromFile.current().version().number());
        } finally {
            if (before == null) {
                System.clearProperty(TableSnapshotService.TABLE_FILE_PROPERTY);
            } else {
                System.setProperty(TableSnapshotService.TABLE_FILE_PROPERTY, before);
            }
        }
    }
}
