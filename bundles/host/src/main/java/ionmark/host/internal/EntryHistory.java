package ionmark.host.internal;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Every saved version of every entry: the text as saved, who saved it and when. Append-only: a save adds
 * a file {@code <id>/<n>.md} and a line to {@code <id>/log.tsv} (n, time, author); nothing is rewritten.
 */
final class EntryHistory {
    /** One save. */
    record Save(int number, Instant time, String author) {
    }

    private final Path folder;

    EntryHistory(Path folder) {
        this.folder = folder;
    }

    synchronized Save record(String id, String text, String author) throws IOException {
        Path dir = folder.resolve(id);
        Files.createDirectories(dir);
        int n = saves(id).size() + 1;
        Save s = new Save(n, Instant.now(), clean(author));
        Files.writeString(dir.resolve(n + ".md"), text, StandardCharsets.UTF_8, StandardOpenOption.CREATE_NEW);
        Files.writeString(dir.resolve("log.tsv"), n + "\t" + s.time() + "\t" + s.author() + "\n", StandardCharsets.UTF_8,
                StandardOpenOption.CREATE, StandardOpenOption.APPEND);
        return s;
    }

    /** The saves of an entry, oldest first; empty for an entry never saved through the host. */
    List<Save> saves(String id) throws IOException {
        Path log = folder.resolve(id).resolve("log.tsv");
        List<Save> out = new ArrayList<>();
        if (!Files.exists(log)) {
            return out;
        }
        for (String line : Files.readAllLines(log, StandardCharsets.UTF_8)) {
            String[] f = line.split("\t", 3);
            if (f.length == 3) {
                out.add(new Save(Integer.parseInt(f[0]), Instant.parse(f[1]), f[2]));
            }
        }
        return out;
    }

    Optional<Save> last(String id) throws IOException {
        List<Save> s = saves(id);
        return s.isEmpty() ? Optional.empty() : Optional.of(s.get(s.size() - 1));
    }

    /** The text of save n. */
    String text(String id, int n) throws IOException {
        return Files.readString(folder.resolve(id).resolve(n + ".md"), StandardCharsets.UTF_8);
    }

    private static String clean(String author) {
        return author == null || author.isBlank() ? "unknown" : author.replaceAll("[\\t\\r\\n]", " ").strip();
    }
}
