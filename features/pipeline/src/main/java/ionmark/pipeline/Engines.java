package ionmark.pipeline;

import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.atomic.AtomicInteger;

import ionmark.notebook.api.EntryAnnotation;
import ionmark.notebook.api.EntryAnnotations;
import ionmark.speciation.api.Speciation;
import ionmark.speciation.internal.SpeciationService;

/**
 * One engine per table snapshot per worker JVM: every DoFn instance's {@code @Setup} asks here, and only the
 * first builds it (reading the table and compiling its patterns costs far more than one structure). The
 * engine is thread-safe, so all of a worker's threads share it.
 */
public final class Engines {
    private static final Map<EngineSpec, SpeciationService> BUILT = new ConcurrentHashMap<>();
    private static final Map<EngineSpec, EntryAnnotation> NOTEBOOKS = new ConcurrentHashMap<>();
    private static final AtomicInteger BUILDS = new AtomicInteger();

    private Engines() {
    }

    public static Speciation get(EngineSpec spec) {
        return BUILT.computeIfAbsent(spec, s -> {
            BUILDS.incrementAndGet();
            return new SpeciationService(s.table(), s.maxHeavyAtoms(), s.timeoutMillis());
        });
    }

    /** The notebook's entry reader over the same engine ({@link EntryAnnotations}, the notebook's API). */
    public static EntryAnnotation notebook(EngineSpec spec) {
        return NOTEBOOKS.computeIfAbsent(spec, s -> EntryAnnotations.of(get(s)));
    }

    /** How many engines this JVM has built (a check that tables are loaded once per worker, not per element). */
    public static int builds() {
        return BUILDS.get();
    }
}
