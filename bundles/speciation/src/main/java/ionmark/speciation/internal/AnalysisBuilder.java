package ionmark.speciation.internal;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.openscience.cdk.interfaces.IAtomContainer;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.GroupClass;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Profile;
import ionmark.speciation.api.Site;
import ionmark.speciation.api.Species;
import ionmark.speciation.api.Term;
import ionmark.speciation.api.Window;
import ionmark.speciation.internal.estimate.EstimatedSite;
import ionmark.speciation.internal.microstates.Conditioning;
import ionmark.speciation.internal.microstates.Couplings;
import ionmark.speciation.internal.microstates.MacroConstants;
import ionmark.speciation.internal.microstates.MicrostateSolver;
import ionmark.speciation.internal.microstates.Populations;
import ionmark.speciation.internal.microstates.Problem;
import ionmark.speciation.internal.microstates.SiteInteractions;
import ionmark.speciation.internal.profile.ChargeProfile;
import ionmark.speciation.internal.profile.ClassProvenance;
import ionmark.speciation.internal.profile.OctanolLogP;
import ionmark.speciation.internal.profile.Partition;
import ionmark.speciation.internal.profile.SpeciesList;
import ionmark.speciation.internal.profile.WaterRange;
import ionmark.speciation.internal.profile.Windows;
import ionmark.speciation.internal.sites.MatchTarget;

/**
 * The last stage: the {@link Analysis} for a prepared problem. Sites with their derivations,
 * macroscopic constants, populations at the pH, species, logP/logD, windows, isoelectric point and
 * the warnings a chemist should read with them.
 */
final class AnalysisBuilder {
    /** Macroscopic constants outside this range are not observable in water and are not reported. */
    static final double MACRO_LOW = -2;
    static final double MACRO_HIGH = 16;
    static final String CAUTION = "estimated values for planning and write-up; measure before safety-relevant or "
            + "regulatory decisions";

    private final AcidityTable table;
    private final MicrostateSolver solver;
    private final Couplings couplings;

    AnalysisBuilder(AcidityTable table, MicrostateSolver solver) {
        this.table = table;
        this.solver = solver;
        this.couplings = new Couplings(table);
    }

    /** {@code brief}: without logP/logD, species structures, windows and isoelectric point. */
    Analysis build(String input, Conditions c, Problem p, String version, boolean brief) {
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
            warnings.add(AtomText.uncovered(atom, mol.getAtom(atom).getSymbol()));
        }
        if (p.measured().isEmpty() && !titr.isEmpty()) {
            warnings.add("pKa values are estimated, not measured");
        }
        List<Double> macro = MacroConstants.of(p.polynomial()).stream()
                .filter(v -> v >= MACRO_LOW && v <= MACRO_HIGH).map(v -> Math.round(v * 100) / 100.0).toList();
        List<WaterRange.Site> inWater = WaterRange.sites(p.sites(), p.model(), p.prepared().molecule());
        if (p.measured().isPresent() && ChargeProfile.measuredFit(p)) {
            macro = p.measuredHere().stream().map(v -> Math.round(v * 100) / 100.0).toList();
        } else {
            macro = WaterRange.reportable(macro, inWater);
            inWater.stream().filter(WaterRange::heldOut).forEach(w -> warnings.add(String.format(Locale.ROOT,
                    "alcohol O-H estimated at %.1f ± %.1f: not counted as titrating in water (simple alcohols 15.5-16, "
                            + "CRC, from memory); left out of the macroscopic constants and the isoelectric point",
                    w.pka(), w.sd())));
        }
        double logP = brief ? Double.NaN : OctanolLogP.of(mol);
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
            chargeStates = ChargeProfile.shift(pop.chargeStates(), p.permanentCharge());
            if (p.measured().isPresent() && ChargeProfile.measuredFit(p)) {
                chargeStates = ChargeProfile.fromMeasured(p, c.ph());
                corrections.add("charge states from the measured macroscopic constants of "
                        + p.measured().get().name() + (c.temperature() == Conditions.STANDARD_TEMPERATURE
                                && c.ionicStrength() == 0 ? (ChargeProfile.hasUnmeasuredSite(p) ? ""
                                        : " (exact, independent of the site model)")
                                        : ", moved to the stated conditions by the model's temperature and ionic-strength"
                                                + " shifts")
                        + (ChargeProfile.hasUnmeasuredSite(p) ? "; sites without a measured value in their dominant"
                                + " form by the model, in the field of the measured sites" : ""));
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
            species = brief ? List.of() : SpeciesList.species(mol, titr, pop, p.permanentCharge());
            if (!brief && p.measured().isPresent() && ChargeProfile.measuredFit(p)) {
                species = SpeciesList.consistentWith(species,
                        ChargeProfile.shift(pop.chargeStates(), p.permanentCharge()), chargeStates);
            }
            if (sampled) {
                warnings.add(String.format(Locale.ROOT, "populations sampled (Monte Carlo), standard error up to %.3f",
                        pop.stdError()));
            }
        }
        List<Site> sites = new ArrayList<>();
        List<EstimatedSite> titrNow = p.sites().stream().filter(x -> !x.site().group().permanent()).toList();
        int[][][] paths = brief ? null : SiteInteractions.distances(new MatchTarget(mol), p.sites());
        int t = 0;
        for (EstimatedSite s : p.sites()) {
            GroupClass g = s.site().group();
            Double pr = null;
            double pka = s.pka();
            List<Term> terms = new ArrayList<>(s.terms());
            ClassProvenance.Record record = ClassProvenance.of(g, table.fit(g.id()));
            ClassProvenance.annotate(g, record, terms);
            ClassProvenance.thinWarning(g, record).filter(w -> !warnings.contains(w)).ifPresent(warnings::add);
            if (!g.permanent()) {
                pka = p.model().pka()[t];
                pr = prot == null ? null : prot[t];
                if (!brief) {
                    couplings.describe(p.model(), Conditioning.davies(c.ionicStrength(), c.temperature()),
                            p.permanentCharge(), t, titrNow, paths, terms);
                }
                t++;
            }
            if (Math.abs(pka - s.pka()) > 1e-9) {
                terms.add(new Term("conditions (temperature, ionic strength)", pka - s.pka(), "van 't Hoff; Davies"));
            }
            sites.add(new Site(s.site().atom(), mol.getAtom(s.site().atom()).getSymbol(), g.id(), g.name(),
                    g.type(), g.permanent() ? Double.NaN : pka, s.sd(), pr, terms, s.basis(), g.permanent()));
        }
        List<Window> neutralWindows = new ArrayList<>();
        List<Window> chargedWindows = new ArrayList<>();
        if (!brief) {
            Windows.scan(p, neutralWindows, chargedWindows);
        }
        ionmark.speciation.internal.profile.KnownGaps.warnings(mol, p.sites()).stream().filter(w -> !warnings.contains(w)).forEach(warnings::add);
        warnings.add(CAUTION);
        final List<Double> listed = macro;
        Double pI = brief ? null : WaterRange.isoelectricPoint(inWater, p.permanentCharge() > 0, listed,
                ph -> ChargeProfile.meanCharge(p, ph));
        Profile profile = brief ? null : new Profile(species, pI, logP, logD, neutralWindows, chargedWindows);
        return new Analysis(input, brief ? p.prepared().smilesAsRead() : p.prepared().smiles(), p.prepared().stripped(),
                sites, macro, c, netCharge, neutral, uncharged, chargeStates, corrections, warnings, sampled, version,
                p.uncovered(), profile, null, null);
    }

}
