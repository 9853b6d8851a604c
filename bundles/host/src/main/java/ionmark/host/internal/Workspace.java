package ionmark.host.internal;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.List;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import ionmark.host.api.Entry;

/**
 * Entries as Markdown files in a folder. A fenced block {@code ```smiles} or {@code ```molfile} is a
 * structure; {@code ```smiles ph=7.4} gives the structure its own pH. Headings start sections.
 * Saving writes a temporary file and renames it over the old one, so a failed save loses nothing.
 */
final class Workspace {
    private static final Pattern ID = Pattern.compile("[A-Za-z0-9][A-Za-z0-9_-]{0,80}");
    static final List<String> DEMO = List.of("01-workup-extraction", "02-salt-screen", "03-hplc-mobile-phase",
            "04-buffer-preparation", "05-assay-ph74", "06-stability-ph12", "07-coupling-workup");

    private final Path folder;

    private final EntryHistory history;

    Workspace(Path folder) {
        this.folder = folder;
        this.history = new EntryHistory(folder.resolve(".ionmark").resolve("history"));
    }

    Path folder() {
        return folder;
    }

    /** Copies the demo entries into an empty or missing folder. */
    void seedDemo() throws IOException {
        Files.createDirectories(folder);
        try (Stream<Path> s = Files.list(folder)) {
            if (s.anyMatch(p -> p.toString().endsWith(".md"))) {
                return;
            }
        }
        for (String id : DEMO) {
            try (InputStream in = Workspace.class.getResourceAsStream("demo/" + id + ".md")) {
                if (in != null) {
                    Files.write(folder.resolve(id + ".md"), in.readAllBytes());
                }
            }
        }
    }

    List<String> ids() throws IOException {
        if (!Files.isDirectory(folder)) {
            return List.of();
        }
        try (Stream<Path> s = Files.list(folder)) {
            return s.map(p -> p.getFileName().toString()).filter(n -> n.endsWith(".md"))
                    .map(n -> n.substring(0, n.length() - 3)).filter(n -> ID.matcher(n).matches()).sorted().toList();
        }
    }

    String text(String id) throws IOException {
        return Files.readString(path(id), StandardCharsets.UTF_8);
    }

    /** When the file was last changed, for entries never saved through the host. */
    String modified(String id) {
        try {
            return EntryPages.WHEN.format(Files.getLastModifiedTime(path(id)).toInstant());
        } catch (IOException e) {
            return "–";
        }
    }

    Entry entry(String id) throws IOException {
        return parse(id, text(id));
    }

    /** Saves the entry and keeps the saved text, its author and time in the entry's history. */
    void save(String id, String text, String author) throws IOException {
        write(path(id), text);
        history.record(id, text, author);
    }

    EntryHistory history() {
        return history;
    }

    private void write(Path target, String text) throws IOException {
        Files.createDirectories(folder);
        Path tmp = Files.createTempFile(folder, ".save", ".tmp");
        try {
            Files.writeString(tmp, text, StandardCharsets.UTF_8);
            try {
                Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
            }
        } finally {
            Files.deleteIfExists(tmp);
        }
    }

    private Path path(String id) {
        if (id == null || !ID.matcher(id).matches()) {
            throw new IllegalArgumentException("not an entry id: " + id);
        }
        return folder.resolve(id + ".md");
    }

    static Entry parse(String id, String text) {
        return ionmark.host.api.MarkdownEntries.parse(id, text);
    }
}
