package ionmark.console.internal;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.PosixFilePermissions;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Optional;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.ValidationReport;

/**
 * The frameworkless check's table, without paying for the full validation on every run. The full validation
 * (pattern compilation and every class's example SMILES: most of the table's cost) runs once per table text; the
 * SHA-256 of a text that passed it is remembered in {@code .ionmark/verified-tables} (0600, the last
 * {@link #KEEP} texts). A remembered text is only read and checked against its content hash; a text not
 * remembered, or one whose hash does not match, goes through the full validation again. The shipped table is
 * kept the same way in the launcher's per-build folder ({@code ionmark.lean.cache}), keyed by the SHA-256 of the
 * files it is built from.
 */
final class VerifiedTables {
    static final String MARKS = "verified-tables";
    static final int KEEP = 8;
    static final String CACHE_PROPERTY = "ionmark.lean.cache";

    private VerifiedTables() {
    }

    /** The head file's table, or empty when it does not validate or does not match its hash. */
    static Optional<AcidityTable> head(Path ionmarkDir, String json) {
        String sha = sha256(json);
        List<String> marks = marks(ionmarkDir);
        if (marks.contains(sha)) {
            Optional<AcidityTable> t = LeanTables.readVerified(json);
            if (t.isPresent()) {
                return t;
            }
        }
        ValidationReport r = LeanTables.validateText(json);
        AcidityTable t = r.table().orElse(null);
        if (!r.ok() || t == null || t.version().hash().isEmpty()
                || r.warnings().stream().anyMatch(p -> p.path().equals("$.version.hash"))) {
            return Optional.empty();
        }
        marks.remove(sha);
        marks.add(0, sha);
        remember(ionmarkDir, marks.subList(0, Math.min(KEEP, marks.size())));
        return Optional.of(t);
    }

    /** The shipped table: from the per-build cache when there is one and it matches its hash, else built. */
    static AcidityTable shipped() {
        String folder = System.getProperty(CACHE_PROPERTY, "");
        if (folder.isBlank()) {
            return LeanTables.shipped();
        }
        Path cached;
        try {
            cached = Path.of(folder, "shipped-" + sha256(resource("curated.json") + "\0" + resource("fitted.json"))
                    + ".json");
        } catch (IOException e) {
            return LeanTables.shipped();
        }
        if (Files.isRegularFile(cached)) {
            try {
                Optional<AcidityTable> t = LeanTables.readVerified(Files.readString(cached, StandardCharsets.UTF_8));
                if (t.isPresent()) {
                    return t.get();
                }
            } catch (IOException e) {
                // rebuilt below
            }
        }
        AcidityTable t = LeanTables.shipped();
        try {
            Path dir = cached.toAbsolutePath().getParent();
            if (dir == null) {
                return t;
            }
            Path tmp = Files.createTempFile(dir, "shipped", ".tmp");
            Files.writeString(tmp, new LeanTables(t).toJson(t), StandardCharsets.UTF_8);
            Files.move(tmp, cached, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } catch (IOException e) {
            // a read-only build folder: the next check builds it again
        }
        return t;
    }

    private static String resource(String name) throws IOException {
        String path = "ionmark/acidity/internal/table/" + name;
        try (InputStream in = VerifiedTables.class.getClassLoader().getResourceAsStream(path)) {
            if (in == null) {
                throw new IOException("no " + path);
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
    }

    private static List<String> marks(Path ionmarkDir) {
        try {
            List<String> l = new ArrayList<>();
            for (String line : Files.readAllLines(ionmarkDir.resolve(MARKS), StandardCharsets.UTF_8)) {
                if (line.matches("[0-9a-f]{64}")) {
                    l.add(line);
                }
            }
            return l;
        } catch (IOException e) {
            return new ArrayList<>();
        }
    }

    /** Best effort: a workspace the user cannot write to validates fully every time. */
    private static void remember(Path ionmarkDir, List<String> marks) {
        try {
            Path tmp = Files.createTempFile(ionmarkDir, MARKS, ".tmp",
                    PosixFilePermissions.asFileAttribute(PosixFilePermissions.fromString("rw-------")));
            Files.write(tmp, marks, StandardCharsets.UTF_8);
            Files.move(tmp, ionmarkDir.resolve(MARKS), StandardCopyOption.REPLACE_EXISTING,
                    StandardCopyOption.ATOMIC_MOVE);
        } catch (IOException | UnsupportedOperationException e) {
            // not remembered: validated again next time
        }
    }

    static String sha256(String text) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256")
                    .digest(text.getBytes(StandardCharsets.UTF_8)));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required by every Java platform", e);
        }
    }
}
