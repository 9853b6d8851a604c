package ionmark.speciation.internal;

import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.atomic.AtomicLong;
import java.util.concurrent.atomic.LongAdder;

import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Curve;

/**
 * Finished results by (structure, conditions, table version, what was asked): re-rendering an entry or repeating a
 * quick check answers from here. The structure part is {@link ionmark.speciation.internal.structure.StructureKey}
 * (canonical structure with the input's numbering); the table part is the table's number and content hash, so a
 * new table version never meets an old result and old results simply age out. Least recently used entries go
 * first once {@code capacity} is reached. Failures (unreadable input, over budget, busy) are not kept. A hit takes
 * no lock (under fifty concurrent quick checks the synchronized map's monitor was a queue of its own); storing and
 * evicting, which follow an analysis that took milliseconds, are serialised.
 */
final class ResultCache {
    record Key(String structure, Conditions conditions, String table, String what) {
    }

    private final int capacity;
    /** Read without a lock: a hit only stamps its entry; storing and the eviction scan run under {@link #storing}. */
    private final ConcurrentHashMap<Key, Held> map = new ConcurrentHashMap<>();
    private final AtomicLong clock = new AtomicLong();
    private final LongAdder hits = new LongAdder();
    private final LongAdder misses = new LongAdder();
    private final Object storing = new Object();

    /** A kept result and when it was last used (a tick of {@link #clock}). */
    private static final class Held {
        final Object value;
        volatile long used;

        Held(Object value, long used) {
            this.value = value;
            this.used = used;
        }
    }

    ResultCache(int capacity) {
        if (capacity < 0) {
            throw new IllegalArgumentException("cache size must be 0 or more, not " + capacity);
        }
        this.capacity = capacity;
    }

    /** The cached analysis, carrying this call's input text; null on a miss. */
    Analysis analysis(Key k, String input) {
        Analysis a = (Analysis) get(k);
        return a == null ? null : withInput(a, input);
    }

    void put(Key k, Analysis a) {
        if (k != null && a.ok()) {
            store(k, a);
        }
    }

    /** The cached curve (immutable, so shared as it is); null on a miss. */
    Curve curve(Key k) {
        return (Curve) get(k);
    }

    void put(Key k, Curve c) {
        if (k != null) {
            store(k, c);
        }
    }

    long hits() {
        return hits.sum();
    }

    long misses() {
        return misses.sum();
    }

    int size() {
        return map.size();
    }

    private Object get(Key k) {
        Held h = k == null || capacity == 0 ? null : map.get(k);
        if (h == null) {
            misses.increment();
            return null;
        }
        h.used = clock.incrementAndGet();
        hits.increment();
        return h.value;
    }

    private void store(Key k, Object v) {
        if (capacity == 0) {
            return;
        }
        synchronized (storing) {
            map.put(k, new Held(v, clock.incrementAndGet()));
            while (map.size() > capacity) {
                Map.Entry<Key, Held> eldest = null;
                for (Map.Entry<Key, Held> e : map.entrySet()) {
                    if (eldest == null || e.getValue().used < eldest.getValue().used) {
                        eldest = e;
                    }
                }
                if (eldest == null) {
                    break;
                }
                map.remove(eldest.getKey());
            }
        }
    }

    static Analysis withInput(Analysis a, String input) {
        if (a.input().equals(input)) {
            return a;
        }
        return a.withInput(input);
    }
}
