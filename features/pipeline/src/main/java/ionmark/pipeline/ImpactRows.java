package ionmark.pipeline;

import org.apache.parquet.example.data.Group;
import org.apache.parquet.example.data.simple.SimpleGroupFactory;
import org.apache.parquet.schema.LogicalTypeAnnotation;
import org.apache.parquet.schema.MessageType;
import org.apache.parquet.schema.PrimitiveType.PrimitiveTypeName;
import org.apache.parquet.schema.Types;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

/**
 * One Parquet row per structure and pH the impact job compared ({@link Impact#row}), changed or not: the
 * before and after sides as structs with the same keys as the JSON line, the change in fraction neutral, why
 * it is reported ({@code changed}, empty when it is not) and the derivation lines only one side has. Built
 * from the JSON text, so the rows and the {@code impact-*.jsonl} lines cannot disagree.
 */
final class ImpactRows {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final LogicalTypeAnnotation STRING = LogicalTypeAnnotation.stringType();

    static final MessageType SCHEMA = Types.buildMessage()
            .required(PrimitiveTypeName.BINARY).as(STRING).named("id")
            .optional(PrimitiveTypeName.BINARY).as(STRING).named("source")
            .optional(PrimitiveTypeName.BINARY).as(STRING).named("input")
            .optional(PrimitiveTypeName.DOUBLE).named("pH")
            .optional(PrimitiveTypeName.INT32).named("pinnedTableVersion")
            .required(PrimitiveTypeName.BOOLEAN).named("reported")
            .optionalList().requiredElement(PrimitiveTypeName.BINARY).as(STRING).named("changed")
            .addField(side("before"))
            .addField(side("after"))
            .optional(PrimitiveTypeName.DOUBLE).named("deltaFractionNeutral")
            .optionalList().requiredGroupElement()
                .required(PrimitiveTypeName.BINARY).as(STRING).named("site")
                .optionalList().requiredElement(PrimitiveTypeName.BINARY).as(STRING).named("lines")
                .named("derivationChanges")
            .named("ionmark_impact");

    private ImpactRows() {
    }

    private static org.apache.parquet.schema.GroupType side(String name) {
        return Types.optionalGroup()
                .optional(PrimitiveTypeName.BINARY).as(STRING).named("tableVersion")
                .optional(PrimitiveTypeName.BINARY).as(STRING).named("error")
                .optional(PrimitiveTypeName.INT32).named("dominantCharge")
                .optional(PrimitiveTypeName.DOUBLE).named("fractionNeutral")
                .optionalList().requiredElement(PrimitiveTypeName.DOUBLE).named("macroPka")
                .named(name);
    }

    /** The row of one comparison ({@link Impact#row}'s JSON). */
    static Group of(String json) {
        JsonNode r;
        try {
            r = JSON.readTree(json);
        } catch (java.io.IOException e) {
            throw new IllegalArgumentException("not a JSON comparison: " + e.getMessage(), e);
        }
        Group g = new SimpleGroupFactory(SCHEMA).newGroup();
        g.append("id", r.path("id").asText());
        text(g, "source", r.path("source"));
        text(g, "input", r.path("input"));
        if (r.path("pH").isNumber()) {
            g.append("pH", r.path("pH").asDouble());
        }
        if (r.path("pinnedTableVersion").isInt()) {
            g.append("pinnedTableVersion", r.path("pinnedTableVersion").asInt());
        }
        g.append("reported", !r.path("changed").isEmpty());
        Group why = g.addGroup("changed");
        r.path("changed").forEach(v -> why.addGroup("list").append("element", v.asText()));
        for (String k : new String[] {"before", "after"}) {
            JsonNode s = r.path(k);
            if (!s.isObject()) {
                continue;
            }
            Group side = g.addGroup(k);
            text(side, "tableVersion", s.path("tableVersion"));
            text(side, "error", s.path("error"));
            if (s.path("dominantCharge").isInt()) {
                side.append("dominantCharge", s.path("dominantCharge").asInt());
            }
            if (s.path("fractionNeutral").isNumber()) {
                side.append("fractionNeutral", s.path("fractionNeutral").asDouble());
            }
            if (s.path("macroPka").isArray()) {
                Group list = side.addGroup("macroPka");
                s.path("macroPka").forEach(v -> list.addGroup("list").append("element", v.asDouble()));
            }
        }
        if (r.path("deltaFractionNeutral").isNumber()) {
            g.append("deltaFractionNeutral", r.path("deltaFractionNeutral").asDouble());
        }
        Group changes = g.addGroup("derivationChanges");
        for (JsonNode d : r.path("derivationChanges")) {
            Group e = changes.addGroup("list").addGroup("element");
            e.append("site", d.path("site").asText());
            Group lines = e.addGroup("lines");
            d.path("lines").forEach(v -> lines.addGroup("list").append("element", v.asText()));
        }
        return g;
    }

    private static void text(Group g, String k, JsonNode v) {
        if (v.isTextual()) {
            g.append(k, v.asText());
        }
    }
}
