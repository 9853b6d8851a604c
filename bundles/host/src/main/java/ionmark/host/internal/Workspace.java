package ionmark.host.internal;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import ionmark.host.api.Block;
import ionmark.host.api.Entry;

/**
 * Entries as Markdown files in a folder. A fenced block {@code ```smiles} or {@code ```molfile} is a
 * structure; {@code ```smiles ph=7.4} gives the structure its own pH. Headings start sections.
 * Saving writes a temporary file and renames it over the old one, so a failed save loses nothing.
 */
final class Workspace {
    private static final Pattern ID = Pattern.compile("[A-Za-z0-9][A-Za-z0-9_-]{0,80}");
    private static final Pattern FENCE = Pattern.compile("^```\\s*(smiles|molfile)\\b(.*)$");
    private static final Pattern BLOCK_PH = Pattern.compile("ph\\s*=\\s*(-?\\d+(?:\\.\\d+)?)", Pattern.CASE_INSENSITIVE);
    /** "Table version: v3" on a line of its own pins the entry's annotations to that table version. */
    private static final Pattern PIN = Pattern.compile("^\\s*table version:\\s*v?(\\d+)\\s*$", Pattern.CASE_INSENSITIVE);
    static final List<String> DEMO = List.of("01-workup-extraction", "02-salt-screen", "03-hplc-mobile-phase",
            "04-buffer-preparation", "05-assay-ph74", "06-stability-ph12");

    private final Path folder;

    Workspace(Path folder) {
        this.folder = folder;
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

    Entry entry(String id) throws IOException {
        return parse(id, text(id));
    }

    void save(String id, String text) throws IOException {
        Path target = path(id);
        Files.createDirectories(folder);
        Path tmp = Files.createTempFile(folder, "." + id, ".tmp");
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
        List<Block> blocks = new ArrayList<>();
        String title = id;
        int section = 0;
        int pinned = 0;
        StringBuilder para = new StringBuilder();
        String[] lines = text.split("\r?\n", -1);
        for (int i = 0; i < lines.length; i++) {
            String line = lines[i];
            Matcher f = FENCE.matcher(line.strip());
            Matcher pin = PIN.matcher(line);
            if (pin.matches()) {
                pinned = Integer.parseInt(pin.group(1));
            }
            if (f.matches()) {
                flush(blocks, para, section);
                StringBuilder body = new StringBuilder();
                i++;
                while (i < lines.length && !lines[i].strip().equals("```")) {
                    body.append(lines[i]).append('\n');
                    i++;
                }
                Matcher ph = BLOCK_PH.matcher(f.group(2));
                Double p = ph.find() ? Double.valueOf(ph.group(1)) : null;
                String content = f.group(1).equals("smiles") ? body.toString().strip() : body.toString();
                blocks.add(new Block(Block.Kind.STRUCTURE, content, p, section));
            } else if (line.startsWith("#")) {
                flush(blocks, para, section);
                String h = line.replaceFirst("^#+\\s*", "");
                if (line.startsWith("# ") && title.equals(id)) {
                    title = h;
                } else {
                    section++;
                }
                blocks.add(new Block(Block.Kind.TEXT, line, null, section));
            } else if (line.startsWith("|")) {
                flush(blocks, para, section);
                blocks.add(new Block(Block.Kind.TABLE, line, null, section));
            } else if (line.isBlank()) {
                flush(blocks, para, section);
            } else {
                para.append(line).append('\n');
            }
        }
        flush(blocks, para, section);
        return new Entry(id, title, blocks, pinned);
    }

    private static void flush(List<Block> blocks, StringBuilder para, int section) {
        if (para.length() > 0) {
            blocks.add(new Block(Block.Kind.TEXT, para.toString().strip(), null, section));
            para.setLength(0);
        }
    }
}
