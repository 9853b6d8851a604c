package ionmark.notebook.internal;

import java.util.function.Function;

import ionmark.notebook.api.AnnotatedStructure;
import ionmark.reuse.internal.LruCache;
import ionmark.reuse.internal.SingleFlight;

/**
 * Rendered cards by everything a card is drawn from: the whole {@link AnnotatedStructure} (words, conditions, each
 * analysis with its sites, species and table version, the work-up answer, the error) and the curve's numbers. A card
 * is a pure function of that value, so a hit can never be stale: another table version, pH or input changes the key.
 *
 * <p>Why it exists: drawing a card (CDK's layout and SVG writer for the structure and up to four species, the plot)
 * is what a repeated quick check or entry view costs once the analysis itself comes from the speciation cache, and
 * CDK's SVG writer formats every number through one shared {@code DecimalFormat}, so concurrent drawings queue on
 * its lock. Bounded by the characters held (least recently used out first, {@link LruCache}); a card larger than
 * the bound is not kept. While one request draws a card, others asking for the same card wait for that drawing
 * ({@link SingleFlight}) instead of drawing it again.
 */
final class CardCache {
    /** What the cache holds at most, in characters of HTML (a card with its drawings is about 20–80 thousand). */
    static final long DEFAULT_CHARS = Long.getLong("ionmark.cardCacheChars", 16L * 1024 * 1024);

    private final LruCache<Key, String> kept;
    private final SingleFlight<Key, String> drawing = new SingleFlight<>();

    CardCache(long maxChars) {
        this.kept = new LruCache<>(maxChars, String::length, "card cache size in characters");
    }

    /**
     * The card of {@code s}, from the cache or rendered by {@code render} and kept. A page of 50 quick checks arriving
     * at once draws each distinct card once.
     */
    String html(AnnotatedStructure s, Function<AnnotatedStructure, String> render) {
        if (!kept.enabled()) {
            return render.apply(s);
        }
        Key k = new Key(s);
        String hit = kept.get(k);
        if (hit != null) {
            return hit;
        }
        return drawing.run(k, () -> {
            String html = render.apply(s);
            kept.put(k, html);
            return html;
        });
    }

    /** Drawings under way (tests). */
    int drawing() {
        return drawing.running();
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

    long chars() {
        return kept.weight();
    }

    /**
     * The structure with its curve (both compare by value: a {@link ionmark.speciation.api.Curve} by its numbers) and
     * its hash, computed once per request rather than at every map lookup.
     */
    private static final class Key {
        private final AnnotatedStructure structure;
        private final int hash;

        Key(AnnotatedStructure s) {
            this.structure = s;
            this.hash = s.hashCode();
        }

        @Override
        public boolean equals(Object o) {
            return o instanceof Key k && k.hash == hash && k.structure.equals(structure);
        }

        @Override
        public int hashCode() {
            return hash;
        }
    }
}
