package ionmark.console.internal;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;

import org.osgi.framework.BundleContext;
import org.osgi.service.component.annotations.Activate;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Deactivate;
import org.osgi.service.component.annotations.Reference;
import org.osgi.service.component.annotations.ReferenceCardinality;
import org.osgi.service.component.annotations.ReferencePolicy;

import ionmark.acidity.api.TableService;
import ionmark.host.api.HostAuditor;
import ionmark.speciation.api.Speciation;

/**
 * In a running notebook: answers {@code ./ionmark check} for the command line, so that a quick check from a
 * terminal does not start a JVM's worth of table and engine. Listens on a random loopback port
 * ({@link ChannelServer}) and names it with a random token in {@code workspace/.ionmark/cli-channel} (0600,
 * {@link ChannelFile}), written at start and deleted at stop. The answer is what the command line's own path
 * prints, from the same {@link Cli}, with the notebook's table (the store's head). Refused attempts go to every
 * {@link HostAuditor} as {@code request denied}. Not started in a framework run for one command or without HTTP.
 */
@Component(immediate = true)
public final class CheckChannel {
    private final List<HostAuditor> auditors = new CopyOnWriteArrayList<>();
    private final ChannelServer server;
    private final ChannelFile file;
    private final Path dir;
    private final Thread onExit;

    @Activate
    public CheckChannel(@Reference Speciation speciation, @Reference TableService tables, BundleContext ctx) {
        boolean notebook = ctx.getProperty(CommandLineRunner.ARGS_FILE) == null
                && !"false".equals(ctx.getProperty("org.apache.felix.http.enable"));
        String ws = ctx.getProperty("ionmark.workspace");
        this.dir = Path.of(ws == null || ws.isBlank() ? "workspace" : ws, ".ionmark");
        ChannelServer s = null;
        ChannelFile f = null;
        if (notebook) {
            try {
                String token = ChannelFile.newToken();
                s = new ChannelServer(0, token, args -> run(speciation, tables, args), this::denied);
                f = new ChannelFile(s.port(), token);
                f.write(dir);
            } catch (IOException e) {
                System.err.println("ionmark: the command line's check channel is off (" + e.getMessage()
                        + "); ./ionmark check runs on its own");
                if (s != null) {
                    s.close();
                }
                s = null;
                f = null;
            }
        }
        this.server = s;
        this.file = f;
        // a notebook ended by a signal (Ctrl-C, kill) may not deactivate its components: delete the file then too
        ChannelFile ours = f;
        ChannelServer listening = s;
        this.onExit = new Thread(() -> {
            if (listening != null) {
                listening.close();
                ours.deleteIfOurs(dir);
            }
        }, "ionmark-check-channel-exit");
        if (s != null) {
            Runtime.getRuntime().addShutdownHook(onExit);
        }
    }

    /** One command line through the same {@link Cli} the local path uses; only {@code check} reaches here. */
    static ChannelAnswer run(Speciation speciation, TableService tables, List<String> args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code;
        try (PrintStream o = new PrintStream(out, true, StandardCharsets.UTF_8);
                PrintStream e = new PrintStream(err, true, StandardCharsets.UTF_8)) {
            code = new Cli(speciation, tables, null, null, o, e).run(args);
        }
        return new ChannelAnswer(code, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    private void denied(String address, String why) {
        for (HostAuditor a : auditors) {
            a.record("anonymous@" + address, "request", "denied", "command-line check channel: " + why);
        }
    }

    @Reference(cardinality = ReferenceCardinality.MULTIPLE, policy = ReferencePolicy.DYNAMIC)
    void addAuditor(HostAuditor a) {
        auditors.add(a);
    }

    void removeAuditor(HostAuditor a) {
        auditors.remove(a);
    }

    @Deactivate
    void deactivate() {
        if (server != null) {
            server.close();
            file.deleteIfOurs(dir);
            try {
                Runtime.getRuntime().removeShutdownHook(onExit);
            } catch (IllegalStateException e) {
                // the JVM is already shutting down: the hook runs anyway
            }
        }
    }
}
