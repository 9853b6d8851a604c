package ionmark.console.internal;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;

import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Speciation;

/** {@code check SMILES|FILE}: one structure, as a text report or JSON. */
final class CheckCommand implements Command {
    private final Speciation speciation;
    private final PrintStream out;
    private final PrintStream err;

    CheckCommand(Speciation speciation, PrintStream out, PrintStream err) {
        this.speciation = speciation;
        this.out = out;
        this.err = err;
    }

    @Override
    public int run(List<String> raw) {
        boolean json = raw.contains("--format") && raw.indexOf("--format") + 1 < raw.size()
                && raw.get(raw.indexOf("--format") + 1).equals("json");
        if (!json) {
            return checkParsed(raw);
        }
        try {
            return checkParsed(raw);
        } catch (Cli.UsageException e) {
            // --format json: a usage problem is an answer in JSON too, so that a script never reads text
            out.println(AnalysisJson.error(e.getMessage()));
            err.println("ionmark: " + e.getMessage());
            return 2;
        }
    }

    private int checkParsed(List<String> raw) {
        Cli.Args a = Cli.Args.parse(raw, Set.of("--ph", "--temp", "--ionic", "--format"));
        if (a.positional().size() != 1) {
            throw new Cli.UsageException("check takes one structure (SMILES or file)");
        }
        String format = a.flags().getOrDefault("--format", "text");
        if (!format.equals("text") && !format.equals("json")) {
            throw new Cli.UsageException("--format must be text or json, not '" + format + "'");
        }
        Conditions c = a.conditions();
        String input = a.positional().get(0);
        Path p = Path.of(".");
        try {
            p = Path.of(input.length() < 250 && !input.contains("\n") ? input : ".");
        } catch (InvalidPathException e) {
            // not a file name (a NUL, say): the text is the structure
        }
        if (!input.isBlank() && Files.isRegularFile(p)) {
            try {
                input = Files.readString(p, StandardCharsets.UTF_8);
            } catch (IOException e) {
                if (format.equals("json")) {
                    out.println(AnalysisJson.error("cannot read " + p + ": " + e.getMessage()));
                }
                err.println("ionmark: cannot read " + p + ": " + e.getMessage());
                return 1;
            }
        }
        Analysis r = speciation.analyse(input, c);
        if (format.equals("json")) {
            out.println(AnalysisJson.of(null, r).toString());
        } else {
            out.print(TextReport.of(r));
        }
        if (!r.ok()) {
            err.println("ionmark: " + r.error());
            return 1;
        }
        return 0;
    }
}
