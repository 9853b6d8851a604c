package ionmark.reuse.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

/** The bound holds in entries or in weight, and the least recently used entry goes first. */
class LruCacheTest {
    @Test
    void theLeastRecentlyUsedEntryGoesFirst() {
        LruCache<String, String> c = LruCache.ofEntries(2, "cache size");
        c.put("a", "A");
        c.put("b", "B");
        assertEquals("A", c.get("a")); // a is now the most recently used
        c.put("c", "C");
        assertNull(c.get("b"));
        assertEquals("A", c.get("a"));
        assertEquals("C", c.get("c"));
        assertEquals(2, c.size());
        assertEquals(3, c.hits());
        assertEquals(1, c.misses());
    }

    @Test
    void aWeightBoundCountsWhatIsKeptAndReplacing() {
        LruCache<String, String> c = new LruCache<>(10, String::length, "size in characters");
        c.put("a", "xxxx");
        c.put("b", "yyyy");
        assertEquals(8, c.weight());
        c.put("a", "zz"); // replacing a value counts only the new one
        assertEquals(6, c.weight());
        c.put("c", "wwwww"); // 11 > 10: b, the least recently used, goes
        assertNull(c.get("b"));
        assertEquals(7, c.weight());
        c.put("d", "v".repeat(11)); // heavier than the bound: not kept, nothing evicted for it
        assertNull(c.get("d"));
        assertEquals(7, c.weight());
    }

    @Test
    void boundZeroKeepsNothingAndANegativeBoundIsRefused() {
        LruCache<String, String> c = LruCache.ofEntries(0, "cache size");
        c.put("a", "A");
        assertNull(c.get("a"));
        assertEquals(0, c.size());
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> LruCache.ofEntries(-1, "cache size"));
        assertEquals("cache size must be 0 or more, not -1", e.getMessage());
    }
}
