package ionmark.pipeline;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Site;
import ionmark.speciation.api.Term;

/**
 * What a table change does to one structure at one pH: the dominant charge state and the fraction neutral
 * before and after, and the derivation lines that differ. A structure is reported when its dominant charge
 * state changes, its fraction neutral moves by more than the threshold, or it starts or stops failing.
 */
public final class Impact {
    private static final ObjectMapper JSON = new ObjectMapper();

    private Impact() {
    }

    public static Optional<ObjectNode> compare(Structure s, double ph, Analysis before, Analysis after,
            double threshold) {
        ObjectNode o = row(s, ph, before, after, threshold);
        return o.path("changed").isEmpty() ? Optional.empty() : Optional.of(o);
    }

    /**
     * The comparison whatever its outcome: {@code changed} lists why it is reported (empty: it is not), and
     * the before/after values, the change and the differing derivation lines follow either way (the impact
     * job's Parquet rows hold every structure and pH).
     */
    public static ObjectNode row(Structure s, double ph, Analysis before, Analysis after, double threshold) {
        boolean errorChanged = before.ok() != after.ok();
        Integer cb = dominant(before.chargeStates());
        Integer ca = dominant(after.chargeStates());
        double fb = before.fractionNeutral() == null ? Double.NaN : before.fractionNeutral();
        double fa = after.fractionNeutral() == null ? Double.NaN : after.fractionNeutral();
        boolean chargeChanged = cb != null && ca != null && !cb.equals(ca);
        double delta = fa - fb;
        boolean fractionChanged = Math.abs(delta) > threshold;
        ObjectNode o = JSON.createObjectNode();
        o.put("id", s.id());
        o.put("source", s.source());
        o.put("input", s.text());
        if (Double.isNaN(ph)) {
            o.putNull("pH");
        } else {
            o.put("pH", ph);
        }
        if (s.pinnedVersion() > 0) {
            o.put("pinnedTableVersion", s.pinnedVersion());
        }
        List<String> why = new ArrayList<>();
        if (chargeChanged) {
            why.add("charge state");
        }
        if (fractionChanged) {
            why.add("fraction neutral");
        }
        if (errorChanged) {
            why.add(after.ok() ? "no longer fails" : "now fails");
        }
        why.forEach(o.putArray("changed")::add);
        side(o.putObject("before"), before, cb);
        side(o.putObject("after"), after, ca);
        if (!Double.isNaN(delta)) {
            o.put("deltaFractionNeutral", round4(delta));
        }
        derivations(o.putArray("derivationChanges"), before, after);
        return o;
    }

    private static void side(ObjectNode o, Analysis a, Integer dominant) {
        o.put("tableVersion", a.tableVersion());
        if (!a.ok()) {
            o.put("error", a.error());
            return;
        }
        if (dominant == null) {
            o.putNull("dominantCharge");
        } else {
            o.put("dominantCharge", dominant);
        }
        if (a.fractionNeutral() == null) {
            o.putNull("fractionNeutral");
        } else {
            o.put("fractionNeutral", round4(a.fractionNeutral()));
        }
        ArrayNode m = o.putArray("macroPka");
        a.macroPka().forEach(v -> m.add(Math.round(v * 100) / 100.0));
    }

    /** Per site (atom and group), the derivation lines only one side has: "-" before, "+" after. */
    private static void derivations(ArrayNode out, Analysis before, Analysis after) {
        Set<String> keys = new LinkedHashSet<>();
        before.sites().forEach(x -> keys.add(key(x)));
        after.sites().forEach(x -> keys.add(key(x)));
        for (String k : keys) {
            List<String> b = lines(before, k);
            List<String> a = lines(after, k);
            List<String> gone = new ArrayList<>(b);
            gone.removeAll(a);
            List<String> added = new ArrayList<>(a);
            added.removeAll(b);
            if (gone.isEmpty() && added.isEmpty()) {
                continue;
            }
            ObjectNode n = out.addObject();
            n.put("site", k);
            ArrayNode d = n.putArray("lines");
            gone.forEach(x -> d.add("- " + x));
            added.forEach(x -> d.add("+ " + x));
        }
    }

    private static String key(Site s) {
        return s.element() + (s.atom() + 1) + " " + s.group();
    }

    private static List<String> lines(Analysis a, String key) {
        List<String> out = new ArrayList<>();
        for (Site s : a.sites()) {
            if (key(s).equals(key)) {
                out.add(String.format(java.util.Locale.ROOT, "pKa %.2f", s.pka()));
                for (Term t : s.derivation()) {
                    out.add(String.format(java.util.Locale.ROOT, "%s %+.2f", t.label(), t.value()));
                }
            }
        }
        return out;
    }

    /** The charge with the largest fraction, or null without charge states. */
    static Integer dominant(Map<Integer, Double> states) {
        return states.entrySet().stream().max(Map.Entry.comparingByValue()).map(Map.Entry::getKey).orElse(null);
    }

    private static double round4(double v) {
        return Math.round(v * 10000) / 10000.0;
    }
}
