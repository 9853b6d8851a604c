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
        StringBuilder sb = new StringBuilder("<form class=\"im-quick\" method=\"post\" id=\"quick\">");
        sb.append("<label class=\"im-wide\">Structure: SMILES, a chemical name, or a molfile (paste it or drop the file here)"
                + "<textarea id=\"structure\" name=\"structure\" rows=\"8\" cols=\"70\">").append(Html.esc(structure))
                .append("</textarea></label>");
        sb.append(field("ph", "pH", ph, bad)).append(field("temp", "°C (25 if empty)", t, bad))
                .append(field("ionic", "ionic strength, M (0 if empty)", is, bad));
        // quick-check.js reads a dropped molfile into the box
        sb.append("<button type=\"submit\">Check</button></form>").append(StaticFiles.QUICK_CHECK_JS);
        if (structure.isBlank()) {
            if (params.containsKey("structure")) {
                sb.append("<p class=\"im-error\" role=\"alert\">Structure: give a SMILES, a chemical name or a molfile.</p>");
            }
            return sb.toString();
        }
        if (!bad.isEmpty()) {
            return sb.toString();
        }
        List<String> lines = new ArrayList<>();
        lines.add("Quick check" + (p == null ? "" : " at pH " + ph.strip().replace(',', '.')) + (temp == null ? ""
                : ", " + t.strip() + " °C") + (ionic == null ? "" : ", ionic strength " + is.strip() + " M") + ".");
        List<Block> blocks = List.of(new Block(Block.Kind.TEXT, String.join(" ", lines), null, 0),
                new Block(Block.Kind.STRUCTURE, structure, p, 0));
        for (var s : annotator.annotate(new Entry("quick-check", "Quick check", blocks, 0)).structures()) {
            sb.append(new Card(s).html());
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

    private static String field(String name, String label, String value, Map<String, String> bad) {
        String err = bad.get(name);
        return "<label>" + label + " <input name=\"" + name + "\" size=\"6\" value=\"" + Html.esc(value) + "\""
                + (err == null ? "" : " aria-invalid=\"true\" aria-describedby=\"" + name + "-error\"") + ">"
                + (err == null ? "" : "<span class=\"im-error\" id=\"" + name + "-error\" role=\"alert\">"
                        + Html.esc(err) + "</span>") + "</label>";
    }
}
