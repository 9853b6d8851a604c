package ionmark.notebook.internal;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.TreeSet;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

/**
 * What changed between two table texts, record by record (by id) and field by field, and how to
 * carry one side's changes onto another version: the draft kept after a refused publish is rebased
 * on the new head this way.
 */
final class RecordChanges {
    static final List<String> SECTIONS = List.of("references", "groups", "substituents", "measured", "pairs");
    private static final ObjectMapper JSON = new ObjectMapper();

    private RecordChanges() {
    }

    /** One change: a record added or removed (with its values), or one field of a record changed. */
    record Change(String kind, String section, String id, String field, JsonNode from, JsonNode to) {
        String where() {
            return section + " " + id + (field.isEmpty() ? "" : " · " + field);
        }

        String text() {
            return switch (kind) {
                case "added" -> "added " + where() + ": " + to;
                case "removed" -> "removed " + where() + ": " + from;
                default -> "changed " + where() + ": " + (from == null ? "(none)" : from) + " → "
                        + (to == null ? "(none)" : to);
            };
        }
    }

    static JsonNode tree(String text) {
        try {
            return JSON.readTree(text);
        } catch (JsonProcessingException e) {
            throw new IllegalArgumentException("not valid JSON: " + e.getOriginalMessage(), e);
        }
    }

    static List<Change> between(String from, String to) {
        return between(tree(from), tree(to));
    }

    static List<Change> between(JsonNode a, JsonNode b) {
        List<Change> out = new ArrayList<>();
        for (String section : SECTIONS) {
            Map<String, JsonNode> ra = byId(a.path(section));
            Map<String, JsonNode> rb = byId(b.path(section));
            ra.forEach((id, n) -> {
                if (!rb.containsKey(id)) {
                    out.add(new Change("removed", section, id, "", n, null));
                }
            });
            rb.forEach((id, n) -> {
                if (!ra.containsKey(id)) {
                    out.add(new Change("added", section, id, "", null, n));
                } else {
                    fields(section, id, ra.get(id), n, out);
                }
            });
        }
        fields("interaction", "", a.path("interaction"), b.path("interaction"), out);
        return out;
    }

    private static void fields(String section, String id, JsonNode a, JsonNode b, List<Change> out) {
        TreeSet<String> names = new TreeSet<>();
        a.fieldNames().forEachRemaining(names::add);
        b.fieldNames().forEachRemaining(names::add);
        for (String f : names) {
            if (!Objects.equals(a.get(f), b.get(f))) {
                out.add(new Change("changed", section, id, f, a.get(f), b.get(f)));
            }
        }
    }

    private static Map<String, JsonNode> byId(JsonNode arr) {
        Map<String, JsonNode> m = new LinkedHashMap<>();
        arr.forEach(n -> m.put(n.path("id").asText(), n));
        return m;
    }

    /** A rebase: the head with the draft's changes on it, and the changes that collided. */
    record Rebased(String text, List<Change> applied, List<Change> conflicts) {
    }

    /**
     * Carries {@code base → draft} onto {@code head}. A change collides when the head changed the same
     * field (or record) to something else since the base; then the head's value stays and the change
     * is listed.
     */
    static Rebased rebase(String base, String draft, String head) {
        JsonNode b = tree(base);
        ObjectNode h = (ObjectNode) tree(head).deepCopy();
        List<Change> theirs = between(b, h);
        List<Change> applied = new ArrayList<>();
        List<Change> conflicts = new ArrayList<>();
        for (Change c : between(b, tree(draft))) {
            boolean clash = theirs.stream().anyMatch(t -> t.section().equals(c.section()) && t.id().equals(c.id())
                    && (t.field().isEmpty() || c.field().isEmpty() || t.field().equals(c.field()))
                    && !(Objects.equals(t.to(), c.to()) && t.kind().equals(c.kind())));
            if (clash) {
                conflicts.add(c);
            } else {
                apply(h, c);
                applied.add(c);
            }
        }
        return new Rebased(h.toString(), applied, conflicts);
    }

    private static void apply(ObjectNode root, Change c) {
        if (c.section().equals("interaction")) {
            ObjectNode in = (ObjectNode) root.get("interaction");
            if (c.to() == null) {
                in.remove(c.field());
            } else {
                in.set(c.field(), c.to());
            }
            return;
        }
        ArrayNode arr = root.has(c.section()) ? (ArrayNode) root.get(c.section()) : root.putArray(c.section());
        int at = -1;
        for (int i = 0; i < arr.size(); i++) {
            if (arr.get(i).path("id").asText().equals(c.id())) {
                at = i;
            }
        }
        switch (c.kind()) {
            case "added" -> {
                if (at < 0) {
                    arr.add(c.to());
                }
            }
            case "removed" -> {
                if (at >= 0) {
                    arr.remove(at);
                }
            }
            default -> {
                if (at >= 0) {
                    ObjectNode r = (ObjectNode) arr.get(at);
                    if (c.to() == null) {
                        r.remove(c.field());
                    } else {
                        r.set(c.field(), c.to());
                    }
                }
            }
        }
    }
}
