package ionmark.notebook.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.MeasuredCompound;
import ionmark.acidity.internal.TableSnapshotService;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Term;
import ionmark.speciation.internal.SpeciationService;

/** The regression report's per-compound verdicts and the records a structure rests on. */
class AdminReportsTest {
    static final MeasuredCompound PHENOL = new MeasuredCompound("phenol", "phenol", "Oc1ccccc1", List.of(9.99), 25, 0,
            "compilation value", "crc", List.of("phenol"));

    @Test
    void aSiteRestsOnAMeasuredCompoundOnlyWhenItsDerivationSaysSo() {
        assertTrue(AdminReports.cites("measured compound phenol: macroscopic pKa [9.99] at 25 °C", PHENOL));
        assertTrue(AdminReports.cites("measured analog phenol (phenol, measured pKa 9.99 at 25 °C, compilation value): "
                + "residual +0.10 against the model's constant 9.89, local similarity 0.60", PHENOL));
        assertFalse(AdminReports.cites("measured analog phenolphthalein (phenol, measured pKa 9.4 at 25 °C)", PHENOL));
        assertFalse(AdminReports.cites("class Phenol O-H ortho to a carboxylic acid (phenol-ortho-carboxy)", PHENOL));
    }

    /**
     * The analog lines the engine writes are found: dipropylamine takes diethylamine, a measured compound of the
     * shipped table, as an analog, so the structure page and the regression report name it.
     */
    @Test
    void theEnginesOwnAnalogLineCitesItsMeasuredCompound() {
        AcidityTable t = TableSnapshotService.shipped();
        MeasuredCompound diethylamine = t.measured().stream().filter(m -> m.name().equals("diethylamine")).findFirst()
                .orElseThrow();
        Analysis a = new SpeciationService(t, 300, 10_000).analyse("CCCNCCC", Conditions.noPh());
        List<String> labels = a.sites().stream().flatMap(s -> s.derivation().stream()).map(Term::label).toList();
        assertTrue(labels.stream().anyMatch(l -> AdminReports.cites(l, diethylamine)), labels.toString());
    }

    @Test
    void theErrorIsAgainstTheNearestPredictedConstant() {
        // glycine 2.34 and 9.60 (CRC, from memory) against predictions 2.5 and 9.5
        assertEquals(0.13, AdminReports.error(List.of(2.34, 9.60), List.of(9.5, 2.5)), 1e-9);
        assertTrue(Double.isNaN(AdminReports.error(List.of(4.76), List.of())));
    }
}
