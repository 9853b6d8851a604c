package ionmark.calibration.internal;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

import org.osgi.service.component.annotations.Activate;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;

import ionmark.acidity.api.AcidityTable;
import ionmark.calibration.api.ClassFit;
import ionmark.calibration.api.Observation;
import ionmark.calibration.api.TableCalibration;
import ionmark.speciation.spi.CalibrationPoint;
import ionmark.speciation.spi.ModelEngine;
import ionmark.speciation.spi.ModelEngines;

/**
 * The table calibration: the one-site least-squares fit per class ({@link Calibration}) on the calibration
 * points of the full engine, then the whole-model refinement of class values and pair rules
 * ({@link ModelCalibration}) on engines without measured analogs. The engines come from the speciation SPI.
 */
@Component(service = TableCalibration.class)
public final class CalibrationService implements TableCalibration {
    private final ModelEngines engines;

    @Activate
    public CalibrationService(@Reference ModelEngines engines) {
        this.engines = engines;
    }

    @Override
    public Result calibrate(AcidityTable base, List<Observation> data, String referenceId, String citation) {
        ModelEngine e = engines.engine(base);
        List<CalibrationPoint> points = data.parallelStream().map(o -> e.calibrationPoint(o.structure(), o.pka()))
                .flatMap(Optional::stream).toList();
        Result first = Calibration.fit(base, points, referenceId, citation);
        ModelCalibration.Outcome second = new ModelCalibration(engines).refine(first.table(), data, referenceId);
        Map<String, ModelCalibration.Move> moved = new HashMap<>();
        second.moves().forEach(m -> moved.put(m.group(), m));
        List<ClassFit> fits = new ArrayList<>();
        Set<String> seen = new HashSet<>();
        for (ClassFit f : first.fits()) {
            ModelCalibration.Move m = moved.get(f.group());
            fits.add(m == null ? f : f.refined(m.after(), m.rhoAfter(), m.compounds()));
            seen.add(f.group());
        }
        for (ModelCalibration.Move m : second.moves()) {
            if (!seen.contains(m.group())) {
                fits.add(ClassFit.refinedOnly(m.group(), m.compounds(), m.before(), m.after(), m.rhoBefore(),
                        m.rhoAfter()));
            }
        }
        return new Result(second.table(), fits);
    }
}
