package ionmark.speciation.internal;

import java.util.LinkedHashMap;
import java.util.Map;

import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Curve;

/**
 * Finished results by (structure, conditions, table version, what was asked): re-rendering an entry or repeating a
 * quick check answers from here. The structure part is {@link ionmark.speciation.internal.structure.StructureKey}
 * (canonical structure with the input's numbering); the table part is the table's number and content hash, so a
 * new table version never meets an old result and old results simply age out. Least recently used entries go
 * first once {@code capacity} is reached. Failures (unreadable input, over budget, busy) are not kept.
 */
final class ResultCache {
    record Key(String structure, Conditions conditions, String table, String what) {
    }

    private final int capacity;
    private final Map<Key, Object> map;
    private long hits;
    private long misses;

    ResultCache(int capacity) {
        if (capacity < 0) {
            throw new IllegalArgumentException("cache size must be 0 or more, not " + capacity);
        }
        this.capacity = capacity;
        this.map = new LinkedHashMap<>(16, 0.75f, true) {
            private static final long serialVersionUID = 1L;

            @Override
            protected boolean removeEldestEntry(Map.Entry<Key, Object> e) {
                return super.size() > ResultCache.this.capacity;
            }
        };
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

    /** The cached curve as a copy (its arrays are the caller's); null on a miss. */
    Curve curve(Key k) {
        Curve c = (Curve) get(k);
        return c == null ? null : copy(c);
    }

    void put(Key k, Curve c) {
        if (k != null) {
            store(k, copy(c));
        }
    }

    synchronized long hits() {
        return hits;
    }

    synchronized long misses() {
        return misses;
    }

    synchronized int size() {
        return map.size();
    }

    private synchronized Object get(Key k) {
        Object v = k == null || capacity == 0 ? null : map.get(k);
        if (v == null) {
            misses++;
        } else {
            hits++;
        }
        return v;
    }

    private synchronized void store(Key k, Object v) {
        if (capacity > 0) {
            map.put(k, v);
        }
    }

    private static Analysis withInput(Analysis a, String input) {
        if (a.input().equals(input)) {
            return a;
        }
        return a.withInput(input);
    }

    private static Curve copy(Curve c) {
        Map<Integer, double[]> sites = new LinkedHashMap<>();
        c.siteProtonated().forEach((k, v) -> sites.put(k, v.clone()));
        Map<Integer, double[]> states = new java.util.TreeMap<>();
        c.chargeStates().forEach((k, v) -> states.put(k, v.clone()));
        return new Curve(c.ph().clone(), c.meanCharge().clone(), sites, states);
    }
}
