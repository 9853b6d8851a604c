package ionmark.speciation.internal;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;

import org.openscience.cdk.interfaces.IAtom;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.qsar.descriptors.molecular.JPlogPDescriptor;
import org.openscience.cdk.qsar.result.DoubleResult;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.GroupClass;
import ionmark.acidity.api.MeasuredCompound;
import ionmark.acidity.api.SiteInteraction;
import ionmark.acidity.api.SiteType;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Curve;
import ionmark.speciation.api.Site;
import ionmark.speciation.api.Species;
import ionmark.speciation.api.Term;
import ionmark.speciation.api.Window;
import ionmark.speciation.internal.estimate.EstimatedSite;
import ionmark.speciation.internal.estimate.LferEstimator;
import ionmark.speciation.internal.estimate.AnalogCorrection;
import ionmark.speciation.internal.estimate.AnalogSettings;
import ionmark.speciation.internal.estimate.Overrides;
import ionmark.speciation.internal.estimate.SiteAnalogIndex;
import ionmark.speciation.internal.microstates.MacroConstants;
import ionmark.speciation.internal.microstates.SpeciesActivity;
import ionmark.speciation.internal.profile.ClassProvenance;
import ionmark.speciation.internal.profile.Partition;
import ionmark.speciation.internal.profile.WaterRange;
import ionmark.speciation.internal.microstates.MicrostateSolver;
import ionmark.speciation.internal.microstates.Populations;
import ionmark.speciation.internal.microstates.SiteModel;
import ionmark.speciation.internal.microstates.SitePaths;
import ionmark.speciation.internal.sites.CompiledTable;
import ionmark.speciation.internal.sites.PerceivedSite;
import ionmark.speciation.internal.sites.RootedPattern;
import ionmark.speciation.internal.sites.SitePerceiver;
import ionmark.speciation.internal.structure.StructureException;
import ionmark.speciation.internal.structure.StructureReader;

/**
 * The pipeline for one table snapshot: structure → sites → estimates → microstates → analysis.
 * Immutable and thread-safe; every call works on its own freshly read molecule.
 */
public final class Engine {
    static final double WINDOW_STEP = 0.05;
    /** Macroscopic constants outside this range are not observable in water and are not reported. */
    static final double MACRO_LOW = -2;
    static final double MACRO_HIGH = 16;
    static final String CAUTION = "estimated values for planning and write-up; measure before safety-relevant or "
            + "regulatory decisions";

    private final CompiledTable table;
    private final Overrides overrides;
    private final StructureReader reader;
    private final MicrostateSolver solver;
    /** Built on first use: engines made for a calibration step rarely need it. */
    private volatile SiteAnalogIndex analogs;
    /** Set while the index is built, under the lock: a measured compound read then that is no exact match gets none. */
    private boolean buildingAnalogs;

    public Engine(AcidityTable table, int maxHeavyAtoms) {
        this.table = new CompiledTable(table);
        this.overrides = new Overrides(this.table);
        this.reader = new StructureReader(maxHeavyAtoms);
        this.solver = new MicrostateSolver(table.interaction().cutoff());
    }

    /** The measured sites of this table, by class family (built once, on first use). */
    SiteAnalogIndex analogIndex() {
        SiteAnalogIndex idx = analogs;
        if (idx == null) {
            synchronized (this) {
                if (buildingAnalogs) {
                    return SiteAnalogIndex.EMPTY;
                }
                if (analogs == null) {
                    buildingAnalogs = true;
                    try {
                        analogs = MeasuredSites.index(this, table.table().measured(), AnalogSettings.current());
                    } finally {
                        buildingAnalogs = false;
                    }
                }
                idx = analogs;
            }
        }
        return idx;
    }

    public AcidityTable table() {
        return table.table();
    }

    /** The prepared problem for one structure: molecule, sites, numeric model at the conditions. */
    record Problem(StructureReader.Prepared prepared, List<EstimatedSite> sites, List<Integer> uncovered,
            SiteModel model, double[] polynomial, int permanentCharge, List<String> notes,
            Optional<MeasuredCompound> measured, List<Double> measuredHere) {
        /** Net charge of the fully protonated form: every base site +1, plus permanent charges. */
        int topCharge() {
            int z = permanentCharge;
            for (boolean b : model.base()) {
                z += b ? 1 : 0;
            }
            return z;
        }
    }

    public Analysis analyse(String input, Conditions c) {
        return analyse(input, c, false);
    }

    /** {@code brief}: without logP/logD, species structures, windows and isoelectric point. */
    public Analysis analyse(String input, Conditions c, boolean brief) {
        String version = table.table().version().label();
        try {
            Problem p = prepare(input, c);
            return analyse(input, c, p, version, brief);
        } catch (StructureException e) {
            return Analysis.failed(input, c, version, e.getMessage());
        } catch (RuntimeException e) {
            // a structure that slips past the reader's checks must not break the caller
            return Analysis.failed(input, c, version, "cannot analyse this structure ("
                    + String.valueOf(e.getMessage()).lines().findFirst().orElse(e.getClass().getSimpleName()) + ")");
        }
    }

    Problem prepare(String input, Conditions c) throws StructureException {
        StructureReader.Prepared prep = reader.read(input);
        IAtomContainer mol = prep.molecule();
        RootedPattern.Target target = new RootedPattern.Target(mol);
        int[][] adj = target.adjacency();
        List<PerceivedSite> perceived = SitePerceiver.perceive(table, target);
        List<EstimatedSite> est = new ArrayList<>(LferEstimator.estimate(table, mol, target, perceived));
        List<String> notes = new ArrayList<>(prep.notes());
        Optional<MeasuredCompound> measured = overrides.exact(target);
        // the sites keep their order from here on: one interaction matrix serves every model below
        double[][] inter = interactions(distances(target, est), est);
        est = heldPairs(target, est, inter, new java.util.HashSet<>());
        if (measured.isPresent()) {
            est = fitToMeasured(mol, adj, inter, est, measured.get());
        } else {
            est = AnalogCorrection.apply(analogIndex(), target, est);
        }
        List<Integer> uncovered = SitePerceiver.uncovered(mol, perceived);
        // ionic strength acts on whole species (Davies with each microstate's net charge), see SpeciesActivity
        SiteModel atZero = model(inter, est, c);
        double k = Conditioning.davies(c.ionicStrength(), c.temperature());
        SiteModel model = SpeciesActivity.of(atZero, permanentCharge(est), k);
        double[] poly = SpeciesActivity.polynomial(MacroConstants.polynomial(atZero, table.table().interaction().cutoff()),
                atZero, permanentCharge(est), k);
        final List<EstimatedSite> sitesNow = est;
        List<Double> measuredHere = measured.map(m -> atConditions(m, inter, sitesNow, poly)).orElse(List.of());
        return new Problem(prep, est, uncovered, model, poly, permanentCharge(est), notes, measured, measuredHere);
    }

    /** The model's macroscopic constants at 25 °C, I = 0, with no measured value or analog applied (for the analog index). */
    List<Double> modelConstants(String input) throws StructureException {
        RootedPattern.Target target = new RootedPattern.Target(reader.read(input).molecule());
        List<EstimatedSite> est = LferEstimator.estimate(table, target.molecule(), target,
                SitePerceiver.perceive(table, target));
        double[][] inter = interactions(distances(target, est), est);
        est = heldPairs(target, est, inter, new java.util.HashSet<>());
        return MacroConstants.of(MacroConstants.polynomial(model(inter, est, Conditions.noPh()),
                table.table().interaction().cutoff()));
    }

    /**
     * Measured macroscopic constants moved to the stated conditions: each by the model's own shift of
     * the matching constant between 25 °C, I = 0 and the stated temperature and ionic strength
     * (van 't Hoff per class enthalpy, Davies). Exact at standard conditions.
     */
    private List<Double> atConditions(MeasuredCompound m, double[][] inter, List<EstimatedSite> est, double[] poly) {
        List<Double> here = MacroConstants.of(poly);
        List<Double> std = MacroConstants.of(MacroConstants.polynomial(model(inter, est, Conditions.noPh()),
                table.table().interaction().cutoff()));
        if (here.size() != std.size() || here.size() < m.pka().size()) {
            return m.pka();
        }
        // the model constants nearest the measured ones, in order
        int start = 0;
        double best = Double.MAX_VALUE;
        for (int s0 = 0; s0 + m.pka().size() <= std.size(); s0++) {
            double cost = 0;
            for (int i = 0; i < m.pka().size(); i++) {
                cost += Math.abs(std.get(s0 + i) - m.pka().get(i));
            }
            if (cost < best) {
                best = cost;
                start = s0;
            }
        }
        List<Double> out = new ArrayList<>();
        for (int i = 0; i < m.pka().size(); i++) {
            out.add(m.pka().get(i) + here.get(start + i) - std.get(start + i));
        }
        return out;
    }

    /** Ids of the table's pair rules that join two sites of this structure (none when it cannot be read). */
    public java.util.Set<String> pairRules(String input) {
        try {
            StructureReader.Prepared prep = reader.read(input);
            RootedPattern.Target target = new RootedPattern.Target(prep.molecule());
            List<EstimatedSite> est = LferEstimator.estimate(table, prep.molecule(), target,
                    SitePerceiver.perceive(table, target));
            java.util.Set<String> used = new java.util.TreeSet<>();
            heldPairs(target, est, interactions(distances(target, est), est), used);
            return used;
        } catch (StructureException | RuntimeException e) {
            return java.util.Set.of();
        }
    }

    /**
     * Calibration input from one observation with one experimental value: the class and substituent
     * sum Σ of the site that titrates first (the most basic when all perceived sites in −3…17 are
     * bases, the most acidic when all are acids). Mixed acid–base compounds are not used. Raw
     * estimates, no overrides.
     */
    public java.util.Optional<ionmark.speciation.internal.estimate.Calibration.Point> calibrationPoint(
            ionmark.speciation.api.Observation o) {
        try {
            if (o.pka().size() != 1) {
                return java.util.Optional.empty();
            }
            StructureReader.Prepared prep = reader.read(o.structure());
            List<EstimatedSite> est = LferEstimator.estimate(table, prep.molecule(),
                    SitePerceiver.perceive(table, prep.molecule())).stream()
                    .filter(s -> !s.site().group().permanent() && s.pka() > -3 && s.pka() < 17).toList();
            long bases = est.stream().filter(s -> s.site().group().type() == SiteType.BASE).count();
            if (est.isEmpty() || (bases != 0 && bases != est.size())) {
                return java.util.Optional.empty();
            }
            java.util.Comparator<EstimatedSite> byPka = java.util.Comparator.comparingDouble(EstimatedSite::pka);
            EstimatedSite first = bases > 0 ? est.stream().max(byPka).orElseThrow() : est.stream().min(byPka)
                    .orElseThrow();
            if (est.size() > 1 && !firstStepNearest(o, bases > 0)) {
                return java.util.Optional.empty();
            }
            GroupClass g = first.site().group();
            double sigma = g.relation() == ionmark.acidity.api.Relation.NONE || g.rho() == 0 || Double.isNaN(g.rho())
                    ? 0 : -(first.pka() - g.pka()) / g.rho();
            return java.util.Optional.of(new ionmark.speciation.internal.estimate.Calibration.Point(g.id(), sigma,
                    o.pka().get(0)));
        } catch (StructureException | RuntimeException e) {
            return java.util.Optional.empty();
        }
    }

    /**
     * Whether the one experimental value of a compound with several sites of one type is nearer the
     * model's first macroscopic step (lowest for acids, highest for bases) than any other: a single
     * reported value is often a later step (the second pKa of an alkyl phosphate or a dialkylmalonic
     * acid, the first lying below the measured range), and giving it to the first site would drag
     * that class toward the later step.
     */
    private boolean firstStepNearest(ionmark.speciation.api.Observation o, boolean bases) {
        List<Double> macro = analyse(o.structure(), Conditions.noPh(), true).macroPka().stream()
                .filter(v -> v > -3 && v < 17).toList();
        if (macro.size() < 2) {
            return true;
        }
        double x = o.pka().get(0);
        int nearest = 0;
        for (int j = 1; j < macro.size(); j++) {
            if (Math.abs(macro.get(j) - x) < Math.abs(macro.get(nearest) - x)) {
                nearest = j;
            }
        }
        return nearest == (bases ? macro.size() - 1 : 0);
    }

    /**
     * Exact match: shift site values so that the model's macroscopic constants equal the measured
     * ones. The k measured values are given to the k sites (in pKa order) whose estimates lie
     * closest to them; the shifts are found by damped Gauss–Newton on the macroscopic constants.
     */
    private List<EstimatedSite> fitToMeasured(IAtomContainer mol, int[][] adj, double[][] inter, List<EstimatedSite> est,
            MeasuredCompound m) {
        List<EstimatedSite> titr = new ArrayList<>(est.stream().filter(s -> !s.site().group().permanent()).toList());
        int k = m.pka().size();
        if (titr.size() < k || k == 0) {
            return est; // fewer sites than measured values: keep the estimates, say nothing false
        }
        titr.sort((a, b) -> Double.compare(a.pka(), b.pka()));
        int bestStart = 0;
        double bestCost = Double.MAX_VALUE;
        for (int start = 0; start + k <= titr.size(); start++) {
            double cost = 0;
            for (int i = 0; i < k; i++) {
                cost += Math.abs(titr.get(start + i).pka() - m.pka().get(i));
            }
            if (cost < bestCost) {
                bestCost = cost;
                bestStart = start;
            }
        }
        List<EstimatedSite> fitted = titr.subList(bestStart, bestStart + k);
        // topologically equivalent sites share one shift (phosphoric acid's three O-H stay equal)
        long[] sym = org.openscience.cdk.graph.invariant.Canon.symmetry(mol, adj);
        List<Long> classes = new ArrayList<>();
        int[] classOf = new int[k];
        for (int i = 0; i < k; i++) {
            long c = sym[fitted.get(i).site().atom()];
            int idx = classes.indexOf(c);
            if (idx < 0) {
                classes.add(c);
                idx = classes.size() - 1;
            }
            classOf[i] = idx;
        }
        int p = classes.size();
        double[] param = new double[p];
        for (int i = 0; i < k; i++) {
            param[classOf[i]] += (m.pka().get(i) - fitted.get(i).pka()) / java.util.Collections.frequency(
                    java.util.Arrays.stream(classOf).boxed().toList(), classOf[i]);
        }
        double[] shift = new double[k];
        for (int i = 0; i < k; i++) {
            shift[i] = param[classOf[i]];
        }
        // the model at standard conditions is built once; a shift moves only its site values
        SiteModel standard = model(inter, est, Conditions.noPh());
        List<EstimatedSite> order = est.stream().filter(s -> !s.site().group().permanent()).toList();
        int[] at = new int[k];
        for (int i = 0; i < k; i++) {
            at[i] = indexOf(order, fitted.get(i));
        }
        for (int iter = 0; iter < 40; iter++) {
            double[] r = residual(standard, at, shift, m);
            double worst = Arrays.stream(r).map(Math::abs).max().orElse(0);
            if (worst < 1e-6) {
                break;
            }
            double[][] jac = new double[k][p];
            for (int j = 0; j < p; j++) {
                double[] trial = shift.clone();
                for (int i = 0; i < k; i++) {
                    if (classOf[i] == j) {
                        trial[i] += 1e-4;
                    }
                }
                double[] rj = residual(standard, at, trial, m);
                for (int i = 0; i < k; i++) {
                    jac[i][j] = (rj[i] - r[i]) / 1e-4;
                }
            }
            double[] step = solveDamped(jac, r, 1e-3);
            double norm = Arrays.stream(step).map(Math::abs).max().orElse(0);
            if (norm < 1e-7) {
                break; // least-squares optimum reached (fewer symmetry classes than constants)
            }
            double scale = norm > 1 ? 1 / norm : 1;
            for (int j = 0; j < p; j++) {
                param[j] -= scale * step[j];
            }
            for (int i = 0; i < k; i++) {
                shift[i] = param[classOf[i]];
            }
        }
        List<EstimatedSite> out = new ArrayList<>();
        for (EstimatedSite s : est) {
            int idx = indexOf(fitted, s);
            if (idx < 0) {
                out.add(s);
                continue;
            }
            out.add(s.shifted(shift[idx], new Term("measured compound " + m.name() + ": macroscopic pKa "
                    + m.pka() + " at " + Math.round(m.temperature()) + " °C (" + m.method()
                    + "); site value set to reproduce it", shift[idx], table.table().citation(m.source())),
                    "measured", 0.05));
        }
        return out;
    }

    /** Model constants minus measured ones, with site {@code at[i]} of the standard model moved by {@code shift[i]}. */
    private double[] residual(SiteModel standard, int[] at, double[] shift, MeasuredCompound m) {
        double[] pka = standard.pka().clone();
        for (int i = 0; i < at.length; i++) {
            pka[at[i]] += shift[i];
        }
        List<Double> macro = MacroConstants.of(new SiteModel(pka, standard.base(), standard.w(), standard.background()),
                table.table().interaction().cutoff());
        // compare the measured values with the macroscopic constants nearest in order
        int k = m.pka().size();
        int start = 0;
        double bestCost = Double.MAX_VALUE;
        for (int s0 = 0; s0 + k <= macro.size(); s0++) {
            double cost = 0;
            for (int i = 0; i < k; i++) {
                cost += Math.abs(macro.get(s0 + i) - m.pka().get(i));
            }
            if (cost < bestCost) {
                bestCost = cost;
                start = s0;
            }
        }
        double[] r = new double[k];
        for (int i = 0; i < k; i++) {
            r[i] = macro.get(start + i) - m.pka().get(i);
        }
        return r;
    }

    /** (JᵀJ + λI) x = Jᵀr by Gaussian elimination: m residuals, k parameters, both small. */
    private static double[] solveDamped(double[][] j, double[] r, double lambda) {
        int m = r.length;
        int k = j[0].length;
        double[][] a = new double[k][k + 1];
        for (int p = 0; p < k; p++) {
            for (int q = 0; q < k; q++) {
                double v = 0;
                for (int i = 0; i < m; i++) {
                    v += j[i][p] * j[i][q];
                }
                a[p][q] = v + (p == q ? lambda : 0);
            }
            double v = 0;
            for (int i = 0; i < m; i++) {
                v += j[i][p] * r[i];
            }
            a[p][k] = v;
        }
        for (int col = 0; col < k; col++) {
            int piv = col;
            for (int row = col + 1; row < k; row++) {
                if (Math.abs(a[row][col]) > Math.abs(a[piv][col])) {
                    piv = row;
                }
            }
            double[] tmp = a[col];
            a[col] = a[piv];
            a[piv] = tmp;
            if (Math.abs(a[col][col]) < 1e-15) {
                continue;
            }
            for (int row = 0; row < k; row++) {
                if (row != col) {
                    double f = a[row][col] / a[col][col];
                    for (int c = col; c <= k; c++) {
                        a[row][c] -= f * a[col][c];
                    }
                }
            }
        }
        double[] x = new double[k];
        for (int p = 0; p < k; p++) {
            x[p] = Math.abs(a[p][p]) < 1e-15 ? 0 : a[p][k] / a[p][p];
        }
        return x;
    }

    private static int permanentCharge(List<EstimatedSite> est) {
        int q = 0;
        for (EstimatedSite s : est) {
            if (s.site().group().permanent()) {
                q += s.site().group().type() == SiteType.BASE ? 1 : -1;
            }
        }
        return q;
    }

    /**
     * Position of {@code s} itself in {@code l}. Records compare by value, which walks every derivation
     * term; the same object is what is meant here.
     */
    private static int indexOf(List<EstimatedSite> l, EstimatedSite s) {
        for (int i = 0; i < l.size(); i++) {
            if (l.get(i) == s) {
                return i;
            }
        }
        return -1;
    }

    /**
     * The numeric model at the temperature (ionic strength comes after, on whole species): corrected site pKa values and the interactions
     * ({@code inter}, from {@link #interactions} and {@link #heldPairs} for these sites).
     */
    private SiteModel model(double[][] inter, List<EstimatedSite> est, Conditions c) {
        List<EstimatedSite> titr = new ArrayList<>(est.size());
        List<EstimatedSite> perm = new ArrayList<>(0);
        for (EstimatedSite s : est) {
            (s.site().group().permanent() ? perm : titr).add(s);
        }
        int n = titr.size();
        double[] pka = new double[n];
        boolean[] base = new boolean[n];
        for (int i = 0; i < n; i++) {
            GroupClass g = titr.get(i).site().group();
            base[i] = g.type() == SiteType.BASE;
            pka[i] = titr.get(i).pka() + Conditioning.temperatureShift(g.enthalpy(), c.temperature());
        }
        double[][] w = new double[n][n];
        double[] bg = new double[n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                if (i != j) {
                    w[i][j] = inter[i][j];
                }
            }
            for (int p = 0; p < perm.size(); p++) {
                double q = perm.get(p).site().group().type() == SiteType.BASE ? 1 : -1;
                bg[i] += inter[i][n + p] * q;
            }
        }
        return new SiteModel(pka, base, w, bg);
    }

    private static List<EstimatedSite> withPermanent(List<EstimatedSite> all, List<EstimatedSite> titratable) {
        List<EstimatedSite> out = new ArrayList<>(titratable);
        all.stream().filter(s -> s.site().group().permanent()).forEach(out::add);
        return out;
    }

    /**
     * The charge-distance interaction for every pair of sites, indexed as {@link #distances}; 0 for a
     * pair with a site of a class the table exempts (its charge is already in the substituent constants),
     * times both sites' reach factors.
     */
    private double[][] interactions(int[][][] dist, List<EstimatedSite> est) {
        SiteInteraction rule = table.table().interaction();
        int k = dist.length;
        double[] reach = new double[k];
        List<EstimatedSite> ordered = inDistanceOrder(est);
        for (int i = 0; i < k; i++) {
            reach[i] = rule.reachOf(ordered.get(i).site().group().id());
        }
        double[][] w = new double[k][k];
        for (int i = 0; i < k; i++) {
            for (int j = 0; j < k; j++) {
                w[i][j] = i == j || reach[i] == 0 || reach[j] == 0 ? 0 : SitePaths.interaction(rule, dist[i][j]) * reach[i] * reach[j];
            }
        }
        return w;
    }

    /**
     * The table's pair rules applied: for every two titratable sites of one kind that a rule joins
     * (its :1 atom on one site, its :2 atom on the other; the first rule in table order wins), both
     * values move by the rule's singly charged term (acids down, bases up, each with its derivation
     * term) and {@link ionmark.acidity.api.PairRule#interaction()} is added to the pair's entry in
     * {@code inter}; {@code used} collects the rule ids. A site in no pair is returned as it came.
     */
    private List<EstimatedSite> heldPairs(RootedPattern.Target target, List<EstimatedSite> est, double[][] inter,
            java.util.Set<String> used) {
        List<CompiledTable.Pair> rules = table.pairs();
        if (rules.isEmpty()) {
            return est;
        }
        List<EstimatedSite> titr = est.stream().filter(s -> !s.site().group().permanent()).toList();
        if (titr.size() < 2) {
            return est;
        }
        int[] siteAt = new int[target.atomCount()];
        Arrays.fill(siteAt, -1);
        for (int k = 0; k < titr.size(); k++) {
            siteAt[titr.get(k).site().atom()] = k;
        }
        EstimatedSite[] now = titr.toArray(new EstimatedSite[0]);
        boolean[][] joined = new boolean[titr.size()][titr.size()];
        for (CompiledTable.Pair rule : rules) {
            for (int i = 0; i < titr.size(); i++) {
                final int a = i;
                rule.pattern().forEach(target, titr.get(i).site().atom(), m -> {
                    int b = siteAt[m[rule.partner()]];
                    if (b < 0 || b == a || joined[a][b]
                            || titr.get(a).site().group().type() != titr.get(b).site().group().type()) {
                        return true;
                    }
                    joined[a][b] = true;
                    joined[b][a] = true;
                    used.add(rule.rule().id());
                    inter[a][b] += rule.rule().interaction();
                    inter[b][a] += rule.rule().interaction();
                    now[a] = held(now[a], titr.get(b), rule.rule());
                    now[b] = held(now[b], titr.get(a), rule.rule());
                    return true;
                });
            }
        }
        List<EstimatedSite> out = new ArrayList<>(est.size());
        for (EstimatedSite s : est) {
            int k = indexOf(titr, s);
            out.add(k < 0 ? s : now[k]);
        }
        return out;
    }

    private EstimatedSite held(EstimatedSite s, EstimatedSite partner, ionmark.acidity.api.PairRule rule) {
        boolean base = s.site().group().type() == SiteType.BASE;
        double d = base ? rule.singly() : -rule.singly();
        String label = String.format(Locale.ROOT, "pair rule with the %s site on atom %d (%s): singly %s form held "
                + "by %.2f, doubly %s form dearer by %.2f; the pair's interaction grows by %.2f",
                partner.site().group().id(), partner.site().atom(), rule.name(), base ? "protonated" : "deprotonated",
                rule.singly(), base ? "protonated" : "deprotonated", rule.doubly(), rule.interaction());
        return s.shifted(d, new Term(label, d, table.table().citation(rule.source())), s.basis(), s.sd());
    }

    /**
     * Derivation lines, worth 0 in the site value, for what the microstate model adds on top of it: the
     * coupling with every other titratable site (distance rule at the bond count × both reach factors,
     * plus any pair rule) and the potential of permanent charges. They are why the macroscopic constants
     * differ from the site values.
     */
    private void couplings(SiteModel model, double davies, int q0, int i, List<EstimatedSite> titr, int[][][] paths,
            List<Term> terms) {
        double cutoff = table.table().interaction().cutoff();
        String source = table.table().citation(table.table().interaction().source());
        for (int j = 0; j < model.size(); j++) {
            double w = model.w()[i][j] + 2 * davies; // the rule's part; SpeciesActivity adds −2k to every pair
            if (j == i || Math.abs(w) < cutoff) {
                continue;
            }
            EstimatedSite other = titr.get(j);
            terms.add(new Term(String.format(Locale.ROOT, "coupling with the %s site on atom %d: %.2f pKa units while "
                    + "both are charged (distance rule at %s, × both reach factors, with any pair rule); applied in "
                    + "the microstate model, not in this value", other.site().group().id(), other.site().atom(), w,
                    SitePaths.describe(paths[i][j])), 0.0,
                    source + reachSources(titr.get(i).site().group(), other.site().group())));
        }
        double phi = model.background()[i] + 2 * davies * q0;
        if (Math.abs(phi) >= cutoff) {
            // log weight −q·Φ: the site titrates as if its value were lower by Φ, acid or base
            terms.add(new Term(String.format(Locale.ROOT, "permanent charges in the molecule move this site by %+.2f "
                    + "pKa units in the microstate model, not in this value", -phi), 0.0,
                    source + reachSources(titr.get(i).site().group(), titr.get(i).site().group())));
        }
    }

    /**
     * "; reach factor r of X: citation" for each of the two classes (one when both are the same) whose
     * factor is not 1.
     */
    private String reachSources(GroupClass a, GroupClass b) {
        StringBuilder sb = new StringBuilder();
        for (GroupClass g : a.id().equals(b.id()) ? List.of(a) : List.of(a, b)) {
            double r = table.table().interaction().reachOf(g.id());
            if (r != 1.0 && !g.source("reach").isBlank()) {
                sb.append(String.format(Locale.ROOT, "; reach factor %.2f of %s: %s", r, g.id(),
                        table.table().citation(g.source("reach"))));
            }
        }
        return sb.toString();
    }

    /** The sites as {@link #distances} and {@link #interactions} index them: titratable first, then permanent. */
    private static List<EstimatedSite> inDistanceOrder(List<EstimatedSite> est) {
        List<EstimatedSite> out = new ArrayList<>(est.size());
        est.stream().filter(s -> !s.site().group().permanent()).forEach(out::add);
        est.stream().filter(s -> s.site().group().permanent()).forEach(out::add);
        return out;
    }

    /** The bond paths between the sites' atoms ({@link SitePaths#between}), in {@link #inDistanceOrder}. */
    private static int[][][] distances(RootedPattern.Target target, List<EstimatedSite> est) {
        int k = est.size();
        List<EstimatedSite> ordered = inDistanceOrder(est);
        int[][] adj = target.adjacency();
        boolean[] saturated = new boolean[adj.length];
        for (int i = 0; i < adj.length; i++) {
            saturated[i] = !target.aromatic(i);
            for (int n = 0; n < adj[i].length; n++) {
                saturated[i] &= target.bondCode(i, n) == 1;
            }
        }
        int[][][] out = new int[k][k][];
        for (int i = 0; i < k; i++) {
            for (int j = i; j < k; j++) {
                out[i][j] = SitePaths.between(adj, saturated, ordered.get(i).site().atom(), ordered.get(j).site().atom());
                out[j][i] = out[i][j];
            }
        }
        return out;
    }

    private Analysis analyse(String input, Conditions c, Problem p, String version, boolean brief) {
        IAtomContainer mol = p.prepared().molecule();
        List<EstimatedSite> titr = p.sites().stream().filter(s -> !s.site().group().permanent()).toList();
        List<String> corrections = new ArrayList<>();
        List<String> warnings = new ArrayList<>();
        Conditioning.describe(c, corrections, warnings);
        warnings.addAll(p.notes());
        if (!p.prepared().stripped().isEmpty()) {
            warnings.add("mixture or salt: analysed the parent, stripped " + String.join(", ", p.prepared().stripped()));
        }
        for (int atom : p.uncovered()) {
            warnings.add("atom " + atom + " (" + mol.getAtom(atom).getSymbol() + "-H) looks ionizable but is outside "
                    + "the table: not estimated");
        }
        if (p.measured().isEmpty() && !titr.isEmpty()) {
            warnings.add("pKa values are estimated, not measured");
        }
        List<Double> macro = MacroConstants.of(p.polynomial()).stream()
                .filter(v -> v >= MACRO_LOW && v <= MACRO_HIGH).map(v -> Math.round(v * 100) / 100.0).toList();
        List<WaterRange.Site> inWater = WaterRange.sites(p.sites(), p.model(), p.prepared().molecule());
        if (p.measured().isPresent() && measuredFit(p)) {
            macro = p.measuredHere().stream().map(v -> Math.round(v * 100) / 100.0).toList();
        } else {
            macro = WaterRange.reportable(macro, inWater);
            inWater.stream().filter(WaterRange::heldOut).forEach(w -> warnings.add(String.format(Locale.ROOT,
                    "alcohol O-H estimated at %.1f ± %.1f: not counted as titrating in water (simple alcohols 15.5-16, "
                            + "CRC, from memory); left out of the macroscopic constants and the isoelectric point",
                    w.pka(), w.sd())));
        }
        double logP = brief ? Double.NaN : logP(mol);
        Double netCharge = null;
        Double neutral = null;
        Double uncharged = null;
        Double logD = null;
        Map<Integer, Double> chargeStates = Map.of();
        List<Species> species = List.of();
        boolean sampled = false;
        double[] prot = null;
        if (c.hasPh()) {
            Populations pop = solver.solve(p.model(), c.ph());
            sampled = pop.sampled();
            prot = pop.protonated();
            chargeStates = shift(pop.chargeStates(), p.permanentCharge());
            if (p.measured().isPresent() && measuredFit(p)) {
                chargeStates = fromMeasured(p, c.ph());
                corrections.add("charge states from the measured macroscopic constants of "
                        + p.measured().get().name() + (c.temperature() == Conditions.STANDARD_TEMPERATURE
                                && c.ionicStrength() == 0 ? " (exact, independent of the site model)"
                                        : ", moved to the stated conditions by the model's temperature and ionic-strength"
                                                + " shifts"));
            }
            double mean = 0;
            for (var e : chargeStates.entrySet()) {
                mean += e.getKey() * e.getValue();
            }
            netCharge = mean;
            neutral = chargeStates.getOrDefault(0, 0.0);
            uncharged = neutral * Partition.unchargedShareOfNeutral(p.model(), p.polynomial(), p.permanentCharge(),
                    Conditioning.davies(c.ionicStrength(), c.temperature()));
            logD = Partition.logD(logP, chargeStates, uncharged);
            species = brief ? List.of() : species(mol, titr, pop, p.permanentCharge());
            if (!brief && p.measured().isPresent() && measuredFit(p)) {
                species = consistentWith(species, shift(pop.chargeStates(), p.permanentCharge()), chargeStates);
            }
            if (sampled) {
                warnings.add(String.format(Locale.ROOT, "populations sampled (Monte Carlo), standard error up to %.3f",
                        pop.stdError()));
            }
        }
        List<Site> sites = new ArrayList<>();
        List<EstimatedSite> titrNow = p.sites().stream().filter(x -> !x.site().group().permanent()).toList();
        int[][][] paths = brief ? null : distances(new RootedPattern.Target(mol), p.sites());
        int t = 0;
        for (EstimatedSite s : p.sites()) {
            GroupClass g = s.site().group();
            Double pr = null;
            double pka = s.pka();
            List<Term> terms = new ArrayList<>(s.terms());
            ClassProvenance.Record record = ClassProvenance.of(g, table().fit(g.id()));
            ClassProvenance.annotate(g, record, terms);
            ClassProvenance.thinWarning(g, record).filter(w -> !warnings.contains(w)).ifPresent(warnings::add);
            if (!g.permanent()) {
                pka = p.model().pka()[t];
                pr = prot == null ? null : prot[t];
                if (!brief) {
                    couplings(p.model(), Conditioning.davies(c.ionicStrength(), c.temperature()), p.permanentCharge(), t,
                            titrNow, paths, terms);
                }
                t++;
            }
            if (Math.abs(pka - s.pka()) > 1e-9) {
                terms.add(new Term("conditions (temperature, ionic strength)", pka - s.pka(), "van 't Hoff; Davies"));
            }
            sites.add(new Site(s.site().atom(), mol.getAtom(s.site().atom()).getSymbol(), g.id(), g.name(),
                    g.type().label(), g.permanent() ? Double.NaN : pka, s.sd(), pr, terms, s.basis(), g.permanent()));
        }
        List<Window> neutralWindows = new ArrayList<>();
        List<Window> chargedWindows = new ArrayList<>();
        if (!brief) {
            windows(p, neutralWindows, chargedWindows);
        }
        ionmark.speciation.internal.profile.KnownGaps.warnings(mol, p.sites()).stream().filter(w -> !warnings.contains(w)).forEach(warnings::add);
        warnings.add(CAUTION);
        final List<Double> listed = macro;
        Double pI = brief ? null : WaterRange.isoelectricPoint(inWater, p.permanentCharge() > 0, listed,
                ph -> meanCharge(p, ph));
        return new Analysis(input, brief ? p.prepared().smilesAsRead() : p.prepared().smiles(), p.prepared().stripped(), sites, macro, c, netCharge, neutral,
                uncharged, chargeStates, species, pI, logP, logD, neutralWindows, chargedWindows, corrections, warnings, sampled, version,
                null);
    }

    public Curve curve(String input, Conditions c, double from, double to, double step) throws StructureException {
        if (!(step > 0) || !(to >= from) || (to - from) / step > 100_000) {
            throw new IllegalArgumentException("curve needs from <= to and a positive step (at most 100000 points)");
        }
        Problem p = prepare(input, c);
        int n = (int) Math.round((to - from) / step) + 1;
        double[] ph = new double[n];
        double[] mean = new double[n];
        Map<Integer, double[]> site = new LinkedHashMap<>();
        Map<Integer, double[]> states = new TreeMap<>();
        List<EstimatedSite> titr = p.sites().stream().filter(s -> !s.site().group().permanent()).toList();
        titr.forEach(s -> site.put(s.site().atom(), new double[n]));
        for (int k = 0; k < n; k++) {
            ph[k] = from + k * step;
            Populations pop = solver.solve(p.model(), ph[k]);
            mean[k] = pop.meanCharge() + p.permanentCharge();
            for (int i = 0; i < titr.size(); i++) {
                site.get(titr.get(i).site().atom())[k] = pop.protonated()[i];
            }
            for (var e : pop.chargeStates().entrySet()) {
                states.computeIfAbsent(e.getKey() + p.permanentCharge(), z -> new double[n])[k] = e.getValue();
            }
        }
        return new Curve(ph, mean, site, states);
    }

    private double meanCharge(Problem p, double ph) {
        if (p.measured().isPresent() && measuredFit(p)) {
            double m = 0;
            for (var e : fromMeasured(p, ph).entrySet()) {
                m += e.getKey() * e.getValue();
            }
            return m;
        }
        double[] f = MacroConstants.fractions(p.polynomial(), ph);
        double m = p.topCharge();
        for (int d = 0; d < f.length; d++) {
            m -= d * f[d];
        }
        return m;
    }

    /** Fraction with net charge 0 at a pH, without building a map (used by the window scan). */
    private double neutralAt(Problem p, double ph) {
        if (p.measured().isPresent() && measuredFit(p)) {
            return fromMeasured(p, ph).getOrDefault(0, 0.0);
        }
        int d = p.topCharge();
        if (d < 0 || d >= p.polynomial().length) {
            return 0;
        }
        return MacroConstants.fractions(p.polynomial(), ph)[d];
    }

    /**
     * Fractions per net charge: from measured constants for an exact match, else from the proton-binding
     * polynomial of the site model (net charge = top charge − protons lost).
     */
    private Map<Integer, Double> chargeStatesAt(Problem p, double ph) {
        if (p.measured().isPresent() && measuredFit(p)) {
            return fromMeasured(p, ph);
        }
        double[] f = MacroConstants.fractions(p.polynomial(), ph);
        Map<Integer, Double> out = new TreeMap<>();
        int top = p.topCharge();
        for (int d = 0; d < f.length; d++) {
            if (f[d] > 0) {
                out.merge(top - d, f[d], Double::sum);
            }
        }
        return out;
    }

    private void windows(Problem p, List<Window> neutral, List<Window> charged) {
        Double nStart = null;
        Double cStart = null;
        double last = 0;
        for (double ph = 0; ph <= 14 + 1e-9; ph += WINDOW_STEP) {
            double f0 = neutralAt(p, ph);
            if (f0 >= 0.99 && nStart == null) {
                nStart = ph;
            } else if (f0 < 0.99 && nStart != null) {
                neutral.add(new Window(round(nStart), round(last)));
                nStart = null;
            }
            if (1 - f0 >= 0.99 && cStart == null) {
                cStart = ph;
            } else if (1 - f0 < 0.99 && cStart != null) {
                charged.add(new Window(round(cStart), round(last)));
                cStart = null;
            }
            last = ph;
        }
        if (nStart != null) {
            neutral.add(new Window(round(nStart), 14.0));
        }
        if (cStart != null) {
            charged.add(new Window(round(cStart), 14.0));
        }
    }

    private static double round(double v) {
        return Math.round(v * 100) / 100.0;
    }

    private static boolean measuredFit(Problem p) {
        return p.sites().stream().filter(s -> "measured".equals(s.basis())).count() == p.measured().get().pka().size();
    }

    /**
     * Charge-state fractions from measured macroscopic constants: the state that has lost d protons
     * has weight 10^(Σ_(j≤d) (pH − pK_j)). Sites without measured values stay in their dominant form.
     */
    private Map<Integer, Double> fromMeasured(Problem p, double ph) {
        List<Double> pk = p.measuredHere();
        int z0 = p.permanentCharge();
        for (EstimatedSite s : p.sites()) {
            if (s.site().group().permanent()) {
                continue;
            }
            boolean base = s.site().group().type() == SiteType.BASE;
            if ("measured".equals(s.basis())) {
                z0 += base ? 1 : 0;
            } else {
                boolean dep = ph > s.pka();
                z0 += base ? (dep ? 0 : 1) : (dep ? -1 : 0);
            }
        }
        double[] logw = new double[pk.size() + 1];
        double max = 0;
        for (int d = 1; d <= pk.size(); d++) {
            logw[d] = logw[d - 1] + ph - pk.get(d - 1);
            max = Math.max(max, logw[d]);
        }
        double sum = 0;
        for (double l : logw) {
            sum += Math.pow(10, l - max);
        }
        Map<Integer, Double> out = new TreeMap<>();
        for (int d = 0; d < logw.length; d++) {
            out.merge(z0 - d, Math.pow(10, logw[d] - max) / sum, Double::sum);
        }
        return out;
    }

    private static Map<Integer, Double> shift(Map<Integer, Double> states, int by) {
        Map<Integer, Double> out = new TreeMap<>();
        states.forEach((z, f) -> out.put(z + by, f));
        return out;
    }

    /** Species fractions rescaled within each net charge so that they add up to the given charge states. */
    private static List<Species> consistentWith(List<Species> species, Map<Integer, Double> model,
            Map<Integer, Double> target) {
        List<Species> out = new ArrayList<>();
        for (Species s : species) {
            double m = model.getOrDefault(s.charge(), 0.0);
            double f = m > 0 ? s.fraction() * target.getOrDefault(s.charge(), 0.0) / m : s.fraction();
            out.add(new Species(s.smiles(), s.charge(), f));
        }
        out.sort((a, b) -> Double.compare(b.fraction(), a.fraction()));
        return out;
    }

    /** Leading species; microstates that are the same species (equivalent sites) are merged. */
    private static List<Species> species(IAtomContainer mol, List<EstimatedSite> titr, Populations pop, int permanent) {
        List<Species> out = new ArrayList<>();
        List<String> keys = new ArrayList<>();
        for (Populations.Microstate m : pop.top()) {
            if (m.fraction() < 0.001 && !out.isEmpty()) {
                break;
            }
            try {
                IAtomContainer copy = mol.clone();
                int z = permanent;
                List<Integer> cations = new ArrayList<>();
                List<Integer> anions = new ArrayList<>();
                for (int i = 0; i < titr.size(); i++) {
                    IAtom a = copy.getAtom(titr.get(i).site().atom());
                    boolean base = titr.get(i).site().group().type() == SiteType.BASE;
                    boolean dep = m.deprotonated()[i];
                    int h = a.getImplicitHydrogenCount() == null ? 0 : a.getImplicitHydrogenCount();
                    int q = a.getFormalCharge() == null ? 0 : a.getFormalCharge();
                    if (base && !dep) {
                        cations.add(titr.get(i).site().atom());
                        a.setImplicitHydrogenCount(h + 1);
                        a.setFormalCharge(q + 1);
                        z++;
                    } else if (!base && dep) {
                        if (h > 0) {
                            anions.add(titr.get(i).site().atom());
                            a.setImplicitHydrogenCount(h - 1);
                        } else {
                            IAtom o = copy.getBuilder().newInstance(IAtom.class, "O");
                            o.setImplicitHydrogenCount(1);
                            copy.addAtom(o);
                            copy.addBond(copy.indexOf(a), copy.indexOf(o), org.openscience.cdk.interfaces.IBond.Order.SINGLE);
                        }
                        a.setFormalCharge(q - 1);
                        z--;
                    }
                }
                SpeciesForms.cancelRingPairs(copy, cations, anions); // [nH+]...[n-] in one ring is the neutral form
                String key = Overrides.canonical(copy);
                int at = -1;
                for (int j = 0; j < out.size(); j++) {
                    if (keys.get(j).equals(key)) {
                        at = j;
                    }
                }
                if (at >= 0) {
                    Species prior = out.get(at);
                    out.set(at, new Species(prior.smiles(), prior.charge(), prior.fraction() + m.fraction()));
                } else {
                    keys.add(key);
                    out.add(new Species(StructureReader.smiles(copy), z, m.fraction()));
                }
            } catch (CloneNotSupportedException e) {
                throw new IllegalStateException(e);
            }
        }
        out.sort((a, b) -> Double.compare(b.fraction(), a.fraction()));
        return out;
    }

    private static double logP(IAtomContainer mol) {
        try {
            IAtomContainer copy = mol.clone();
            var v = QuietLogP.quietly(() -> new JPlogPDescriptor().calculate(copy).getValue());
            return v instanceof DoubleResult d ? Math.round(d.doubleValue() * 100) / 100.0 : Double.NaN;
        } catch (CloneNotSupportedException | RuntimeException e) {
            return Double.NaN;
        }
    }
}
