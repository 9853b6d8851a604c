package ionmark.acidity.internal;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.List;
import java.util.TreeMap;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.ClassFit;
import ionmark.acidity.api.GroupClass;
import ionmark.acidity.api.MeasuredCompound;
import ionmark.acidity.api.PairRule;
import ionmark.acidity.api.Resonance;
import ionmark.acidity.api.SiteInteraction;
import ionmark.acidity.api.Substituent;
import ionmark.acidity.api.TableVersion;

/**
 * Writes the table's JSON text canonically (fixed key order, one record per line, so that diffs read well) and
 * its content hash; {@link TableCodec} reads it back.
 */
final class TableWriter {
    private static final ObjectMapper JSON = TableCodec.JSON;
    private static final String FORMAT = TableCodec.FORMAT;
    /** One record per line, with a space after colons and commas so that diffs read well. */
    private static final com.fasterxml.jackson.core.util.MinimalPrettyPrinter ONE_LINE =
            new com.fasterxml.jackson.core.util.MinimalPrettyPrinter() {
                private static final long serialVersionUID = 1L;

                @Override
                public void writeObjectFieldValueSeparator(com.fasterxml.jackson.core.JsonGenerator g)
                        throws java.io.IOException {
                    g.writeRaw(": ");
                }

                @Override
                public void writeObjectEntrySeparator(com.fasterxml.jackson.core.JsonGenerator g)
                        throws java.io.IOException {
                    g.writeRaw(", ");
                }

                @Override
                public void writeArrayValueSeparator(com.fasterxml.jackson.core.JsonGenerator g)
                        throws java.io.IOException {
                    g.writeRaw(", ");
                }
            };

    private TableWriter() {
    }

    static ObjectNode fitNode(ClassFit x) {
        ObjectNode o = JSON.createObjectNode();
        o.put("source", x.source());
        if (!x.date().isEmpty()) {
            o.put("date", x.date());
        }
        if (x.n() > 0) {
            o.put("n", x.n());
        }
        num(o, "rmse", x.rmse());
        if (!x.before().isEmpty()) {
            ObjectNode b = o.putObject("before");
            x.before().forEach(b::put);
        }
        if (!x.after().isEmpty()) {
            ObjectNode a = o.putObject("after");
            x.after().forEach(a::put);
        }
        if (!x.log().isEmpty()) {
            o.put("log", x.log());
        }
        return o;
    }


    static String write(AcidityTable t) {
        String content = writeContent(t);
        TableVersion v = t.version();
        ObjectNode vn = JSON.createObjectNode();
        vn.put("number", v.number());
        vn.put("author", v.author());
        vn.put("time", v.time());
        vn.put("comment", v.comment());
        vn.put("hash", hash(t));
        vn.put("parent", v.parent());
        return "{\n  \"format\": \"" + FORMAT + "\",\n  \"version\": " + line(vn) + ",\n" + content + "}\n";
    }

    /** SHA-256 over the canonical content (everything except the version block). */
    static String hash(AcidityTable t) {
        try {
            byte[] d = MessageDigest.getInstance("SHA-256").digest(writeContent(t).getBytes(StandardCharsets.UTF_8));
            return HexFormat.of().formatHex(d);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required by every Java platform", e);
        }
    }

    private static String writeContent(AcidityTable t) {
        StringBuilder sb = new StringBuilder();
        block(sb, "references", t.references().stream().map(r -> {
            ObjectNode o = JSON.createObjectNode();
            o.put("id", r.id());
            o.put("citation", r.citation());
            return o;
        }).toList(), false);
        block(sb, "groups", t.groups().stream().map(g -> withFit(groupNode(g), t.fit(g.id()))).toList(), false);
        block(sb, "substituents", t.substituents().stream().map(TableWriter::substituentNode).toList(), false);
        block(sb, "measured", t.measured().stream().map(TableWriter::measuredNode).toList(), false);
        if (!t.pairs().isEmpty()) { // absent when empty: older tables keep their content hash
            block(sb, "pairs", t.pairs().stream().map(r -> withFit(pairNode(r), t.fit("pair:" + r.id()))).toList(),
                    false);
        }
        SiteInteraction si = t.interaction();
        ObjectNode in = JSON.createObjectNode();
        ArrayNode sh = in.putArray("shifts");
        si.shifts().forEach(s -> sh.addArray().add((int) s[0]).add(s[1]));
        in.put("decay", si.decay());
        in.put("cutoff", si.cutoff());
        in.put("source", si.source());
        if (!si.exempt().isEmpty()) { // absent when empty: older tables keep their content hash
            ArrayNode ex = in.putArray("exempt");
            si.exempt().forEach(ex::add);
        }
        if (!si.reach().isEmpty()) { // absent when empty: older tables keep their content hash
            ObjectNode re = in.putObject("reach");
            si.reach().forEach(re::put);
        }
        sb.append("  \"interaction\": ").append(line(in)).append('\n');
        return sb.toString();
    }

    private static void block(StringBuilder sb, String key, List<ObjectNode> rows, boolean last) {
        sb.append("  \"").append(key).append("\": [");
        for (int i = 0; i < rows.size(); i++) {
            sb.append(i == 0 ? "\n    " : ",\n    ").append(line(rows.get(i)));
        }
        sb.append(rows.isEmpty() ? "]" : "\n  ]").append(last ? "\n" : ",\n");
    }

    private static ObjectNode withFit(ObjectNode o, java.util.Optional<ClassFit> fit) {
        fit.ifPresent(x -> o.set("fit", fitNode(x)));
        return o;
    }

    static ObjectNode groupNode(GroupClass g) {
        ObjectNode o = JSON.createObjectNode();
        o.put("id", g.id());
        o.put("name", g.name());
        o.put("smarts", g.smarts());
        o.put("type", g.type().label());
        num(o, "pka", g.pka());
        o.put("relation", g.relation().label());
        num(o, "rho", g.rho());
        num(o, "attenuation", g.attenuation());
        if (g.resonance() != Resonance.PARA) {
            o.put("resonance", g.resonance().code());
        }
        num(o, "enthalpy", g.enthalpy());
        o.put("sd", g.sd());
        if (g.permanent()) {
            o.put("permanent", true);
        }
        ObjectNode s = o.putObject("sources");
        new TreeMap<>(g.sources()).forEach(s::put);
        if (!g.note().isEmpty()) {
            o.put("note", g.note());
        }
        if (!g.matches().isEmpty()) {
            g.matches().forEach(o.putArray("matches")::add);
        }
        if (!g.misses().isEmpty()) {
            g.misses().forEach(o.putArray("misses")::add);
        }
        return o;
    }

    static ObjectNode substituentNode(Substituent x) {
        ObjectNode o = JSON.createObjectNode();
        o.put("id", x.id());
        o.put("name", x.name());
        o.put("smarts", x.smarts());
        num(o, "sigmaMeta", x.sigmaMeta());
        num(o, "sigmaPara", x.sigmaPara());
        num(o, "sigmaParaMinus", x.sigmaParaMinus());
        num(o, "sigmaParaPlus", x.sigmaParaPlus());
        num(o, "sigmaI", x.sigmaI());
        ObjectNode s = o.putObject("sources");
        new TreeMap<>(x.sources()).forEach(s::put);
        return o;
    }

    static ObjectNode measuredNode(MeasuredCompound m) {
        ObjectNode o = JSON.createObjectNode();
        o.put("id", m.id());
        o.put("name", m.name());
        o.put("smiles", m.smiles());
        ArrayNode a = o.putArray("pka");
        m.pka().forEach(a::add);
        o.put("temperature", m.temperature());
        o.put("ionicStrength", m.ionicStrength());
        o.put("method", m.method());
        o.put("source", m.source());
        ArrayNode g = o.putArray("groups");
        m.groups().forEach(g::add);
        return o;
    }

    static ObjectNode pairNode(PairRule r) {
        ObjectNode o = JSON.createObjectNode();
        o.put("id", r.id());
        o.put("name", r.name());
        o.put("smarts", r.smarts());
        o.put("singly", r.singly());
        o.put("doubly", r.doubly());
        o.put("source", r.source());
        if (!r.note().isEmpty()) {
            o.put("note", r.note());
        }
        ArrayNode m = o.putArray("matches");
        r.matches().forEach(m::add);
        return o;
    }

    static void num(ObjectNode o, String k, double v) {
        if (!Double.isNaN(v)) {
            o.put(k, v);
        }
    }

    private static String line(JsonNode n) {
        try {
            return JSON.writer(ONE_LINE).writeValueAsString(n);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }
}
