package ionmark.console.internal;

import java.util.List;

/**
 * One command of the command line ({@code check}, {@code batch}, {@code table}, {@code accuracy},
 * {@code annotate}). Returns the exit code; a bad argument is a {@link Cli.UsageException}, which
 * {@link Cli} turns into the usage text and exit code 2.
 */
@FunctionalInterface
interface Command {
    int run(List<String> args);
}
