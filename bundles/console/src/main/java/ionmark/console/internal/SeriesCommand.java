package ionmark.console.internal;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;

import ionmark.acidity.api.AcidityTable;
import ionmark.calibration.api.Observation;
import ionmark.calibration.api.TruthFile;
import ionmark.speciation.api.Speciation;

/**
 * {@code ionmark accuracy --series}: reads the options of the series experiment ({@link SeriesExperiment}) and
 * runs it. The analog settings go in as system properties, which the engine reads when it builds a table's
 * analog index.
 * <ul>
 * <li>{@code --members FILE}: write each series member (id, series key, series fold) and stop; with it, a
 * training file without one fold's series is one {@code awk} away (docs/analog-series.md);</li>
 * <li>{@code --series-fold K/N}: only the series of fold K take part (a table calibrated without them);</li>
 * <li>{@code --half}: the half-series experiment only.</li>
 * </ul>
 */
final class SeriesCommand {
    private final Speciation speciation;
    private final AcidityTable head;
    private final PrintStream out;
    private final PrintStream err;

    SeriesCommand(Speciation speciation, AcidityTable head, PrintStream out, PrintStream err) {
        this.speciation = speciation;
        this.head = head;
        this.out = out;
        this.err = err;
    }

    int run(List<String> raw) {
        Cli.Args a = Cli.Args.parse(raw, Set.of("--truth", "--radius", "--threshold", "--prior", "--kernel", "--family",
                "--huber", "--near-prior", "--global", "--assign", "--annular", "--members", "--series-fold"), Set.of("--series", "--detail", "--half"));
        Map<String, String> settings = new TreeMap<>();
        for (String k : List.of("radius", "threshold", "prior", "family", "huber", "near-prior", "global")) {
            if (a.flags().containsKey("--" + k)) {
                double v = a.number("--" + k);
                settings.put("ionmark.analog." + k, k.equals("radius") ? Integer.toString((int) v) : Double.toString(v));
            }
        }
        if (a.flags().containsKey("--kernel")) {
            settings.put("ionmark.analog.kernel", a.v("--kernel"));
        }
        if (a.flags().containsKey("--assign")) {
            String how = a.v("--assign").toLowerCase(java.util.Locale.ROOT);
            if (!Set.of("nearest", "titrating", "split").contains(how)) {
                throw new Cli.UsageException("--assign takes nearest, titrating or split, not '" + a.v("--assign") + "'");
            }
            settings.put("ionmark.analog.assign", how);
        }
        if (a.flags().containsKey("--annular")) {
            String on = a.v("--annular").toLowerCase(java.util.Locale.ROOT);
            if (!on.equals("on") && !on.equals("off")) {
                throw new Cli.UsageException("--annular takes on or off, not '" + a.v("--annular") + "'");
            }
            settings.put("ionmark.analog.annular", Boolean.toString(on.equals("on")));
        }
        if (a.flags().containsKey("--detail")) {
            settings.put("ionmark.series.detail", "true");
        }
        int[] fold = fold(a.v("--series-fold"));
        if (!a.flags().containsKey("--truth")) {
            throw new Cli.UsageException("--truth FILE is required");
        }
        List<Observation> data;
        try {
            data = TruthFile.read(Path.of(a.v("--truth"))).stream().filter(o -> !SeriesExperiment.frozen(o.id()))
                    .toList();
        } catch (IOException | RuntimeException e) {
            throw new Cli.UsageException("cannot read truth file: " + e.getMessage());
        }
        SeriesExperiment x = new SeriesExperiment(speciation, head, out, err);
        if (a.flags().containsKey("--members")) {
            return x.members(data, Path.of(a.v("--members")), fold == null ? SeriesExperiment.FOLDS : fold[1]);
        }
        return x.run(data, settings, fold, a.flags().containsKey("--half"));
    }

    private static int[] fold(String spec) {
        if (spec == null) {
            return null;
        }
        String[] p = spec.split("/");
        try {
            int k = Integer.parseInt(p[0]);
            int n = Integer.parseInt(p[1]);
            if (p.length == 2 && n >= 2 && k >= 0 && k < n) {
                return new int[] {k, n};
            }
        } catch (NumberFormatException | ArrayIndexOutOfBoundsException e) {
            // falls through to the usage error
        }
        throw new Cli.UsageException("--series-fold needs K/N with 0 <= K < N, N >= 2, not '" + spec + "'");
    }
}
