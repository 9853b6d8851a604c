package ionmark.apptests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.util.Arrays;
import java.util.Map;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.Test;
import org.osgi.framework.BundleContext;
import org.osgi.framework.FrameworkUtil;
import org.osgi.framework.ServiceReference;
import org.osgi.service.cm.Configuration;
import org.osgi.service.cm.ConfigurationAdmin;
import org.osgi.service.component.runtime.ServiceComponentRuntime;
import org.osgi.service.component.runtime.dto.ComponentConfigurationDTO;
import org.osgi.service.component.runtime.dto.ComponentDescriptionDTO;
import org.osgi.util.tracker.ServiceTracker;

/**
 * The deployment configuration is data in the application bundle (ionmark.app's configurator JSON): the
 * Configurator puts it into Config Admin and each component runs with it. Values come from the JSON's defaults
 * unless a framework property overrides them, which tests.bndrun does for the port, the workspace and the
 * speciation workers, as ./ionmark does with -D.
 */
class ConfigurationTest {
    private static final long WAIT_MILLIS = TimeUnit.SECONDS.toMillis(30);
    private final BundleContext ctx = FrameworkUtil.getBundle(ConfigurationTest.class).getBundleContext();

    @Test
    void theConfiguratorPutsEveryComponentsConfigurationIntoConfigAdmin() throws Exception {
        ConfigurationAdmin ca = service(ConfigurationAdmin.class);
        for (String pid : new String[] {"org.apache.felix.http", "ionmark.host", "ionmark.store", "ionmark.acidity.table",
                "ionmark.speciation"}) {
            Configuration[] found = ca.listConfigurations("(service.pid=" + pid + ")");
            assertNotNull(found, "no configuration for " + pid + ": the application's configurator JSON was not applied");
            assertEquals(1, found.length, pid);
        }
    }

    @Test
    void speciationLimitsComeFromTheJsonAndAnOverride() throws Exception {
        Map<String, Object> p = componentProperties("ionmark.speciation.internal.SpeciationService", "maxHeavyAtoms");
        assertEquals("ionmark.speciation", p.get("service.pid"));
        // the JSON's values, typed by the interpolation (an Integer, not the text of the placeholder)
        assertEquals(300, p.get("maxHeavyAtoms"));
        assertEquals(5000, p.get("timeoutMillis"));
        assertEquals(2000, p.get("cacheEntries"));
        // tests.bndrun sets ionmark.speciation.workers=3; the JSON's default is 2
        assertEquals(3, p.get("workers"));
    }

    @Test
    void theWorkspaceFrameworkPropertyReachesTheHostAndTheStore() throws Exception {
        // tests.bndrun's ionmark.workspace, as ./ionmark --workspace DIR sets it
        Map<String, Object> host = componentProperties("ionmark.host.internal.WebShell", "workspace");
        assertEquals("target/it-workspace", host.get("workspace"));
        assertEquals("chemist", host.get("user"));
        Map<String, Object> store = componentProperties("ionmark.store.internal.StoreComponent", "workspace");
        assertEquals("target/it-workspace", store.get("workspace"));
        // an empty default stays empty: H2 in the workspace
        assertEquals("", store.get("jdbcUrl"));
        assertEquals(2, store.get("pollSeconds"));
    }

    @Test
    void withoutIonmarkTableTheTableComesFromNoFile() throws Exception {
        Map<String, Object> p = componentProperties("ionmark.acidity.internal.TableSnapshotService", "tableFile");
        assertEquals("", p.get("tableFile"));
        assertEquals(2, p.get("pollSeconds"));
    }

    @Test
    void jettyListensOnLoopbackOnThePortTheFrameworkPropertyNames() throws Exception {
        // tests.bndrun sets org.osgi.service.http.port=0 (any free port) over the JSON's 8080
        long end = System.currentTimeMillis() + WAIT_MILLIS;
        String endpoints = null;
        while (endpoints == null && System.currentTimeMillis() < end) {
            ServiceReference<?>[] refs = ctx.getServiceReferences("org.osgi.service.servlet.runtime.HttpServiceRuntime",
                    null);
            if (refs != null && refs.length > 0) {
                Object e = refs[0].getProperty("osgi.http.endpoint");
                endpoints = e instanceof String[] a ? String.join(" ", a) : String.valueOf(e);
            } else {
                Thread.sleep(100);
            }
        }
        assertNotNull(endpoints, "no HTTP runtime registered");
        assertTrue(endpoints.startsWith("http://127.0.0.1:"), endpoints);
        assertNotEquals("http://127.0.0.1:8080/", endpoints);
    }

    private <T> T service(Class<T> type) throws InterruptedException {
        ServiceTracker<T, T> t = new ServiceTracker<>(ctx, type, null);
        t.open();
        T s = t.waitForService(WAIT_MILLIS);
        assertNotNull(s, type.getName() + " is not registered");
        return s;
    }

    /** The properties of the named component's active configuration, once they hold {@code key}. */
    private Map<String, Object> componentProperties(String component, String key) throws InterruptedException {
        ServiceComponentRuntime scr = service(ServiceComponentRuntime.class);
        long end = System.currentTimeMillis() + WAIT_MILLIS;
        while (System.currentTimeMillis() < end) {
            for (ComponentDescriptionDTO d : scr.getComponentDescriptionDTOs()) {
                if (component.equals(d.name)) {
                    for (ComponentConfigurationDTO c : scr.getComponentConfigurationDTOs(d)) {
                        if (c.properties.containsKey(key)) {
                            return c.properties;
                        }
                    }
                }
            }
            Thread.sleep(100);
        }
        fail(component + " runs without a configuration that sets " + key + "; components: " + Arrays.toString(
                scr.getComponentDescriptionDTOs().stream().map(d -> d.name).toArray()));
        return Map.of();
    }
}
