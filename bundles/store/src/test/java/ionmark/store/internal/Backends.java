package ionmark.store.internal;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;

import ionmark.acidity.api.TableService;
import ionmark.acidity.internal.TableSnapshotService;

/**
 * The databases the store suite runs against: H2 in a file always; PostgreSQL when IONMARK_PG_URL
 * (with IONMARK_PG_USER, IONMARK_PG_PASSWORD) names a server. Under CI the server is required.
 */
final class Backends {
    static final TableService TABLES = new TableSnapshotService(null);

    private Backends() {
    }

    static String smallTable() {
        try (InputStream in = Backends.class.getResourceAsStream("/ionmark/store/small-table.json")) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
    }

    static String h2(Path dir) {
        return "jdbc:h2:file:" + dir.resolve("store").toAbsolutePath();
    }

    static String pgUrl() {
        return System.getenv("IONMARK_PG_URL");
    }

    /** Fresh stores: one per available backend, each emptied first. */
    static List<JdbcTableStore> fresh(Path dir) throws Exception {
        List<JdbcTableStore> out = new ArrayList<>();
        out.add(new JdbcTableStore(TABLES, h2(dir), "sa", ""));
        if (pgUrl() != null) {
            JdbcTableStore pg = new JdbcTableStore(TABLES, pgUrl(), System.getenv("IONMARK_PG_USER"),
                    System.getenv("IONMARK_PG_PASSWORD"));
            try (Connection c = pg.connect(); Statement s = c.createStatement()) {
                s.execute("drop table if exists ionmark_version, ionmark_head, ionmark_audit, ionmark_schema");
            }
            out.add(new JdbcTableStore(TABLES, pgUrl(), System.getenv("IONMARK_PG_USER"),
                    System.getenv("IONMARK_PG_PASSWORD")));
        } else if (System.getenv("CI") != null) {
            throw new AssertionError("CI must provide PostgreSQL (IONMARK_PG_URL, set by .ci/run)");
        } else {
            System.out.println("PostgreSQL store tests skipped: set IONMARK_PG_URL to run them against a server");
        }
        return out;
    }
}
