package ionmark.speciation.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.MeasuredCompound;
import ionmark.acidity.internal.TableSnapshotService;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Site;
import ionmark.speciation.api.Basis;

/**
 * Site-level analog correction: the shipped table without its measured compounds, then with one or a
 * few measured pyridines added (25 °C values quoted from the CRC Handbook, from memory: 2,6-dimethylpyridine
 * 6.72, 2,4-dimethylpyridine 6.99, 2-methylpyridine 5.97).
 */
class AnalogCorrectionTest {
    static final AcidityTable BARE = with(List.of());
    static final MeasuredCompound LUTIDINE_26 = measured("lutidine-2-6", "2,6-dimethylpyridine", "Cc1cccc(C)n1", 6.72);
    static final MeasuredCompound LUTIDINE_24 = measured("lutidine-2-4", "2,4-dimethylpyridine", "Cc1ccnc(C)c1", 6.99);
    static final MeasuredCompound PICOLINE_2 = measured("picoline-2", "2-methylpyridine", "Cc1ccccn1", 5.97);

    static MeasuredCompound measured(String id, String name, String smiles, double pka) {
        return new MeasuredCompound(id, name, smiles, List.of(pka), 25, 0, "compilation value", "crc",
                List.of("pyridine"));
    }

    static AcidityTable with(List<MeasuredCompound> m) {
        AcidityTable t = TableSnapshotService.shipped();
        return new AcidityTable(t.version(), t.references(), t.groups(), t.substituents(), m, t.interaction(), t.pairs());
    }

    static Site site(Engine e, String smiles) {
        Analysis a = e.analyse(smiles, Conditions.noPh(), false);
        assertTrue(a.ok(), a.error());
        return a.sites().stream().filter(s -> s.group().startsWith("pyridine")).findFirst().orElseThrow();
    }

    /** How far one measured compound moves the site of {@code smiles}, and its residual. */
    static double[] moved(List<MeasuredCompound> m, String smiles) {
        Engine bare = new Engine(BARE, 300);
        Engine taught = new Engine(with(m), 300);
        double residual = m.get(0).pka().get(0) - site(bare, m.get(0).smiles()).pka();
        return new double[] {site(taught, smiles).pka() - site(bare, smiles).pka(), residual};
    }

    @Test
    void aCloseMeasuredAnalogMovesTheSiteTowardItsResidual() {
        // 2,4,6-trimethylpyridine: 2,6-lutidine's ring pattern with a methyl para to the N
        double[] d = moved(List.of(LUTIDINE_26), "Cc1cc(C)nc(C)c1");
        assertTrue(Math.abs(d[1]) > 0.2, "the model must be off for 2,6-lutidine for this check to mean anything: " + d[1]);
        assertEquals(Math.signum(d[1]), Math.signum(d[0]), "moved " + d[0] + " for residual " + d[1]);
        assertTrue(Math.abs(d[0]) >= 0.1 * Math.abs(d[1]) && Math.abs(d[0]) < Math.abs(d[1]), "moved " + d[0]);
    }

    @Test
    void aDistantMeasuredAnalogMovesTheSiteLittleOrNot() {
        double[] close = moved(List.of(LUTIDINE_26), "Cc1cc(C)nc(C)c1");
        // 3-bromopyridine: a pyridine, but nothing around its N like 2,6-lutidine's two flanking methyls
        double[] far = moved(List.of(LUTIDINE_26), "Brc1cccnc1");
        assertTrue(Math.abs(far[0]) < 0.5 * Math.abs(close[0]), "far " + far[0] + ", close " + close[0]);
    }

    @Test
    void moreCloseAnalogsMoveTheSiteFurther() {
        double one = moved(List.of(LUTIDINE_26), "Cc1cc(C)nc(C)c1")[0];
        double three = moved(List.of(LUTIDINE_26, LUTIDINE_24, PICOLINE_2), "Cc1cc(C)nc(C)c1")[0];
        assertTrue(Math.abs(one) > 0.02, "one analog moved " + one);
        assertTrue(Math.abs(three) > Math.abs(one), "three analogs moved " + three + ", one " + one);
    }

    @Test
    void theDerivationNamesEveryAnalogWithItsSimilarityResidualWeightAndSource() {
        Site s = site(new Engine(with(List.of(LUTIDINE_26, LUTIDINE_24)), 300), "Cc1cc(C)nc(C)c1");
        assertEquals(Basis.ANALOG, s.basis());
        var lines = s.derivation().stream().filter(t -> t.label().startsWith("measured analog")).toList();
        assertEquals(2, lines.size(), s.derivation().toString());
        for (var t : lines) {
            assertTrue(t.label().contains("similarity") && t.label().contains("residual") && t.label().contains("weight"),
                    t.label());
            assertTrue(t.source().contains("CRC"), t.source());
        }
        assertTrue(lines.stream().anyMatch(t -> t.label().contains("2,6-dimethylpyridine")));
        assertTrue(lines.stream().anyMatch(t -> t.label().contains("2,4-dimethylpyridine")));
        // the lines add up to the site value
        assertEquals(s.pka(), s.derivation().stream().mapToDouble(t -> t.value()).sum(), 0.011);
    }

    @Test
    void aCompoundWithoutMeasuredAnalogKeepsItsAnalysisExactly() {
        Engine bare = new Engine(BARE, 300);
        Engine taught = new Engine(with(List.of(LUTIDINE_26, LUTIDINE_24, PICOLINE_2)), 300);
        for (String smiles : new String[] {"CC(=O)O", "Oc1ccc(Cl)cc1", "NCC(=O)O", "CN1CCCCC1"}) {
            for (Conditions c : List.of(Conditions.noPh(), Conditions.atPh(7.4))) {
                assertEquals(bare.analyse(smiles, c).toString(), taught.analyse(smiles, c).toString(), smiles);
            }
        }
    }

    @Test
    void ringNitrogensHeldByADiazinePairRuleLearnFromSitesHeldByTheSameRule() {
        // 2-amino-4,6-dimethylpyrimidine 4.82 (Perrin's compilation, from memory): both ring N are held by the
        // 1,3-diazine pair rule, as are those of 2-amino-4-methylpyrimidine; before, held sites took no analogs
        MeasuredCompound dimethyl = new MeasuredCompound("apm-46", "2-amino-4,6-dimethylpyrimidine", "Cc1cc(C)nc(N)n1",
                List.of(4.82), 25, 0, "compilation value", "crc", List.of("pyrimidine"));
        Engine bare = new Engine(BARE, 300);
        Engine taught = new Engine(with(List.of(dimethyl)), 300);
        String query = "Cc1ccnc(N)n1";
        Site before = pyrimidine(bare, query);
        Site after = pyrimidine(taught, query);
        assertTrue(before.derivation().stream().anyMatch(t -> t.label().startsWith("pair rule ")),
                "the query site must be held by a pair rule for this check to mean anything");
        var lines = after.derivation().stream().filter(t -> t.label().startsWith("measured analog")).toList();
        assertEquals(1, lines.size(), after.derivation().toString());
        assertTrue(lines.get(0).label().contains("2-amino-4,6-dimethylpyrimidine"), lines.get(0).label());
        double residual = 4.82 - bare.analyse("Cc1cc(C)nc(N)n1", Conditions.noPh(), false).macroPka().get(0);
        assertEquals(Math.signum(residual), Math.signum(after.pka() - before.pka()), after.derivation().toString());
    }

    static Site pyrimidine(Engine e, String smiles) {
        Analysis a = e.analyse(smiles, Conditions.noPh(), false);
        assertTrue(a.ok(), a.error());
        return a.sites().stream().filter(s -> s.group().startsWith("pyrimidine")).findFirst().orElseThrow();
    }

    @Test
    void theMeasuredCompoundItselfKeepsItsMeasuredValue() {
        Analysis a = new Engine(with(List.of(LUTIDINE_26)), 300).analyse("Cc1cccc(C)n1", Conditions.noPh());
        assertEquals(6.72, a.macroPka().get(0), 0.005);
    }
}
