package ionmark.acidity.internal;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.TreeMap;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.util.DefaultIndenter;
import com.fasterxml.jackson.core.util.DefaultPrettyPrinter;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.ClassFit;
import ionmark.acidity.api.GroupClass;
import ionmark.acidity.api.PairRule;
import ionmark.acidity.api.Problem;
import ionmark.acidity.api.Reference;

/**
 * Takes a one-file table apart into the curated base and the fitted overlay: the base table gives
 * what chemists wrote, the calibrated table what a calibration set. Calibration logs found in the
 * calibrated table's notes go to the overlay's provenance, not into the curated notes. The split
 * is checked: the two files built again must give the calibrated table, number for number and
 * pattern for pattern.
 */
final class TableSplitter {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final Pattern DATE = Pattern.compile("\\((\\d{4}-\\d{2}-\\d{2})\\)");
    private static final Pattern N = Pattern.compile("(?:n=(\\d+)|(\\d+) compounds)");
    private static final Pattern RMSE = Pattern.compile("RMSE ([0-9.]+)");

    /** The fragments every split starts from (more come from an existing curated file). */
    static final Map<String, String> DEFAULT_FRAGMENTS = defaults();

    private TableSplitter() {
    }

    private static Map<String, String> defaults() {
        Map<String, String> m = new LinkedHashMap<>();
        m.put("not-beside-n-oxide", "!$(n1:a:[n+]([O-]):a:a:a1);!$(n1:a:a:[n+]([O-]):a:a1);!$(n1:[n+]([O-]):a:a:a:a1)");
        m.put("not-amide-like-n", "!$([#7]~[#6]=[O,S])");
        m.put("not-acyl-n", "!$(N[#6]=[O,S,N])");
        m.put("not-aryl-n", "!$(N[a])");
        m.put("not-n-on-heteroatom", "!$(N[!#6;!#1])");
        m.put("not-enamine-n", "!$(N[CX3]=[CX3])");
        return m;
    }

    /** The two texts of a split. */
    record Split(String curated, String fitted) {
    }

    static Split split(AcidityTable base, AcidityTable calibrated, Map<String, String> fragments) {
        String curated = pretty(curated(base, fragments));
        String fitted = pretty(fitted(base, calibrated));
        List<Problem> problems = new ArrayList<>();
        AcidityTable built = build(curated, fitted, problems);
        if (built == null || !fingerprint(built).equals(fingerprint(calibrated))) {
            throw new IllegalStateException("the split does not give the calibrated table back: " + problems
                    + (built == null ? "" : "; first difference: " + firstDifference(built, calibrated)));
        }
        return new Split(curated, fitted);
    }

    /** The one-file table from the two texts, or null with problems. */
    static AcidityTable build(String curated, String fitted, List<Problem> problems) {
        try {
            ObjectNode tree = SplitFormat.build(JSON.readTree(curated), fitted == null ? null : JSON.readTree(fitted),
                    problems);
            boolean joined = problems.stream().noneMatch(p -> p.severity() == Problem.Severity.ERROR);
            var r = TableValidator.validate(JSON.writeValueAsString(tree));
            problems.addAll(r.problems());
            return r.table().filter(t -> joined).map(t -> t.withVersion(new ionmark.acidity.api.TableVersion(t.version().number(),
                    t.version().author(), t.version().time(), t.version().comment(), TableWriter.hash(t),
                    t.version().parent()))).orElse(null);
        } catch (IOException e) {
            problems.add(TableCodec.error("$", "not valid JSON: " + e.getMessage()));
            return null;
        }
    }

    private static ObjectNode curated(AcidityTable base, Map<String, String> fragments) {
        ObjectNode o = JSON.createObjectNode();
        o.put("format", SplitFormat.CURATED);
        ObjectNode v = o.putObject("version");
        v.put("number", base.version().number());
        v.put("author", base.version().author());
        v.put("time", base.version().time());
        v.put("comment", base.version().comment());
        v.put("hash", "");
        v.put("parent", base.version().parent());
        var refs = o.putArray("references");
        base.references().forEach(r -> refs.addObject().put("id", r.id()).put("citation", r.citation()));
        ObjectNode frag = o.putObject("fragments");
        fragments.forEach(frag::put);
        var groups = o.putArray("groups");
        for (GroupClass g : base.groups()) {
            ObjectNode n = TableWriter.groupNode(g);
            n.put("smarts", SplitFormat.abbreviate(g.smarts(), fragments));
            groups.add(n);
        }
        var subs = o.putArray("substituents");
        base.substituents().forEach(x -> subs.add(TableWriter.substituentNode(x)));
        var measured = o.putArray("measured");
        base.measured().forEach(x -> measured.add(TableWriter.measuredNode(x)));
        var pairs = o.putArray("pairs");
        base.pairs().forEach(x -> pairs.add(TableWriter.pairNode(x).put("smarts",
                SplitFormat.abbreviate(x.smarts(), fragments))));
        ObjectNode in = o.putObject("interaction");
        var sh = in.putArray("shifts");
        base.interaction().shifts().forEach(s -> sh.addArray().add((int) s[0]).add(s[1]));
        in.put("decay", base.interaction().decay());
        in.put("cutoff", base.interaction().cutoff());
        in.put("source", base.interaction().source());
        if (!base.interaction().exempt().isEmpty()) {
            base.interaction().exempt().forEach(in.putArray("exempt")::add);
        }
        if (!base.interaction().reach().isEmpty()) { // curated reach factors (set by hand, with a source)
            ObjectNode reach = in.putObject("reach");
            base.interaction().reach().forEach(reach::put);
        }
        return o;
    }

    private static ObjectNode fitted(AcidityTable base, AcidityTable cal) {
        ObjectNode o = JSON.createObjectNode();
        o.put("format", SplitFormat.FITTED);
        ObjectNode v = o.putObject("version");
        v.put("number", cal.version().number());
        v.put("author", cal.version().author());
        v.put("time", cal.version().time());
        v.put("comment", cal.version().comment());
        v.put("hash", "");
        v.put("parent", cal.version().parent());
        var refs = o.putArray("references");
        for (Reference r : cal.references()) {
            if (base.references().stream().noneMatch(b -> b.id().equals(r.id()))) {
                refs.addObject().put("id", r.id()).put("citation", r.citation());
            }
        }
        ObjectNode classes = o.putObject("classes");
        for (GroupClass g : cal.groups()) {
            GroupClass b = base.group(g.id()).orElse(null);
            if (b == null) {
                throw new IllegalStateException("class '" + g.id() + "' is in the calibrated table but not in the base");
            }
            ObjectNode e = JSON.createObjectNode();
            Map<String, Double> before = new TreeMap<>();
            Map<String, Double> after = new TreeMap<>();
            double[] bv = {b.pka(), b.rho(), b.attenuation(), b.sd()};
            double[] cv = {g.pka(), g.rho(), g.attenuation(), g.sd()};
            for (int i = 0; i < cv.length; i++) {
                if (!same(bv[i], cv[i])) {
                    String f = SplitFormat.FITTED_FIELDS.get(i);
                    TableWriter.num(e, f, cv[i]);
                    put(before, f, bv[i]);
                    put(after, f, cv[i]);
                }
            }
            Double reach = cal.interaction().reach().get(g.id());
            if (reach != null && !reach.equals(base.interaction().reach().get(g.id()))) {
                e.put("reach", reach);
                put(before, "reach", base.interaction().reach().getOrDefault(g.id(), 1.0));
                put(after, "reach", reach);
            }
            ObjectNode src = JSON.createObjectNode();
            new TreeMap<>(g.sources()).forEach((k, s) -> {
                if (!s.equals(b.sources().get(k))) {
                    src.put(k, s);
                }
            });
            if (!src.isEmpty()) {
                e.set("sources", src);
            }
            String log = log(b.note(), g.note());
            if (!e.isEmpty() || !log.isEmpty()) {
                ClassFit known = cal.fit(g.id()).orElse(null);
                e.set("fit", TableWriter.fitNode(log.isEmpty() && known != null ? known
                        : provenance(src, log, cal, before, after)));
                classes.set(g.id(), e);
            }
        }
        ObjectNode pairs = o.putObject("pairs");
        for (PairRule r : cal.pairs()) {
            PairRule b = base.pairs().stream().filter(x -> x.id().equals(r.id())).findFirst().orElseThrow(() ->
                    new IllegalStateException("pair rule '" + r.id() + "' is in the calibrated table but not in the base"));
            ObjectNode e = JSON.createObjectNode();
            Map<String, Double> before = new TreeMap<>();
            Map<String, Double> after = new TreeMap<>();
            if (!same(b.singly(), r.singly())) {
                e.put("singly", r.singly());
                put(before, "singly", b.singly());
                put(after, "singly", r.singly());
            }
            if (!same(b.doubly(), r.doubly())) {
                e.put("doubly", r.doubly());
                put(before, "doubly", b.doubly());
                put(after, "doubly", r.doubly());
            }
            ObjectNode src = JSON.createObjectNode();
            if (!r.source().equals(b.source())) {
                e.put("source", r.source());
                src.put("singly", r.source());
            }
            String log = log(b.note(), r.note());
            if (!e.isEmpty() || !log.isEmpty()) {
                ClassFit known = cal.fit("pair:" + r.id()).orElse(null);
                e.set("fit", TableWriter.fitNode(log.isEmpty() && known != null ? known
                        : provenance(src, log, cal, before, after)));
                pairs.set(r.id(), e);
            }
        }
        o.put("fingerprint", fingerprint(cal));
        return o;
    }

    private static void put(Map<String, Double> m, String k, double v) {
        if (!Double.isNaN(v)) {
            m.put(k, v);
        }
    }

    private static boolean same(double a, double b) {
        return Double.isNaN(a) ? Double.isNaN(b) : a == b;
    }

    /** The calibration's words: what the calibrated note says beyond the curator's note. */
    static String log(String curated, String calibrated) {
        if (calibrated.equals(curated)) {
            return "";
        }
        if (!curated.isEmpty() && calibrated.startsWith(curated + "; ")) {
            return calibrated.substring(curated.length() + 2);
        }
        return calibrated;
    }

    private static ClassFit provenance(ObjectNode sources, String log, AcidityTable cal, Map<String, Double> before,
            Map<String, Double> after) {
        Map<String, Integer> count = new TreeMap<>();
        sources.forEach(s -> count.merge(s.asText(), 1, Integer::sum));
        String source = count.entrySet().stream().max(Map.Entry.comparingByValue()).map(Map.Entry::getKey)
                .orElse(log.contains(" ") ? log.substring(0, log.indexOf(' ')) : "");
        Matcher d = DATE.matcher(log);
        String date = d.find() ? d.group(1) : cal.version().time().length() >= 10 ? cal.version().time().substring(0, 10) : "";
        int n = 0;
        Matcher m = N.matcher(log);
        while (m.find()) {
            n = Math.max(n, Integer.parseInt(m.group(1) != null ? m.group(1) : m.group(2)));
        }
        Matcher r = RMSE.matcher(log);
        double rmse = r.find() ? Double.parseDouble(r.group(1)) : Double.NaN;
        return new ClassFit(source, date, n, rmse, before, after, log);
    }

    /**
     * SHA-256 over everything a prediction can depend on: version numbers, references (by id),
     * classes, substituents, measured compounds, pair rules and the interaction rule, without the
     * curators' notes and the fit provenance.
     */
    static String fingerprint(AcidityTable t) {
        AcidityTable bare = t.withFits(Map.of())
                .withGroups(t.groups().stream().map(g -> new GroupClass(g.id(), g.name(), g.smarts(), g.type(), g.pka(),
                        g.relation(), g.rho(), g.attenuation(), g.resonance(), g.enthalpy(), g.sd(), g.permanent(),
                        g.sources(), "", g.matches(), g.misses())).toList())
                .withPairs(t.pairs().stream().map(r -> new PairRule(r.id(), r.name(), r.smarts(), r.singly(), r.doubly(),
                        r.source(), "", r.matches())).toList())
                .withReferences(t.references().stream().sorted(Comparator.comparing(Reference::id)).toList());
        var v = t.version();
        String text = v.number() + "|" + v.author() + "|" + v.time() + "|" + v.comment() + "|" + v.parent() + "\n"
                + TableWriter.write(bare.withVersion(new ionmark.acidity.api.TableVersion(0, "", "", "", "", 0)));
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256")
                    .digest(text.getBytes(StandardCharsets.UTF_8)));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }

    /** The first line where the two tables' fingerprint texts differ, for the error message. */
    static String firstDifference(AcidityTable a, AcidityTable b) {
        String[] x = TableWriter.write(a.withFits(Map.of())).split("\n");
        String[] y = TableWriter.write(b.withFits(Map.of())).split("\n");
        for (int i = 0; i < Math.min(x.length, y.length); i++) {
            if (!Objects.equals(x[i], y[i])) {
                return "line " + (i + 1) + ":\n  built:      " + x[i] + "\n  calibrated: " + y[i];
            }
        }
        return "lengths " + x.length + " and " + y.length;
    }

    /** Pretty JSON: one field per line, lists of numbers and text on one line, two-space indent. */
    static String pretty(JsonNode n) {
        DefaultPrettyPrinter p = new DefaultPrettyPrinter() {
            private static final long serialVersionUID = 1L;

            @Override
            public DefaultPrettyPrinter createInstance() {
                return this;
            }

            @Override
            public void writeObjectFieldValueSeparator(JsonGenerator g) throws IOException {
                g.writeRaw(": ");
            }
        };
        p.indentObjectsWith(new DefaultIndenter("  ", "\n"));
        p.indentArraysWith(new DefaultIndenter("  ", "\n") {
            private static final long serialVersionUID = 1L;
        });
        try {
            return inlineScalarLists(JSON.writer(p).writeValueAsString(n)) + "\n";
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Puts lists that hold only numbers or text on one line ("matches": ["CCN", "CCCN"]). */
    private static String inlineScalarLists(String text) {
        Pattern list = Pattern.compile("\\[\\s*\\n((?:\\s*(?:\"(?:[^\"\\\\]|\\\\.)*\"|-?[0-9.eE+-]+),?\\n)*?)\\s*]");
        Matcher m = list.matcher(text);
        StringBuilder sb = new StringBuilder();
        while (m.find()) {
            String[] items = m.group(1).strip().split(",?\\n\\s*");
            StringBuilder one = new StringBuilder("[");
            for (int i = 0; i < items.length; i++) {
                one.append(i == 0 ? "" : ", ").append(items[i].strip().replaceAll(",$", ""));
            }
            m.appendReplacement(sb, Matcher.quoteReplacement(one.append(']').toString()));
        }
        m.appendTail(sb);
        return sb.toString().replace("[ ]", "[]").replace("{ }", "{}");
    }
}
