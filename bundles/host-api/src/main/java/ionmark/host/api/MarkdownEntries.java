package ionmark.host.api;

import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Reads an entry written in Markdown, the reference host's format, so that a host, a script and the
 * command line see one entry the same way.
 *
 * <p>A fenced block {@code ```smiles}, {@code ```molfile} or {@code ```rxn} is a structure;
 * {@code ```smiles ph=7.4} gives it its own pH. Headings start sections; a line {@code Table version: v3}
 * pins the entry to that table version. A fence that is never closed, or a structure block with nothing in
 * it, is reported in {@link Entry#notices()} with its line number.
 *
 * <pre>{@code
 * Entry e = MarkdownEntries.parse("workup-17", Files.readString(path));
 * }</pre>
 */
public final class MarkdownEntries {
    private static final Pattern FENCE = Pattern.compile("^```\\s*(smiles|molfile|rxn)\\b(.*)$", Pattern.CASE_INSENSITIVE);
    private static final Pattern BLOCK_PH = Pattern.compile("ph\\s*=\\s*(\\S+)", Pattern.CASE_INSENSITIVE);
    private static final Pattern NUMBER = Pattern.compile("-?\\d+(?:[.,]\\d+)?");
    private static final Pattern PIN = Pattern.compile("^\\s*table version:\\s*v?(\\d+)\\s*$", Pattern.CASE_INSENSITIVE);

    private MarkdownEntries() {
    }

    /** The entry; never throws for odd Markdown, it reports what it could not read in the notices. */
    public static Entry parse(String id, String text) {
        List<Block> blocks = new ArrayList<>();
        List<String> notices = new ArrayList<>();
        String title = id;
        int section = 0;
        int pinned = 0;
        StringBuilder para = new StringBuilder();
        String[] lines = (text == null ? "" : text).split("\r?\n", -1);
        for (int i = 0; i < lines.length; i++) {
            String line = lines[i];
            Matcher f = FENCE.matcher(line.strip());
            Matcher pin = PIN.matcher(line);
            if (pin.matches()) {
                pinned = Integer.parseInt(pin.group(1));
            }
            if (f.matches()) {
                flush(blocks, para, section);
                int opened = i + 1;
                StringBuilder body = new StringBuilder();
                i++;
                while (i < lines.length && !lines[i].strip().equals("```")) {
                    body.append(lines[i]).append('\n');
                    i++;
                }
                String kind = f.group(1).toLowerCase(java.util.Locale.ROOT);
                if (i >= lines.length) {
                    notices.add("line " + opened + ": the " + kind + " block is never closed with ```; "
                            + "everything after it was read as that block");
                }
                Double ph = null;
                Matcher m = BLOCK_PH.matcher(f.group(2));
                if (m.find()) {
                    String v = m.group(1);
                    if (NUMBER.matcher(v).matches()) {
                        ph = Double.valueOf(v.replace(',', '.'));
                    } else {
                        notices.add("line " + opened + ": 'ph=" + v + "' is not a number; the block's pH is ignored");
                    }
                }
                String content = kind.equals("molfile") ? body.toString() : body.toString().strip();
                if (content.isBlank()) {
                    notices.add("line " + opened + ": the " + kind + " block is empty");
                }
                blocks.add(new Block(Block.Kind.STRUCTURE, content, ph, section));
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
        return new Entry(id, title, blocks, pinned, notices);
    }

    private static void flush(List<Block> blocks, StringBuilder para, int section) {
        if (para.length() > 0) {
            blocks.add(new Block(Block.Kind.TEXT, para.toString().strip(), null, section));
            para.setLength(0);
        }
    }
}
