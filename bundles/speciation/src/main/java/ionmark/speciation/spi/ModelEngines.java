package ionmark.speciation.spi;

import org.osgi.annotation.versioning.ProviderType;

import ionmark.acidity.api.AcidityTable;

/**
 * Builds engines for a given table snapshot, with the speciation bundle's configured size limit. Each engine
 * is immutable and thread-safe; building one compiles the table, so keep it while the table is the same.
 * Calls run in the caller's thread, without the runtime's time budget or result cache.
 */
@ProviderType
public interface ModelEngines {

    /** The whole pipeline as the runtime runs it: exact measured compounds, then measured analogs for the rest. */
    ModelEngine engine(AcidityTable table);

    /**
     * The pipeline without the measured-analog correction (exact measured compounds still count): the model
     * calibration fits class values on, so that analogs, applied on top at run time, correct what the classes do
     * not describe instead of being absorbed into them.
     */
    ModelEngine withoutAnalogs(AcidityTable table);
}
