package ionmark.browsertests;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.net.HttpURLConnection;
import java.net.ServerSocket;
import java.net.URI;
import java.nio.file.Files;
import java.nio.file.Path;

/** The exported application started on a free loopback port with its own workspace, for end-to-end tests. */
final class RunningApp implements AutoCloseable {
    final String base;
    private final Process process;

    private RunningApp(String base, Process process) {
        this.base = base;
        this.process = process;
    }

    /** Starts the application and waits until the demo entry carries annotations. */
    static RunningApp start(Path workspace, String logName) throws Exception {
        return start(workspace, logName, 0);
    }

    /** Starts the application on a given port (0: any free one). */
    static RunningApp start(Path workspace, String logName, int fixedPort) throws Exception {
        Path jar = Path.of(System.getProperty("ionmark.app.jar", "../app/target/ionmark.jar"));
        assertTrue(Files.isRegularFile(jar), "build the application first: " + jar);
        int port = fixedPort != 0 ? fixedPort : freePortInRange();
        try (ServerSocket s = new ServerSocket(port)) {
            port = s.getLocalPort();
        }
        Process p = new ProcessBuilder("java", "-Dorg.osgi.service.http.port=" + port, "-Dgosh.args=--nointeractive",
                "-Dionmark.workspace=" + workspace, "-jar", jar.toString()).redirectErrorStream(true)
                .redirectOutput(workspace.resolveSibling(workspace.getFileName() + "-" + logName + ".log").toFile()).start();
        RunningApp app = new RunningApp("http://127.0.0.1:" + port, p);
        app.waitForCards("/entry/05-assay-ph74");
        return app;
    }

    /**
     * A free port from {@code -Dionmark.browser.ports=LOW-HIGH} (for shared machines where each user has a range),
     * else 0: any free port.
     */
    private static int freePortInRange() {
        String range = System.getProperty("ionmark.browser.ports", "");
        if (!range.matches("\\d+-\\d+")) {
            return 0;
        }
        String[] r = range.split("-");
        for (int p = Integer.parseInt(r[0]); p <= Integer.parseInt(r[1]); p++) {
            try (ServerSocket s = new ServerSocket(p)) {
                return s.getLocalPort();
            } catch (IOException e) {
                // taken: try the next
            }
        }
        throw new IllegalStateException("no free port in " + range);
    }

    /** Waits until the server answers and the speciation service has annotated the page. */
    void waitForCards(String path) throws Exception {
        long deadline = System.currentTimeMillis() + 60_000;
        while (System.currentTimeMillis() < deadline) {
            try {
                HttpURLConnection c = (HttpURLConnection) URI.create(base + path).toURL().openConnection();
                if (c.getResponseCode() == 200 && new String(c.getInputStream().readAllBytes()).contains("class=\"im-card\"")) {
                    return;
                }
            } catch (IOException e) {
                // not up yet
            }
            Thread.sleep(250);
        }
        throw new AssertionError("the notebook did not come up with annotations within 60 s");
    }

    @Override
    public void close() {
        process.destroy();
    }
}
