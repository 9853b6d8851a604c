package ionmark.speciation.internal;

import java.util.concurrent.atomic.AtomicReference;

import org.osgi.service.component.annotations.Activate;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Deactivate;
import org.osgi.service.component.annotations.Reference;
import org.osgi.service.metatype.annotations.Designate;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.TableService;
import ionmark.reuse.internal.SingleFlight;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Curve;
import ionmark.speciation.api.CurveResult;
import ionmark.speciation.api.Speciation;
import ionmark.speciation.api.TableRegression;
import ionmark.speciation.internal.structure.StructureException;
import ionmark.speciation.internal.structure.StructureKey;
import ionmark.speciation.internal.work.AnalysisPool;
import ionmark.speciation.internal.work.Budget;
import ionmark.speciation.internal.work.OverBudgetException;
import ionmark.speciation.spi.ModelEngine;
import ionmark.speciation.spi.ModelEngines;

/**
 * The speciation service: one compiled {@link Engine} per table snapshot. Every call compares the
 * current snapshot with the engine's (an identity check) and rebuilds the engine when the table has
 * changed, so a new table is used from the next call on and no change can be missed. (A listener
 * callback would need the table service to reference this service while this service references
 * the table service: a cycle that Declarative Services may leave unbound.) Each structure runs on a bounded
 * pool under a time budget its loops check ({@link AnalysisPool}, {@link Budget}); finished results are kept by
 * (structure, conditions, table version) in a bounded cache ({@link ResultCache}). It also offers engines for
 * any table to the calibration bundle ({@link ModelEngines}, the speciation SPI), with the same size limit.
 */
@Component(service = {Speciation.class, TableRegression.class, ModelEngines.class},
        configurationPid = "ionmark.speciation")
@Designate(ocd = SpeciationConfiguration.class)
public final class SpeciationService implements Speciation, TableRegression, ModelEngines {
    private final AtomicReference<Engine> engine = new AtomicReference<>();
    private final TableService tables;
    private final int maxHeavyAtoms;
    private final int timeoutMillis;
    private final AnalysisPool pool;
    private final boolean ownPool;
    private final ResultCache cache;
    /** Identical requests under way share one analysis or curve (see {@link SingleFlight}). */
    private final SingleFlight<ResultCache.Key, Analysis> analysing = new SingleFlight<>();
    private final SingleFlight<ResultCache.Key, CurveResult> curving = new SingleFlight<>();

    @Activate
    public SpeciationService(@Reference TableService tables, SpeciationConfiguration config) {
        this(tables, tables.current(), config.maxHeavyAtoms(), config.timeoutMillis(),
                pool(config.workers(), config.timeoutMillis()), true, new ResultCache(config.cacheEntries()));
    }

    /** With a fixed table (tests, tools). */
    public SpeciationService(AcidityTable table, int maxHeavyAtoms, int timeoutMillis) {
        this(table, maxHeavyAtoms, timeoutMillis, DEFAULT_WORKERS, DEFAULT_CACHE);
    }

    /** With a fixed table, a number of workers and a cache size. */
    public SpeciationService(AcidityTable table, int maxHeavyAtoms, int timeoutMillis, int workers, int cacheEntries) {
        this(null, table, maxHeavyAtoms, timeoutMillis, pool(workers, timeoutMillis), true, new ResultCache(cacheEntries));
    }

    static final int DEFAULT_WORKERS = Math.max(2, Runtime.getRuntime().availableProcessors());
    static final int DEFAULT_CACHE = 2000;

    private static AnalysisPool pool(int workers, int timeoutMillis) {
        if (timeoutMillis < 10) {
            throw new IllegalArgumentException("timeoutMillis must be at least 10, not " + timeoutMillis);
        }
        if (workers < 1) {
            throw new IllegalArgumentException("workers must be at least 1, not " + workers);
        }
        // room for a burst of quick checks (50 clients at once) to wait their turn, at most one budget each; beyond
        // that the caller is answered busy at once
        return new AnalysisPool(workers, 32 * workers, timeoutMillis, timeoutMillis);
    }

    private SpeciationService(TableService tables, AcidityTable table, int maxHeavyAtoms, int timeoutMillis,
            AnalysisPool pool, boolean ownPool, ResultCache cache) {
        if (maxHeavyAtoms < 1) {
            throw new IllegalArgumentException("maxHeavyAtoms must be at least 1, not " + maxHeavyAtoms);
        }
        this.tables = tables;
        this.maxHeavyAtoms = maxHeavyAtoms;
        this.timeoutMillis = timeoutMillis;
        this.engine.set(new Engine(table, maxHeavyAtoms));
        this.pool = pool;
        this.ownPool = ownPool;
        this.cache = cache;
    }

    @Deactivate
    public void close() {
        if (ownPool) {
            pool.close();
        }
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
        String version = e.table().version().label();
        ResultCache.Key key = key(e, structure, c, brief ? "brief " + structure.strip() : "full");
        Analysis hit = cache.analysis(key, structure);
        if (hit != null) {
            return hit;
        }
        e.analogIndex(); // table-wide work, once per table: outside any one structure's budget
        Analysis a = analysing.run(key, () -> {
            AnalysisPool.Outcome<Analysis> o = pool.run(() -> {
                Analysis x = e.analyse(structure, c, brief);
                // the engine turns any exception into a failed analysis; say why when the budget ended it
                return x.ok() || !Budget.exhausted() ? x : Analysis.failed(structure, c, version,
                        OverBudgetException.message(pool.budgetMillis()));
            });
            Analysis x = o.ok() ? o.value() : Analysis.failed(structure, c, version, o.refusal());
            cache.put(key, x);
            return x;
        });
        return ResultCache.withInput(a, structure);
    }

    private ResultCache.Key key(Engine e, String structure, Conditions c, String what) {
        String k = StructureKey.of(structure);
        return k == null ? null : new ResultCache.Key(k, c, e.table().version().number() + "/" + e.table().version()
                .hash() + "@" + System.identityHashCode(e.table()), what);
    }

    /** The result cache (tests). */
    ResultCache cache() {
        return cache;
    }

    /** The analysis pool (tests). */
    AnalysisPool pool() {
        return pool;
    }

    /**
     * Curves under the same budget as an analysis. Over the budget (or when the pool is busy) the result is a failure
     * whose message starts with "not annotated"; the card then leaves the plot out.
     */
    @Override
    public CurveResult curve(String structure, Conditions conditions, double from, double to, double step) {
        Conditions c = conditions == null ? Conditions.noPh() : conditions;
        Engine e = engine();
        ResultCache.Key key = key(e, structure, c, "curve " + from + " " + to + " " + step);
        Curve hit = cache.curve(key);
        if (hit != null) {
            return CurveResult.of(hit);
        }
        e.analogIndex();
        CurveResult result = curving.run(key, () -> {
            AnalysisPool.Outcome<CurveResult> o = pool.run(() -> {
                try {
                    return CurveResult.of(e.curve(structure, c, from, to, step));
                } catch (StructureException ex) {
                    return CurveResult.failed(ex.getMessage(), ex.position());
                } catch (IllegalArgumentException ex) {
                    return CurveResult.failed(ex.getMessage());
                }
            });
            if (!o.ok()) {
                return CurveResult.failed(o.refusal());
            }
            if (o.value().ok()) {
                cache.put(key, o.value().curve());
            }
            return o.value();
        });
        // a Curve is immutable: requests that shared one computation may share the result itself
        return result;
    }

    @Override
    public ModelEngine engine(AcidityTable table) {
        return new EngineView(new Engine(table, maxHeavyAtoms));
    }

    @Override
    public ModelEngine withoutAnalogs(AcidityTable table) {
        return new EngineView(Engine.withoutAnalogs(table, maxHeavyAtoms));
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
                k -> new SpeciationService(null, table, maxHeavyAtoms, timeoutMillis, pool, false, cache));
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
