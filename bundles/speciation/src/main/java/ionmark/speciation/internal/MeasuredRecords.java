package ionmark.speciation.internal;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/** The rows of a measured-values file, TSV or SDF, as named fields with their line or record number. */
final class MeasuredRecords {
    static final List<String> COLUMNS = List.of("id", "smiles", "pka_values", "temperature", "ionic_strength", "method",
            "source", "name");

    /**
     * @param line     line number (TSV) or record number (SDF)
     * @param fields   field name → text ({@code smiles} holds the molfile for SDF)
     * @param molfile  whether the structure is a molfile
     * @param problems what stops the row before it is read
     */
    record Record(int line, Map<String, String> fields, boolean molfile, List<String> problems) {
    }

    private MeasuredRecords() {
    }

    static List<Record> tsv(String text) {
        List<Record> out = new ArrayList<>();
        String[] lines = text.split("\r?\n", -1);
        for (int i = 0; i < lines.length; i++) {
            String line = lines[i];
            if (line.isBlank() || line.startsWith("#")) {
                continue;
            }
            String[] cells = line.split("\t", -1);
            if (i == 0 || out.isEmpty() && cells[0].strip().toLowerCase(Locale.ROOT).equals("id")) {
                if (cells[0].strip().toLowerCase(Locale.ROOT).equals("id")) {
                    continue; // the header line
                }
            }
            Map<String, String> f = new LinkedHashMap<>();
            List<String> problems = new ArrayList<>();
            for (int c = 0; c < cells.length && c < COLUMNS.size(); c++) {
                f.put(COLUMNS.get(c), cells[c]);
            }
            if (cells.length < 3) {
                problems.add("expected the columns " + String.join(", ", COLUMNS) + " separated by tabs; found "
                        + cells.length);
            } else if (cells.length > COLUMNS.size()) {
                problems.add(cells.length + " columns, at most " + COLUMNS.size() + " expected");
            }
            out.add(new Record(i + 1, f, false, problems));
        }
        return out;
    }

    static List<Record> sdf(String text) {
        List<Record> out = new ArrayList<>();
        String[] records = text.replace("\r\n", "\n").split("\n\\$\\$\\$\\$[^\n]*\n?");
        int number = 0;
        for (String rec : records) {
            if (rec.isBlank()) {
                continue;
            }
            number++;
            Map<String, String> f = new LinkedHashMap<>();
            List<String> problems = new ArrayList<>();
            int end = rec.indexOf("M  END");
            if (end < 0) {
                problems.add("no molfile (no 'M  END' line) in this record");
                out.add(new Record(number, f, true, problems));
                continue;
            }
            f.put("smiles", rec.substring(0, end + "M  END".length()));
            String[] lines = rec.substring(end + "M  END".length()).split("\n");
            for (int i = 0; i < lines.length; i++) {
                String l = lines[i];
                int open = l.indexOf('<');
                int close = l.indexOf('>', open + 1);
                if (l.startsWith(">") && open > 0 && close > open) {
                    String name = l.substring(open + 1, close).strip().toLowerCase(Locale.ROOT);
                    StringBuilder v = new StringBuilder();
                    while (i + 1 < lines.length && !lines[i + 1].isBlank() && !lines[i + 1].startsWith(">")) {
                        v.append(v.length() == 0 ? "" : " ").append(lines[++i].strip());
                    }
                    if (!name.equals("smiles")) {
                        f.put(name, v.toString());
                    }
                }
            }
            out.add(new Record(number, f, true, problems));
        }
        return out;
    }
}
