package ionmark.acidity.internal;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.ClassFit;
import ionmark.acidity.api.GroupClass;
import ionmark.acidity.api.MeasuredCompound;
import ionmark.acidity.api.Problem;
import ionmark.acidity.api.Reference;
import ionmark.acidity.api.Relation;
import ionmark.acidity.api.Resonance;
import ionmark.acidity.api.PairRule;
import ionmark.acidity.api.SiteInteraction;
import ionmark.acidity.api.SiteType;
import ionmark.acidity.api.Substituent;
import ionmark.acidity.api.TableVersion;

/**
 * Reads the table's JSON text, leniently about what it can skip, recording a {@link Problem} with its JSON
 * path for everything it cannot read; the validator adds the checks that need chemistry. Writing (canonical
 * text and the content hash) is {@link TableWriter}.
 */
final class TableCodec {
    static final String FORMAT = "ionmark-acidity-table/1";
    static final ObjectMapper JSON = new ObjectMapper();
    private TableCodec() {
    }

    /** The result of reading: the table (when the shape allowed it) and the problems met. */
    record Read(AcidityTable table, JsonNode tree, List<Problem> problems) {
    }

    static Read read(String text) {
        List<Problem> problems = new ArrayList<>();
        if (text == null || text.isBlank()) {
            problems.add(error("$", "the table text is empty"));
            return new Read(null, null, problems);
        }
        JsonNode root;
        try {
            root = JSON.readTree(text);
        } catch (JsonProcessingException e) {
            var loc = e.getLocation();
            problems.add(error("$", "not valid JSON at line " + (loc == null ? "?" : loc.getLineNr()) + ", column "
                    + (loc == null ? "?" : loc.getColumnNr()) + ": " + e.getOriginalMessage()));
            return new Read(null, null, problems);
        }
        if (!root.isObject()) {
            problems.add(error("$", "the table must be a JSON object"));
            return new Read(null, root, problems);
        }
        if (SplitFormat.CURATED.equals(root.path("format").asText())) {
            // the curated base alone (fragments expanded, no fitted overlay): what calibration starts from
            root = SplitFormat.build(root, null, problems);
        }
        Fields f = new Fields(problems);
        if (!FORMAT.equals(root.path("format").asText())) {
            problems.add(error("$.format", "format must be \"" + FORMAT + "\""));
        }
        TableVersion version = readVersion(root.path("version"), f);
        List<Reference> refs = new ArrayList<>();
        each(root, "references", f, (n, p) -> refs.add(new Reference(f.text(n, p, "id"), f.text(n, p, "citation"))));
        List<GroupClass> groups = new ArrayList<>();
        Map<String, ClassFit> fits = new TreeMap<>();
        each(root, "groups", f, (n, p) -> {
            GroupClass g = readGroup(n, p, f);
            groups.add(g);
            readFit(n.get("fit"), p + ".fit", f).ifPresent(x -> fits.put(g.id(), x));
        });
        List<Substituent> subs = new ArrayList<>();
        each(root, "substituents", f, (n, p) -> subs.add(readSubstituent(n, p, f)));
        List<MeasuredCompound> measured = new ArrayList<>();
        each(root, "measured", f, (n, p) -> measured.add(readMeasured(n, p, f)));
        List<PairRule> pairs = new ArrayList<>();
        if (root.has("pairs")) { // optional: tables before pair rules have none
            each(root, "pairs", f, (n, p) -> {
                PairRule r = readPair(n, p, f);
                pairs.add(r);
                readFit(n.get("fit"), p + ".fit", f).ifPresent(x -> fits.put("pair:" + r.id(), x));
            });
        }
        SiteInteraction interaction = readInteraction(root.path("interaction"), "$.interaction", f);
        AcidityTable table = new AcidityTable(version, refs, groups, subs, measured, interaction, pairs, fits);
        return new Read(table, root, problems);
    }

    private interface RecordReader {
        void read(JsonNode node, String path);
    }

    private static void each(JsonNode root, String key, Fields f, RecordReader r) {
        JsonNode arr = root.path(key);
        if (!arr.isArray()) {
            f.problems.add(error("$." + key, "a list of records is required here"));
            return;
        }
        for (int i = 0; i < arr.size(); i++) {
            String path = "$." + key + "[" + i + "]";
            if (!arr.get(i).isObject()) {
                f.problems.add(error(path, "each record must be a JSON object"));
                continue;
            }
            r.read(arr.get(i), path);
        }
    }

    private static TableVersion readVersion(JsonNode n, Fields f) {
        if (!n.isObject()) {
            f.problems.add(error("$.version", "version metadata is required"));
            return new TableVersion(0, "", "", "", "", 0);
        }
        return new TableVersion(n.path("number").asInt(0), n.path("author").asText(""), n.path("time").asText(""),
                n.path("comment").asText(""), n.path("hash").asText(""), n.path("parent").asInt(0));
    }

    private static GroupClass readGroup(JsonNode n, String p, Fields f) {
        SiteType type = SiteType.ACID;
        try {
            type = SiteType.parse(f.text(n, p, "type"));
        } catch (IllegalArgumentException e) {
            f.problems.add(error(p + ".type", e.getMessage()));
        }
        Relation rel = Relation.NONE;
        try {
            rel = Relation.parse(n.path("relation").asText("none"));
        } catch (IllegalArgumentException e) {
            f.problems.add(error(p + ".relation", e.getMessage()));
        }
        Resonance resonance = Resonance.PARA;
        try {
            resonance = Resonance.parse(n.path("resonance").asText("p"));
        } catch (IllegalArgumentException e) {
            f.problems.add(error(p + ".resonance", e.getMessage()));
        }
        return new GroupClass(f.text(n, p, "id"), f.text(n, p, "name"), f.text(n, p, "smarts"), type,
                f.number(n, p, "pka", false), rel, f.number(n, p, "rho", false), f.number(n, p, "attenuation", false),
                resonance, f.number(n, p, "enthalpy", false), f.number(n, p, "sd", true),
                n.path("permanent").asBoolean(false), sources(n, p, f), n.path("note").asText(""),
                f.strings(n, p, "matches"), f.strings(n, p, "misses"));
    }

    private static Substituent readSubstituent(JsonNode n, String p, Fields f) {
        return new Substituent(f.text(n, p, "id"), f.text(n, p, "name"), f.text(n, p, "smarts"),
                f.number(n, p, "sigmaMeta", false), f.number(n, p, "sigmaPara", false),
                f.number(n, p, "sigmaParaMinus", false), f.number(n, p, "sigmaParaPlus", false),
                f.number(n, p, "sigmaI", false), sources(n, p, f));
    }

    private static MeasuredCompound readMeasured(JsonNode n, String p, Fields f) {
        List<Double> pka = new ArrayList<>();
        JsonNode arr = n.path("pka");
        if (!arr.isArray() || arr.isEmpty()) {
            f.problems.add(error(p + ".pka", "a list of at least one measured pKa is required"));
        } else {
            for (int i = 0; i < arr.size(); i++) {
                if (!arr.get(i).isNumber()) {
                    f.problems.add(error(p + ".pka[" + i + "]", "must be a number"));
                } else {
                    pka.add(arr.get(i).asDouble());
                }
            }
        }
        return new MeasuredCompound(f.text(n, p, "id"), n.path("name").asText(""), f.text(n, p, "smiles"), pka,
                n.path("temperature").asDouble(25.0), n.path("ionicStrength").asDouble(0.0),
                n.path("method").asText(""), n.path("source").asText(""), f.strings(n, p, "groups"));
    }

    private static PairRule readPair(JsonNode n, String p, Fields f) {
        return new PairRule(f.text(n, p, "id"), f.text(n, p, "name"), f.text(n, p, "smarts"),
                f.number(n, p, "singly", true), f.number(n, p, "doubly", true), n.path("source").asText(""), n.path("note").asText(""),
                f.strings(n, p, "matches"));
    }

    /** The provenance object of a fitted record: source, date, n, rmse, before, after, log. */
    static java.util.Optional<ClassFit> readFit(JsonNode n, String p, Fields f) {
        if (n == null || n.isNull()) {
            return java.util.Optional.empty();
        }
        if (!n.isObject()) {
            f.problems.add(error(p, "a fit is an object with source, date, n, rmse, before, after and log"));
            return java.util.Optional.empty();
        }
        return java.util.Optional.of(new ClassFit(f.text(n, p, "source"), n.path("date").asText(""),
                n.path("n").asInt(0), n.has("rmse") ? n.path("rmse").asDouble() : Double.NaN,
                numbers(n.path("before")), numbers(n.path("after")), n.path("log").asText("")));
    }

    private static Map<String, Double> numbers(JsonNode n) {
        Map<String, Double> m = new TreeMap<>();
        n.properties().forEach(e -> m.put(e.getKey(), e.getValue().asDouble()));
        return m;
    }

    private static SiteInteraction readInteraction(JsonNode n, String p, Fields f) {
        if (!n.isObject()) {
            f.problems.add(error(p, "site-interaction parameters are required"));
            return new SiteInteraction(List.of(), 0.5, 0.05, "");
        }
        List<double[]> shifts = new ArrayList<>();
        JsonNode arr = n.path("shifts");
        for (int i = 0; i < arr.size(); i++) {
            JsonNode e = arr.get(i);
            if (!e.isArray() || e.size() != 2 || !e.get(0).isNumber() || !e.get(1).isNumber()) {
                f.problems.add(error(p + ".shifts[" + i + "]", "each shift is [bonds, pKa units]"));
                continue;
            }
            shifts.add(new double[] {e.get(0).asDouble(), e.get(1).asDouble()});
        }
        Map<String, Double> reach = new TreeMap<>();
        JsonNode r = n.path("reach");
        if (!r.isMissingNode()) {
            if (!r.isObject()) {
                f.problems.add(error(p + ".reach", "must map group class ids to factors"));
            } else {
                r.properties().forEach(e -> reach.put(e.getKey(), f.number(r, p + ".reach", e.getKey(), true)));
            }
        }
        return new SiteInteraction(shifts, f.number(n, p, "decay", true), f.number(n, p, "cutoff", true),
                n.path("source").asText(""), f.strings(n, p, "exempt"), reach);
    }

    private static Map<String, String> sources(JsonNode n, String p, Fields f) {
        Map<String, String> m = new TreeMap<>();
        JsonNode s = n.path("sources");
        if (s.isMissingNode()) {
            return m;
        }
        if (!s.isObject()) {
            f.problems.add(error(p + ".sources", "sources must map a field name to a reference id"));
            return m;
        }
        s.properties().forEach(e -> m.put(e.getKey(), e.getValue().asText("")));
        return m;
    }

    /** Small helpers that read a field and record a problem when it is missing or of the wrong kind. */
    private record Fields(List<Problem> problems) {
        String text(JsonNode n, String p, String key) {
            JsonNode v = n.get(key);
            if (v == null || !v.isTextual() || v.asText().isBlank()) {
                problems.add(error(p + "." + key, "text is required here"));
                return "";
            }
            return v.asText();
        }

        double number(JsonNode n, String p, String key, boolean required) {
            JsonNode v = n.get(key);
            if (v == null || v.isNull()) {
                if (required) {
                    problems.add(error(p + "." + key, "a number is required here"));
                }
                return Double.NaN;
            }
            if (!v.isNumber()) {
                problems.add(error(p + "." + key, "must be a number, not " + v));
                return Double.NaN;
            }
            return v.asDouble();
        }

        List<String> strings(JsonNode n, String p, String key) {
            List<String> out = new ArrayList<>();
            JsonNode v = n.get(key);
            if (v == null) {
                return out;
            }
            if (!v.isArray()) {
                problems.add(error(p + "." + key, "must be a list of text"));
                return out;
            }
            v.forEach(x -> out.add(x.asText()));
            return out;
        }
    }

    static Problem error(String path, String message) {
        return new Problem(Problem.Severity.ERROR, path, message);
    }
}
