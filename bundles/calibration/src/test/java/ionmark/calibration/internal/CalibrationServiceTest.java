package ionmark.calibration.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.GroupClass;
import ionmark.calibration.api.ClassFit;
import ionmark.calibration.api.Observation;
import ionmark.calibration.api.TableCalibration;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.spi.ModelEngine;

/**
 * The calibration service through the speciation SPI, both stages: six primary amines "measured" 0.5 above
 * what the model gives (invented offsets; the structures are ordinary alkylamines) move the primary-amine
 * class up, and the fit says which compounds it used.
 */
class CalibrationServiceTest {

    @Test
    void aClassObservedAboveTheModelIsRaisedAndItsFitReported() {
        AcidityTable plain = new AcidityTable(ModelCalibrationTest.TABLE.version(),
                ModelCalibrationTest.TABLE.references(), ModelCalibrationTest.TABLE.groups(),
                ModelCalibrationTest.TABLE.substituents(), List.of(), ModelCalibrationTest.TABLE.interaction(),
                ModelCalibrationTest.TABLE.pairs());
        ModelEngine e = ModelCalibrationTest.ENGINES.engine(plain);
        List<Observation> data = new ArrayList<>();
        for (String smiles : List.of("CCN", "CCCN", "CCCCN", "CC(C)CN", "CCCCCN", "NCC1CCCCC1")) {
            double v = e.analyse(smiles, Conditions.noPh(), true).macroPka().get(0) + 0.5;
            data.add(new Observation("a" + data.size(), smiles, List.of(v)));
        }
        TableCalibration.Result r = new CalibrationService(ModelCalibrationTest.ENGINES).calibrate(plain, data,
                "test-fit", "six alkylamines");
        ClassFit fit = r.fits().stream().filter(f -> f.group().equals("amine-primary")).findFirst().orElseThrow();
        assertEquals(6, fit.n(), fit.toString());
        double before = pka(plain);
        double after = pka(r.table());
        // the prior (three compounds at the old value) keeps it short of the full 0.5
        assertTrue(after - before > 0.2 && after - before <= 0.5 + 1e-9, before + " -> " + after);
        assertTrue(r.table().references().stream().anyMatch(ref -> ref.id().equals("test-fit")),
                "the fit is cited in the new table");
    }

    private static double pka(AcidityTable t) {
        return t.groups().stream().filter(g -> g.id().equals("amine-primary")).findFirst().map(GroupClass::pka)
                .orElseThrow();
    }
}
