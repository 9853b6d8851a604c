package ionmark.pipeline;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.PrintStream;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Stream;

import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.io.SDFWriter;
import org.openscience.cdk.silent.SilentChemObjectBuilder;
import org.openscience.cdk.smiles.SmilesParser;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import ionmark.acidity.internal.TableSnapshotService;
import ionmark.console.internal.Cli;
import ionmark.speciation.internal.SpeciationService;

/** Inputs built from the reference set shipped in the speciation bundle, and the two ways to annotate them. */
final class Fixtures {
    static final ObjectMapper JSON = new ObjectMapper();
    static final int TIMEOUT = 60_000;

    private Fixtures() {
    }

    /** name → SMILES of the reference set (handbook compounds; see the file's sources). */
    static Map<String, String> referenceSet() throws IOException {
        Map<String, String> out = new java.util.LinkedHashMap<>();
        try (InputStream in = SpeciationService.class.getResourceAsStream("/ionmark/speciation/reference-set.tsv")) {
            for (String line : new String(in.readAllBytes(), StandardCharsets.UTF_8).split("\n")) {
                if (!line.startsWith("#") && !line.isBlank()) {
                    String[] f = line.split("\t");
                    out.put(f[0], f[1]);
                }
            }
        }
        return out;
    }

    /** A TSV in batch's id/smiles form, with two rows that must come out as error records. */
    static Path tsv(Path dir) throws IOException {
        StringBuilder sb = new StringBuilder("id\tsmiles\n");
        referenceSet().forEach((name, smi) -> sb.append(name).append('\t').append(smi).append('\n'));
        sb.append("not-a-smiles\tC1CC(\n").append("no-smiles\n");
        return Files.writeString(dir.resolve("reference.tsv"), sb.toString());
    }

    /** An SDF written by CDK from the first {@code n} reference compounds (title line = name). */
    static Path sdf(Path dir, int n) throws Exception {
        SmilesParser sp = new SmilesParser(SilentChemObjectBuilder.getInstance());
        StringWriter w = new StringWriter();
        try (SDFWriter out = new SDFWriter(w)) {
            int k = 0;
            for (Map.Entry<String, String> e : referenceSet().entrySet()) {
                if (k++ == n) {
                    break;
                }
                IAtomContainer m = sp.parseSmiles(e.getValue());
                m.setTitle(e.getKey());
                out.write(m);
            }
        }
        return Files.writeString(dir.resolve("reference.sdf"), w.toString());
    }

    /** {@code ionmark batch}, run in-process on the shipped table: one JSON text per line. */
    static List<String> batch(Path in, String... extra) {
        TableSnapshotService tables = new TableSnapshotService(null);
        SpeciationService sp = new SpeciationService(tables.current(), EngineSpec.MAX_HEAVY_ATOMS, TIMEOUT);
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        List<String> args = new ArrayList<>(List.of("batch", "--in", in.toString()));
        args.addAll(List.of(extra));
        int rc = new Cli(sp, tables, null, null, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(new ByteArrayOutputStream(), true, StandardCharsets.UTF_8)).run(args);
        if (rc != 0) {
            throw new IllegalStateException("batch exited " + rc);
        }
        return out.toString(StandardCharsets.UTF_8).lines().toList();
    }

    /** Runs the pipeline and returns every line of the output files starting with {@code prefix}. */
    static List<String> pipeline(Path out, String prefix, String... args) throws IOException {
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int rc = Main.run(args, new PrintStream(err, true, StandardCharsets.UTF_8));
        if (rc != 0) {
            throw new IllegalStateException("pipeline exited " + rc + ": " + err.toString(StandardCharsets.UTF_8));
        }
        return lines(out, prefix);
    }

    /** Every line of the output files {@code prefix-N-of-M.jsonl} in {@code out}. */
    static List<String> lines(Path out, String prefix) throws IOException {
        List<String> lines = new ArrayList<>();
        try (Stream<Path> s = Files.list(out)) {
            for (Path p : s.filter(p -> p.getFileName().toString().matches(java.util.regex.Pattern.quote(prefix)
                    + "-\\d+-of-\\d+\\.jsonl")).sorted().toList()) {
                lines.addAll(Files.readAllLines(p));
            }
        }
        return lines;
    }

    /** Records keyed by id and pH, parsed, so that the order of the output does not matter. */
    static Map<String, JsonNode> byKey(List<String> lines) throws IOException {
        Map<String, JsonNode> out = new TreeMap<>();
        for (String l : lines) {
            JsonNode n = JSON.readTree(l);
            String key = n.path("id").asText() + " @ " + n.path("conditions").path("pH").asText("none");
            if (out.put(key, n) != null) {
                throw new IllegalStateException("two records for " + key);
            }
        }
        return out;
    }
}
