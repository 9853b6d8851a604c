package ionmark.acidity.internal;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import com.fasterxml.jackson.databind.ObjectMapper;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.Problem;
import ionmark.acidity.api.ValidationReport;

/**
 * Command line for the two table files (run from the project root):
 *
 * <pre>
 * mvn -B -q -o -pl bundles/acidity compile exec:java -Dexec.args="split --base OLD-BASE.json --calibrated TABLE.json"
 * mvn -B -q -o -pl bundles/acidity compile exec:java -Dexec.args="build --out shipped.json"
 * mvn -B -q -o -pl bundles/acidity compile exec:java -Dexec.args="base --out base.json"
 * </pre>
 *
 * {@code split} writes {@code bundles/acidity/table/curated.json} and {@code fitted.json} from a base table
 * (one-file or curated format) and a calibrated one-file table, keeping the fragments the curated file
 * already names, and refuses when the two files would not give the calibrated table back.
 * {@code build} writes the shipped table (one file), {@code base} the curated base alone as one file.
 */
public final class TableFiles {
    static final Path DIR = Path.of("bundles/acidity/table");
    static final String CURATED_FILE = "curated.json";
    static final String FITTED_FILE = "fitted.json";

    private TableFiles() {
    }

    public static void main(String[] args) throws IOException {
        Map<String, String> opt = new LinkedHashMap<>();
        for (int i = 1; i + 1 < args.length; i += 2) {
            opt.put(args[i], args[i + 1]);
        }
        String cmd = args.length == 0 ? "" : args[0];
        Path dir = Path.of(opt.getOrDefault("--dir", root().resolve(DIR).toString()));
        switch (cmd) {
            case "split" -> {
                AcidityTable base = table(Path.of(required(opt, "--base")));
                AcidityTable cal = table(Path.of(required(opt, "--calibrated")));
                Map<String, String> fragments = new LinkedHashMap<>(TableSplitter.DEFAULT_FRAGMENTS);
                Path existing = dir.resolve(CURATED_FILE);
                if (Files.isRegularFile(existing)) {
                    fragments.putAll(SplitFormat.fragments(new ObjectMapper().readTree(Files.readString(existing))
                            .path("fragments"), new ArrayList<>()));
                }
                TableSplitter.Split s = TableSplitter.split(base, cal, fragments);
                Files.createDirectories(dir);
                Files.writeString(dir.resolve(CURATED_FILE), s.curated(), StandardCharsets.UTF_8);
                Files.writeString(dir.resolve(FITTED_FILE), s.fitted(), StandardCharsets.UTF_8);
                System.out.println("wrote " + dir.resolve(CURATED_FILE) + " and " + dir.resolve(FITTED_FILE)
                        + "; built again they give table v" + cal.version().number() + " (fingerprint "
                        + TableSplitter.fingerprint(cal).substring(0, 12) + ")");
            }
            case "build", "base" -> {
                List<Problem> problems = new ArrayList<>();
                String curated = Files.readString(dir.resolve(CURATED_FILE));
                String fitted = cmd.equals("build") ? Files.readString(dir.resolve(FITTED_FILE)) : null;
                AcidityTable t = TableSplitter.build(curated, fitted, problems);
                problems.stream().filter(p -> p.severity() == Problem.Severity.ERROR).forEach(System.err::println);
                if (t == null) {
                    System.exit(1);
                }
                Files.writeString(Path.of(required(opt, "--out")), TableWriter.write(t), StandardCharsets.UTF_8);
            }
            default -> {
                System.err.println("usage: split --base FILE --calibrated FILE [--dir DIR] | build --out FILE | "
                        + "base --out FILE");
                System.exit(2);
            }
        }
    }

    /** exec:java runs in the module directory; the paths in the docs are from the project root. */
    private static Path root() {
        Path here = Path.of("").toAbsolutePath();
        Path bundles = here.getParent();
        Path module = bundles == null ? null : bundles.getParent();
        return Files.isDirectory(here.resolve("bundles")) || module == null ? here : module;
    }

    private static String required(Map<String, String> opt, String key) {
        String v = opt.get(key);
        if (v == null) {
            throw new IllegalArgumentException(key + " is required");
        }
        return v;
    }

    private static AcidityTable table(Path p) throws IOException {
        Path file = p.isAbsolute() || Files.exists(p) ? p : root().resolve(p);
        ValidationReport r = TableValidator.validate(Files.readString(file));
        return r.table().orElseThrow(() -> new IllegalArgumentException(file + " does not validate: " + r.errors()));
    }
}
