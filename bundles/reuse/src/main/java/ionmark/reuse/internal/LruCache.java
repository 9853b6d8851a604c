package ionmark.reuse.internal;

import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.atomic.AtomicLong;
import java.util.concurrent.atomic.LongAdder;
import java.util.function.ToLongFunction;

/**
 * A bounded cache that lets the least recently used entries go first. The bound is a total weight: one per entry for
 * a cache counted in entries, characters for one counted in text. A hit takes no lock, it only stamps its entry with
 * a tick of a clock (under fifty concurrent quick checks a synchronized map's monitor was a queue of its own);
 * storing and the eviction scan, which follow work that took milliseconds, are serialised. A bound of 0 keeps
 * nothing, and a value heavier than the bound is not kept.
 */
public final class LruCache<K, V> {
    private final long maxWeight;
    private final ToLongFunction<V> weigher;
    private final ConcurrentHashMap<K, Held<V>> map = new ConcurrentHashMap<>();
    private final AtomicLong clock = new AtomicLong();
    private final LongAdder hits = new LongAdder();
    private final LongAdder misses = new LongAdder();
    private final Object storing = new Object();
    private long weight;

    /** A kept value, its weight, and when it was last used (a tick of {@link #clock}). */
    private static final class Held<V> {
        final V value;
        final long weight;
        volatile long used;

        Held(V value, long weight, long used) {
            this.value = value;
            this.weight = weight;
            this.used = used;
        }
    }

    /** {@code what}: how the bound reads in an error message ("cache size", "card cache size in characters"). */
    public LruCache(long maxWeight, ToLongFunction<V> weigher, String what) {
        if (maxWeight < 0) {
            throw new IllegalArgumentException(what + " must be 0 or more, not " + maxWeight);
        }
        this.maxWeight = maxWeight;
        this.weigher = weigher;
    }

    /** A cache bounded by its number of entries. */
    public static <K, V> LruCache<K, V> ofEntries(int capacity, String what) {
        return new LruCache<>(capacity, v -> 1, what);
    }

    /** The value kept for {@code key}, or null (a null key always misses). */
    public V get(K key) {
        Held<V> h = key == null || maxWeight == 0 ? null : map.get(key);
        if (h == null) {
            misses.increment();
            return null;
        }
        h.used = clock.incrementAndGet();
        hits.increment();
        return h.value;
    }

    /** Keeps {@code value} for {@code key} and lets the least recently used entries go until the bound holds. */
    public void put(K key, V value) {
        long w = weigher.applyAsLong(value);
        if (key == null || maxWeight == 0 || w > maxWeight) {
            return;
        }
        synchronized (storing) {
            Held<V> old = map.put(key, new Held<>(value, w, clock.incrementAndGet()));
            weight += w - (old == null ? 0 : old.weight);
            while (weight > maxWeight) {
                Map.Entry<K, Held<V>> eldest = null;
                for (Map.Entry<K, Held<V>> e : map.entrySet()) {
                    if (eldest == null || e.getValue().used < eldest.getValue().used) {
                        eldest = e;
                    }
                }
                if (eldest == null) {
                    break;
                }
                map.remove(eldest.getKey());
                weight -= eldest.getValue().weight;
            }
        }
    }

    /** Whether the cache keeps anything at all (its bound is above 0). */
    public boolean enabled() {
        return maxWeight > 0;
    }

    public long hits() {
        return hits.sum();
    }

    public long misses() {
        return misses.sum();
    }

    public int size() {
        return map.size();
    }

    /** The summed weight of what is kept. */
    public long weight() {
        synchronized (storing) {
            return weight;
        }
    }
}
