package ionmark.store.internal;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.sql.SQLException;

import ionmark.acidity.api.TableService;

/**
 * Opens the workspace's embedded store. There is no database port: the notebook and a command-line run share the
 * store through H2's file lock, one process at a time. A run that finds the lock taken waits up to
 * {@code waitMs} (another command finishing) and then fails with one line naming the store; it never opens a
 * second, empty store somewhere else. The {@code .ionmark} folder is made owner-only (0700).
 */
final class StoreOpener {
    static final String FILE = "table-store";
    static final long DEFAULT_WAIT_MS = 10_000;

    private StoreOpener() {
    }

    static Path folder(String workspace) throws IOException {
        Path dir = Path.of(workspace == null || workspace.isBlank() ? "workspace" : workspace, ".ionmark")
                .toAbsolutePath().normalize();
        Files.createDirectories(dir);
        ownerOnly(dir, "rwx------");
        return dir;
    }

    static void ownerOnly(Path p, String mode) {
        try {
            Files.setPosixFilePermissions(p, PosixFilePermissions.fromString(mode));
        } catch (UnsupportedOperationException | IOException e) {
            // not a POSIX file system: the folder keeps what the platform gives it
        }
    }

    static String h2Url(Path dir) {
        return "jdbc:h2:file:" + dir.resolve(FILE);
    }

    static boolean exists(Path dir) {
        return Files.isRegularFile(dir.resolve(FILE + ".mv.db"));
    }

    /** Opens, waiting while another process holds the file lock. */
    static JdbcTableStore open(TableService tables, String url, String user, String password, long waitMs) {
        long until = System.currentTimeMillis() + waitMs;
        while (true) {
            try {
                return new JdbcTableStore(tables, url, user, password);
            } catch (IllegalStateException e) {
                if (!inUse(e) || System.currentTimeMillis() >= until) {
                    throw new IllegalStateException(inUse(e) ? "the table store " + url.replaceFirst(";.*", "")
                            + " is in use by another Ionmark process (a running notebook?): stop it, or use the"
                            + " notebook's table page, and run the command again" : e.getMessage(), e);
                }
                try {
                    Thread.sleep(200);
                } catch (InterruptedException ie) {
                    Thread.currentThread().interrupt();
                    throw e;
                }
            }
        }
    }

    private static boolean inUse(Throwable e) {
        for (Throwable t = e; t != null; t = t.getCause()) {
            if (t instanceof SQLException s && (s.getErrorCode() == 90020 // DATABASE_ALREADY_OPEN_1
                    || String.valueOf(s.getMessage()).contains("already in use"))) {
                return true;
            }
        }
        return false;
    }
}
