package ionmark.speciation.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
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
import ionmark.speciation.internal.estimate.SiteEnvironment;
import ionmark.speciation.internal.microstates.Problem;
import ionmark.speciation.internal.sites.MatchTarget;
import ionmark.speciation.internal.structure.StructureException;

/**
 * The whole molecule's share of an analog's similarity ({@link AnalogSettings#global()}): an analog's weight comes from
 * (1 − g) · local + g · whole-molecule similarity, so members of one series (one scaffold) count more for each other
 * than a site of the same local environment in an unrelated molecule. A sum of two similarity kernels is again one
 * (common practice in kernel methods). Measured pyridines as in {@link AnalogCorrectionTest} (CRC Handbook, from
 * memory).
 */
class AnalogWholeMoleculeTest {
    private static final Pattern NUMBERS = Pattern.compile("local similarity ([0-9.]+), whole-molecule similarity "
            + "([0-9.]+), weight ([0-9.]+) of");

    @Test
    void twoDrawingsOfOneMoleculeHaveTheSameWholeMoleculeFeatures() throws StructureException {
        int[] a = whole("Cc1cccc(C)n1");
        int[] b = whole("n1c(C)cccc1C");
        assertEquals(1.0, SiteEnvironment.tanimoto(a, b), 0);
        assertTrue(SiteEnvironment.tanimoto(a, whole("Cc1ccccn1")) < 1);
    }

    /**
     * 4-(3-phenylpropyl)-2,6-dimethylpyridine against 2,6-dimethylpyridine: the pyridine N's environment within four
     * bonds is nearly the same, the whole molecules are not. With the whole molecule's share at 0.5 the analog's
     * weight is that of the mean of the two similarities (linear kernel from the threshold 0.3: (T − 0.3)/0.7), and
     * lower than with the local environment alone.
     */
    @Test
    void theWeightFollowsTheBlendOfLocalAndWholeMoleculeSimilarity() throws StructureException {
        String query = "Cc1cc(CCCc2ccccc2)cc(C)n1";
        Term local = analogLines(settings(0), query).get(0);
        assertFalse(local.label().contains("whole-molecule"), local.label());
        Term blended = analogLines(settings(0.5), query).get(0);
        Matcher m = NUMBERS.matcher(blended.label());
        assertTrue(m.find(), blended.label());
        double sim = Double.parseDouble(m.group(1));
        double mol = Double.parseDouble(m.group(2));
        double w = Double.parseDouble(m.group(3));
        assertTrue(mol < sim, "the whole molecules differ more than the sites' environments: " + blended.label());
        assertEquals(((0.5 * sim + 0.5 * mol) - 0.3) / 0.7, w, 0.015); // the line rounds each number to 0.01
        assertTrue(Math.abs(blended.value()) < Math.abs(local.value()),
                "a less similar molecule moves the site less: " + blended + " against " + local);
    }

    /**
     * A measured site stored without its molecule's features (an index built for sites only) is compared by its
     * environment alone, not at whole-molecule similarity 0, which would silently cut its weight.
     */
    @Test
    void aSiteStoredWithoutItsMoleculeIsComparedByItsEnvironment() throws StructureException {
        String query = "Cc1cc(CCCc2ccccc2)cc(C)n1";
        Term local = analogLines(settings(0), query).get(0);
        List<MeasuredCompound> measured = List.of(AnalogCorrectionTest.LUTIDINE_26);
        SiteAnalogIndex full = MeasuredSites.index(new Engine(AnalogCorrectionTest.with(measured), 300), measured,
                settings(0.5));
        Problem p = new Engine(AnalogCorrectionTest.BARE, 300).prepare(query, Conditions.noPh());
        EstimatedSite pyridine = p.sites().stream().filter(e -> e.site().group().id().startsWith("pyridine"))
                .findFirst().orElseThrow();
        List<SiteAnalogIndex.MeasuredSite> stored = full.candidates(pyridine.site().group(),
                AnalogCorrection.heldBy(pyridine));
        assertFalse(stored.isEmpty());
        assertTrue(stored.stream().allMatch(m -> m.molecule().length > 0), "the index keeps the molecules' features");
        List<SiteAnalogIndex.MeasuredSite> bare = stored.stream().map(m -> new SiteAnalogIndex.MeasuredSite(
                m.compound(), m.group(), m.type(), m.env(), m.model(), m.residual(), m.citation(), m.held(),
                m.share())).toList();
        Term line = analogLines(new SiteAnalogIndex(bare, settings(0.5)), query).get(0);
        assertFalse(line.label().contains("whole-molecule"), line.label());
        assertEquals(local.label(), line.label());
        assertEquals(local.value(), line.value(), 1e-12);
    }

    private static AnalogSettings settings(double global) {
        return new AnalogSettings(4, 0.3, 0.15, 0, 8, AnalogSettings.Kernel.LINEAR, 0.5, 0.15,
                AnalogSettings.Assignment.TITRATING, true, global);
    }

    private static int[] whole(String smiles) throws StructureException {
        Problem p = new Engine(AnalogCorrectionTest.BARE, 300).prepare(smiles, Conditions.noPh());
        return SiteEnvironment.molecule(new MatchTarget(p.prepared().molecule()), 4, true);
    }

    private static List<Term> analogLines(AnalogSettings s, String query) throws StructureException {
        List<MeasuredCompound> measured = List.of(AnalogCorrectionTest.LUTIDINE_26);
        return analogLines(MeasuredSites.index(new Engine(AnalogCorrectionTest.with(measured), 300), measured, s), query);
    }

    private static List<Term> analogLines(SiteAnalogIndex index, String query) throws StructureException {
        Problem p = new Engine(AnalogCorrectionTest.BARE, 300).prepare(query, Conditions.noPh());
        List<EstimatedSite> out = AnalogCorrection.apply(index, new MatchTarget(p.prepared().molecule()), p.sites());
        EstimatedSite site = out.stream().filter(e -> e.site().group().id().startsWith("pyridine")).findFirst()
                .orElseThrow();
        List<Term> lines = site.terms().stream().filter(t -> t.label().startsWith("measured analog")).toList();
        assertEquals(1, lines.size(), lines.toString());
        return lines;
    }
}
