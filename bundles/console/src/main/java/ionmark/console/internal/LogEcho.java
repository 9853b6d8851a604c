package ionmark.console.internal;

import java.io.PrintStream;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

import org.osgi.service.component.annotations.Activate;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Deactivate;
import org.osgi.service.component.annotations.Reference;
import org.osgi.service.log.LogEntry;
import org.osgi.service.log.LogLevel;
import org.osgi.service.log.LogListener;
import org.osgi.service.log.LogReaderService;

/**
 * Prints the framework's warnings and errors (the OSGi log: Declarative Services, the Configurator, Config Admin)
 * to standard error, one line each. With a log service present those bundles log to it and nowhere else; without
 * one the Configurator would print its debug lines to standard output, into a command's report or JSON.
 */
@Component(immediate = true)
public final class LogEcho implements LogListener {
    private final LogReaderService reader;
    private final PrintStream err;

    @Activate
    public LogEcho(@Reference LogReaderService reader) {
        this(reader, System.err);
    }

    LogEcho(LogReaderService reader, PrintStream err) {
        this.reader = reader;
        this.err = err;
        // what was logged before this component started, oldest first, then everything new
        List<LogEntry> earlier = new ArrayList<>(Collections.list(reader.getLog()));
        Collections.reverse(earlier);
        earlier.forEach(this::logged);
        reader.addLogListener(this);
    }

    @Override
    public void logged(LogEntry entry) {
        LogLevel level = entry.getLogLevel();
        if (level != LogLevel.WARN && level != LogLevel.ERROR && level != LogLevel.AUDIT) {
            return;
        }
        String from = entry.getBundle() == null ? "framework" : entry.getBundle().getSymbolicName();
        err.println("ionmark: " + level.name().toLowerCase(java.util.Locale.ROOT) + " from " + from + ": "
                + entry.getMessage() + (entry.getException() == null ? "" : " (" + entry.getException() + ")"));
    }

    @Deactivate
    void stop() {
        reader.removeLogListener(this);
    }
}
