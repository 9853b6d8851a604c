package ionmark.acidity.internal;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

import ionmark.acidity.api.Problem;

/**
 * The table as two files people review: the curated base (what chemists write: references, named
 * SMARTS fragments, classes with their starting values, substituents, measured compounds, pair
 * rules, the interaction rule) and the fitted overlay (per class and pair rule the numbers a
 * calibration set, with its provenance). {@link #build} joins them into the one-file table the
 * codec reads; {@link TableSplitter} takes a one-file table apart again.
 */
final class SplitFormat {
    static final String CURATED = "ionmark-acidity-curated/1";
    static final String FITTED = "ionmark-acidity-fitted/1";
    /** Fields of a class a calibration may set; everything else is the curator's. */
    static final List<String> FITTED_FIELDS = List.of("pka", "rho", "attenuation", "sd");
    static final List<String> FITTED_PAIR_FIELDS = List.of("singly", "doubly");
    /** A fragment reference inside a pattern: {@code {name}}; SMARTS itself never uses braces. */
    static final Pattern REFERENCE = Pattern.compile("\\{([A-Za-z0-9][A-Za-z0-9_.-]*)}");
    private static final ObjectMapper JSON = new ObjectMapper();

    private SplitFormat() {
    }

    /**
     * The one-file table tree from a curated base and (optionally) a fitted overlay. Problems (an
     * unknown fragment, an overlay entry for a record the base does not have) are added with the
     * path of the file they are in.
     */
    static ObjectNode build(JsonNode curated, JsonNode fitted, List<Problem> problems) {
        ObjectNode out = JSON.createObjectNode();
        out.put("format", TableCodec.FORMAT);
        JsonNode version = fitted != null && fitted.has("version") ? fitted.get("version") : curated.path("version");
        out.set("version", version.deepCopy());
        ArrayNode refs = out.putArray("references");
        Set<String> refIds = new HashSet<>();
        curated.path("references").forEach(r -> {
            refs.add(r.deepCopy());
            refIds.add(r.path("id").asText());
        });
        if (fitted != null) {
            fitted.path("references").forEach(r -> {
                if (refIds.add(r.path("id").asText())) {
                    refs.add(r.deepCopy());
                }
            });
        }
        Map<String, String> fragments = fragments(curated.path("fragments"), problems);
        JsonNode classes = fitted == null ? JSON.createObjectNode() : fitted.path("classes");
        JsonNode pairFits = fitted == null ? JSON.createObjectNode() : fitted.path("pairs");
        ObjectNode reach = JSON.createObjectNode();
        curated.path("interaction").path("reach").properties().forEach(e -> reach.set(e.getKey(), e.getValue()));
        ArrayNode groups = out.putArray("groups");
        Set<String> groupIds = new HashSet<>();
        JsonNode cg = curated.path("groups");
        for (int i = 0; i < cg.size(); i++) {
            ObjectNode g = cg.get(i).deepCopy();
            String id = g.path("id").asText();
            groupIds.add(id);
            expand(g, fragments, "curated $.groups[" + i + "].smarts", problems);
            JsonNode fit = classes.get(id);
            if (fit != null) {
                overlay(g, fit, FITTED_FIELDS);
                if (fit.has("reach")) {
                    reach.set(id, fit.get("reach"));
                }
            }
            groups.add(g);
        }
        out.set("substituents", curated.path("substituents").deepCopy());
        out.set("measured", curated.path("measured").deepCopy());
        ArrayNode pairs = out.putArray("pairs");
        Set<String> pairIds = new HashSet<>();
        JsonNode cp = curated.path("pairs");
        for (int i = 0; i < cp.size(); i++) {
            ObjectNode r = cp.get(i).deepCopy();
            String id = r.path("id").asText();
            pairIds.add(id);
            expand(r, fragments, "curated $.pairs[" + i + "].smarts", problems);
            JsonNode fit = pairFits.get(id);
            if (fit != null) {
                overlay(r, fit, FITTED_PAIR_FIELDS);
                if (fit.has("source")) {
                    r.set("source", fit.get("source"));
                }
            }
            pairs.add(r);
        }
        ObjectNode interaction = curated.path("interaction").isObject() ? curated.get("interaction").deepCopy()
                : JSON.createObjectNode();
        interaction.remove("reach");
        if (!reach.isEmpty()) {
            interaction.set("reach", reach);
        }
        out.set("interaction", interaction);
        orphans(classes, groupIds, "classes", problems);
        orphans(pairFits, pairIds, "pairs", problems);
        return out;
    }

    /** Sets a record's fitted fields, their sources and its fit provenance from an overlay entry. */
    private static void overlay(ObjectNode record, JsonNode fit, List<String> fields) {
        for (String f : fields) {
            if (fit.has(f)) {
                record.set(f, fit.get(f));
            }
        }
        if (fit.has("sources") && record.has("sources")) {
            ObjectNode s = (ObjectNode) record.get("sources");
            fit.get("sources").properties().forEach(e -> s.set(e.getKey(), e.getValue()));
        } else if (fit.has("sources")) {
            record.set("sources", fit.get("sources").deepCopy());
        }
        if (fit.has("fit")) {
            record.set("fit", fit.get("fit").deepCopy());
        }
    }

    private static void orphans(JsonNode overlay, Set<String> known, String key, List<Problem> problems) {
        overlay.fieldNames().forEachRemaining(id -> {
            if (!known.contains(id)) {
                problems.add(TableCodec.error("fitted $." + key + "." + id, "the fitted overlay has numbers for '" + id
                        + "', which the curated base does not define (renamed or removed? re-run the split)"));
            }
        });
    }

    static Map<String, String> fragments(JsonNode n, List<Problem> problems) {
        Map<String, String> m = new LinkedHashMap<>();
        n.properties().forEach(e -> {
            if (!e.getValue().isTextual() || REFERENCE.matcher(e.getValue().asText()).find()) {
                problems.add(TableCodec.error("curated $.fragments." + e.getKey(),
                        "a fragment is SMARTS text and may not use other fragments"));
            } else {
                m.put(e.getKey(), e.getValue().asText());
            }
        });
        return m;
    }

    private static void expand(ObjectNode record, Map<String, String> fragments, String path, List<Problem> problems) {
        String smarts = record.path("smarts").asText("");
        Matcher m = REFERENCE.matcher(smarts);
        StringBuilder sb = new StringBuilder();
        while (m.find()) {
            String text = fragments.get(m.group(1));
            if (text == null) {
                problems.add(TableCodec.error(path, "unknown fragment {" + m.group(1) + "}; fragments defined: "
                        + String.join(", ", fragments.keySet())));
                text = m.group();
            }
            m.appendReplacement(sb, Matcher.quoteReplacement(text));
        }
        m.appendTail(sb);
        if (!sb.toString().equals(smarts)) {
            record.put("smarts", sb.toString());
        }
    }

    /** A pattern with every fragment's text replaced by its reference, longest fragment first. */
    static String abbreviate(String smarts, Map<String, String> fragments) {
        List<Map.Entry<String, String>> byLength = new ArrayList<>(fragments.entrySet());
        byLength.sort((a, b) -> b.getValue().length() - a.getValue().length());
        String s = smarts;
        for (Map.Entry<String, String> e : byLength) {
            s = s.replace(e.getValue(), "{" + e.getKey() + "}");
        }
        return s;
    }
}
