package ionmark.pipeline;

import java.util.ArrayList;
import java.util.List;

import org.apache.beam.sdk.metrics.Counter;
import org.apache.beam.sdk.metrics.Distribution;
import org.apache.beam.sdk.metrics.Metrics;
import org.apache.beam.sdk.transforms.DoFn;

import ionmark.console.internal.AnalysisJson;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Speciation;

/**
 * Annotates one structure at each of its pH values and writes {@code batch}'s JSON record for each. The engine
 * comes from {@link Engines} in {@code @Setup}, once per worker JVM. A failure is a record with {@code error};
 * the run goes on.
 */
final class AnnotateFn extends DoFn<Chunk, String> {
    private static final long serialVersionUID = 1L;
    private final Counter records = Metrics.counter(ReadFiles.NS, "records");
    private final Counter errors = Metrics.counter(ReadFiles.NS, "errors");
    private final Distribution analyseMicros = Metrics.distribution(ReadFiles.NS, "analyse-us");
    private final Distribution encodeMicros = Metrics.distribution(ReadFiles.NS, "encode-us");
    private final EngineSpec spec;
    private final double temperature;
    private final double ionicStrength;
    private final boolean brief;
    private transient Speciation speciation;

    AnnotateFn(EngineSpec spec, double temperature, double ionicStrength, boolean brief) {
        this.spec = spec;
        this.temperature = temperature;
        this.ionicStrength = ionicStrength;
        this.brief = brief;
    }

    @Setup
    public void setup() {
        speciation = Engines.get(spec);
    }

    @ProcessElement
    public void process(@Element Chunk chunk, OutputReceiver<String> out) {
        for (Structure s : chunk.structures()) {
            annotate(s, out);
        }
    }

    private void annotate(Structure s, OutputReceiver<String> out) {
        for (Conditions c : conditions(s, temperature, ionicStrength)) {
            long t0 = System.nanoTime();
            Analysis a;
            try {
                a = s.error() != null ? Analysis.failed(s.text(), c, "", s.error())
                        : brief ? speciation.screen(s.text(), c) : speciation.analyse(s.text(), c);
            } catch (RuntimeException e) {
                a = Analysis.failed(s.text(), c, "", "internal error: " + e);
            }
            long t1 = System.nanoTime();
            String json;
            try {
                json = AnalysisJson.of(s.id(), a, brief).toString();
            } catch (RuntimeException e) {
                a = Analysis.failed(s.text(), c, "", "internal error: " + e);
                json = AnalysisJson.of(s.id(), a, brief).toString();
            }
            analyseMicros.update((t1 - t0) / 1000);
            encodeMicros.update((System.nanoTime() - t1) / 1000);
            records.inc();
            if (!a.ok()) {
                errors.inc();
            }
            out.output(json);
        }
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
