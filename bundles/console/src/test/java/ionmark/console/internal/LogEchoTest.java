package ionmark.console.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.lang.reflect.Proxy;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.osgi.service.log.LogEntry;
import org.osgi.service.log.LogLevel;
import org.osgi.service.log.LogListener;
import org.osgi.service.log.LogReaderService;

class LogEchoTest {
    private final List<LogListener> listeners = new ArrayList<>();
    private final ByteArrayOutputStream err = new ByteArrayOutputStream();

    @Test
    void warningsAndErrorsReachStandardErrorDebugAndInfoDoNot() {
        LogEcho echo = new LogEcho(reader(List.of()), new PrintStream(err, true, StandardCharsets.UTF_8));
        listeners.forEach(l -> l.logged(entry(LogLevel.DEBUG, "examining bundle")));
        listeners.forEach(l -> l.logged(entry(LogLevel.INFO, "started")));
        listeners.forEach(l -> l.logged(entry(LogLevel.WARN, "configuration ignored")));
        listeners.forEach(l -> l.logged(entry(LogLevel.ERROR, "component failed")));
        assertEquals("ionmark: warn from framework: configuration ignored\nionmark: error from framework: component failed\n",
                err.toString(StandardCharsets.UTF_8).replace("\r\n", "\n"));
        echo.stop();
        assertTrue(listeners.isEmpty(), "the listener stays registered after the component stopped");
    }

    @Test
    void whatWasLoggedBeforeTheEchoStartedIsPrintedOldestFirst() {
        // the log reader hands out the newest entry first
        new LogEcho(reader(List.of(entry(LogLevel.ERROR, "second"), entry(LogLevel.WARN, "first"))),
                new PrintStream(err, true, StandardCharsets.UTF_8));
        assertEquals("ionmark: warn from framework: first\nionmark: error from framework: second\n",
                err.toString(StandardCharsets.UTF_8).replace("\r\n", "\n"));
    }

    private LogReaderService reader(List<LogEntry> earlier) {
        return (LogReaderService) Proxy.newProxyInstance(getClass().getClassLoader(),
                new Class<?>[] {LogReaderService.class}, (p, m, a) -> switch (m.getName()) {
                    case "addLogListener" -> listeners.add((LogListener) a[0]);
                    case "removeLogListener" -> listeners.remove((LogListener) a[0]);
                    case "getLog" -> Collections.enumeration(earlier);
                    default -> throw new UnsupportedOperationException(m.getName());
                });
    }

    private static LogEntry entry(LogLevel level, String message) {
        return (LogEntry) Proxy.newProxyInstance(LogEchoTest.class.getClassLoader(), new Class<?>[] {LogEntry.class},
                (p, m, a) -> switch (m.getName()) {
                    case "getLogLevel" -> level;
                    case "getMessage" -> message;
                    case "getBundle", "getException" -> null;
                    default -> throw new UnsupportedOperationException(m.getName());
                });
    }
}
