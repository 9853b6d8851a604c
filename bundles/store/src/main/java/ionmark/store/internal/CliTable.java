package ionmark.store.internal;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.function.Supplier;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.TableService;
import ionmark.acidity.api.ValidationReport;

/**
 * The table a command-line run uses. Every process that installs the store's head (the notebook's follower, a
 * command-line publish) writes it to {@code .ionmark/head.json}, owner-only; a command-line run reads that file
 * and does not open the database, so {@code check} neither waits for a running notebook's lock nor pays for
 * opening H2. Without the file it reads the head from the store, and seeds a store that has none yet (a
 * notebook stopped while it started). With no store at all it says, on one line, that it uses the shipped table.
 * A head file that fails its hash check is an error, never used.
 */
final class CliTable {
    static final String HEAD_FILE = "head.json";

    private final TableService tables;
    private final Path dir;
    private final String unavailable;
    private final Supplier<JdbcTableStore> db;

    CliTable(TableService tables, Path dir, String unavailable, Supplier<JdbcTableStore> db) {
        this.tables = tables;
        this.dir = dir;
        this.unavailable = unavailable;
        this.db = db;
    }

    void install() {
        Path head = dir == null ? null : dir.resolve(HEAD_FILE);
        if (head != null && Files.isRegularFile(head)) {
            String json;
            try {
                json = Files.readString(head, StandardCharsets.UTF_8);
            } catch (IOException e) {
                throw new IllegalStateException("cannot read " + head + ": " + e.getMessage(), e);
            }
            ValidationReport r = tables.validate(json);
            AcidityTable t = r.table().orElse(null);
            if (!r.ok() || t == null || VersionCheckOutcome.hashMismatch(r)) {
                throw new IllegalStateException(head + " does not match its hash or does not validate: remove it and"
                        + " run the command again (it is rewritten from the store)");
            }
            tables.install(t);
            return;
        }
        if (unavailable != null) {
            System.err.println("ionmark: " + unavailable + ": using the shipped table "
                    + tables.current().version().label());
            return;
        }
        JdbcTableStore s = db.get();
        if (s.seedIfEmpty()) {
            System.err.println("ionmark: the table store had no version yet (its first start was stopped before it"
                    + " seeded); seeded it with the shipped table " + tables.current().version().label());
        }
        int number = s.head().orElseThrow(() -> new IllegalStateException("the table store has no head version"))
                .number();
        String json = s.content(number).orElseThrow();
        tables.install(tables.validate(json).table().orElseThrow());
        if (head != null) {
            write(head, json);
        }
    }

    /** Writes the head file atomically, owner-only (0600). */
    static void write(Path head, String json) {
        try {
            // beside the head file (a bare name's folder is the working directory), so the move stays atomic
            Path dir = java.util.Objects.requireNonNull(head.toAbsolutePath().getParent(), "the head file needs a folder");
            Path tmp = Files.createTempFile(dir, "head", ".tmp");
            StoreOpener.ownerOnly(tmp, "rw-------");
            Files.writeString(tmp, json, StandardCharsets.UTF_8);
            Files.move(tmp, head, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } catch (IOException e) {
            System.err.println("ionmark: cannot write " + head + ": " + e.getMessage());
        }
    }

    /** The validator's report on a content whose version block hash does not match it. */
    static final class VersionCheckOutcome {
        private VersionCheckOutcome() {
        }

        static boolean hashMismatch(ValidationReport r) {
            return r.warnings().stream().anyMatch(p -> p.path().equals("$.version.hash"))
                    || r.table().map(t -> t.version().hash().isEmpty()).orElse(true);
        }
    }
}
