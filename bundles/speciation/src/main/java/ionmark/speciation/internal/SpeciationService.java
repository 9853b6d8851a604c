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
import ionmark.acidity.api.TableService;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Curve;
import ionmark.speciation.api.Observation;
import ionmark.speciation.api.Speciation;
import ionmark.speciation.api.TableCalibration;
import ionmark.speciation.api.TableRegression;
import ionmark.speciation.internal.estimate.Calibration;
import ionmark.speciation.internal.structure.StructureException;

/**
 * The speciation service: one compiled {@link Engine} per table snapshot. Every call compares the
 * current snapshot with the engine's (an identity check) and rebuilds the engine when the table has
 * changed, so a new table is used from the next call on and no change can be missed. (A listener
 * callback would need the table service to reference this service while this service references
 * the table service: a cycle that Declarative Services may leave unbound.) Each molecule runs under
 * a time limit.
 */
@Component(service = {Speciation.class, TableCalibration.class, TableRegression.class},
        configurationPid = "ionmark.speciation")
@Designate(ocd = SpeciationConfiguration.class)
public final class SpeciationService implements Speciation, TableCalibration, TableRegression {
    private final AtomicReference<Engine> engine = new AtomicReference<>();
    private final TableService tables;
    private final int maxHeavyAtoms;
    private final int timeoutMillis;
    private final ExecutorService pool;

    @Activate
    public SpeciationService(@Reference TableService tables, SpeciationConfiguration config) {
        this(tables, tables.current(), config.maxHeavyAtoms(), config.timeoutMillis());
    }

    /** With a fixed table (tests, tools). */
    public SpeciationService(AcidityTable table, int maxHeavyAtoms, int timeoutMillis) {
        this(null, table, maxHeavyAtoms, timeoutMillis);
    }

    private SpeciationService(TableService tables, AcidityTable table, int maxHeavyAtoms, int timeoutMillis) {
        if (maxHeavyAtoms < 1) {
            throw new IllegalArgumentException("maxHeavyAtoms must be at least 1, not " + maxHeavyAtoms);
        }
        if (timeoutMillis < 10) {
            throw new IllegalArgumentException("timeoutMillis must be at least 10, not " + timeoutMillis);
        }
        this.tables = tables;
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

    /** The engine for the current table, rebuilt once when the table service holds a new snapshot. */
    Engine engine() {
        Engine e = engine.get();
        if (tables == null) {
            return e;
        }
        AcidityTable now = tables.current();
        if (e.table() == now) {
            return e;
        }
        synchronized (this) {
            e = engine.get();
            if (e.table() != now) {
                e = new Engine(now, maxHeavyAtoms);
                engine.set(e);
            }
            return e;
        }
    }

    @Override
    public Analysis analyse(String structure, Conditions conditions) {
        return run(structure, conditions, false);
    }

    @Override
    public Analysis screen(String structure, Conditions conditions) {
        return run(structure, conditions, true);
    }

    private Analysis run(String structure, Conditions conditions, boolean brief) {
        Conditions c = conditions == null ? Conditions.noPh() : conditions;
        Engine e = engine();
        Future<Analysis> f = pool.submit(() -> e.analyse(structure, c, brief));
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
            return engine().curve(structure, conditions == null ? Conditions.noPh() : conditions, from, to, step);
        } catch (StructureException e) {
            throw new IllegalArgumentException(e.getMessage(), e);
        }
    }

    @Override
    public Result calibrate(AcidityTable base, java.util.List<Observation> data, String referenceId, String citation) {
        Engine e = new Engine(base, maxHeavyAtoms);
        java.util.List<Calibration.Point> points = data.parallelStream().map(e::calibrationPoint)
                .flatMap(java.util.Optional::stream).toList();
        Result first = Calibration.fit(base, points, referenceId, citation);
        ModelCalibration.Outcome second = new ModelCalibration(maxHeavyAtoms).refine(first.table(), data, referenceId);
        java.util.Map<String, ModelCalibration.Move> moved = new java.util.HashMap<>();
        second.moves().forEach(m -> moved.put(m.group(), m));
        java.util.List<ionmark.speciation.api.ClassFit> fits = new java.util.ArrayList<>();
        java.util.Set<String> seen = new java.util.HashSet<>();
        for (ionmark.speciation.api.ClassFit f : first.fits()) {
            ModelCalibration.Move m = moved.get(f.group());
            fits.add(m == null ? f : f.refined(m.after(), m.rhoAfter(), m.compounds()));
            seen.add(f.group());
        }
        for (ModelCalibration.Move m : second.moves()) {
            if (!seen.contains(m.group())) {
                fits.add(ionmark.speciation.api.ClassFit.refinedOnly(m.group(), m.compounds(), m.before(), m.after(), m.rhoBefore(), m.rhoAfter()));
            }
        }
        return new Result(second.table(), fits);
    }

    private final java.util.Map<String, SpeciationService> pinned = java.util.Collections.synchronizedMap(
            new java.util.LinkedHashMap<>(8, 0.75f, true) {
                private static final long serialVersionUID = 1L;

                @Override
                protected boolean removeEldestEntry(java.util.Map.Entry<String, SpeciationService> e) {
                    return size() > 8;
                }
            });

    @Override
    public Speciation pinned(AcidityTable table) {
        return pinned.computeIfAbsent(table.version().hash() + "/" + table.version().number(),
                k -> new SpeciationService(table, maxHeavyAtoms, timeoutMillis));
    }

    @Override
    public Report compare(AcidityTable head, AcidityTable draft) {
        return Regression.compare(head, draft, maxHeavyAtoms);
    }

    /** The table version currently in use. */
    public String tableVersion() {
        return engine().table().version().label();
    }
}
