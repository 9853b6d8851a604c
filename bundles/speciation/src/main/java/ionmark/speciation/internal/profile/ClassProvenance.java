package ionmark.speciation.internal.profile;

import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ConcurrentHashMap;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import ionmark.acidity.api.ClassFit;
import ionmark.acidity.api.GroupClass;
import ionmark.speciation.api.Term;

/**
 * What a class value is, read from the calibration record its note carries: the compilation value it
 * started from ("before pKa X" of the one-site fit, else the start of the whole-model refinement,
 * "pKa X -> Y") and how many compounds it was fitted on (the whole-model count "N compounds with a site
 * of this class", else the one-site "n=N"). A class value {@link #FAR} or more from its compilation value
 * is an effective fitted value: it absorbs what the model lacks (statistical factors, missing terms,
 * tautomer mixtures) and no longer reproduces its parent compound, and the derivation says so with the
 * compilation value beside it. A class fitted on fewer than {@link #THIN} compounds gets a warning.
 */
public final class ClassProvenance {
    public static final double FAR = 1.0;
    public static final int THIN = 5;

    private static final Pattern BEFORE = Pattern.compile("before pKa (-?[0-9]+(?:\\.[0-9]+)?)");
    private static final Pattern WHOLE_START = Pattern.compile("refinement: [^;]*?pKa (-?[0-9]+(?:\\.[0-9]+)?) ->");
    private static final Pattern WHOLE_N = Pattern.compile("refinement: ([0-9]+) compounds with a site");
    private static final Pattern ONE_SITE_N = Pattern.compile("\\bn=([0-9]+)");
    /**
     * The last record read per class id, with the class and fit objects it was read from: a hit needs the very
     * same (immutable) objects, so a new table reads its notes again, and the map never holds more entries than
     * there are class ids (a calibration trying thousands of tables does not grow it).
     */
    private static final Map<String, Cached> CACHE = new ConcurrentHashMap<>();

    private record Cached(GroupClass g, ClassFit fit, Record record) {
    }

    /** The calibration record of a class; null fields where the note does not say. */
    public record Record(Double compilationPka, Integer compounds) {
    }

    private ClassProvenance() {
    }

    public static Record of(GroupClass g) {
        Cached c = CACHE.get(g.id());
        if (c != null && c.g() == g && c.fit() == null) {
            return c.record();
        }
        Record r = parse(g.note());
        CACHE.put(g.id(), new Cached(g, null, r));
        return r;
    }

    /**
     * The record of a class from the fit provenance the table keeps beside it (the curated value the calibration
     * started from, and the compounds it used); from the class note where the table has none for it.
     */
    public static Record of(GroupClass g, Optional<ClassFit> fit) {
        if (fit.isEmpty()) {
            return of(g);
        }
        ClassFit f = fit.get();
        Cached c = CACHE.get(g.id());
        if (c != null && c.g() == g && c.fit() == f) {
            return c.record();
        }
        Double start = f.before().get("pka");
        Record fromLog = parse(f.log());
        Record r = new Record(start != null ? start : fromLog.compilationPka(),
                f.n() > 0 ? Integer.valueOf(f.n()) : fromLog.compounds());
        CACHE.put(g.id(), new Cached(g, f, r));
        return r;
    }

    static Record parse(String note) {
        Double start = first(BEFORE, note);
        if (start == null) {
            start = first(WHOLE_START, note);
        }
        Double n = first(WHOLE_N, note);
        if (n == null) {
            n = first(ONE_SITE_N, note);
        }
        return new Record(start, n == null ? null : n.intValue());
    }

    private static Double first(Pattern p, String s) {
        Matcher m = p.matcher(s);
        return m.find() ? Double.valueOf(m.group(1)) : null;
    }

    /** The derivation line for an effective fitted class value, inserted right after the class term. */
    public static void annotate(GroupClass g, Record r, List<Term> terms) {
        if (r.compilationPka() == null || Math.abs(g.pka() - r.compilationPka()) < FAR || terms.isEmpty()) {
            return;
        }
        terms.add(1, new Term(String.format(Locale.ROOT, "effective fitted value: the class value %.2f is fitted "
                + "through the whole model and sits %.1f units from the compilation value %.2f it started from, "
                + "which it no longer reproduces", g.pka(), Math.abs(g.pka() - r.compilationPka()),
                r.compilationPka()), 0.0, "calibration record of class " + g.id()));
    }

    /** A warning for a class fitted on fewer than {@link #THIN} compounds. */
    public static Optional<String> thinWarning(GroupClass g, Record r) {
        if (r.compounds() == null || r.compounds() >= THIN) {
            return Optional.empty();
        }
        return Optional.of(String.format(Locale.ROOT, "class %s is fitted on %d compound%s only: its value and sd "
                + "rest on little data", g.id(), r.compounds(), r.compounds() == 1 ? "" : "s"));
    }
}
