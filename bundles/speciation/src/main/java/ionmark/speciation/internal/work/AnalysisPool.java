package ionmark.speciation.internal.work;

import java.util.concurrent.ExecutionException;
import java.util.concurrent.Future;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.RejectedExecutionException;
import java.util.concurrent.ThreadPoolExecutor;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.Supplier;

/**
 * Where structures are analysed: a bounded pool (a fixed number of workers, a bounded queue) whose every task
 * runs under a {@link Budget}. The caller waits at most the queue wait, the budget and a grace second; a
 * structure over its budget stops at the next check of its loops, and one whose loop does not check is told to
 * stop and no longer holds the caller. Idle workers end after 30 s, so a quiet notebook keeps no threads.
 */
public final class AnalysisPool implements AutoCloseable {
    /** How long a finished structure's worker may take past its budget before the caller stops waiting. */
    static final long GRACE_MILLIS = 1000;

    /** How every refusal for load starts. */
    public static final String BUSY = "not annotated: the notebook is busy with other structures";

    private final ThreadPoolExecutor pool;
    private final long budgetMillis;
    private final long queueWaitMillis;

    /** What a task gave: its value, or a one-line refusal (over budget, busy) and no value. */
    public record Outcome<T>(T value, String refusal) {
        public boolean ok() {
            return refusal == null;
        }
    }

    public AnalysisPool(int workers, int queue, long budgetMillis, long queueWaitMillis) {
        if (workers < 1 || queue < 1) {
            throw new IllegalArgumentException("the analysis pool needs at least one worker and one queue place, not "
                    + workers + " and " + queue);
        }
        this.budgetMillis = budgetMillis;
        this.queueWaitMillis = queueWaitMillis;
        AtomicInteger n = new AtomicInteger();
        this.pool = new ThreadPoolExecutor(workers, workers, 30, TimeUnit.SECONDS, new LinkedBlockingQueue<>(queue),
                r -> {
                    Thread t = new Thread(r, "ionmark-speciation-" + n.incrementAndGet());
                    t.setDaemon(true);
                    return t;
                }, new ThreadPoolExecutor.AbortPolicy());
        this.pool.allowCoreThreadTimeOut(true);
    }

    public long budgetMillis() {
        return budgetMillis;
    }

    /** Runs {@code work} on a worker under a fresh budget. */
    public <T> Outcome<T> run(Supplier<T> work) {
        AtomicReference<Budget> running = new AtomicReference<>();
        Future<T> f;
        try {
            f = pool.submit(() -> {
                Budget b = Budget.of(budgetMillis);
                running.set(b);
                return b.run(work);
            });
        } catch (RejectedExecutionException e) {
            return new Outcome<>(null, busy());
        }
        try {
            return new Outcome<>(f.get(budgetMillis + GRACE_MILLIS + queueWaitMillis, TimeUnit.MILLISECONDS), null);
        } catch (TimeoutException e) {
            Budget b = running.get();
            f.cancel(false);
            if (b == null) {
                return new Outcome<>(null, busy());
            }
            b.cancel();
            return new Outcome<>(null, OverBudgetException.message(budgetMillis));
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            Budget b = running.get();
            if (b != null) {
                b.cancel();
            }
            f.cancel(false);
            return new Outcome<>(null, "not annotated: the request was cancelled");
        } catch (ExecutionException e) {
            if (e.getCause() instanceof OverBudgetException) {
                return new Outcome<>(null, e.getCause().getMessage());
            }
            if (e.getCause() instanceof RuntimeException r) {
                throw r;
            }
            throw new IllegalStateException(e.getCause());
        }
    }

    private String busy() {
        return BUSY + " (" + pool.getMaximumPoolSize() + " at a time, " + pool.getQueue().size()
                + " waiting): try again in a moment";
    }

    /** Workers alive now (tests). */
    public int liveWorkers() {
        return pool.getPoolSize();
    }

    /** Workers busy with a structure now (tests). */
    public int busyWorkers() {
        return pool.getActiveCount();
    }

    @Override
    public void close() {
        pool.shutdownNow();
    }
}
