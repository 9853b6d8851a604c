package ionmark.console.internal;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Set;

import ionmark.store.api.AuditEvent;
import ionmark.store.api.StoreConflictException;
import ionmark.store.api.StoreRejectedException;
import ionmark.store.api.TableStore;
import ionmark.store.api.VersionInfo;

/** {@code table history|publish|rollback|diff|audit}: the versioned store from the command line. */
final class StoreCommands {
    private final TableStore store;
    private final PrintStream out;
    private final PrintStream err;

    StoreCommands(TableStore store, PrintStream out, PrintStream err) {
        this.store = store;
        this.out = out;
        this.err = err;
    }

    int run(List<String> raw) {
        String cmd = raw.get(0);
        Cli.Args a = Cli.Args.parse(raw.subList(1, raw.size()), Set.of("--base", "--comment", "--author", "--limit"));
        String author = a.flags().getOrDefault("--author", System.getProperty("user.name", "unknown"));
        try {
            switch (cmd) {
                case "history" -> {
                    for (VersionInfo v : store.history()) {
                        out.println(String.format(Locale.ROOT, "v%-4d %s  %-16s %s  %s", v.number(), v.time(),
                                Printable.of(v.author()), v.hash().substring(0, 8), Printable.of(v.comment())));
                    }
                    return 0;
                }
                case "diff" -> {
                    if (a.positional().size() != 2) {
                        throw new Cli.UsageException("table diff takes two version numbers");
                    }
                    store.diff(number(a.positional().get(0)), number(a.positional().get(1)))
                            .forEach(l -> out.println(Printable.of(l)));
                    return 0;
                }
                case "audit" -> {
                    int limit = a.flags().containsKey("--limit") ? number(a.flags().get("--limit")) : 50;
                    for (AuditEvent e : store.audit(limit)) {
                        out.println(String.format(Locale.ROOT, "%s  %-12s %-9s v%-4d %-9s %s", e.time(),
                                Printable.of(e.user()), Printable.of(e.action()), e.version(), Printable.of(e.outcome()),
                                Printable.of(e.detail())));
                    }
                    return 0;
                }
                case "publish" -> {
                    if (a.positional().size() != 1 || !a.flags().containsKey("--base")) {
                        throw new Cli.UsageException("table publish FILE --base N --comment TEXT");
                    }
                    String json = Files.readString(Path.of(a.positional().get(0)), StandardCharsets.UTF_8);
                    VersionInfo v = store.publish(json, number(a.flags().get("--base")), author,
                            a.flags().getOrDefault("--comment", ""));
                    out.println("published v" + v.number() + " (" + v.hash().substring(0, 8) + ")");
                    return 0;
                }
                case "rollback" -> {
                    if (a.positional().size() != 1 || !a.flags().containsKey("--base")) {
                        throw new Cli.UsageException("table rollback N --base M --comment TEXT");
                    }
                    VersionInfo v = store.rollback(number(a.positional().get(0)), number(a.flags().get("--base")), author,
                            a.flags().getOrDefault("--comment", ""));
                    out.println("published v" + v.number() + " with the content of v" + a.positional().get(0));
                    return 0;
                }
                default -> throw new Cli.UsageException("unknown table subcommand '" + cmd + "'");
            }
        } catch (StoreConflictException e) {
            err.println("ionmark: conflict: " + e.getMessage());
            return 1;
        } catch (StoreRejectedException e) {
            err.println("ionmark: " + e.getMessage());
            e.problems().forEach(p -> err.println("  " + p));
            return 1;
        } catch (IOException e) {
            err.println("ionmark: cannot read: " + e.getMessage());
            return 1;
        }
    }

    private static int number(String s) {
        try {
            return Integer.parseInt(s.strip().replaceFirst("^v", ""));
        } catch (NumberFormatException e) {
            throw new Cli.UsageException("a version number is needed, not '" + s + "'");
        }
    }
}
