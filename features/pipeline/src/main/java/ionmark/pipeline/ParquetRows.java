package ionmark.pipeline;

import java.util.Map;

import org.apache.parquet.example.data.Group;
import org.apache.parquet.example.data.simple.SimpleGroupFactory;
import org.apache.parquet.schema.LogicalTypeAnnotation;
import org.apache.parquet.schema.MessageType;
import org.apache.parquet.schema.PrimitiveType.PrimitiveTypeName;
import org.apache.parquet.schema.Types;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

/**
 * One Parquet row per JSON record (structure and pH), for analytics: the record's scalar fields as columns,
 * {@code macroPka} as a list, {@code sites} as a list of structs, the charge-state fractions as a map. Built from
 * the JSON text itself, so a row never says anything its record does not. Column names are the record's keys.
 */
final class ParquetRows {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final LogicalTypeAnnotation STRING = LogicalTypeAnnotation.stringType();

    static final MessageType SCHEMA = Types.buildMessage()
            .required(PrimitiveTypeName.BINARY).as(STRING).named("id")
            .optional(PrimitiveTypeName.BINARY).as(STRING).named("input")
            .optional(PrimitiveTypeName.BINARY).as(STRING).named("smiles")
            .optional(PrimitiveTypeName.DOUBLE).named("pH")
            .optional(PrimitiveTypeName.DOUBLE).named("temperatureC")
            .optional(PrimitiveTypeName.DOUBLE).named("ionicStrengthM")
            .optional(PrimitiveTypeName.BINARY).as(STRING).named("error")
            .optional(PrimitiveTypeName.DOUBLE).named("netCharge")
            .optional(PrimitiveTypeName.DOUBLE).named("fractionNeutral")
            .optional(PrimitiveTypeName.DOUBLE).named("fractionUncharged")
            .optional(PrimitiveTypeName.DOUBLE).named("logP")
            .optional(PrimitiveTypeName.DOUBLE).named("logD")
            .optional(PrimitiveTypeName.DOUBLE).named("isoelectricPoint")
            .optionalList().requiredElement(PrimitiveTypeName.DOUBLE).named("macroPka")
            .optionalMap().key(PrimitiveTypeName.INT32).requiredValue(PrimitiveTypeName.DOUBLE).named("chargeStates")
            .optionalList().requiredGroupElement()
                .required(PrimitiveTypeName.INT32).named("atom")
                .required(PrimitiveTypeName.BINARY).as(STRING).named("element")
                .required(PrimitiveTypeName.BINARY).as(STRING).named("group")
                .required(PrimitiveTypeName.BINARY).as(STRING).named("type")
                .optional(PrimitiveTypeName.DOUBLE).named("pka")
                .optional(PrimitiveTypeName.DOUBLE).named("sd")
                .optional(PrimitiveTypeName.DOUBLE).named("protonated")
                .optional(PrimitiveTypeName.BINARY).as(STRING).named("basis")
                .named("sites")
            .optionalList().requiredElement(PrimitiveTypeName.BINARY).as(STRING).named("warnings")
            .optional(PrimitiveTypeName.BOOLEAN).named("brief")
            .optional(PrimitiveTypeName.BINARY).as(STRING).named("tableVersion")
            .named("ionmark_record");

    private ParquetRows() {
    }

    /** The row of one JSON record ({@code batch}'s contract). */
    static Group of(String record) {
        JsonNode r;
        try {
            r = JSON.readTree(record);
        } catch (java.io.IOException e) {
            throw new IllegalArgumentException("not a JSON record: " + e.getMessage(), e);
        }
        Group g = new SimpleGroupFactory(SCHEMA).newGroup();
        text(g, "id", r.path("id"));
        text(g, "input", r.path("input"));
        text(g, "smiles", r.path("smiles"));
        JsonNode c = r.path("conditions");
        number(g, "pH", c.path("pH"));
        number(g, "temperatureC", c.path("temperatureC"));
        number(g, "ionicStrengthM", c.path("ionicStrengthM"));
        text(g, "error", r.path("error"));
        for (String k : new String[] {"netCharge", "fractionNeutral", "fractionUncharged", "logP", "logD",
                "isoelectricPoint"}) {
            number(g, k, r.path(k));
        }
        if (r.path("macroPka").isArray()) {
            Group list = g.addGroup("macroPka");
            r.path("macroPka").forEach(v -> list.addGroup("list").append("element", v.asDouble()));
        }
        if (r.path("chargeStates").isObject()) {
            Group map = g.addGroup("chargeStates");
            for (Map.Entry<String, JsonNode> e : r.path("chargeStates").properties()) {
                map.addGroup("key_value").append("key", Integer.parseInt(e.getKey())).append("value",
                        e.getValue().asDouble());
            }
        }
        if (r.path("sites").isArray()) {
            Group list = g.addGroup("sites");
            for (JsonNode s : r.path("sites")) {
                Group e = list.addGroup("list").addGroup("element");
                e.append("atom", s.path("atom").asInt()).append("element", s.path("element").asText())
                        .append("group", s.path("group").asText()).append("type", s.path("type").asText());
                number(e, "pka", s.path("pka"));
                number(e, "sd", s.path("sd"));
                number(e, "protonated", s.path("protonated"));
                text(e, "basis", s.path("basis"));
            }
        }
        if (r.path("warnings").isArray()) {
            Group list = g.addGroup("warnings");
            r.path("warnings").forEach(v -> list.addGroup("list").append("element", v.asText()));
        }
        if (r.has("brief")) {
            g.append("brief", r.path("brief").asBoolean());
        }
        text(g, "tableVersion", r.path("tableVersion"));
        return g;
    }

    private static void text(Group g, String k, JsonNode v) {
        if (v.isTextual()) {
            g.append(k, v.asText());
        }
    }

    private static void number(Group g, String k, JsonNode v) {
        if (v.isNumber()) {
            g.append(k, v.asDouble());
        }
    }
}
