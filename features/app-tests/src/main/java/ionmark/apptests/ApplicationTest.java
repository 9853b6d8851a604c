package ionmark.apptests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.Test;
import org.osgi.framework.Bundle;
import org.osgi.framework.BundleContext;
import org.osgi.framework.FrameworkUtil;
import org.osgi.util.tracker.ServiceTracker;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.TableListener;
import ionmark.acidity.api.TableService;
import ionmark.host.api.Block;
import ionmark.host.api.Decoration;
import ionmark.host.api.Entry;
import ionmark.host.api.EntryDecorator;
import ionmark.host.api.HostUser;
import ionmark.host.api.SidePanel;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Speciation;

/** The application as it runs: every bundle active, every product service registered and working. */
class ApplicationTest {
    private final BundleContext ctx = FrameworkUtil.getBundle(ApplicationTest.class).getBundleContext();

    <T> T service(Class<T> type) throws InterruptedException {
        ServiceTracker<T, T> t = new ServiceTracker<>(ctx, type, null);
        t.open();
        T s = t.waitForService(TimeUnit.SECONDS.toMillis(30));
        assertNotNull(s, type.getName() + " is not registered");
        return s;
    }

    @Test
    void everyBundleIsActive() {
        for (Bundle b : ctx.getBundles()) {
            if (b.getHeaders().get("Fragment-Host") == null) {
                assertEquals(Bundle.ACTIVE, b.getState(), b.getSymbolicName() + " is not active");
            }
        }
    }

    @Test
    void productBundlesAreInstalled() {
        List<String> names = java.util.Arrays.stream(ctx.getBundles()).map(Bundle::getSymbolicName).toList();
        for (String bsn : List.of("ionmark.acidity", "ionmark.speciation", "ionmark.notebook", "ionmark.host",
                "ionmark.host.api", "ionmark.console", "ionmark.cdk")) {
            assertTrue(names.contains(bsn), bsn + " missing from the framework");
        }
    }

    /**
     * The runtime does not need calibration: this framework is the notebook application without the calibration
     * bundle (tests.bndrun, like ionmark.bndrun, does not ask for it and nothing pulls it in), every bundle above
     * is active, and the console's optional import of the calibration API is left unwired.
     */
    @Test
    void theRuntimeRunsWithoutTheCalibrationBundle() throws InterruptedException {
        List<String> names = java.util.Arrays.stream(ctx.getBundles()).map(Bundle::getSymbolicName).toList();
        assertFalse(names.contains("ionmark.calibration"), "the calibration bundle was resolved into the runtime");
        Bundle console = java.util.Arrays.stream(ctx.getBundles())
                .filter(b -> "ionmark.console".equals(b.getSymbolicName())).findFirst().orElseThrow();
        assertEquals(Bundle.ACTIVE, console.getState());
        var wiring = console.adapt(org.osgi.framework.wiring.BundleWiring.class);
        assertTrue(wiring.getRequiredWires("osgi.wiring.package").stream()
                .noneMatch(w -> "ionmark.calibration.api".equals(w.getCapability().getAttributes().get("osgi.wiring.package"))));
        // what the calibration bundle would use is there all the same: the speciation SPI
        service(ionmark.speciation.spi.ModelEngines.class);
        Analysis a = service(Speciation.class).analyse("CC(=O)O", Conditions.atPh(7.4));
        assertTrue(a.ok(), a.error());
    }

    @Test
    void everyProductServiceIsRegistered() throws InterruptedException {
        service(TableService.class);
        service(Speciation.class);
        service(EntryDecorator.class);
        service(SidePanel.class);
    }

    @Test
    void aPublishThroughTheStoreReachesTheSolverWithinFiveSeconds() throws Exception {
        ionmark.store.api.TableStore store = service(ionmark.store.api.TableStore.class);
        TableService tables = service(TableService.class);
        var head = store.head().orElseThrow();
        AcidityTable current = tables.validate(store.content(head.number()).orElseThrow()).table().orElseThrow();
        double old = current.group("amine-secondary").orElseThrow().pka();
        var groups = current.groups().stream()
                .map(g -> g.id().equals("amine-secondary") ? g.withPka(g.pka() + 0.5, g.source("pka")) : g).toList();
        var published = store.publish(tables.toJson(current.withGroups(groups)), head.number(), "in-framework test",
                "raise secondary amines by 0.5");
        long start = System.currentTimeMillis();
        Speciation s = service(Speciation.class);
        double classTerm = Double.NaN;
        while (System.currentTimeMillis() - start < 5000) {
            classTerm = s.analyse("CCCNCC", Conditions.noPh()).sites().get(0).derivation().get(0).value();
            if (Math.abs(classTerm - (old + 0.5)) < 1e-9) {
                break;
            }
            Thread.sleep(50);
        }
        assertEquals(old + 0.5, classTerm, 1e-9, "the published version did not reach the solver within 5 s");
        assertTrue(s.analyse("CCN", Conditions.noPh()).tableVersion().startsWith("v" + published.number()));
        assertTrue(store.audit(5).stream().anyMatch(e -> e.version() == published.number() && e.outcome().equals("ok")));
    }

    @Test
    void aRegisteredTableListenerHearsOfANewTable() throws InterruptedException {
        // a test double registered as a whiteboard service, as any bundle would
        java.util.concurrent.BlockingQueue<AcidityTable> heard = new java.util.concurrent.LinkedBlockingQueue<>();
        var reg = ctx.registerService(TableListener.class, heard::add, null);
        TableService tables = service(TableService.class);
        AcidityTable before = tables.current();
        try {
            var v = before.version();
            tables.install(before.withVersion(new ionmark.acidity.api.TableVersion(v.number() + 1, "in-framework test",
                    v.time(), "listener check", "", v.number())));
            AcidityTable got = heard.poll(10, TimeUnit.SECONDS);
            assertNotNull(got, "the listener was not called");
            assertEquals(v.number() + 1, got.version().number());
        } finally {
            reg.unregister();
            tables.install(before);
        }
    }

    @Test
    void quickCheckOfAceticAcidReturnsItsSite() throws InterruptedException {
        // acetic acid pKa 4.76 (CRC Handbook, from memory): half protonated at pH 4.76
        Analysis a = service(Speciation.class).analyse("CC(=O)O", Conditions.atPh(4.76));
        assertTrue(a.ok(), a.error());
        assertEquals(1, a.sites().size());
        assertEquals("carboxylic-aliphatic", a.sites().get(0).group());
        assertEquals(4.76, a.sites().get(0).pka(), 0.01);
        assertEquals(0.5, a.sites().get(0).protonated(), 0.01);
    }

    @Test
    void cdkWorksInsideTheFramework() throws InterruptedException {
        // SMILES parsing, SMARTS matching and 2D depiction all run in the merged CDK bundle
        Entry e = new Entry("it", "it", List.of(new Block(Block.Kind.TEXT, "buffer at pH 7.4", null, 0),
                new Block(Block.Kind.STRUCTURE, "NCC(=O)O", null, 0)), 0);
        List<Decoration> d = service(EntryDecorator.class).decorate(e, new HostUser("it", java.util.Set.of()));
        assertEquals(1, d.size());
        assertTrue(d.get(0).html().contains("<svg"), "no depiction in the card");
        assertTrue(d.get(0).html().contains("pH 7.4"), "the card does not say which pH it used");
    }

    @Test
    void aNewTableReachesTheSolver() throws InterruptedException {
        TableService tables = service(TableService.class);
        AcidityTable before = tables.current();
        double oldValue = before.group("amine-tertiary").orElseThrow().pka();
        var groups = before.groups().stream()
                .map(g -> g.id().equals("amine-tertiary") ? g.withPka(g.pka() + 1.0, g.source("pka")) : g).toList();
        var v = before.version();
        tables.install(before.withGroups(groups).withVersion(new ionmark.acidity.api.TableVersion(v.number() + 1,
                "in-framework test", v.time(), "raise the tertiary amine class by 1.0", "", v.number())));
        try {
            Speciation s = service(Speciation.class);
            // the listener swaps the engine asynchronously: wait for the new class value in the derivation
            long start = System.currentTimeMillis();
            long deadline = start + 30_000;
            double classTerm = Double.NaN;
            Analysis a = null;
            while (System.currentTimeMillis() < deadline) {
                a = s.analyse("CN1CCCC1", Conditions.noPh());
                classTerm = a.sites().get(0).derivation().get(0).value();
                if (Math.abs(classTerm - (oldValue + 1.0)) < 1e-9) {
                    break;
                }
                Thread.sleep(50);
            }
            assertEquals(oldValue + 1.0, classTerm, 1e-9, "the solver still uses the old table after 30 s");
            System.out.println("new table in use after " + (System.currentTimeMillis() - start) + " ms");
            assertTrue(a.tableVersion().startsWith("v" + (v.number() + 1)), a.tableVersion());
        } finally {
            tables.install(before);
        }
    }
}
