package ionmark.pipeline;

import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Structures of a Markdown notebook entry and the pH each is stated at, for the pipeline. An interim reader
 * until a shared annotate code path exists: it follows the reference host's entry format (a fenced
 * {@code ```smiles} or {@code ```molfile} block is a structure, {@code ```smiles ph=7.4} gives it its own pH,
 * headings start sections, {@code Table version: vN} pins the entry) and the notebook's rule for the pH that
 * applies (the block's own, else the nearest statement before it in its section, else the entry's first).
 * It reads single pH values only ("pH 7.4", "pH = 2.5", "pH of 9"); a range counts by its first value, and
 * temperature and ionic strength are not read.
 */
public final class MarkdownStructureReader {
    private static final Pattern FENCE = Pattern.compile("^```\\s*(smiles|molfile)\\b(.*)$");
    private static final Pattern BLOCK_PH = Pattern.compile("ph\\s*=\\s*(-?\\d+(?:\\.\\d+)?)", Pattern.CASE_INSENSITIVE);
    private static final Pattern PIN = Pattern.compile("^\\s*table version:\\s*v?(\\d+)\\s*$", Pattern.CASE_INSENSITIVE);
    private static final Pattern PH = Pattern.compile(
            "(?<![A-Za-z])pH(?![A-Za-z])\\s*(?:=|:|of|is|at|was)?\\s*(-?\\d{1,2}(?:\\.\\d+)?)(?![\\d.]*\\s*(?:M\\b|mM\\b|%))");

    /** One structure block: its number in the entry (1-based), its text, and the pH that applies or null. */
    public record Block(int number, String text, Double ph) {
    }

    /** The structure blocks of one entry and the table version it is pinned to (0: none). */
    public record Entry(List<Block> blocks, int pinnedVersion) {
    }

    private record Statement(int line, int section, double ph) {
    }

    private record Raw(int line, int section, String text, Double ph) {
    }

    private MarkdownStructureReader() {
    }

    public static Entry read(String text) {
        List<Statement> statements = new ArrayList<>();
        List<Raw> raws = new ArrayList<>();
        int section = 0;
        int pinned = 0;
        boolean titled = false;
        String[] lines = text.split("\r?\n", -1);
        for (int i = 0; i < lines.length; i++) {
            String line = lines[i];
            Matcher pin = PIN.matcher(line);
            if (pin.matches()) {
                pinned = Integer.parseInt(pin.group(1));
            }
            Matcher f = FENCE.matcher(line.strip());
            if (f.matches()) {
                int start = i;
                StringBuilder body = new StringBuilder();
                for (i++; i < lines.length && !lines[i].strip().equals("```"); i++) {
                    body.append(lines[i]).append('\n');
                }
                Matcher ph = BLOCK_PH.matcher(f.group(2));
                String content = f.group(1).equals("smiles") ? body.toString().strip() : body.toString();
                if (!content.isBlank()) {
                    raws.add(new Raw(start, section, content, ph.find() ? Double.valueOf(ph.group(1)) : null));
                }
                continue;
            }
            if (line.startsWith("#")) {
                if (line.startsWith("# ") && !titled) {
                    titled = true;
                } else {
                    section++;
                }
            }
            Matcher m = PH.matcher(line);
            while (m.find()) {
                double v = Double.parseDouble(m.group(1));
                if (v >= -2 && v <= 16) {
                    statements.add(new Statement(i, section, v));
                }
            }
        }
        List<Block> blocks = new ArrayList<>();
        for (Raw r : raws) {
            blocks.add(new Block(blocks.size() + 1, r.text(), r.ph() != null ? r.ph() : stated(statements, r)));
        }
        return new Entry(blocks, pinned);
    }

    private static Double stated(List<Statement> statements, Raw r) {
        Double best = null;
        for (Statement s : statements) {
            if (s.line() < r.line() && s.section() == r.section()) {
                best = s.ph();
            }
        }
        return best != null ? best : statements.isEmpty() ? null : statements.get(0).ph();
    }
}
