package ionmark.acidity.internal;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

import org.openscience.cdk.exception.InvalidSmilesException;
import org.openscience.cdk.interfaces.IAtomContainer;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.GroupClass;
import ionmark.acidity.api.MeasuredCompound;
import ionmark.acidity.api.Problem;
import ionmark.acidity.api.Reference;
import ionmark.acidity.api.Relation;
import ionmark.acidity.api.PairRule;
import ionmark.acidity.api.SiteInteraction;
import ionmark.acidity.api.SiteType;
import ionmark.acidity.api.Substituent;
import ionmark.acidity.api.ValidationReport;

/** Every check on a table text, all problems reported at once with their JSON paths. */
final class TableValidator {
    private TableValidator() {
    }

    static ValidationReport validate(String json) {
        TableCodec.Read read = TableCodec.read(json);
        List<Problem> problems = new ArrayList<>(read.problems());
        AcidityTable t = read.table();
        if (t != null) {
            check(t, problems);
        }
        boolean ok = problems.stream().noneMatch(p -> p.severity() == Problem.Severity.ERROR);
        return new ValidationReport(problems, ok ? Optional.of(t) : Optional.empty());
    }

    static void check(AcidityTable t, List<Problem> out) {
        Set<String> refIds = new HashSet<>();
        for (int i = 0; i < t.references().size(); i++) {
            Reference r = t.references().get(i);
            if (!r.id().isEmpty() && !refIds.add(r.id())) {
                out.add(err("$.references[" + i + "].id", "duplicate reference id '" + r.id() + "'"));
            }
        }
        Map<String, Patterns.Compiled> compiled = new HashMap<>();
        checkGroups(t, refIds, compiled, out);
        checkOverlaps(t, compiled, out);
        checkSubstituents(t, refIds, out);
        checkMeasured(t, refIds, compiled, out);
        checkInteraction(t.interaction(), refIds, out);
        checkExempt(t, out);
        checkPairs(t, refIds, out);
        checkFits(t, refIds, out);
        if (!t.version().hash().isEmpty() && !t.version().hash().equals(TableWriter.hash(t))) {
            out.add(warn("$.version.hash", "content hash does not match the content (edited by hand?); "
                    + "it is recomputed when the table is written"));
        }
    }

    private static void checkGroups(AcidityTable t, Set<String> refIds, Map<String, Patterns.Compiled> compiled,
            List<Problem> out) {
        Map<String, Integer> ids = new HashMap<>();
        Map<String, Integer> patterns = new HashMap<>();
        for (int i = 0; i < t.groups().size(); i++) {
            GroupClass g = t.groups().get(i);
            String p = "$.groups[" + i + "]";
            Integer prior = ids.putIfAbsent(g.id(), i);
            if (prior != null && !g.id().isEmpty()) {
                out.add(err(p + ".id", "duplicate group id '" + g.id() + "' (first at $.groups[" + prior + "])"));
            }
            Integer same = patterns.putIfAbsent(g.smarts().strip(), i);
            if (same != null && !g.smarts().isBlank()) {
                out.add(err(p + ".smarts", "identical pattern to $.groups[" + same + "] ('" + g.smarts() + "')"));
            }
            Patterns.Compiled c = Patterns.compile(g.smarts(), true);
            if (!c.ok()) {
                if (!g.smarts().isBlank()) {
                    out.add(err(p + ".smarts", c.error()));
                }
            } else {
                compiled.put(g.id(), c);
                examples(g, c, p, out);
            }
            if (Double.isNaN(g.pka()) && !g.permanent()) {
                out.add(err(p + ".pka", "a number is required here (only permanent groups go without a pKa)"));
            }
            range(out, p + ".pka", g.pka(), -5, 20, "pKa");
            range(out, p + ".sd", g.sd(), 0.01, 5, "uncertainty (sd)");
            if (g.relation() != Relation.NONE) {
                if (Double.isNaN(g.rho())) {
                    out.add(err(p + ".rho", "a " + g.relation().label() + " class needs its reaction constant rho"));
                } else {
                    range(out, p + ".rho", g.rho(), -15, 15, "reaction constant");
                }
                if (!Double.isNaN(g.attenuation())) {
                    range(out, p + ".attenuation", g.attenuation(), 0, 1, "attenuation factor");
                }
            }
            if (!Double.isNaN(g.enthalpy())) {
                range(out, p + ".enthalpy", g.enthalpy(), -150, 150, "ionization enthalpy (kJ/mol)");
            }
            sourced(out, p, g.sources(), refIds, "pka", g.pka());
            sourced(out, p, g.sources(), refIds, "sd", g.sd());
            sourced(out, p, g.sources(), refIds, "rho", g.rho());
            sourced(out, p, g.sources(), refIds, "attenuation", g.attenuation());
            sourced(out, p, g.sources(), refIds, "enthalpy", g.enthalpy());
            unknownSourceKeys(out, p, g.sources(), refIds);
        }
    }

    /**
     * Two classes that both claim the site atom of one of their own examples with patterns of the
     * same specificity: table order decides which wins, which a curator should know about.
     */
    private static void checkOverlaps(AcidityTable t, Map<String, Patterns.Compiled> compiled, List<Problem> out) {
        // specificity parses the pattern: once per class, not once per class, example and rival
        int[] specificity = new int[t.groups().size()];
        for (int i = 0; i < specificity.length; i++) {
            specificity[i] = compiled.containsKey(t.groups().get(i).id()) ? ionmark.acidity.patterns.PatternSpecificity.of(t.groups().get(i).smarts()) : -1;
        }
        for (int i = 0; i < t.groups().size(); i++) {
            GroupClass g = t.groups().get(i);
            Patterns.Compiled cg = compiled.get(g.id());
            if (cg == null) {
                continue;
            }
            for (String ex : g.matches()) {
                IAtomContainer mol;
                try {
                    mol = Patterns.parseSmiles(ex);
                } catch (InvalidSmilesException | RuntimeException e) {
                    continue;
                }
                List<Integer> mine = Patterns.siteAtoms(cg, mol);
                for (int j = 0; j < t.groups().size(); j++) {
                    GroupClass o = t.groups().get(j);
                    Patterns.Compiled co = compiled.get(o.id());
                    if (j == i || co == null || specificity[j] != specificity[i]) {
                        continue;
                    }
                    List<Integer> theirs = Patterns.siteAtoms(co, mol);
                    if (theirs.stream().anyMatch(mine::contains)) {
                        out.add(warn("$.groups[" + i + "].smarts", "overlaps with '" + o.id() + "' on example '" + ex
                                + "' with the same specificity: table order decides"));
                    }
                }
            }
        }
    }

    private static void examples(GroupClass g, Patterns.Compiled c, String p, List<Problem> out) {
        mustMatch(g.matches(), c, p, out);
        for (int k = 0; k < g.misses().size(); k++) {
            Optional<IAtomContainer> mol = smiles(g.misses().get(k), p + ".misses[" + k + "]", out);
            if (mol.isPresent() && !Patterns.siteAtoms(c, mol.get()).isEmpty()) {
                out.add(err(p + ".misses[" + k + "]", "the pattern matches '" + g.misses().get(k)
                        + "', listed as an example it must not match"));
            }
        }
    }

    /** Each example in {@code matches} (at {@code p}.matches) must be a SMILES the pattern matches. */
    private static void mustMatch(List<String> matches, Patterns.Compiled c, String p, List<Problem> out) {
        for (int k = 0; k < matches.size(); k++) {
            Optional<IAtomContainer> mol = smiles(matches.get(k), p + ".matches[" + k + "]", out);
            if (mol.isPresent() && Patterns.siteAtoms(c, mol.get()).isEmpty()) {
                out.add(err(p + ".matches[" + k + "]", "the pattern does not match its own example '"
                        + matches.get(k) + "'"));
            }
        }
    }

    private static void checkSubstituents(AcidityTable t, Set<String> refIds, List<Problem> out) {
        Set<String> ids = new HashSet<>();
        for (int i = 0; i < t.substituents().size(); i++) {
            Substituent s = t.substituents().get(i);
            String p = "$.substituents[" + i + "]";
            if (!s.id().isEmpty() && !ids.add(s.id())) {
                out.add(err(p + ".id", "duplicate substituent id '" + s.id() + "'"));
            }
            Patterns.Compiled c = Patterns.compile(s.smarts(), false);
            if (!c.ok() && !s.smarts().isBlank()) {
                out.add(err(p + ".smarts", c.error()));
            }
            for (String f : List.of("sigmaMeta", "sigmaPara", "sigmaParaMinus", "sigmaParaPlus", "sigmaI")) {
                double v = switch (f) {
                    case "sigmaMeta" -> s.sigmaMeta();
                    case "sigmaPara" -> s.sigmaPara();
                    case "sigmaParaMinus" -> s.sigmaParaMinus();
                    case "sigmaParaPlus" -> s.sigmaParaPlus();
                    default -> s.sigmaI();
                };
                if (!Double.isNaN(v)) {
                    range(out, p + "." + f, v, -3, 3, "substituent constant");
                    sourced(out, p, s.sources(), refIds, f, v);
                }
            }
            if (Double.isNaN(s.sigmaMeta()) && Double.isNaN(s.sigmaPara()) && Double.isNaN(s.sigmaI())) {
                out.add(err(p, "a substituent needs at least one of sigmaMeta, sigmaPara, sigmaI"));
            }
            unknownSourceKeys(out, p, s.sources(), refIds);
        }
    }

    private static void checkMeasured(AcidityTable t, Set<String> refIds, Map<String, Patterns.Compiled> compiled,
            List<Problem> out) {
        Set<String> ids = new HashSet<>();
        Set<String> exercised = new HashSet<>();
        for (int i = 0; i < t.measured().size(); i++) {
            MeasuredCompound m = t.measured().get(i);
            String p = "$.measured[" + i + "]";
            if (!m.id().isEmpty() && !ids.add(m.id())) {
                out.add(err(p + ".id", "duplicate measured-compound id '" + m.id() + "'"));
            }
            for (int k = 0; k < m.pka().size(); k++) {
                range(out, p + ".pka[" + k + "]", m.pka().get(k), -5, 20, "pKa");
                if (k > 0 && m.pka().get(k) < m.pka().get(k - 1)) {
                    out.add(err(p + ".pka[" + k + "]", "macroscopic pKa values must be listed in ascending order"));
                }
            }
            range(out, p + ".temperature", m.temperature(), 0, 100, "temperature (°C)");
            range(out, p + ".ionicStrength", m.ionicStrength(), 0, 5, "ionic strength (mol/L)");
            if (m.source().isEmpty()) {
                out.add(err(p + ".source", "a measured value needs its source"));
            } else if (!refIds.contains(m.source())) {
                out.add(err(p + ".source", "unknown reference '" + m.source() + "'"));
            }
            Optional<IAtomContainer> mol = smiles(m.smiles(), p + ".smiles", out);
            for (int k = 0; k < m.groups().size(); k++) {
                String gid = m.groups().get(k);
                if (t.group(gid).isEmpty()) {
                    out.add(err(p + ".groups[" + k + "]", "unknown group class '" + gid + "'"));
                    continue;
                }
                exercised.add(gid);
                Patterns.Compiled c = compiled.get(gid);
                if (mol.isPresent() && c != null && Patterns.siteAtoms(c, mol.get()).isEmpty()) {
                    out.add(err(p + ".groups[" + k + "]", "group class '" + gid + "' does not match "
                            + m.smiles()));
                }
            }
        }
        for (int i = 0; i < t.groups().size(); i++) {
            GroupClass g = t.groups().get(i);
            if (!exercised.contains(g.id()) && !g.id().isEmpty()) {
                out.add(warn("$.groups[" + i + "]", "no measured compound exercises group class '" + g.id() + "'"));
            }
        }
    }

    /**
     * Pair rules: unique ids, a pattern with exactly one atom mapped :1 and one mapped :2, singly
     * and doubly charged terms between 0 and 6 pKa units with their source, and examples the pattern
     * matches.
     */
    private static void checkPairs(AcidityTable t, Set<String> refIds, List<Problem> out) {
        Set<String> ids = new HashSet<>();
        for (int i = 0; i < t.pairs().size(); i++) {
            PairRule r = t.pairs().get(i);
            String p = "$.pairs[" + i + "]";
            if (!r.id().isEmpty() && !ids.add(r.id())) {
                out.add(err(p + ".id", "duplicate pair rule id '" + r.id() + "'"));
            }
            Patterns.Compiled c = Patterns.compile(r.smarts(), true);
            if (!c.ok()) {
                if (!r.smarts().isBlank()) {
                    out.add(err(p + ".smarts", c.error()));
                }
            } else if (Patterns.mapped(r.smarts(), 1) != 1 || Patterns.mapped(r.smarts(), 2) != 1) {
                out.add(err(p + ".smarts", "a pair rule maps exactly one atom :1 and one atom :2 (the two sites)"));
            } else {
                mustMatch(r.matches(), c, p, out);
            }
            range(out, p + ".singly", r.singly(), 0, 6, "singly charged stabilisation (pKa units)");
            range(out, p + ".doubly", r.doubly(), 0, 6, "doubly charged destabilisation (pKa units)");
            if (r.source().isEmpty()) {
                out.add(err(p + ".source", "the pair values need their source"));
            } else if (!refIds.contains(r.source())) {
                out.add(err(p + ".source", "unknown reference '" + r.source() + "'"));
            }
        }
    }

    /** Each class the distance rule leaves out exists and is an acid (only an anion's charge can sit in σ). */
    /** A fit's provenance cites a reference of the table and belongs to a record the table has. */
    private static void checkFits(AcidityTable t, Set<String> refIds, List<Problem> out) {
        for (int i = 0; i < t.groups().size(); i++) {
            var f = t.fit(t.groups().get(i).id());
            if (f.isPresent() && !refIds.contains(f.get().source())) {
                out.add(err("$.groups[" + i + "].fit.source", "unknown reference '" + f.get().source() + "'"));
            }
        }
        for (int i = 0; i < t.pairs().size(); i++) {
            var f = t.fit("pair:" + t.pairs().get(i).id());
            if (f.isPresent() && !refIds.contains(f.get().source())) {
                out.add(err("$.pairs[" + i + "].fit.source", "unknown reference '" + f.get().source() + "'"));
            }
        }
    }

    private static void checkExempt(AcidityTable t, List<Problem> out) {
        List<String> ex = t.interaction().exempt();
        for (int i = 0; i < ex.size(); i++) {
            String id = ex.get(i);
            Optional<GroupClass> g = t.group(id);
            if (g.isEmpty()) {
                out.add(err("$.interaction.exempt[" + i + "]", "unknown group class '" + id + "'"));
            } else if (g.get().type() != SiteType.ACID) {
                out.add(err("$.interaction.exempt[" + i + "]", "'" + id + "' is a base; only an acid's anion can be"
                        + " part of substituent constants"));
            }
        }
        t.interaction().reach().forEach((id, f) -> {
            String p = "$.interaction.reach." + id;
            Optional<GroupClass> g = t.group(id);
            if (g.isEmpty()) {
                out.add(err(p, "unknown group class '" + id + "'"));
            } else if (g.get().source("reach").isBlank()) {
                out.add(err(p, "the reach factor " + f + " has no source: add sources.reach to class '" + id + "'"));
            }
            range(out, p, f, 0.2, 2, "reach factor");
        });
    }

    private static void checkInteraction(SiteInteraction si, Set<String> refIds, List<Problem> out) {
        String p = "$.interaction";
        for (int i = 0; i < si.shifts().size(); i++) {
            double[] s = si.shifts().get(i);
            if (s[0] < 1 || s[0] != Math.rint(s[0])) {
                out.add(err(p + ".shifts[" + i + "]", "bond count must be a whole number of at least 1"));
            }
            range(out, p + ".shifts[" + i + "]", s[1], 0, 10, "interaction (pKa units)");
            if (i > 0 && s[0] <= si.shifts().get(i - 1)[0]) {
                out.add(err(p + ".shifts[" + i + "]", "bond counts must ascend"));
            }
        }
        range(out, p + ".decay", si.decay(), 0, 1, "decay factor");
        range(out, p + ".cutoff", si.cutoff(), 0, 1, "cutoff");
        if (si.source().isEmpty()) {
            out.add(err(p + ".source", "the interaction parameters need their source"));
        } else if (!refIds.contains(si.source())) {
            out.add(err(p + ".source", "unknown reference '" + si.source() + "'"));
        }
    }

    private static Optional<IAtomContainer> smiles(String smi, String path, List<Problem> out) {
        try {
            return Optional.of(Patterns.parseSmiles(smi));
        } catch (InvalidSmilesException | RuntimeException e) {
            out.add(err(path, "structure does not parse: " + firstLine(e.getMessage())));
            return Optional.empty();
        }
    }

    private static String firstLine(String s) {
        if (s == null) {
            return "unreadable";
        }
        int nl = s.indexOf('\n');
        return nl < 0 ? s : s.substring(0, nl);
    }

    private static void range(List<Problem> out, String path, double v, double lo, double hi, String what) {
        if (Double.isNaN(v)) {
            return;
        }
        if (v < lo || v > hi || Double.isInfinite(v)) {
            out.add(err(path, what + " " + v + " is outside the physical range " + lo + " to " + hi));
        }
    }

    private static void sourced(List<Problem> out, String p, Map<String, String> sources, Set<String> refIds,
            String field, double value) {
        if (Double.isNaN(value)) {
            return;
        }
        String ref = sources.get(field);
        if (ref == null || ref.isBlank()) {
            out.add(err(p + "." + field, "the number " + value + " has no source: add sources." + field));
        }
    }

    private static void unknownSourceKeys(List<Problem> out, String p, Map<String, String> sources, Set<String> refIds) {
        sources.forEach((field, ref) -> {
            if (!ref.isBlank() && !refIds.contains(ref)) {
                out.add(err(p + ".sources." + field, "unknown reference '" + ref + "'"));
            }
        });
    }

    private static Problem err(String path, String msg) {
        return new Problem(Problem.Severity.ERROR, path, msg);
    }

    private static Problem warn(String path, String msg) {
        return new Problem(Problem.Severity.WARNING, path, msg);
    }
}
