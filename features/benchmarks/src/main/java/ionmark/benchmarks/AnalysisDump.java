package ionmark.benchmarks;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.TreeMap;

import ionmark.acidity.internal.TableSnapshotService;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.internal.Engine;

/**
 * Every analysis of a development file, written as text, so that a speed change can be checked to change
 * no result: run it before and after and compare the two files with {@code cmp}. For each compound (the
 * {@code smiles} column of a TSV with a header line): brief at pH 7.4, brief without pH and, with
 * {@code full}, the complete analysis at pH 7.4, one line each (the records' own text, every number at full
 * precision; the charge-state map in key order, since an immutable map's order changes from run to run).
 * The analyses carry no timing field.
 *
 * <p>{@code java -cp features/benchmarks/target/benchmarks.jar ionmark.benchmarks.AnalysisDump in.tsv out.txt [full]}
 */
public final class AnalysisDump {
    private AnalysisDump() {
    }

    public static void main(String[] args) throws IOException {
        if (args.length < 2) {
            System.err.println("usage: AnalysisDump <compounds.tsv> <out.txt> [full]");
            System.exit(2);
        }
        Engine engine = new Engine(TableSnapshotService.shipped(), 300);
        boolean full = args.length > 2 && args[2].equals("full");
        List<String> lines = Files.readAllLines(Path.of(args[0]), StandardCharsets.UTF_8);
        int column = List.of(lines.get(0).split("\t")).indexOf("smiles");
        if (column < 0) {
            throw new IllegalArgumentException("no 'smiles' column in the header of " + args[0]);
        }
        try (PrintWriter out = new PrintWriter(Files.newBufferedWriter(Path.of(args[1]), StandardCharsets.UTF_8))) {
            for (String line : lines.subList(1, lines.size())) {
                String smiles = line.split("\t")[column];
                out.println(text(engine.analyse(smiles, Conditions.atPh(7.4), true)));
                out.println(text(engine.analyse(smiles, Conditions.noPh(), true)));
                if (full) {
                    out.println(text(engine.analyse(smiles, Conditions.atPh(7.4), false)));
                }
            }
        }
    }

    private static String text(Analysis a) {
        return a.toString().replace("chargeStates=" + a.chargeStates(), "chargeStates=" + new TreeMap<>(a.chargeStates()));
    }
}
