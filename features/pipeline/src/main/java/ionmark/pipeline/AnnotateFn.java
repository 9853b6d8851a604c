package ionmark.pipeline;

import java.util.ArrayList;
import java.util.List;

import org.apache.beam.sdk.metrics.Counter;
import org.apache.beam.sdk.metrics.Distribution;
import org.apache.beam.sdk.metrics.Metrics;
import org.apache.beam.sdk.transforms.DoFn;

import ionmark.console.internal.AnalysisJson;
import ionmark.notebook.api.EntryAnnotation;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Speciation;

/**
 * Annotates one structure at each of its pH values and writes {@code batch}'s JSON record for each. The engine
 * comes from {@link Engines} in {@code @Setup}, once per worker JVM. A Markdown entry is read by the notebook's
 * own reader ({@link EntryRecords}). A failure is a record with {@code error}; the run goes on.
 */
final class AnnotateFn extends DoFn<Chunk, String> {
    private static final long serialVersionUID = 1L;
    private final Counter records = Metrics.counter(ReadFiles.NS, "records");
    private final Counter errors = Metrics.counter(ReadFiles.NS, "errors");
    private final Distribution analyseMicros = Metrics.distribution(ReadFiles.NS, "analyse-us");
    private final Distribution encodeMicros = Metrics.distribution(ReadFiles.NS, "encode-us");
    private final Counter structures = Metrics.counter(ReadFiles.NS, "structures");
    private final Distribution entryMicros = Metrics.distribution(ReadFiles.NS, "entry-us");
    private final EngineSpec spec;
    private final double temperature;
    private final double ionicStrength;
    private final boolean brief;
    private transient Speciation speciation;
    private transient EntryAnnotation notebook;

    AnnotateFn(EngineSpec spec, double temperature, double ionicStrength, boolean brief) {
        this.spec = spec;
        this.temperature = temperature;
        this.ionicStrength = ionicStrength;
        this.brief = brief;
    }

    @Setup
    public void setup() {
        speciation = Engines.get(spec);
        notebook = Engines.notebook(spec);
    }

    @ProcessElement
    public void process(@Element Chunk chunk, OutputReceiver<String> out) {
        for (Structure s : chunk.structures()) {
            annotate(s, out);
        }
    }

    private void annotate(Structure s, OutputReceiver<String> out) {
        if (s.entry()) {
            entry(s, out);
            return;
        }
        for (Conditions c : conditions(s, temperature, ionicStrength)) {
            long t0 = System.nanoTime();
            Analysis a;
            try {
                a = s.error() != null ? Analysis.failed(s.text(), c, "", s.error())
                        : brief ? speciation.screen(s.text(), c) : speciation.analyse(s.text(), c);
            } catch (RuntimeException e) {
                a = Analysis.failed(s.text(), c, "", "internal error: " + e);
            }
            analyseMicros.update((System.nanoTime() - t0) / 1000);
            write(s.id(), s.text(), a, out);
        }
    }

    /** Every structure of an entry as the notebook reads it; the notebook's analyses are the records. */
    private void entry(Structure s, OutputReceiver<String> out) {
        long t0 = System.nanoTime();
        EntryRecords.Read r;
        try {
            r = EntryRecords.read(notebook, speciation, s);
        } catch (RuntimeException e) {
            write(s.id(), s.text(), Analysis.failed("", new Conditions(null, temperature, ionicStrength), "",
                    "internal error reading entry " + s.id() + ": " + e), out);
            return;
        }
        entryMicros.update((System.nanoTime() - t0) / 1000);
        structures.inc(r.structures());
        for (EntryRecords.Item it : r.items()) {
            write(it.id(), it.analysis().input(), it.analysis(), out);
        }
    }

    private void write(String id, String input, Analysis analysis, OutputReceiver<String> out) {
        long t1 = System.nanoTime();
        Analysis a = analysis;
        String json;
        try {
            json = AnalysisJson.of(id, a, brief).toString();
        } catch (RuntimeException e) {
            a = Analysis.failed(input, a.conditions(), "", "internal error: " + e);
            json = AnalysisJson.of(id, a, brief).toString();
        }
        encodeMicros.update((System.nanoTime() - t1) / 1000);
        records.inc();
        if (!a.ok()) {
            errors.inc();
        }
        out.output(json);
    }

    /** One set of conditions per pH, or one without pH. */
    static List<Conditions> conditions(Structure s, double temperature, double ionicStrength) {
        List<Conditions> out = new ArrayList<>();
        if (s.phs().isEmpty()) {
            out.add(new Conditions(null, temperature, ionicStrength));
        }
        for (double ph : s.phs()) {
            out.add(new Conditions(ph, temperature, ionicStrength));
        }
        return out;
    }
}
