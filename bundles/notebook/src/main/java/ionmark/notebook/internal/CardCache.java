package ionmark.notebook.internal;

import java.util.Map;
import java.util.Objects;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CompletionException;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.atomic.AtomicLong;
import java.util.concurrent.atomic.LongAdder;
import java.util.function.Function;

import ionmark.notebook.api.AnnotatedStructure;
import ionmark.speciation.api.Curve;

/**
 * Rendered cards by everything a card is drawn from: the whole {@link AnnotatedStructure} (words, conditions, each
 * analysis with its sites, species and table version, the work-up answer, the error) and the curve's numbers. A card
 * is a pure function of that value, so a hit can never be stale: another table version, pH or input changes the key.
 *
 * <p>Why it exists: drawing a card (CDK's layout and SVG writer for the structure and up to four species, the plot)
 * is what a repeated quick check or entry view costs once the analysis itself comes from the speciation cache, and
 * CDK's SVG writer formats every number through one shared {@code DecimalFormat}, so concurrent drawings queue on
 * its lock. Bounded by the characters held (least recently used out first); a card larger than the bound is not
 * kept. A hit takes no lock (fifty request threads on two cores queued on a synchronized map's monitor whenever
 * its holder was descheduled); only storing and evicting are serialised.
 */
final class CardCache {
    /** What the cache holds at most, in characters of HTML (a card with its drawings is about 20–80 thousand). */
    static final long DEFAULT_CHARS = Long.getLong("ionmark.cardCacheChars", 16L * 1024 * 1024);

    private final long maxChars;
    /** Read without a lock: a hit only stamps its entry; the eviction scan runs under {@link #evicting}. */
    private final ConcurrentHashMap<Key, Held> map = new ConcurrentHashMap<>();
    private final ConcurrentHashMap<Key, CompletableFuture<String>> drawing = new ConcurrentHashMap<>();
    private final AtomicLong clock = new AtomicLong();
    private final LongAdder hits = new LongAdder();
    private final LongAdder misses = new LongAdder();
    private final Object evicting = new Object();
    private long chars;

    /** A kept card and when it was last used (a tick of {@link #clock}). */
    private static final class Held {
        final String html;
        volatile long used;

        Held(String html, long used) {
            this.html = html;
            this.used = used;
        }
    }

    CardCache(long maxChars) {
        if (maxChars < 0) {
            throw new IllegalArgumentException("card cache size must be 0 or more characters, not " + maxChars);
        }
        this.maxChars = maxChars;
    }

    /**
     * The card of {@code s}, from the cache or rendered by {@code render} (outside the cache's lock) and kept. While
     * one request draws a card, others asking for the same card wait for that drawing instead of drawing it again
     * (a page of 50 quick checks arriving at once draws each distinct card once).
     */
    String html(AnnotatedStructure s, Function<AnnotatedStructure, String> render) {
        if (maxChars == 0) {
            return render.apply(s);
        }
        Key k = new Key(s);
        String hit = get(k);
        if (hit != null) {
            return hit;
        }
        CompletableFuture<String> mine = new CompletableFuture<>();
        CompletableFuture<String> running = drawing.putIfAbsent(k, mine);
        if (running != null) {
            try {
                return running.join();
            } catch (CompletionException e) {
                return render.apply(s); // the other drawing failed: this request tries on its own
            }
        }
        try {
            String html = render.apply(s);
            put(k, html);
            mine.complete(html);
            return html;
        } catch (RuntimeException | Error e) {
            mine.completeExceptionally(e);
            throw e;
        } finally {
            drawing.remove(k, mine);
        }
    }

    /** Drawings under way (tests). */
    int drawing() {
        return drawing.size();
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

    long chars() {
        synchronized (evicting) {
            return chars;
        }
    }

    private String get(Key k) {
        Held h = map.get(k);
        if (h == null) {
            misses.increment();
            return null;
        }
        h.used = clock.incrementAndGet();
        hits.increment();
        return h.html;
    }

    private void put(Key k, String html) {
        if (html.length() > maxChars) {
            return;
        }
        synchronized (evicting) {
            Held old = map.put(k, new Held(html, clock.incrementAndGet()));
            chars += html.length() - (old == null ? 0 : old.html.length());
            while (chars > maxChars) {
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
                chars -= eldest.getValue().html.length();
            }
        }
    }

    /**
     * The structure without its curve (records compare by value, a curve's arrays by identity) plus the curve's
     * numbers; the hash is computed once, outside the lock.
     */
    private static final class Key {
        private final AnnotatedStructure structure;
        private final Curve curve;
        private final int hash;

        Key(AnnotatedStructure s) {
            this.structure = new AnnotatedStructure(s.block(), s.words(), s.source(), s.structure(), s.conditions(),
                    s.analyses(), null, s.phases(), s.error());
            this.curve = s.curve();
            this.hash = 31 * structure.hashCode() + Objects.hashCode(curve);
        }


        @Override
        public boolean equals(Object o) {
            return o instanceof Key k && k.hash == hash && Objects.equals(k.structure, structure)
                    && Objects.equals(k.curve, curve);
        }

        @Override
        public int hashCode() {
            return hash;
        }
    }
}
