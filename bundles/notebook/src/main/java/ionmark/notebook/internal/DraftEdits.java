package ionmark.notebook.internal;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.ClassFit;
import ionmark.acidity.api.GroupClass;
import ionmark.acidity.api.MeasuredCompound;
import ionmark.acidity.api.Reference;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Site;
import ionmark.speciation.api.Speciation;

/**
 * The admin page's record forms: each takes the draft table and the form's fields and gives the
 * changed draft, or the reasons it cannot, in a chemist's words. Nothing here writes JSON by hand.
 */
final class DraftEdits {
    /**
     * A measured value farther than this from every perceived site's estimate (or 3 sd, when that is
     * more) is taken for a value no site can have: a typing slip or the wrong structure. Common practice
     * for a plausibility screen, not a fitted number.
     */
    static final double FARTHEST = 4.0;

    private DraftEdits() {
    }

    /** The changed draft, or errors; {@code notes} say what was done or assumed. */
    record Result(AcidityTable table, List<String> errors, List<String> notes) {
        static Result error(String... e) {
            return new Result(null, List.of(e), List.of());
        }

        boolean ok() {
            return errors.isEmpty();
        }
    }

    /** One measured value and the perceived site it belongs to. */
    record Assignment(double value, Site site) {
    }

    /**
     * Adds a measured compound, or replaces the one with the same id. Each value goes to the nearest
     * perceived titratable site not yet taken; a value no site can take is an error.
     */
    static Result measured(AcidityTable draft, Map<String, String> f, Speciation speciation) {
        List<String> errors = new ArrayList<>();
        String smiles = f.getOrDefault("smiles", "").strip();
        String name = f.getOrDefault("name", "").strip();
        String id = f.getOrDefault("id", "").strip();
        if (id.isEmpty()) {
            id = name.toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9]+", "-").replaceAll("^-|-$", "");
        }
        if (smiles.isEmpty() || name.isEmpty()) {
            errors.add("Give the compound's name and its structure (SMILES).");
        }
        List<Double> values = numbers(f.getOrDefault("pka", ""), "pKa", errors);
        double temp = number(f.getOrDefault("temperature", "25"), "temperature", errors);
        double ionic = number(f.getOrDefault("ionicStrength", "0"), "ionic strength", errors);
        String source = f.getOrDefault("source", "");
        if (draft.references().stream().noneMatch(r -> r.id().equals(source))) {
            errors.add("Choose the reference the values come from (add it first if it is new).");
        }
        if (!errors.isEmpty()) {
            return new Result(null, errors, List.of());
        }
        List<Assignment> sites = assign(draft, smiles, values, speciation, errors);
        if (!errors.isEmpty()) {
            return new Result(null, errors, List.of());
        }
        List<String> groups = sites.stream().map(a -> a.site().group()).distinct().toList();
        MeasuredCompound m = new MeasuredCompound(id, name, smiles, values.stream().sorted().toList(), temp, ionic,
                f.getOrDefault("method", "").strip(), source, groups);
        List<MeasuredCompound> list = new ArrayList<>(draft.measured());
        String key = id;
        int at = indexOf(list.stream().map(MeasuredCompound::id).toList(), key);
        List<String> notes = new ArrayList<>();
        if (at >= 0) {
            list.set(at, m);
            notes.add("Replaced measured compound " + id + ".");
        } else {
            list.add(m);
            notes.add("Added measured compound " + id + ".");
        }
        sites.forEach(a -> notes.add(String.format(Locale.ROOT, "pKa %.2f → %s (%s, estimated %.2f)", a.value(),
                a.site().groupName(), a.site().group(), a.site().pka())));
        return new Result(draft.withMeasured(list), List.of(), notes);
    }

    /** The perceived titratable sites of a structure under the draft, each measured value on its nearest one. */
    static List<Assignment> assign(AcidityTable draft, String smiles, List<Double> values, Speciation speciation,
            List<String> errors) {
        Analysis a = speciation.pinned(draft).analyse(smiles, Conditions.noPh());
        if (!a.ok()) {
            errors.add("The structure cannot be read: " + a.error());
            return List.of();
        }
        List<Site> free = new ArrayList<>(a.sites().stream().filter(s -> !s.permanent()).toList());
        if (values.size() > free.size()) {
            errors.add(values.size() + " values but the structure has " + free.size()
                    + " titratable site(s) the table perceives: a value no site can take.");
            return List.of();
        }
        List<Assignment> out = new ArrayList<>();
        for (double v : values.stream().sorted().toList()) {
            Site best = free.stream().min(Comparator.comparingDouble(s -> Math.abs(s.pka() - v))).orElseThrow();
            if (Math.abs(best.pka() - v) > Math.max(FARTHEST, 3 * best.sd())) {
                errors.add(String.format(Locale.ROOT, "pKa %.2f: no perceived site can take it; the nearest is %s "
                        + "(%s) estimated at %.2f ± %.2f.", v, best.groupName(), best.group(), best.pka(), best.sd()));
                continue;
            }
            free.remove(best);
            out.add(new Assignment(v, best));
        }
        return out;
    }

    /**
     * Sets a class's reference pKa, ρ or sd by hand. The source must be chosen in the same form; it
     * may not be a calibration's, and the fit provenance of a hand-set field is dropped.
     */
    static Result classValue(AcidityTable draft, Map<String, String> f) {
        String id = f.getOrDefault("group", "");
        GroupClass g = draft.group(id).orElse(null);
        if (g == null) {
            return Result.error("No group class '" + id + "' in the draft.");
        }
        String source = f.getOrDefault("source", "");
        if (draft.references().stream().noneMatch(r -> r.id().equals(source))) {
            return Result.error("Choose the source of the new value (add the reference first if it is new).");
        }
        if (calibrations(draft).contains(source)) {
            return Result.error("'" + source + "' is a calibration's citation: a value set by hand needs the source "
                    + "you took it from, not the fit's.");
        }
        List<String> errors = new ArrayList<>();
        Map<String, Double> set = new TreeMap<>();
        for (String field : List.of("pka", "rho", "sd")) {
            String text = f.getOrDefault(field, "").strip();
            if (!text.isEmpty()) {
                double v = number(text, field, errors);
                double old = field.equals("pka") ? g.pka() : field.equals("rho") ? g.rho() : g.sd();
                if (v == old) {
                    continue;
                }
                if (source.equals(g.source(field)) && !"yes".equals(f.get("confirm"))) {
                    errors.add("The source of " + field + " is still '" + source + "': choose the source of the new "
                            + "value, or tick the box to confirm that '" + source + "' gives it.");
                }
                set.put(field, v);
            }
        }
        if (!errors.isEmpty()) {
            return new Result(null, errors, List.of());
        }
        if (set.isEmpty()) {
            return Result.error("Nothing changed: every value given is the class's present one.");
        }
        GroupClass n = g;
        Map<String, ClassFit> fits = new TreeMap<>(draft.fits());
        List<String> notes = new ArrayList<>();
        for (var e : set.entrySet()) {
            n = switch (e.getKey()) {
                case "pka" -> n.withPka(e.getValue(), source);
                case "rho" -> n.withRho(e.getValue(), source);
                default -> n.withSd(e.getValue(), source);
            };
            ClassFit fit = fits.get(id);
            if (fit != null) {
                fits.put(id, fit.without(e.getKey()));
            }
            notes.add(String.format(Locale.ROOT, "%s %s: %s → %s, source %s", id, e.getKey(), fmt(g, e.getKey()),
                    e.getValue(), source));
        }
        GroupClass changed = n;
        List<GroupClass> groups = draft.groups().stream().map(x -> x.id().equals(id) ? changed : x).toList();
        return new Result(draft.withGroups(groups).withFits(fits), List.of(), notes);
    }

    /** Adds a reference (id and full citation) that forms can then cite. */
    static Result reference(AcidityTable draft, Map<String, String> f) {
        String id = f.getOrDefault("refid", "").strip();
        String citation = f.getOrDefault("citation", "").strip();
        if (!id.matches("[a-z0-9][a-z0-9-]*")) {
            return Result.error("A reference id is short lower-case text with digits and hyphens, like 'smith2024'.");
        }
        if (citation.length() < 10) {
            return Result.error("Give the full citation (authors, title, where published, year).");
        }
        if (draft.references().stream().anyMatch(r -> r.id().equals(id))) {
            return Result.error("There is already a reference '" + id + "'.");
        }
        List<Reference> refs = new ArrayList<>(draft.references());
        refs.add(new Reference(id, citation));
        return new Result(draft.withReferences(refs), List.of(), List.of("Added reference " + id + "."));
    }

    /** Reference ids that a calibration set (they vouch for fitted numbers only). */
    static java.util.Set<String> calibrations(AcidityTable t) {
        java.util.Set<String> s = new java.util.TreeSet<>();
        t.fits().values().forEach(x -> s.add(x.source()));
        return s;
    }

    private static String fmt(GroupClass g, String field) {
        double v = field.equals("pka") ? g.pka() : field.equals("rho") ? g.rho() : g.sd();
        return Double.isNaN(v) ? "(none)" : String.valueOf(v);
    }

    private static int indexOf(List<String> ids, String id) {
        return ids.indexOf(id);
    }

    static List<Double> numbers(String text, String what, List<String> errors) {
        List<Double> out = new ArrayList<>();
        for (String s : text.split("[,;\\s]+")) {
            if (!s.isBlank()) {
                out.add(number(s, what, errors));
            }
        }
        if (out.isEmpty()) {
            errors.add("Give at least one " + what + " value.");
        }
        return out;
    }

    static double number(String s, String what, List<String> errors) {
        try {
            return Double.parseDouble(s.strip().replace('−', '-'));
        } catch (NumberFormatException e) {
            errors.add("'" + s.strip() + "' is not a number (" + what + ").");
            return Double.NaN;
        }
    }
}
