package ionmark.speciation.spi;

import java.util.List;
import java.util.Optional;
import java.util.Set;

import org.osgi.annotation.versioning.ProviderType;

import ionmark.acidity.api.AcidityTable;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;

/** The engine for one table snapshot (see {@link ModelEngines}). Never throws for bad input. */
@ProviderType
public interface ModelEngine {

    AcidityTable table();

    /**
     * An analysis at the conditions ({@link Conditions#noPh()}: constants only); {@code brief} leaves out logP and
     * logD, species structures, windows and the isoelectric point, as {@code Speciation.screen} does.
     */
    Analysis analyse(String structure, Conditions conditions, boolean brief);

    /**
     * Calibration input from a compound with one experimental value: the class and substituent sum Σ of the
     * site that titrates first (raw estimates, no measured values). Empty when the compound has several values,
     * mixed acid and base sites, no site, or a single value nearer a later step of the model.
     */
    Optional<CalibrationPoint> calibrationPoint(String structure, List<Double> experimentalPka);

    /** Ids of the table's pair rules that join two sites of this structure (none when it cannot be read). */
    Set<String> pairRules(String structure);
}
