package ionmark.store.internal;

import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

/**
 * Differences between two table texts by record (id) and field, not by text line: an added or
 * removed record is shown with its values, a changed one field by field with old and new value.
 */
final class TableDiff {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final List<String> SECTIONS = List.of("references", "groups", "substituents", "measured", "pairs");

    private TableDiff() {
    }

    static List<String> of(String from, String to) {
        try {
            JsonNode a = JSON.readTree(from);
            JsonNode b = JSON.readTree(to);
            List<String> out = new ArrayList<>();
            for (String section : SECTIONS) {
                Map<String, JsonNode> ra = byId(a.path(section));
                Map<String, JsonNode> rb = byId(b.path(section));
                for (String id : new TreeSet<>(ra.keySet())) {
                    if (!rb.containsKey(id)) {
                        out.add("removed " + section + "[" + id + "]: " + ra.get(id));
                    }
                }
                for (String id : new TreeSet<>(rb.keySet())) {
                    if (!ra.containsKey(id)) {
                        out.add("added " + section + "[" + id + "]: " + rb.get(id));
                    } else {
                        fields(section + "[" + id + "]", ra.get(id), rb.get(id), out);
                    }
                }
            }
            fields("interaction", a.path("interaction"), b.path("interaction"), out);
            return out;
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("a stored version is not valid JSON: " + e.getOriginalMessage(), e);
        }
    }

    private static Map<String, JsonNode> byId(JsonNode arr) {
        Map<String, JsonNode> m = new LinkedHashMap<>();
        arr.forEach(n -> m.put(n.path("id").asText(), n));
        return m;
    }

    private static void fields(String where, JsonNode a, JsonNode b, List<String> out) {
        TreeSet<String> names = new TreeSet<>();
        a.fieldNames().forEachRemaining(names::add);
        b.fieldNames().forEachRemaining(names::add);
        for (Iterator<String> it = names.iterator(); it.hasNext();) {
            String f = it.next();
            JsonNode x = a.get(f);
            JsonNode y = b.get(f);
            if (x == null) {
                out.add("changed " + where + "." + f + ": (none) → " + y);
            } else if (y == null) {
                out.add("changed " + where + "." + f + ": " + x + " → (none)");
            } else if (!x.equals(y)) {
                out.add("changed " + where + "." + f + ": " + x + " → " + y);
            }
        }
    }
}
