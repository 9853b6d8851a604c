package ionmark.pipeline;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.apache.beam.sdk.Pipeline;
import org.apache.beam.sdk.io.FileIO;
import org.apache.beam.sdk.io.TextIO;
import org.apache.beam.sdk.transforms.Create;
import org.apache.beam.sdk.transforms.ParDo;
import org.apache.beam.sdk.transforms.Reshuffle;
import org.apache.beam.sdk.values.PCollection;
import org.apache.beam.sdk.values.PCollectionTuple;
import org.apache.beam.sdk.values.TupleTagList;

import ionmark.speciation.api.Conditions;

/** The two jobs as Beam graphs: read → (reshuffle) → annotate or compare → JSON Lines. */
public final class Jobs {
    private Jobs() {
    }

    /**
     * Annotate: {@code batch}'s record per structure and pH, in {@code out/records-*.jsonl}; with
     * {@code --parquet} the same records as rows of {@code out/records-*.parquet}.
     */
    public static void annotate(Pipeline p, IonmarkOptions o) throws IOException {
        EngineSpec spec = EngineSpec.of(o.getTable(), o.getMaxHeavyAtoms(), o.getTimeoutMillis());
        check(o);
        PCollection<String> records = structures(p, o)
                .apply("Annotate", ParDo.of(new AnnotateFn(spec, o.getTemp(), o.getIonic(), o.getBrief())));
        records.apply("WriteJsonLines", write(o, "records"));
        if (o.getParquet()) {
            FileIO.Write<Void, String> w = FileIO.<String>write().via(new ParquetSink())
                    .to(o.getOut().replaceAll("/+$", "")).withPrefix("records").withSuffix(".parquet");
            records.apply("WriteParquet", o.getShards() > 0 ? w.withNumShards(o.getShards()) : w);
        }
    }

    /** Impact: what changes between two tables, in {@code out/impact-*.jsonl} and {@code out/impact-pinned-*.jsonl}. */
    public static void impact(Pipeline p, IonmarkOptions o) throws IOException {
        if (o.getBefore().isBlank() || o.getAfter().isBlank()) {
            throw new IllegalArgumentException("impact needs --before=TABLE and --after=TABLE (a file or 'shipped')");
        }
        EngineSpec before = EngineSpec.of(o.getBefore(), o.getMaxHeavyAtoms(), o.getTimeoutMillis());
        EngineSpec after = EngineSpec.of(o.getAfter(), o.getMaxHeavyAtoms(), o.getTimeoutMillis());
        check(o);
        PCollectionTuple out = structures(p, o).apply("Compare", ParDo.of(new ImpactFn(before, after,
                o.getThreshold(), o.getTemp(), o.getIonic())).withOutputTags(ImpactFn.CHANGED,
                        TupleTagList.of(ImpactFn.PINNED)));
        out.get(ImpactFn.CHANGED).apply("WriteChanged", write(o, "impact"));
        out.get(ImpactFn.PINNED).apply("WritePinned", write(o, "impact-pinned"));
    }

    private static PCollection<Chunk> structures(Pipeline p, IonmarkOptions o) {
        return p.apply("Patterns", Create.of(patterns(o.getIn())))
                .apply("Match", FileIO.matchAll())
                .apply("Open", FileIO.readMatches())
                .apply("Read", ParDo.of(new ReadFiles(phs(o.getPh()))))
                // one file holds many structures: spread its chunks over the workers
                .apply("Spread", Reshuffle.<Chunk>viaRandomKey().withNumBuckets(buckets(o)));
    }

    /**
     * The direct runner's write groups the records by shard, and its grouping copies every shard's records so
     * far (through their coder) for each bundle that arrives: each bucket of the spread is one such bundle, so
     * one bucket per thread (about 4 CPU s less than four per thread on 10,000 brief records). Other runners
     * spread over random keys (null).
     */
    static Integer buckets(IonmarkOptions o) {
        if (o.getBuckets() > 0) {
            return o.getBuckets();
        }
        if (!o.getRunner().getSimpleName().equals("DirectRunner")) {
            return null;
        }
        return Math.max(1, o.as(org.apache.beam.runners.direct.DirectOptions.class).getTargetParallelism());
    }

    private static TextIO.Write write(IonmarkOptions o, String prefix) {
        TextIO.Write w = TextIO.write().to(o.getOut().replaceAll("/+$", "") + "/" + prefix).withSuffix(".jsonl");
        return o.getShards() > 0 ? w.withNumShards(o.getShards()) : w;
    }

    /** Checks the conditions once on the launcher, so a bad value stops the run before it starts. */
    private static void check(IonmarkOptions o) {
        for (double ph : phs(o.getPh())) {
            new Conditions(ph, o.getTemp(), o.getIonic());
        }
        new Conditions(null, o.getTemp(), o.getIonic());
    }

    /** A folder means its Markdown entries; otherwise comma-separated paths or globs. */
    static List<String> patterns(String in) {
        List<String> out = new ArrayList<>();
        for (String s : in.split(",")) {
            String t = s.strip();
            if (t.isEmpty()) {
                continue;
            }
            out.add(Files.isDirectory(Path.of(t)) ? t.replaceAll("/+$", "") + "/*.md" : t);
        }
        if (out.isEmpty()) {
            throw new IllegalArgumentException("--in names no file");
        }
        return out;
    }

    static List<Double> phs(String list) {
        List<Double> out = new ArrayList<>();
        for (String s : list.split(",")) {
            if (!s.isBlank()) {
                try {
                    out.add(Double.parseDouble(s.strip()));
                } catch (NumberFormatException e) {
                    throw new IllegalArgumentException("--ph takes numbers separated by commas, not '" + s.strip() + "'");
                }
            }
        }
        return out;
    }
}
