package ionmark.calibration.internal;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.GroupClass;
import ionmark.acidity.api.PairRule;
import ionmark.acidity.api.Relation;
import ionmark.calibration.api.Observation;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Site;
import ionmark.speciation.spi.MacroPairing;
import ionmark.speciation.spi.ModelEngine;
import ionmark.speciation.spi.ModelEngines;

/**
 * Second calibration stage: each class's reference pKa refined against every compound that has a
 * site of that class, through the whole model (substituent terms, site interactions,
 * microstates, macroscopic constants), scored with the same one-to-one pairing as the accuracy
 * report. Measured analogs are left out ({@code ModelEngines.withoutAnalogs}): they correct on top of the fitted model.
 *
 * <p>The first stage ({@code Calibration}) can only use compounds with one reported value and sites
 * of one type, so the many multiprotic compounds (amino acids, hydroxy-azines with a ring nitrogen,
 * anything with two or more reported values) do not inform it, and their classes keep whatever the one-site compounds or the handbook said. Here the
 * objective is a robust least-squares sum (Huber, quadratic within {@link #HUBER} unit) over paired
 * values, plus a prior that weighs the stage-one value like {@link #PRIOR_WEIGHT} compounds. Classes
 * are visited one at a time (coordinate descent), largest first, trying shifts of
 * {@link #STEPS} units and both twice that, in up to {@link #SWEEPS} sweeps per step size; a class
 * with fewer than {@link #MIN_COMPOUNDS} compounds is left alone, and no class moves more than
 * {@link #MAX_SHIFT} from where stage one left it. Finally each class's uncertainty is set from the
 * refined model's errors ({@link #withHonestSd}).
 */
final class ModelCalibration {
    static final double HUBER = 1.0;
    static final int PRIOR_WEIGHT = 3;
    /** Constants fitted per class (value, reaction constant, ortho factor or attenuation): the degrees of freedom the sd gives back. */
    static final int FITTED_PER_CLASS = 3;
    static final int MIN_COMPOUNDS = 5;
    /**
     * Compounds a class needs before its reaction constant and ortho factor or attenuation are refined
     * (cross-validated with table v28's base: 10 gave 81.6 % / MAE 0.605 against 81.7 % / 0.604).
     */
    static final int MIN_COMPOUNDS_RHO = 15;
    static final double MIN_SD = 0.25;
    /** The table's ceiling for a class uncertainty: a class that is worse than this is flagged by it. */
    static final double MAX_SD = 5.0;
    static final double MAX_SHIFT = 2.0;
    static final double[] STEPS = {0.4, 0.15, 0.05};
    /**
     * Sweeps over all classes per step size at most; a sweep that moves nothing ends that step size.
     * Classes share compounds, so one sweep leaves each class fitted to its neighbours' old values:
     * 5-fold cross-validation with table v19's base gave 78.0 % within 1.0 / MAE 0.668 with one sweep
     * at 0.4 and 0.15, 78.3 % / 0.662 with 0.05 added, 78.7 % / 0.658 with up to three sweeps each.
     */
    static final int SWEEPS = 3;
    /** Loss of an experimental value left without a predicted partner (as a 3-unit error). */
    static final double MISS = huber(3.0);
    /** Bounds of a class's reach factor on the distance rule. */
    static final double REACH_MIN = 0.4;
    static final double REACH_MAX = 1.5;
    /**
     * Fully observed compounds with a partner site a class needs before its reach factor is refined
     * (cross-validated: 8 gave MAE 0.604 against 0.607 with 15, the same share within 1.0; 5 gave 0.605 and
     * 81.8 %, with table v28's base).
     */
    static final int REACH_MIN_COMPOUNDS = 8;
    /** The prior on a reach factor, by the shift it causes at three bonds (the rule's 2.45 there). */
    static final double REACH_PRIOR_SHIFT = 2.45;

    /** What the refinement did to one class. */
    record Move(String group, int compounds, double before, double after, double rhoBefore, double rhoAfter,
            double lossBefore, double lossAfter) {
    }

    record Outcome(AcidityTable table, List<Move> moves) {
    }

    private final ModelEngines engines;

    ModelCalibration(ModelEngines engines) {
        this.engines = engines;
    }

    Outcome refine(AcidityTable start, List<Observation> data, String refId) {
        List<Observation> usable = data.stream().filter(o -> !o.pka().isEmpty()).toList();
        ModelEngine e0 = engines.withoutAnalogs(start);
        Map<String, List<Observation>> byClass = new LinkedHashMap<>();
        Map<String, List<Observation>> withPartner = new HashMap<>();
        usable.parallelStream().map(o -> Map.entry(o, e0.analyse(o.structure(), Conditions.noPh(), true)))
                .toList().forEach(en -> {
                    Set<String> cs = classes(en.getValue());
                    boolean partnered = fullyObserved(en.getValue(), en.getKey());
                    cs.forEach(g -> {
                        byClass.computeIfAbsent(g, k -> new ArrayList<>()).add(en.getKey());
                        if (partnered) {
                            withPartner.computeIfAbsent(g, k -> new ArrayList<>()).add(en.getKey());
                        }
                    });
                });
        List<String> order = byClass.keySet().stream().filter(g -> byClass.get(g).size() >= MIN_COMPOUNDS)
                .sorted(Comparator.comparingInt((String g) -> -byClass.get(g).size()).thenComparing(g -> g)).toList();
        Map<String, Double> origin = new HashMap<>();
        start.groups().forEach(g -> origin.put(g.id(), g.pka()));
        Map<String, Double> lossBefore = new HashMap<>();
        AcidityTable t = start;
        Map<String, Double> rhoOrigin = new HashMap<>();
        start.groups().forEach(g -> rhoOrigin.put(g.id(), g.rho()));
        Map<String, Double> attOrigin = new HashMap<>();
        start.groups().forEach(g -> attOrigin.put(g.id(), g.attenuation()));
        Map<String, Double> reachOrigin = new HashMap<>();
        start.groups().forEach(g -> reachOrigin.put(g.id(), start.interaction().reachOf(g.id())));
        for (double step : STEPS) {
            for (int sweep = 0; sweep < SWEEPS; sweep++) {
                AcidityTable sweepStart = t;
                for (String id : order) {
                    List<Observation> obs = byClass.get(id);
                    double[] origin0 = {origin.get(id), rhoOrigin.get(id), attOrigin.get(id), reachOrigin.get(id)};
                    GroupClass g = group(t, id);
                    double[] best = {objective(t, id, obs, origin0)};
                    lossBefore.putIfAbsent(id, best[0]);
                    List<AcidityTable> trials = new ArrayList<>();
                    for (double d : new double[] {-2 * step, -step, step, 2 * step}) {
                        double pka = round(g.pka() + d);
                        if (Math.abs(g.pka() + d - origin0[0]) <= MAX_SHIFT) {
                            trials.add(with(t, id, x -> x.withPka(pka, refId)));
                        }
                    }
                    t = better(t, trials, id, obs, origin0, best);
                    g = group(t, id);
                    // the reaction constant, by relative steps, where the class has one and enough compounds
                    if (g.relation() != Relation.NONE && !Double.isNaN(g.rho()) && obs.size() >= MIN_COMPOUNDS_RHO) {
                        trials = new ArrayList<>();
                        for (double f : new double[] {1 - step, 1 - step / 2, 1 + step / 2, 1 + step}) {
                            double rho = round(g.rho() * f);
                            if (rho / origin0[1] >= 0.5 && rho / origin0[1] <= 2.0) {
                                trials.add(with(t, id, x -> x.withRho(rho, refId)));
                            }
                        }
                        t = better(t, trials, id, obs, origin0, best);
                        g = group(t, id);
                    }
                    // the ortho factor (Hammett) or the attenuation per bond (Taft), by absolute steps
                    if (g.relation() != Relation.NONE && !Double.isNaN(g.attenuation())
                            && obs.size() >= MIN_COMPOUNDS_RHO) {
                        trials = new ArrayList<>();
                        boolean hammett = g.relation() == Relation.HAMMETT;
                        for (double d : new double[] {-step, -step / 2, step / 2, step}) {
                            double att = round(g.attenuation() + (hammett ? d : d / 2));
                            if (att >= (hammett ? 0 : 0.2) && att <= (hammett ? 1 : 0.7)) {
                                trials.add(with(t, id, x -> x.withAttenuation(att, refId)));
                            }
                        }
                        t = better(t, trials, id, obs, origin0, best);
                    }
                    // the class's reach factor on the distance rule, where enough of its compounds have a partner site
                    List<Observation> partnered = withPartner.getOrDefault(id, List.of());
                    if (partnered.size() >= REACH_MIN_COMPOUNDS && origin0[3] > 0) {
                        trials = new ArrayList<>();
                        double r0 = t.interaction().reachOf(id);
                        for (double d : new double[] {-step, -step / 2, step / 2, step}) {
                            double r = round(r0 + d);
                            if (r >= REACH_MIN && r <= REACH_MAX) {
                                AcidityTable base = t;
                                trials.add(with(base.withInteraction(base.interaction().withReach(id, r)), id,
                                        x -> x.withSource("reach", refId)));
                            }
                        }
                        double[] bestPartnered = {objective(t, id, partnered, origin0)};
                        AcidityTable chosen = better(t, trials, id, partnered, origin0, bestPartnered);
                        if (chosen != t) {
                            t = chosen;
                            best[0] = objective(t, id, obs, origin0);
                        }
                    }
                }
                if (t == sweepStart) {
                    break;
                }
            }
        }
        PairsRefined pairs = refinePairs(t, usable, refId);
        t = pairs.table();
        t = withHonestSd(t, usable, refId);
        List<Move> moves = new ArrayList<>();
        List<GroupClass> groups = new ArrayList<>();
        ModelEngine end = engines.withoutAnalogs(t);
        for (GroupClass g : t.groups()) {
            double before = origin.getOrDefault(g.id(), g.pka());
            double rhoBefore = rhoOrigin.getOrDefault(g.id(), g.rho());
            double attBefore = attOrigin.getOrDefault(g.id(), g.attenuation());
            boolean same = Math.abs(g.pka() - before) < 1e-9
                    && (Double.isNaN(g.rho()) || Math.abs(g.rho() - rhoBefore) < 1e-9)
                    && (Double.isNaN(g.attenuation()) || Math.abs(g.attenuation() - attBefore) < 1e-9)
                    && Math.abs(t.interaction().reachOf(g.id()) - reachOrigin.get(g.id())) < 1e-9;
            if (!order.contains(g.id()) || same) {
                groups.add(g);
                continue;
            }
            List<Observation> obs = byClass.get(g.id());
            double after = loss(end, obs) + prior(g, before, rhoBefore, attBefore);
            moves.add(new Move(g.id(), obs.size(), before, g.pka(), rhoBefore, g.rho(), lossBefore.get(g.id()), after));
            String rhoText = Double.isNaN(g.rho()) || Math.abs(g.rho() - rhoBefore) < 1e-9 ? ""
                    : String.format(Locale.ROOT, ", rho %.2f -> %.2f", rhoBefore, g.rho());
            if (!Double.isNaN(g.attenuation()) && Math.abs(g.attenuation() - attBefore) >= 1e-9) {
                rhoText += String.format(Locale.ROOT, ", %s %.2f -> %.2f", g.relation() == Relation.HAMMETT
                        ? "ortho factor" : "attenuation", attBefore, g.attenuation());
            }
            double reachNow = t.interaction().reachOf(g.id());
            if (Math.abs(reachNow - reachOrigin.get(g.id())) >= 1e-9) {
                rhoText += String.format(Locale.ROOT, ", reach on the distance rule %.2f -> %.2f (%d compounds with a "
                        + "second site and every constant observed)", reachOrigin.get(g.id()), reachNow,
                        withPartner.getOrDefault(g.id(), List.of()).size());
            }
            String note = (g.note() == null || g.note().isBlank() ? "" : g.note() + "; ") + String.format(Locale.ROOT,
                    "%s whole-model refinement: %d compounds with a site of this class, pKa %.2f -> %.2f%s, objective "
                            + "%.1f -> %.1f", refId, obs.size(), before, g.pka(), rhoText, lossBefore.get(g.id()), after);
            groups.add(new GroupClass(g.id(), g.name(), g.smarts(), g.type(), g.pka(), g.relation(), g.rho(),
                    g.attenuation(), g.resonance(), g.enthalpy(), g.sd(), g.permanent(), g.sources(), note, g.matches(),
                    g.misses()));
        }
        moves.addAll(pairs.moves());
        return new Outcome(t.withGroups(groups), moves);
    }

    /** The table with refined pair rules, and the rules that moved (reported with the class moves). */
    record PairsRefined(AcidityTable table, List<Move> moves) {
    }

    /**
     * Each pair rule's two values refined like a class value, after the classes: the same loss over
     * the compounds where the rule joins two sites, the same prior on the starting values, steps of
     * {@link #STEPS} on one value at a time, at most {@link #MAX_SHIFT} from the start and never below
     * 0. A rule with fewer than {@link #MIN_COMPOUNDS} compounds, or one that is not
     * {@link #refinable}, keeps its values.
     */
    PairsRefined refinePairs(AcidityTable start, List<Observation> usable, String refId) {
        List<Move> pairMoves = new ArrayList<>();
        if (start.pairs().isEmpty()) {
            return new PairsRefined(start, pairMoves);
        }
        ModelEngine e0 = engines.withoutAnalogs(start);
        Map<String, List<Observation>> byRule = new LinkedHashMap<>();
        usable.parallelStream().map(o -> Map.entry(o, e0.pairRules(o.structure()))).toList().forEach(en ->
                en.getValue().forEach(r -> byRule.computeIfAbsent(r, k -> new ArrayList<>()).add(en.getKey())));
        AcidityTable t = start;
        for (PairRule r0 : start.pairs()) {
            List<Observation> obs = byRule.getOrDefault(r0.id(), List.of());
            if (obs.size() < MIN_COMPOUNDS || !refinable(r0)) {
                continue;
            }
            java.util.function.ToDoubleFunction<AcidityTable> objective = x -> loss(engines.withoutAnalogs(x), obs)
                    + PRIOR_WEIGHT * (huber(pair(x, r0.id()).singly() - r0.singly())
                            + huber(pair(x, r0.id()).doubly() - r0.doubly()));
            double[] best = {objective.applyAsDouble(t)};
            double lossBefore = best[0];
            for (double step : STEPS) {
                for (int pass = 0; pass < 4; pass++) {
                    AcidityTable chosen = t;
                    for (int which = 0; which < 2; which++) {
                        PairRule now = pair(chosen, r0.id());
                        AcidityTable round = chosen;
                        for (double d : new double[] {-2 * step, -step, step, 2 * step}) {
                            double s1 = which == 0 ? round(now.singly() + d) : now.singly();
                            double s2 = which == 1 ? round(now.doubly() + d) : now.doubly();
                            if (Math.min(s1, s2) < 0 || Math.max(s1, s2) > 6 || Math.abs(s1 - r0.singly()) > MAX_SHIFT
                                    || Math.abs(s2 - r0.doubly()) > MAX_SHIFT) {
                                continue;
                            }
                            AcidityTable trial = withPair(round, r0.id(), s1, s2, r0.source(), r0.note());
                            double l = objective.applyAsDouble(trial);
                            if (l < best[0] - 1e-9) {
                                best[0] = l;
                                chosen = trial;
                            }
                        }
                    }
                    if (chosen == t) {
                        break;
                    }
                    t = chosen;
                }
            }
            PairRule end = pair(t, r0.id());
            if (Math.abs(end.singly() - r0.singly()) < 1e-9 && Math.abs(end.doubly() - r0.doubly()) < 1e-9) {
                continue;
            }
            pairMoves.add(new Move("pair " + r0.id(), obs.size(), r0.singly(), end.singly(), r0.doubly(), end.doubly(),
                    lossBefore, best[0]));
            String how = (r0.note().isBlank() ? "" : r0.note() + "; ") + String.format(Locale.ROOT,
                    "%s whole-model refinement: %d compounds where the rule joins two sites, singly %.2f -> %.2f, "
                            + "doubly %.2f -> %.2f, objective %.1f -> %.1f", refId, obs.size(), r0.singly(),
                    end.singly(), r0.doubly(), end.doubly(), lossBefore, best[0]);
            t = withPair(t, r0.id(), end.singly(), end.doubly(), refId, how);
        }
        return new PairsRefined(t, pairMoves);
    }

    /**
     * Sources whose values are derived from measured macroscopic constants of reference compounds (the
     * distance rule, the extra interaction of two ring nitrogens in one azine ring): the calibration
     * keeps rules from these. The loss pairs each experimental value with the nearest predicted one and
     * does not charge for a spurious extra constant, so a refit weakens such a rule until, say, the
     * second constant of a pyrazine lands where the first belongs.
     */
    static final java.util.Set<String> DERIVED_SOURCES =
            java.util.Set.of("ionmark-interaction", "ionmark-azine-pairs");

    /** Whether the calibration may move a rule: working values and earlier fits yes, derived values no. */
    static boolean refinable(PairRule r) {
        return !DERIVED_SOURCES.contains(r.source());
    }

    private static PairRule pair(AcidityTable t, String id) {
        return t.pairs().stream().filter(r -> r.id().equals(id)).findFirst().orElseThrow();
    }

    private static AcidityTable withPair(AcidityTable t, String id, double singly, double doubly, String source,
            String note) {
        return t.withPairs(t.pairs().stream().map(r -> r.id().equals(id) ? r.withValues(singly, doubly, source, note)
                : r).toList());
    }

    /**
     * Class uncertainties from the refined model's own errors: for every paired value, the class of
     * the site whose estimate lies nearest the predicted constant takes the absolute error; a class's
     * sd becomes the 68th percentile of its errors (what "within one sd" should cover), widened by
     * √(n/(n−{@link #FITTED_PER_CLASS})) for the constants fitted to those same errors, pooled with
     * the current sd weighted as {@link #PRIOR_WEIGHT} values, between {@link #MIN_SD} and
     * {@link #MAX_SD}.
     */
    AcidityTable withHonestSd(AcidityTable t, List<Observation> obs, String refId) {
        ModelEngine e = engines.withoutAnalogs(t);
        Map<String, List<Double>> errors = new HashMap<>();
        List<Map.Entry<String, Double>> all = obs.parallelStream().flatMap(o -> classErrors(e.analyse(o.structure(),
                Conditions.noPh(), true), o).stream()).toList();
        all.forEach(en -> errors.computeIfAbsent(en.getKey(), k -> new ArrayList<>()).add(en.getValue()));
        List<GroupClass> gs = new ArrayList<>();
        for (GroupClass g : t.groups()) {
            List<Double> err = errors.getOrDefault(g.id(), List.of());
            if (err.size() < MIN_COMPOUNDS || g.permanent()) {
                gs.add(g);
                continue;
            }
            double q68 = err.stream().sorted().skip((long) Math.floor(0.68 * (err.size() - 1))).findFirst().orElseThrow();
            int n = err.size();
            // the class's own fitted constants make its errors smaller than a new compound's will be
            q68 *= Math.sqrt((double) n / Math.max(1, n - FITTED_PER_CLASS));
            double sd = Math.min(MAX_SD, Math.max(MIN_SD,
                    Math.sqrt((n * q68 * q68 + PRIOR_WEIGHT * g.sd() * g.sd()) / (n + PRIOR_WEIGHT))));
            gs.add(g.withSd(round(sd), refId));
        }
        return t.withGroups(gs);
    }

    /** (class, |error|) for every paired value of one compound. */
    static List<Map.Entry<String, Double>> classErrors(Analysis a, Observation o) {
        List<Map.Entry<String, Double>> out = new ArrayList<>();
        if (!a.ok()) {
            return out;
        }
        List<Site> sites = a.sites().stream().filter(s -> !s.permanent()).toList();
        List<Double> pred = a.macroPka();
        for (int[] p : MacroPairing.assign(o.pka(), pred)) {
            double v = pred.get(p[1]);
            sites.stream().min(Comparator.comparingDouble((Site s) -> Math.abs(s.pka() - v)))
                    .ifPresent(s -> out.add(Map.entry(s.group(), Math.abs(v - o.pka().get(p[0])))));
        }
        return out;
    }

    /**
     * Whether a compound can tell how strongly its sites interact: at least two titratable sites, and
     * no predicted constant in the measurable range (−2 to 16) without an experimental value to pair
     * with. The loss does not charge for an extra constant, so where one is free, weakening the
     * distance rule can move it onto a value that belongs to another site (a diazine's second,
     * unmeasurable protonation landing on a covalent-hydration constant); such compounds take no part
     * in fitting a class's reach.
     */
    static boolean fullyObserved(Analysis a, Observation o) {
        if (!a.ok() || a.sites().stream().filter(x -> !x.permanent()).count() < 2) {
            return false;
        }
        long inRange = a.macroPka().stream().filter(v -> v >= -2 && v <= 16).count();
        return inRange <= o.pka().size();
    }

    /** Classes of the titratable sites in one analysis. */
    static Set<String> classes(Analysis a) {
        Set<String> out = new TreeSet<>();
        if (a.ok()) {
            for (Site s : a.sites()) {
                if (!s.permanent()) {
                    out.add(s.group());
                }
            }
        }
        return out;
    }

    /** Sum over compounds of the paired Huber losses and the misses. */
    static double loss(ModelEngine e, List<Observation> obs) {
        return obs.parallelStream().mapToDouble(o -> loss(e.analyse(o.structure(), Conditions.noPh(), true), o)).sum();
    }

    static double loss(Analysis a, Observation o) {
        List<Double> pred = a.ok() ? a.macroPka() : List.of();
        List<int[]> pairs = MacroPairing.assign(o.pka(), pred);
        double l = MISS * (o.pka().size() - pairs.size());
        for (int[] p : pairs) {
            l += huber(pred.get(p[1]) - o.pka().get(p[0]));
        }
        return l;
    }

    static double huber(double e) {
        double a = Math.abs(e);
        return a <= HUBER ? 0.5 * a * a : HUBER * (a - 0.5 * HUBER);
    }

    /**
     * The stage-one values count as {@link #PRIOR_WEIGHT} compounds with no error: for the reference
     * pKa by its shift, for ρ by the shift it causes at a substituent sum of 0.5.
     */
    static double prior(GroupClass g, double pka0, double rho0, double att0) {
        double p = PRIOR_WEIGHT * huber(g.pka() - pka0);
        if (!Double.isNaN(rho0) && !Double.isNaN(g.rho())) {
            p += PRIOR_WEIGHT * huber(0.5 * (g.rho() - rho0));
        }
        if (!Double.isNaN(att0) && !Double.isNaN(g.attenuation())) {
            p += PRIOR_WEIGHT * huber(g.attenuation() - att0);
        }
        return p;
    }

    private static GroupClass group(AcidityTable t, String id) {
        return t.groups().stream().filter(g -> g.id().equals(id)).findFirst().orElseThrow();
    }




    /** {@code t} with class {@code id} changed by {@code change}. */
    private static AcidityTable with(AcidityTable t, String id, java.util.function.UnaryOperator<GroupClass> change) {
        List<GroupClass> gs = new ArrayList<>();
        for (GroupClass g : t.groups()) {
            gs.add(g.id().equals(id) ? change.apply(g) : g);
        }
        return t.withGroups(gs);
    }

    /** Loss over the class's compounds plus the prior, for one table. */
    private double objective(AcidityTable t, String id, List<Observation> obs, double[] origin0) {
        return loss(engines.withoutAnalogs(t), obs) + prior(group(t, id), origin0[0], origin0[1], origin0[2])
                + PRIOR_WEIGHT * huber(REACH_PRIOR_SHIFT * (t.interaction().reachOf(id) - origin0[3]));
    }

    /**
     * The trial with the lowest objective when it beats {@code best[0]} (which is then lowered to it),
     * else {@code current}.
     */
    private AcidityTable better(AcidityTable current, List<AcidityTable> trials, String id, List<Observation> obs,
            double[] origin0, double[] best) {
        AcidityTable chosen = current;
        for (AcidityTable trial : trials) {
            double l = objective(trial, id, obs, origin0);
            if (l < best[0] - 1e-9) {
                best[0] = l;
                chosen = trial;
            }
        }
        return chosen;
    }

    private static double round(double v) {
        return Math.round(v * 100) / 100.0;
    }
}
