package ionmark.pipeline.bench;

import java.io.BufferedWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.io.SDFWriter;
import org.openscience.cdk.silent.SilentChemObjectBuilder;
import org.openscience.cdk.smiles.SmilesParser;

/**
 * {@code SdfCopies IN.tsv N OUT.sdf}: an SDF of N structures written by CDK from the id/smiles columns of a
 * TSV, repeated with distinct titles ({@code id}, {@code id-2} …) until N; unparsable rows are skipped.
 */
public final class SdfCopies {
    private SdfCopies() {
    }

    public static void main(String[] args) throws Exception {
        List<String[]> rows = new ArrayList<>();
        for (String line : Files.readAllLines(Path.of(args[0]), StandardCharsets.UTF_8)) {
            String[] f = line.split("\t");
            if (f.length >= 2 && !f[0].equals("id")) {
                rows.add(f);
            }
        }
        int n = Integer.parseInt(args[1]);
        SmilesParser sp = new SmilesParser(SilentChemObjectBuilder.getInstance());
        int written = 0;
        try (BufferedWriter w = Files.newBufferedWriter(Path.of(args[2]), StandardCharsets.UTF_8);
                SDFWriter out = new SDFWriter(w)) {
            for (int round = 1; written < n; round++) {
                for (String[] r : rows) {
                    if (written == n) {
                        break;
                    }
                    IAtomContainer m;
                    try {
                        m = sp.parseSmiles(r[1]);
                    } catch (Exception e) {
                        continue;
                    }
                    m.setTitle(round == 1 ? r[0] : r[0] + "-" + round);
                    out.write(m);
                    written++;
                }
            }
        }
        System.err.println(written + " structures written to " + args[2]);
    }
}
