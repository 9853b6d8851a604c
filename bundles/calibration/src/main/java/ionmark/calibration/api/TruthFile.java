package ionmark.calibration.api;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * The truth files that accuracy reports, calibration and the benchmarks read, and the folds they are split
 * into. A truth file is tab-separated: compound id, SMILES, the experimental pKa values joined by ';' (any
 * further columns are ignored; a header line starting with {@code id<TAB>} and blank lines are skipped).
 */
public final class TruthFile {

    private TruthFile() {
    }

    /** The observations of a truth file, each with its values in ascending order. */
    public static List<Observation> read(Path p) throws IOException {
        List<Observation> out = new ArrayList<>();
        for (String line : Files.readAllLines(p, StandardCharsets.UTF_8)) {
            if (line.isBlank() || line.startsWith("id\t")) {
                continue;
            }
            String[] f = line.split("\t");
            if (f.length < 3) {
                continue;
            }
            List<Double> v = new ArrayList<>();
            for (String x : f[2].split(";")) {
                if (!x.isBlank()) {
                    v.add(Double.parseDouble(x.strip()));
                }
            }
            v.sort(Double::compare);
            out.add(new Observation(f[0], f[1], v));
        }
        return out;
    }

    /**
     * Fold membership by a stable hash of the compound id: whether {@code id} is in fold {@code k} of {@code n}
     * ({@code --fold K/N}: accuracy scores fold K, calibration leaves it out).
     */
    public static boolean inFold(String id, int k, int n) {
        int h = 0;
        for (char c : id.toCharArray()) {
            h = 31 * h + c;
        }
        return Math.floorMod(h * 0x9E3779B1, n) == k;
    }
}
