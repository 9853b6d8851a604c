package ionmark.pipeline;

import java.util.List;

import org.apache.beam.sdk.io.FileIO;
import org.apache.beam.sdk.metrics.Counter;
import org.apache.beam.sdk.metrics.Distribution;
import org.apache.beam.sdk.metrics.Metrics;
import org.apache.beam.sdk.transforms.DoFn;

import ionmark.console.internal.Records;

/**
 * Turns each matched file into its structures by {@code batch}'s own rules ({@link Records}), so ids and
 * reading errors are the same; a Markdown entry ({@code .md}) travels whole, and the annotating step reads it
 * with the notebook's reader ({@link EntryRecords}). A file that cannot be read becomes one record with the
 * error.
 */
final class ReadFiles extends DoFn<FileIO.ReadableFile, Chunk> {
    private static final long serialVersionUID = 1L;
    static final String NS = "ionmark";
    private final Counter files = Metrics.counter(NS, "files");
    private final Counter structures = Metrics.counter(NS, "structures");
    private final Counter entries = Metrics.counter(NS, "entries");
    private final Distribution readMicros = Metrics.distribution(NS, "read-us-per-file");
    private final List<Double> phs;

    /** @param phs the pH values for structures that state none (empty: no pH) */
    ReadFiles(List<Double> phs) {
        this.phs = List.copyOf(phs);
    }

    @ProcessElement
    public void process(@Element FileIO.ReadableFile file, OutputReceiver<Chunk> receiver) {
        long t0 = System.nanoTime();
        String name = file.getMetadata().resourceId().toString();
        files.inc();
        List<Structure> chunk = new java.util.ArrayList<>();
        java.util.function.Consumer<Structure> out = x -> {
            chunk.add(x);
            if (chunk.size() == Chunk.SIZE) {
                receiver.output(new Chunk(chunk));
                chunk.clear();
            }
        };
        String text;
        try {
            text = file.readFullyAsUTF8String();
        } catch (Exception e) {
            receiver.output(new Chunk(List.of(Structure.of(name, name, "", "cannot read " + name + ": "
                    + e.getMessage(), phs))));
            return;
        }
        int n = 0;
        if (name.endsWith(".md")) {
            String entry = file.getMetadata().resourceId().getFilename().replaceFirst("\\.md$", "");
            out.accept(Structure.entry(name, entry, text, phs));
            entries.inc();
        } else {
            for (Records.Item it : Records.parse(text)) {
                out.accept(Structure.of(name, it.id(), it.structure(), it.error(), phs));
                n++;
            }
        }
        if (!chunk.isEmpty()) {
            receiver.output(new Chunk(chunk));
        }
        structures.inc(n);
        readMicros.update((System.nanoTime() - t0) / 1000);
    }
}
