package ionmark.speciation.internal;

import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import java.util.concurrent.atomic.AtomicReference;

import org.osgi.service.component.annotations.Activate;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Deactivate;
import org.osgi.service.component.annotations.Reference;
import org.osgi.service.metatype.annotations.Designate;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.TableListener;
import ionmark.acidity.api.TableService;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Curve;
import ionmark.speciation.api.Observation;
import ionmark.speciation.api.Speciation;
import ionmark.speciation.api.TableCalibration;
import ionmark.speciation.internal.estimate.Calibration;
import ionmark.speciation.internal.structure.StructureException;

/**
 * The speciation service: one compiled {@link Engine} per table snapshot, swapped atomically when
 * the table changes; each molecule runs under a time limit.
 */
@Component(service = {Speciation.class, TableCalibration.class, TableListener.class},
        configurationPid = "ionmark.speciation")
@Designate(ocd = SpeciationConfiguration.class)
public final class SpeciationService implements Speciation, TableCalibration, TableListener {
    private final AtomicReference<Engine> engine = new AtomicReference<>();
    private final int maxHeavyAtoms;
    private final int timeoutMillis;
    private final ExecutorService pool;

    @Activate
    public SpeciationService(@Reference TableService tables, SpeciationConfiguration config) {
        this(tables.current(), config.maxHeavyAtoms(), config.timeoutMillis());
    }

    public SpeciationService(AcidityTable table, int maxHeavyAtoms, int timeoutMillis) {
        if (maxHeavyAtoms < 1) {
            throw new IllegalArgumentException("maxHeavyAtoms must be at least 1, not " + maxHeavyAtoms);
        }
        if (timeoutMillis < 10) {
            throw new IllegalArgumentException("timeoutMillis must be at least 10, not " + timeoutMillis);
        }
        this.maxHeavyAtoms = maxHeavyAtoms;
        this.timeoutMillis = timeoutMillis;
        this.engine.set(new Engine(table, maxHeavyAtoms));
        this.pool = Executors.newCachedThreadPool(r -> {
            Thread t = new Thread(r, "ionmark-speciation");
            t.setDaemon(true);
            return t;
        });
    }

    @Deactivate
    public void close() {
        pool.shutdownNow();
    }

    @Override
    public void tableChanged(AcidityTable current) {
        engine.set(new Engine(current, maxHeavyAtoms));
    }

    @Override
    public Analysis analyse(String structure, Conditions conditions) {
        Conditions c = conditions == null ? Conditions.noPh() : conditions;
        Engine e = engine.get();
        Future<Analysis> f = pool.submit(() -> e.analyse(structure, c));
        try {
            return f.get(timeoutMillis, TimeUnit.MILLISECONDS);
        } catch (TimeoutException ex) {
            f.cancel(true);
            return Analysis.failed(structure, c, e.table().version().label(), "gave up after " + timeoutMillis
                    + " ms (per-molecule time limit)");
        } catch (InterruptedException ex) {
            Thread.currentThread().interrupt();
            return Analysis.failed(structure, c, e.table().version().label(), "interrupted");
        } catch (ExecutionException ex) {
            return Analysis.failed(structure, c, e.table().version().label(), "internal error: " + ex.getCause());
        }
    }

    @Override
    public Curve curve(String structure, Conditions conditions, double from, double to, double step) {
        try {
            return engine.get().curve(structure, conditions == null ? Conditions.noPh() : conditions, from, to, step);
        } catch (StructureException e) {
            throw new IllegalArgumentException(e.getMessage(), e);
        }
    }

    @Override
    public Result calibrate(AcidityTable base, java.util.List<Observation> data, String referenceId, String citation) {
        Engine e = new Engine(base, maxHeavyAtoms);
        java.util.List<Calibration.Point> points = data.parallelStream().map(e::calibrationPoint)
                .flatMap(java.util.Optional::stream).toList();
        return Calibration.fit(base, points, referenceId, citation);
    }

    /** The table version currently in use. */
    public String tableVersion() {
        return engine.get().table().version().label();
    }
}
