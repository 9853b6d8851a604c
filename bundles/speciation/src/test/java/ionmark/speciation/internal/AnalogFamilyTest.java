package ionmark.speciation.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
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
 * Family analogs: a measured site of another class of the same family (the class id up to its first hyphen: a
 * primary amine for a secondary one) counts at the settings' family weight, on top of the blended similarity. With
 * the whole molecule's share in the similarity, such an analog counts where the two molecules are alike (members of
 * one series whose site a substituent puts in another class), not wherever a site of the family sits in a similar
 * local environment. Amphetamine 9.9 (CRC Handbook and Clarke's Analysis of Drugs and Poisons, from memory).
 */
class AnalogFamilyTest {
    private static final MeasuredCompound AMPHETAMINE = new MeasuredCompound("amphetamine", "amphetamine",
            "CC(N)Cc1ccccc1", List.of(9.9), 25, 0, "compilation value", "crc", List.of("amine-primary"));
    private static final Pattern NUMBERS = Pattern.compile("local similarity ([0-9.]+), whole-molecule similarity "
            + "([0-9.]+), weight ([0-9.]+) of");

    @Test
    void aPrimaryAmineCorrectsASecondaryOneAtTheFamilyWeight() throws StructureException {
        String query = "CNC(C)Cc1ccccc1"; // methamphetamine: a secondary amine
        assertTrue(lines(0, query).isEmpty(), "without family analogs only measured secondary amines count");
        List<Term> half = lines(0.5, query);
        assertEquals(1, half.size(), half.toString());
        Term line = half.get(0);
        assertTrue(line.label().contains("amphetamine (amine-primary"), line.label());
        assertTrue(line.label().contains("another class of the family: weight × 0.50"), line.label());
        Matcher m = NUMBERS.matcher(line.label());
        assertTrue(m.find(), line.label());
        double blend = 0.1 * Double.parseDouble(m.group(1)) + 0.9 * Double.parseDouble(m.group(2));
        // the kernel's weight, (T − 0.3)/0.7, halved; the line rounds each number to 0.01
        assertEquals(0.5 * (blend - 0.3) / 0.7, Double.parseDouble(m.group(3)), 0.015);
        List<Term> full = lines(1, query);
        assertTrue(Math.abs(line.value()) < Math.abs(full.get(0).value()),
                "another class moves the site less than the same class would: " + line + " against " + full);
    }

    @Test
    void anAnalogOfTheSameClassSaysNothingOfTheFamily() throws StructureException {
        // 1-(4-methylphenyl)propan-2-amine: a primary amine like amphetamine
        List<Term> same = lines(0.5, "CC(N)Cc1ccc(C)cc1", "amine-primary");
        assertEquals(1, same.size(), same.toString());
        assertTrue(same.get(0).label().contains("amphetamine (amine-primary"), same.get(0).label());
        assertTrue(!same.get(0).label().contains("another class"), same.get(0).label());
    }

    private static List<Term> lines(double family, String query) throws StructureException {
        return lines(family, query, "amine-secondary");
    }

    private static List<Term> lines(double family, String query, String group) throws StructureException {
        AnalogSettings s = new AnalogSettings(4, 0.3, 0.1, family, 8, AnalogSettings.Kernel.LINEAR, 0.5, 0.01,
                AnalogSettings.Assignment.TITRATING, true, 0.9);
        List<MeasuredCompound> measured = List.of(AMPHETAMINE);
        SiteAnalogIndex index = MeasuredSites.index(new Engine(AnalogCorrectionTest.with(measured), 300), measured, s);
        Problem p = new Engine(AnalogCorrectionTest.BARE, 300).prepare(query, Conditions.noPh());
        List<EstimatedSite> out = AnalogCorrection.apply(index, new MatchTarget(p.prepared().molecule()), p.sites());
        EstimatedSite site = out.stream().filter(e -> e.site().group().id().equals(group)).findFirst()
                .orElseThrow();
        return site.terms().stream().filter(t -> t.label().startsWith("measured analog")).toList();
    }
}
