package ionmark.speciation.internal;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;

import org.openscience.cdk.interfaces.IAtomContainer;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.MeasuredCompound;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Curve;
import ionmark.speciation.internal.estimate.AnalogCorrection;
import ionmark.speciation.internal.estimate.AnalogSettings;
import ionmark.speciation.internal.estimate.EstimatedSite;
import ionmark.speciation.internal.estimate.LferEstimator;
import ionmark.speciation.internal.estimate.Overrides;
import ionmark.speciation.internal.estimate.PairRules;
import ionmark.speciation.internal.estimate.SiteAnalogIndex;
import ionmark.speciation.internal.microstates.Conditioning;
import ionmark.speciation.internal.microstates.MacroConstants;
import ionmark.speciation.internal.microstates.MeasuredFit;
import ionmark.speciation.internal.microstates.MicrostateSolver;
import ionmark.speciation.internal.microstates.Problem;
import ionmark.speciation.internal.microstates.SiteInteractions;
import ionmark.speciation.internal.microstates.SiteModel;
import ionmark.speciation.internal.microstates.SpeciesActivity;
import ionmark.speciation.internal.profile.Curves;
import ionmark.speciation.internal.sites.CompiledTable;
import ionmark.speciation.internal.sites.PerceivedSite;
import ionmark.speciation.internal.sites.MatchTarget;
import ionmark.speciation.internal.sites.SitePerceiver;
import ionmark.speciation.internal.structure.StructureException;
import ionmark.speciation.internal.structure.StructureReader;
import ionmark.speciation.spi.CalibrationPoint;

/**
 * The pipeline for one table snapshot: structure → sites → estimates → microstates → analysis.
 * Each stage is a class in its own package (see docs/code-map.md); this class only composes them.
 * Immutable and thread-safe; every call works on its own freshly read molecule.
 */
public final class Engine {
    private final CompiledTable table;
    private final Overrides overrides;
    private final StructureReader reader;
    private final MicrostateSolver solver;
    private final PairRules pairs;
    private final SiteInteractions interactions;
    private final MeasuredFit measuredFit;
    private final AnalysisBuilder result;
    private final CalibrationPoints calibration;
    /** Built on first use: engines made for a calibration step rarely need it. */
    private volatile SiteAnalogIndex analogs;
    /** Set while the index is built, under the lock: a measured compound read then that is no exact match gets none. */
    private boolean buildingAnalogs;
    /** False for the engines a calibration fits class values with: analogs correct on top of the fitted model. */
    private final boolean analogsOn;

    public Engine(AcidityTable table, int maxHeavyAtoms) {
        this(table, maxHeavyAtoms, true);
    }

    /**
     * An engine that leaves measured analogs out (exact measured compounds still count). Calibration fits class
     * values on this model, so that the analog step, applied on top at run time, corrects what the classes do not
     * describe instead of being absorbed into them; the analog prior can then change without refitting the table.
     */
    static Engine withoutAnalogs(AcidityTable table, int maxHeavyAtoms) {
        return new Engine(table, maxHeavyAtoms, false);
    }

    private Engine(AcidityTable table, int maxHeavyAtoms, boolean analogsOn) {
        this.analogsOn = analogsOn;
        this.table = new CompiledTable(table);
        this.overrides = new Overrides(this.table);
        this.reader = new StructureReader(maxHeavyAtoms);
        this.solver = new MicrostateSolver(table.interaction().cutoff());
        this.pairs = new PairRules(this.table);
        this.interactions = new SiteInteractions(table.interaction());
        this.measuredFit = new MeasuredFit(table);
        this.result = new AnalysisBuilder(table, solver);
        this.calibration = new CalibrationPoints(this.table, reader,
                structure -> analyse(structure, Conditions.noPh(), true).macroPka());
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
                        // once per snapshot, for every later structure: not under the asking structure's budget
                        analogs = ionmark.speciation.internal.work.Budget.unbudgeted(
                                () -> MeasuredSites.index(this, table.table().measured(), AnalogSettings.current()));
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

    public Analysis analyse(String input, Conditions c) {
        return analyse(input, c, false);
    }

    /** {@code brief}: without logP/logD, species structures, windows and isoelectric point. */
    public Analysis analyse(String input, Conditions c, boolean brief) {
        String version = table.table().version().label();
        try {
            Problem p = prepare(input, c);
            return result.build(input, c, p, version, brief);
        } catch (StructureException e) {
            return Analysis.failed(input, c, version, e.getMessage(), e.position());
        } catch (RuntimeException e) {
            // a structure that slips past the reader's checks must not break the caller
            return Analysis.failed(input, c, version, "cannot analyse this structure ("
                    + String.valueOf(e.getMessage()).lines().findFirst().orElse(e.getClass().getSimpleName()) + ")");
        }
    }

    /** Entry to the microstate model: read → perceive → estimate → pair rules → measured fit or analogs → model. */
    Problem prepare(String input, Conditions c) throws StructureException {
        StructureReader.Prepared prep = reader.read(input);
        IAtomContainer mol = prep.molecule();
        MatchTarget target = new MatchTarget(mol);
        int[][] adj = target.adjacency();
        List<PerceivedSite> perceived = SitePerceiver.perceive(table, target);
        List<EstimatedSite> est = new ArrayList<>(LferEstimator.estimate(table, mol, target, perceived));
        List<String> notes = new ArrayList<>(prep.notes());
        Optional<MeasuredCompound> measured = overrides.exact(target);
        // the sites keep their order from here on: one interaction matrix serves every model below
        double[][] inter = interactions.interactions(SiteInteractions.distances(target, est), est);
        est = pairs.apply(target, est, inter, new HashSet<>());
        if (measured.isPresent()) {
            est = measuredFit.fit(mol, adj, inter, est, measured.get());
        } else if (analogsOn) {
            est = AnalogCorrection.apply(analogIndex(), target, est);
        }
        List<Integer> uncovered = SitePerceiver.uncovered(mol, perceived);
        // ionic strength acts on whole species (Davies with each microstate's net charge), see SpeciesActivity
        SiteModel atZero = SiteInteractions.model(inter, est, c);
        double k = Conditioning.davies(c.ionicStrength(), c.temperature());
        int permanent = SiteInteractions.permanentCharge(est);
        SiteModel model = SpeciesActivity.of(atZero, permanent, k);
        double[] poly = SpeciesActivity.polynomial(MacroConstants.polynomial(atZero, table.table().interaction().cutoff()),
                atZero, permanent, k);
        final List<EstimatedSite> sitesNow = est;
        List<Double> measuredHere = measured.map(m -> measuredFit.atConditions(m, inter, sitesNow, poly))
                .orElse(List.of());
        return new Problem(prep, est, uncovered, model, poly, permanent, notes, measured, measuredHere);
    }

    /** The model's macroscopic constants at 25 °C, I = 0, with no measured value or analog applied (for the analog index). */
    List<Double> modelConstants(String input) throws StructureException {
        return model(input).constants();
    }

    /** The model at 25 °C, I = 0, with no measured value or analog applied: sites, numeric model, constants. */
    ModelSites model(String input) throws StructureException {
        MatchTarget target = new MatchTarget(reader.read(input).molecule());
        List<EstimatedSite> est = LferEstimator.estimate(table, target.molecule(), target,
                SitePerceiver.perceive(table, target));
        double[][] inter = interactions.interactions(SiteInteractions.distances(target, est), est);
        est = pairs.apply(target, est, inter, new HashSet<>());
        SiteModel m = SiteInteractions.model(inter, est, Conditions.noPh());
        return new ModelSites(est, m, MacroConstants.of(MacroConstants.polynomial(m, table.table().interaction().cutoff())),
                solver);
    }

    /** Ids of the table's pair rules that join two sites of this structure (none when it cannot be read). */
    public Set<String> pairRules(String input) {
        try {
            StructureReader.Prepared prep = reader.read(input);
            MatchTarget target = new MatchTarget(prep.molecule());
            List<EstimatedSite> est = LferEstimator.estimate(table, prep.molecule(), target,
                    SitePerceiver.perceive(table, target));
            Set<String> used = new TreeSet<>();
            pairs.apply(target, est, interactions.interactions(SiteInteractions.distances(target, est), est), used);
            return used;
        } catch (StructureException | RuntimeException e) {
            return Set.of();
        }
    }

    /** Calibration input from a compound with one experimental value (see {@link CalibrationPoints#of}). */
    public Optional<CalibrationPoint> calibrationPoint(String structure, List<Double> pka) {
        return calibration.of(structure, pka);
    }

    public Curve curve(String input, Conditions c, double from, double to, double step) throws StructureException {
        Curves.check(from, to, step);
        return Curves.of(prepare(input, c), solver, from, to, step);
    }
}
