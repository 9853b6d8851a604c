package ionmark.reuse.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.concurrent.CountDownLatch;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.Supplier;

import org.junit.jupiter.api.Test;

/** Identical requests under way share one computation; a finished key computes again. */
class SingleFlightTest {
    /** Starts {@code first} on its own thread, waits until it computes, then asks again on a second thread. */
    private static <V> void twoAtOnce(SingleFlight<String, V> f, Supplier<V> work, CountDownLatch go,
            AtomicReference<Object> a, AtomicReference<Object> b) throws InterruptedException {
        Thread first = new Thread(() -> a.set(call(f, work)));
        first.start();
        while (f.running() == 0) {
            Thread.sleep(5);
        }
        Thread second = new Thread(() -> b.set(call(f, work)));
        second.start();
        while (second.getState() != Thread.State.WAITING) {
            Thread.sleep(5);
        }
        go.countDown();
        first.join(10_000);
        second.join(10_000);
    }

    private static <V> Object call(SingleFlight<String, V> f, Supplier<V> work) {
        try {
            return f.run("CC(=O)O pH 7.4", work);
        } catch (RuntimeException e) {
            return e;
        }
    }

    private static Supplier<String> blocking(CountDownLatch go, AtomicInteger runs, boolean fail) {
        return () -> {
            runs.incrementAndGet();
            try {
                go.await();
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
            if (fail) {
                throw new IllegalArgumentException("not annotated: over the time budget");
            }
            return "analysis";
        };
    }

    @Test
    void aSecondRequestForTheSameKeyWaitsForTheFirstsResult() throws Exception {
        SingleFlight<String, String> f = new SingleFlight<>();
        CountDownLatch go = new CountDownLatch(1);
        AtomicInteger runs = new AtomicInteger();
        AtomicReference<Object> a = new AtomicReference<>();
        AtomicReference<Object> b = new AtomicReference<>();
        twoAtOnce(f, blocking(go, runs, false), go, a, b);
        assertEquals(1, runs.get());
        assertEquals("analysis", a.get());
        assertEquals("analysis", b.get());
        assertEquals(0, f.running());
        assertEquals("analysis", f.run("CC(=O)O pH 7.4", () -> "analysis"));
    }

    @Test
    void aFailureReachesEveryWaiterAsItself() throws Exception {
        SingleFlight<String, String> f = new SingleFlight<>();
        CountDownLatch go = new CountDownLatch(1);
        AtomicInteger runs = new AtomicInteger();
        AtomicReference<Object> a = new AtomicReference<>();
        AtomicReference<Object> b = new AtomicReference<>();
        twoAtOnce(f, blocking(go, runs, true), go, a, b);
        assertEquals(1, runs.get());
        assertEquals(IllegalArgumentException.class, a.get().getClass());
        assertEquals(IllegalArgumentException.class, b.get().getClass(), "the waiter sees the refusal, not a wrapper");
        assertEquals(0, f.running(), "a failed key is not left running");
    }

    @Test
    void aNullKeyIsNeverShared() {
        SingleFlight<String, Integer> f = new SingleFlight<>();
        AtomicInteger runs = new AtomicInteger();
        f.run(null, runs::incrementAndGet);
        f.run(null, runs::incrementAndGet);
        assertEquals(2, runs.get());
        assertThrows(IllegalStateException.class, () -> f.run(null, () -> {
            throw new IllegalStateException("x");
        }));
    }
}
