package ionmark.speciation.internal;

import ionmark.reuse.internal.LruCache;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Curve;

/**
 * Finished results by (structure, conditions, table version, what was asked): re-rendering an entry or repeating a
 * quick check answers from here. The structure part is {@link ionmark.speciation.internal.structure.StructureKey}
 * (canonical structure with the input's numbering); the table part is the table's number and content hash, so a
 * new table version never meets an old result and old results simply age out. Least recently used entries go
 * first once {@code capacity} is reached ({@link LruCache}). Failures (unreadable input, over budget, busy) are not
 * kept.
 */
final class ResultCache {
    record Key(String structure, Conditions conditions, String table, String what) {
    }

    /** Analyses and curves by key, at most {@code capacity} of them (see {@link LruCache}). */
    private final LruCache<Key, Object> kept;

    ResultCache(int capacity) {
        this.kept = LruCache.ofEntries(capacity, "cache size");
    }

    /** The cached analysis, carrying this call's input text; null on a miss. */
    Analysis analysis(Key k, String input) {
        Analysis a = (Analysis) kept.get(k);
        return a == null ? null : withInput(a, input);
    }

    void put(Key k, Analysis a) {
        if (a.ok()) {
            kept.put(k, a);
        }
    }

    /** The cached curve (immutable, so shared as it is); null on a miss. */
    Curve curve(Key k) {
        return (Curve) kept.get(k);
    }

    void put(Key k, Curve c) {
        kept.put(k, c);
    }

    long hits() {
        return kept.hits();
    }

    long misses() {
        return kept.misses();
    }

    int size() {
        return kept.size();
    }

    static Analysis withInput(Analysis a, String input) {
        if (a.input().equals(input)) {
            return a;
        }
        return a.withInput(input);
    }
}
