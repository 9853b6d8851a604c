package ionmark.console.internal;

import java.util.Locale;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Profile;
import ionmark.speciation.api.Site;
import ionmark.speciation.api.Species;
import ionmark.speciation.api.Term;
import ionmark.speciation.api.Window;
import ionmark.acidity.api.SiteType;

/**
 * The output contract shared by {@code check}, {@code batch} and the pipeline module: one JSON object per
 * record. Public for that module; not an exported API.
 */
public final class AnalysisJson {
    static final ObjectMapper JSON = new ObjectMapper();
    /** What the keys of a full record say when the analysis has no profile: nothing (empty, null). */
    private static final Profile NO_PROFILE = new Profile(java.util.List.of(), null, Double.NaN, null,
            java.util.List.of(), java.util.List.of());

    private AnalysisJson() {
    }

    public static ObjectNode of(String id, Analysis a) {
        return of(id, a, false);
    }

    /** The answer when there is no analysis at all (a usage problem, an unreadable file): still one JSON object. */
    static ObjectNode error(String message) {
        ObjectNode o = JSON.createObjectNode();
        o.put("error", message);
        o.putArray("sites");
        o.putArray("macroPka");
        return o;
    }

    /**
     * {@code brief}: the record of {@code Speciation.screen}, which has no species, logP, logD,
     * windows or isoelectric point; those keys are left out and {@code "brief": true} says why.
     */
    public static ObjectNode of(String id, Analysis a, boolean brief) {
        ObjectNode o = JSON.createObjectNode();
        if (id != null) {
            o.put("id", id);
        }
        o.put("input", a.input());
        if (!a.ok()) {
            o.put("error", a.error());
            if (a.errorPosition() != null) {
                // where the reader stopped: a character offset into the SMILES, or a 0-based atom index
                o.putObject("errorPosition").put("unit", a.errorPosition().unit().name().toLowerCase(Locale.ROOT))
                        .put("index", a.errorPosition().index());
            }
            o.put("tableVersion", a.tableVersion());
            o.putArray("sites");
            o.putArray("macroPka");
            return o;
        }
        o.put("smiles", a.smiles());
        ArrayNode sites = o.putArray("sites");
        ArrayNode fixed = o.putArray("fixedCharges");
        for (Site s : a.sites()) {
            if (s.permanent()) {
                fixed.addObject().put("atom", s.atom()).put("element", s.element()).put("group", s.group())
                        .put("charge", s.type() == SiteType.BASE ? 1 : -1);
                continue;
            }
            ObjectNode n = sites.addObject();
            n.put("atom", s.atom());
            n.put("element", s.element());
            n.put("group", s.group());
            n.put("groupName", s.groupName());
            n.put("type", s.type().label());
            num(n, "pka", s.pka());
            n.put("sd", round(s.sd()));
            if (s.protonated() != null) {
                n.put("protonated", round4(s.protonated()));
            } else {
                n.putNull("protonated");
            }
            n.put("basis", s.basis().label());
            ArrayNode d = n.putArray("derivation");
            for (Term t : s.derivation()) {
                d.addObject().put("term", t.label()).put("value", round(t.value())).put("source", t.source());
            }
        }
        ArrayNode macro = o.putArray("macroPka");
        a.macroPka().forEach(v -> macro.add(round(v)));
        ObjectNode c = o.putObject("conditions");
        if (a.conditions().hasPh()) {
            c.put("pH", a.conditions().ph());
        } else {
            c.putNull("pH");
        }
        c.put("temperatureC", a.conditions().temperature());
        c.put("ionicStrengthM", a.conditions().ionicStrength());
        nullable(o, "netCharge", a.netCharge());
        nullable(o, "fractionNeutral", a.fractionNeutral()); // net charge 0, zwitterions included
        nullable(o, "fractionUncharged", a.fractionUncharged()); // no charged site at all
        ObjectNode cs = o.putObject("chargeStates");
        a.chargeStates().entrySet().stream().sorted(java.util.Map.Entry.comparingByKey())
                .forEach(e -> cs.put(String.valueOf(e.getKey()), round4(e.getValue())));
        if (brief) {
            o.put("brief", true);
        } else {
            Profile p = a.hasProfile() ? a.profile() : NO_PROFILE;
            ArrayNode sp = o.putArray("species");
            for (Species s : p.species()) {
                sp.addObject().put("smiles", s.smiles()).put("charge", s.charge()).put("fraction", round4(s.fraction()));
            }
            nullable(o, "isoelectricPoint", p.isoelectricPoint());
            num(o, "logP", p.logP());
            nullable(o, "logD", p.logD());
            windows(o.putArray("neutralWindows"), p.neutralWindows()); // by fractionNeutral
            windows(o.putArray("chargedWindows"), p.chargedWindows());
        }
        a.corrections().forEach(o.putArray("corrections")::add);
        ArrayNode w = o.putArray("warnings");
        a.warnings().forEach(w::add);
        if (!a.stripped().isEmpty()) {
            a.stripped().forEach(o.putArray("stripped")::add);
        }
        o.put("sampled", a.sampled());
        o.put("tableVersion", a.tableVersion());
        return o;
    }

    private static void windows(ArrayNode arr, java.util.List<Window> ws) {
        ws.forEach(x -> arr.addArray().add(x.from()).add(x.to()));
    }

    private static void nullable(ObjectNode o, String k, Double v) {
        if (v == null || v.isNaN()) {
            o.putNull(k);
        } else {
            o.put(k, round4(v));
        }
    }

    private static void num(ObjectNode o, String k, double v) {
        if (Double.isNaN(v)) {
            o.putNull(k);
        } else {
            o.put(k, round(v));
        }
    }

    static double round(double v) {
        return Math.round(v * 100) / 100.0;
    }

    static double round4(double v) {
        return Math.round(v * 10000) / 10000.0;
    }
}
