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
import org.apache.beam.sdk.transforms.PTransform;
import org.apache.beam.sdk.transforms.ParDo;
import org.apache.beam.sdk.transforms.Reshuffle;
import org.apache.beam.sdk.values.PCollection;
import org.apache.beam.sdk.values.PCollectionTuple;
import org.apache.beam.sdk.values.PDone;
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
    public static List<BundleFiles> annotate(Pipeline p, IonmarkOptions o) throws IOException {
        List<BundleFiles> files = new ArrayList<>();
        EngineSpec spec = EngineSpec.of(o.getTable(), o.getMaxHeavyAtoms(), o.getTimeoutMillis());
        check(o);
        PCollection<String> records = structures(p, o)
                .apply("Annotate", ParDo.of(new AnnotateFn(spec, o.getTemp(), o.getIonic(), o.getBrief())));
        records.apply("WriteJsonLines", write(o, "records", files));
        if (o.getParquet()) {
            records.apply("WriteParquet", parquet(o, "records", ParquetSink.Layout.RECORDS, files));
        }
        return files;
    }

    /** Impact: what changes between two tables, in {@code out/impact-*.jsonl} and {@code out/impact-pinned-*.jsonl}. */
    public static List<BundleFiles> impact(Pipeline p, IonmarkOptions o) throws IOException {
        List<BundleFiles> files = new ArrayList<>();
        if (o.getBefore().isBlank() || o.getAfter().isBlank()) {
            throw new IllegalArgumentException("impact needs --before=TABLE and --after=TABLE (a file or 'shipped')");
        }
        EngineSpec before = EngineSpec.of(o.getBefore(), o.getMaxHeavyAtoms(), o.getTimeoutMillis());
        EngineSpec after = EngineSpec.of(o.getAfter(), o.getMaxHeavyAtoms(), o.getTimeoutMillis());
        check(o);
        PCollectionTuple out = structures(p, o).apply("Compare", ParDo.of(new ImpactFn(before, after,
                o.getThreshold(), o.getTemp(), o.getIonic(), o.getParquet())).withOutputTags(ImpactFn.CHANGED,
                        TupleTagList.of(ImpactFn.PINNED).and(ImpactFn.ROWS)));
        out.get(ImpactFn.CHANGED).apply("WriteChanged", write(o, "impact", files));
        out.get(ImpactFn.PINNED).apply("WritePinned", write(o, "impact-pinned", files));
        if (o.getParquet()) {
            out.get(ImpactFn.ROWS).apply("WriteParquet", parquet(o, "impact", ParquetSink.Layout.IMPACT, files));
        }
        return files;
    }

    private static PCollection<Chunk> structures(Pipeline p, IonmarkOptions o) {
        return p.apply("Patterns", Create.of(patterns(o.getIn())))
                .apply("Match", FileIO.matchAll())
                .apply("Open", FileIO.readMatches())
                .apply("Read", ParDo.of(new ReadFiles(phs(o.getPh())))).setCoder(ChunkCoder.of())
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

    /**
     * JSON Lines: on the direct runner each bundle straight to its file ({@link BundleFiles}, unless
     * {@code --shards} asks for a number of files; added to {@code files}, to be finished after the run),
     * elsewhere {@code TextIO}.
     */
    static PTransform<PCollection<String>, PDone> write(IonmarkOptions o, String prefix, List<BundleFiles> files) {
        String dir = o.getOut().replaceAll("/+$", "");
        if (bundleFiles(o)) {
            BundleFiles f = new BundleFiles(dir, prefix, ".jsonl", TextIO::sink);
            files.add(f);
            return f;
        }
        TextIO.Write w = TextIO.write().to(dir + "/" + prefix).withSuffix(".jsonl");
        return o.getShards() > 0 ? w.withNumShards(o.getShards()) : w;
    }

    /** Parquet rows ({@link ParquetSink}), written like {@link #write}. */
    static PTransform<PCollection<String>, ?> parquet(IonmarkOptions o, String prefix, ParquetSink.Layout layout,
            List<BundleFiles> files) {
        String dir = o.getOut().replaceAll("/+$", "");
        if (bundleFiles(o)) {
            BundleFiles f = new BundleFiles(dir, prefix, ".parquet", () -> new ParquetSink(layout));
            files.add(f);
            return f;
        }
        FileIO.Write<Void, String> w = FileIO.<String>write().via(new ParquetSink(layout)).to(dir).withPrefix(prefix)
                .withSuffix(".parquet");
        return o.getShards() > 0 ? w.withNumShards(o.getShards()) : w;
    }

    private static boolean bundleFiles(IonmarkOptions o) {
        return o.getShards() == 0 && o.getRunner().getSimpleName().equals("DirectRunner");
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
