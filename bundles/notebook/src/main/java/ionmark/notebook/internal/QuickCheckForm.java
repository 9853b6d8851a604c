package ionmark.notebook.internal;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import ionmark.host.api.Block;
import ionmark.host.api.Entry;

/**
 * The quick check: a structure (typed, pasted or a dropped molfile), pH (7.4 unless changed), temperature and
 * ionic strength; every bad field is named beside the field, and the card is the notebook's own.
 */
final class QuickCheckForm {
    static final String DEFAULT_PH = "7.4";

    /** A condition field as the form shows it: its value as typed and, when bad, what is wrong with it (else null). */
    record Field(String name, String label, String value, String error) {
        /** "true" for a bad field, else null: the template then leaves the attribute out. */
        String invalid() {
            return error == null ? null : "true";
        }

        /** The id of the field's message, or null. */
        String describedBy() {
            return error == null ? null : name + "-error";
        }
    }

    private QuickCheckForm() {
    }

    static String html(Annotator annotator, Map<String, String> params) {
        String structure = params.getOrDefault("structure", "");
        String ph = params.getOrDefault("ph", params.containsKey("structure") ? "" : DEFAULT_PH);
        String t = params.getOrDefault("temp", "");
        String is = params.getOrDefault("ionic", "");
        Map<String, String> bad = new java.util.LinkedHashMap<>();
        Double p = number(ph, "ph", -2, 16, "pH must be a number from -2 to 16", bad);
        Double temp = number(t, "temp", 0, 100, "temperature must be a number from 0 to 100 °C", bad);
        Double ionic = number(is, "ionic", 0, 5, "ionic strength must be a number from 0 to 5 M", bad);
        List<Field> fields = List.of(new Field("ph", "pH", ph, bad.get("ph")),
                new Field("temp", "°C (25 if empty)", t, bad.get("temp")),
                new Field("ionic", "ionic strength, M (0 if empty)", is, bad.get("ionic")));
        StringBuilder sb = new StringBuilder(Html.TEMPLATES.render("quickCheckForm", Map.of("structure", structure, "fields",
                fields, "askForStructure", structure.isBlank() && params.containsKey("structure"))));
        if (structure.isBlank() || !bad.isEmpty()) {
            return sb.toString();
        }
        List<String> lines = new ArrayList<>();
        lines.add("Quick check" + (p == null ? "" : " at pH " + ph.strip().replace(',', '.')) + (temp == null ? ""
                : ", " + t.strip() + " °C") + (ionic == null ? "" : ", ionic strength " + is.strip() + " M") + ".");
        List<Block> blocks = List.of(new Block(Block.Kind.TEXT, String.join(" ", lines), null, 0),
                new Block(Block.Kind.STRUCTURE, structure, p, 0));
        for (var s : annotator.annotate(new Entry("quick-check", "Quick check", blocks, 0)).structures()) {
            sb.append(annotator.card(s));
        }
        return sb.toString();
    }

    private static Double number(String v, String name, double lo, double hi, String message, Map<String, String> bad) {
        if (v.isBlank()) {
            return null;
        }
        try {
            double d = Double.parseDouble(v.strip().replace(',', '.'));
            if (d >= lo && d <= hi) {
                return d;
            }
        } catch (NumberFormatException e) {
            // named below
        }
        bad.put(name, message + ", not '" + v.strip() + "'");
        return null;
    }
}
