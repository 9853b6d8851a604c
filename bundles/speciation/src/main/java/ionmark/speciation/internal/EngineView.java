package ionmark.speciation.internal;

import java.util.List;
import java.util.Optional;
import java.util.Set;

import ionmark.acidity.api.AcidityTable;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.spi.CalibrationPoint;
import ionmark.speciation.spi.ModelEngine;

/** An {@link Engine} as the speciation SPI shows it to the calibration bundle; the engine itself stays private. */
record EngineView(Engine engine) implements ModelEngine {

    @Override
    public AcidityTable table() {
        return engine.table();
    }

    @Override
    public Analysis analyse(String structure, Conditions conditions, boolean brief) {
        return engine.analyse(structure, conditions, brief);
    }

    @Override
    public Optional<CalibrationPoint> calibrationPoint(String structure, List<Double> experimentalPka) {
        return engine.calibrationPoint(structure, experimentalPka);
    }

    @Override
    public Set<String> pairRules(String structure) {
        return engine.pairRules(structure);
    }
}
