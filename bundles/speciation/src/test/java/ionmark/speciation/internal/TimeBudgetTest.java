package ionmark.speciation.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import ionmark.acidity.internal.TableSnapshotService;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.CurveResult;
import ionmark.speciation.internal.work.OverBudgetException;

/**
 * A structure that cannot be finished in its budget is not annotated, says so, and gives its worker back at the
 * next check of its loops: the next structure is answered, the curve stops too, and no thread is left behind.
 * (Before the budget, the polyamine below held a thread for about 7 s of analysis and 47 s of curve on a loaded
 * two-core machine after its caller had given up.)
 */
class TimeBudgetTest {
    /** A linear polyamine of 80 amine sites: sampled microstates, and a curve of 141 sampled points. */
    static final String POLYAMINE = "N" + "CCN".repeat(80);
    static final int BUDGET = 300;
    /**
     * The budget the over-budget cases run with: far below what the polyamine needs on any machine (on an idle
     * two-core machine it finished inside 300 ms, on a loaded one it took seconds), so the cases do not depend on
     * the load.
     */
    static final int TIGHT = 30;

    /** Class loading and the first compilation of a fresh JVM are not what a budget is for. */
    @org.junit.jupiter.api.BeforeAll
    static void warmUp() {
        SpeciationService s = new SpeciationService(TableSnapshotService.shipped(), 300, 600_000, 1, 0);
        for (String smi : new String[] {"NCC(=O)O", "CC(=O)O", "c1ccncc1", "NCCN", "Oc1ccccc1"}) {
            s.analyse(smi, Conditions.atPh(7));
            s.curve(smi, Conditions.noPh(), 0, 14, 0.1);
        }
        s.close();
    }

    static long millis(Runnable r) {
        long t = System.nanoTime();
        r.run();
        return (System.nanoTime() - t) / 1_000_000;
    }

    static SpeciationService oneWorker() {
        return oneWorker(BUDGET);
    }

    static SpeciationService oneWorker(int budgetMs) {
        return new SpeciationService(TableSnapshotService.shipped(), 300, budgetMs, 1, 0);
    }

    /** Waits up to {@code ms} for the condition; whether it came true. */
    static boolean within(long ms, java.util.function.BooleanSupplier ok) throws InterruptedException {
        long end = System.nanoTime() + ms * 1_000_000;
        while (System.nanoTime() < end) {
            if (ok.getAsBoolean()) {
                return true;
            }
            Thread.sleep(20);
        }
        return ok.getAsBoolean();
    }

    @Test
    void anAnalysisOverItsBudgetIsNotAnnotatedAndFreesItsWorker() throws InterruptedException {
        SpeciationService s = oneWorker(TIGHT);
        try {
            Analysis[] a = new Analysis[1];
            long took = millis(() -> a[0] = s.analyse(POLYAMINE, Conditions.atPh(7.4)));
            assertFalse(a[0].ok());
            assertTrue(a[0].error().startsWith(OverBudgetException.PREFIX), a[0].error());
            assertTrue(took < TIGHT + 2500, "answered after " + took + " ms");
            assertTrue(within(1500, () -> s.pool().busyWorkers() == 0), "the worker still runs the polyamine");
            Analysis acetic = s.analyse("CC(=O)O", Conditions.atPh(4.76));
            assertTrue(acetic.ok(), acetic.error());
        } finally {
            s.close();
        }
    }

    @Test
    void aCurveOverItsBudgetStopsAndSaysWhy() throws InterruptedException {
        SpeciationService s = oneWorker(TIGHT);
        try {
            long t = System.nanoTime();
            CurveResult r = s.curve(POLYAMINE, Conditions.noPh(), 0, 14, 0.1);
            long took = (System.nanoTime() - t) / 1_000_000;
            assertTrue(!r.ok() && r.error().startsWith(OverBudgetException.PREFIX), r.error());
            assertTrue(took < TIGHT + 2500, "answered after " + took + " ms");
            assertTrue(within(1500, () -> s.pool().busyWorkers() == 0), "the worker still runs the curve");
        } finally {
            s.close();
        }
    }

    @Test
    void workDoneOnceForEveryStructureRunsOutsideTheAskingStructuresBudget() throws InterruptedException {
        // the measured-analog index of a snapshot is built on first use; a first structure already out of time must
        // not cut it short (and leave it cached incomplete), and its own budget is back in force afterwards
        ionmark.speciation.internal.work.Budget spent = ionmark.speciation.internal.work.Budget.of(1);
        Thread.sleep(5);
        boolean[] checkedInside = new boolean[1];
        boolean overAfter = spent.run(() -> {
            ionmark.speciation.internal.work.Budget.unbudgeted(() -> {
                ionmark.speciation.internal.work.Budget.check(); // would throw under the spent budget
                checkedInside[0] = true;
                return null;
            });
            return ionmark.speciation.internal.work.Budget.exhausted();
        });
        assertTrue(checkedInside[0]);
        assertTrue(overAfter, "the caller's budget applies again after the unbudgeted work");
    }

    @Test
    void aSmallStructureIsAnnotatedWithinItsBudget() {
        SpeciationService s = oneWorker();
        try {
            Analysis a = s.analyse("NCC(=O)O", Conditions.atPh(7));
            assertTrue(a.ok(), a.error());
            assertEquals(2, a.sites().size());
        } finally {
            s.close();
        }
    }

    @Test
    void closingTheServiceLeavesNoWorkerThread() throws InterruptedException {
        SpeciationService s = new SpeciationService(TableSnapshotService.shipped(), 300, TIGHT, 2, 0);
        s.analyse("CC(=O)O", Conditions.atPh(7));
        s.analyse(POLYAMINE, Conditions.atPh(7));
        s.close();
        assertTrue(within(2000, () -> s.pool().liveWorkers() == 0), s.pool().liveWorkers() + " workers left");
    }
}
