package ionmark.speciation.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;

import ionmark.acidity.api.MeasuredCompound;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Term;
import ionmark.speciation.internal.estimate.AnalogCorrection;
import ionmark.speciation.internal.estimate.AnalogSettings;
import ionmark.speciation.internal.estimate.EstimatedSite;
import ionmark.speciation.internal.estimate.SiteAnalogIndex;
import ionmark.speciation.internal.microstates.Problem;
import ionmark.speciation.internal.sites.MatchTarget;
import ionmark.speciation.internal.structure.StructureException;

/**
 * The nearest-analog prior of {@link AnalogSettings}: a prior count that falls as the nearest analog nears identity,
 * so that a lone distant analog moves a site less than a close one. The shift is the shrunk mean
 * Σ wᵢrᵢ / (prior + Σ wᵢ), a weighted mean shrunk toward zero by a prior count (common practice in empirical-Bayes
 * estimation of a group mean; the prior count is the weight given to the model's own estimate). Measured pyridines as
 * in {@link AnalogCorrectionTest} (CRC Handbook, from memory).
 */
class AnalogNearestPriorTest {
    private static final Pattern NUMBERS = Pattern.compile(
            "residual ([+-][0-9.]+) .*local similarity ([0-9.]+), weight ([0-9.]+) of ([0-9.]+) \\(prior ([0-9.]+)\\)");

    /**
     * Worked by hand: prior 1 for a lone analog at the threshold, 0.05 for an identical one, falling geometrically in
     * between. A nearest analog of weight 0.6 gives the prior 1 · 0.05^0.6 = e^(0.6 · ln 0.05) = e^(−1.7974) = 0.1657;
     * of weight 0.5, √0.05 = 0.2236. The analog of weight 0.6 alone, with residual +1.00, moves the site
     * 0.6 · 1.00 / (0.1657 + 0.6) = 0.784, where one prior of 1 moved it 0.6 / 1.6 = 0.375 and one of 0.05 0.923.
     */
    @Test
    void thePriorFallsGeometricallyFromTheFarToTheNearValueWithTheNearestAnalogsWeight() {
        AnalogSettings s = settings(1.0, 0.05);
        assertEquals(1.0, s.prior(0), 1e-12);
        assertEquals(0.05, s.prior(1), 1e-12);
        assertEquals(0.1657, s.prior(0.6), 0.00005);
        assertEquals(0.2236, s.prior(0.5), 0.00005);
        assertEquals(0.784, 0.6 * 1.00 / (s.prior(0.6) + 0.6), 0.0005);
        // one prior: the same value whatever the nearest analog
        AnalogSettings one = settings(0.15, 0.15);
        assertEquals(one.prior(), one.prior(0.0), 0);
        assertEquals(one.prior(), one.prior(0.7), 0);
    }

    /**
     * The shipped prior, worked by hand: 0.1 · 0.1^w. A weak lone analog (w 0.05): prior 0.1 · e^(0.05 · ln 0.1) =
     * 0.1 · 0.89125 = 0.08913, and it moves the site 0.05 / 0.13913 = 0.359 of its residual; at w 0.14: 0.07244 and
     * 0.659; an identical analog: 0.01 and 1 / 1.01 = 0.990. The flat prior 0.03 would have moved the weak one
     * 0.05 / 0.08 = 0.625 of the way.
     */
    @Test
    void theShippedPriorKeepsAWeakLoneAnalogWeakAndTrustsAnIdenticalOne() {
        AnalogSettings s = AnalogSettings.DEFAULT;
        assertEquals(0.1, s.prior(0), 1e-12);
        assertEquals(0.01, s.prior(1), 1e-12);
        assertEquals(0.08913, s.prior(0.05), 0.00001);
        assertEquals(0.359, 0.05 / (s.prior(0.05) + 0.05), 0.0005);
        assertEquals(0.659, 0.14 / (s.prior(0.14) + 0.14), 0.0005);
        assertEquals(0.990, 1 / (s.prior(1) + 1), 0.0005);
        assertEquals(0.9, s.global(), 0);
        assertEquals(0.5, s.familyWeight(), 0);
    }

    @Test
    void aLoneAnalogMovesTheSiteByItsWeightOverThePriorItsOwnWeightSets() throws StructureException {
        // 2,4,6-trimethylpyridine against 2,6-lutidine: one analog (weight 0.26)
        AnalogSettings s = settings(1.0, 0.05);
        List<Term> lines = analogLines(s, List.of(AnalogCorrectionTest.LUTIDINE_26), "Cc1cc(C)nc(C)c1");
        assertEquals(1, lines.size(), lines.toString());
        Matcher m = numbers(lines.get(0));
        double r = Double.parseDouble(m.group(1));
        double w = Double.parseDouble(m.group(3));
        assertTrue(w > 0.1, "an analog with weight: " + w);
        double prior = Math.pow(0.05, w);
        assertEquals(prior, Double.parseDouble(m.group(5)), 0.01); // the line rounds w to 0.01
        assertEquals(w * r / (prior + w), lines.get(0).value(), 0.01);
        assertTrue(lines.get(0).label().contains("as the nearest analog nears identity"), lines.get(0).label());
    }

    @Test
    void aSiteWithNoAnalogIsReturnedAsItWasWhateverThePrior() throws StructureException {
        // 4-chlorophenol: no measured phenol in the index, so no analog
        Problem p = bare().prepare("Oc1ccc(Cl)cc1", Conditions.noPh());
        SiteAnalogIndex idx = index(settings(1.0, 0.05), List.of(AnalogCorrectionTest.LUTIDINE_26));
        List<EstimatedSite> out = AnalogCorrection.apply(idx, new MatchTarget(p.prepared().molecule()), p.sites());
        for (int i = 0; i < out.size(); i++) {
            assertSame(p.sites().get(i), out.get(i));
        }
    }

    private static AnalogSettings settings(double prior, double nearPrior) {
        return new AnalogSettings(4, 0.3, prior, 0, 8, AnalogSettings.Kernel.LINEAR, 0.5, nearPrior);
    }

    private static Engine bare() {
        return new Engine(AnalogCorrectionTest.BARE, 300);
    }

    /** The index of {@code measured} at these settings, built through an engine whose table holds them. */
    private static SiteAnalogIndex index(AnalogSettings s, List<MeasuredCompound> measured) {
        return MeasuredSites.index(new Engine(AnalogCorrectionTest.with(measured), 300), measured, s);
    }

    /** The analog lines of the query's pyridine site, with the measured compounds indexed at these settings. */
    private static List<Term> analogLines(AnalogSettings s, List<MeasuredCompound> measured, String query)
            throws StructureException {
        Problem p = bare().prepare(query, Conditions.noPh());
        List<EstimatedSite> out = AnalogCorrection.apply(index(s, measured), new MatchTarget(p.prepared().molecule()),
                p.sites());
        EstimatedSite site = out.stream().filter(e -> e.site().group().id().startsWith("pyridine")).findFirst()
                .orElseThrow();
        return site.terms().stream().filter(t -> t.label().startsWith("measured analog")).toList();
    }

    private static Matcher numbers(Term t) {
        Matcher m = NUMBERS.matcher(t.label());
        assertTrue(m.find(), t.label());
        return m;
    }
}
