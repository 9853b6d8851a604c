package ionmark.reuse.internal;

import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CompletionException;
import java.util.concurrent.ConcurrentHashMap;
import java.util.function.Supplier;

/**
 * One computation per key at a time: a caller that asks for a key whose result is being computed waits for that
 * result instead of queueing the same work again. Fifty quick checks of twenty structures arriving together
 * otherwise put each structure into the bounded pool two or three times, and the copies took the queue places and
 * worker time the other structures were waiting for. The waiter is bounded by the computing caller, which the
 * pool bounds (queue wait + budget + grace).
 */
public final class SingleFlight<K, V> {
    private final ConcurrentHashMap<K, CompletableFuture<V>> running = new ConcurrentHashMap<>();

    /** The result of {@code work} for {@code key}: computed here, or the one another caller is computing now. */
    public V run(K key, Supplier<V> work) {
        if (key == null) {
            return work.get();
        }
        CompletableFuture<V> mine = new CompletableFuture<>();
        CompletableFuture<V> other = running.putIfAbsent(key, mine);
        if (other != null) {
            try {
                return other.join();
            } catch (CompletionException e) {
                if (e.getCause() instanceof RuntimeException r) {
                    throw r;
                }
                throw e;
            }
        }
        try {
            V v = work.get();
            mine.complete(v);
            return v;
        } catch (RuntimeException | Error e) {
            mine.completeExceptionally(e);
            throw e;
        } finally {
            running.remove(key, mine);
        }
    }

    /** Keys being computed now (tests). */
    public int running() {
        return running.size();
    }
}
