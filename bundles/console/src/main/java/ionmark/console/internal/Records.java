package ionmark.console.internal;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * Batch input: SMILES lines ({@code SMILES<TAB>ID}), a TSV whose header starts {@code id<TAB>smiles},
 * or SDF (records end with {@code $$$$}; the id is the title line). Public for the pipeline module, which
 * reads its files with the same rules so that its records equal {@code batch}'s.
 */
public final class Records {
    public record Item(String id, String structure, String error) {
    }

    private Records() {
    }

    public static List<Item> read(Path p) throws IOException {
        return parse(Files.readString(p, StandardCharsets.UTF_8));
    }

    /** A whole file's text: SDF when it holds a record end or a molfile end, else SMILES lines or TSV. */
    public static List<Item> parse(String text) {
        return text.contains("$$$$") || text.contains("M  END") ? sdf(text) : lines(text);
    }

    public static List<Item> lines(String text) {
        List<Item> out = new ArrayList<>();
        boolean idFirst = false;
        int n = 0;
        for (String line : text.split("\r?\n")) {
            n++;
            if (line.isBlank() || line.startsWith("#")) {
                continue;
            }
            String[] f = line.split("\t");
            if (n == 1 && f.length >= 2 && f[0].equalsIgnoreCase("id") && f[1].equalsIgnoreCase("smiles")) {
                idFirst = true;
                continue;
            }
            if (idFirst) {
                out.add(new Item(f[0], f.length > 1 ? f[1] : "", f.length > 1 ? null : "line " + n + ": no SMILES"));
            } else {
                String[] ws = f.length >= 2 ? f : line.strip().split("\\s+", 2);
                out.add(new Item(ws.length > 1 ? ws[1].strip() : "line" + n, ws[0].strip(), null));
            }
        }
        return out;
    }

    public static List<Item> sdf(String text) {
        List<Item> out = new ArrayList<>();
        int k = 0;
        for (String rec : text.split("\\$\\$\\$\\$\r?\n?")) {
            if (rec.isBlank()) {
                continue;
            }
            k++;
            String title = rec.lines().findFirst().orElse("").strip();
            out.add(new Item(title.isEmpty() ? "record" + k : title, rec, null));
        }
        return out;
    }
}
