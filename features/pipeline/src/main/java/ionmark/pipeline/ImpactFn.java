package ionmark.pipeline;

import org.apache.beam.sdk.metrics.Counter;
import org.apache.beam.sdk.metrics.Metrics;
import org.apache.beam.sdk.transforms.DoFn;
import org.apache.beam.sdk.values.TupleTag;

import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Speciation;

/**
 * Annotates each structure with both tables at each of its pH values and emits what changed: entries pinned
 * to a table version to {@link #PINNED}, the rest to {@link #CHANGED}. A structure without a pH cannot change
 * its charge state and is only counted.
 */
final class ImpactFn extends DoFn<Chunk, String> {
    private static final long serialVersionUID = 1L;
    static final TupleTag<String> CHANGED = new TupleTag<>() {
        private static final long serialVersionUID = 1L;
    };
    static final TupleTag<String> PINNED = new TupleTag<>() {
        private static final long serialVersionUID = 1L;
    };
    private final Counter compared = Metrics.counter(ReadFiles.NS, "records");
    private final Counter changed = Metrics.counter(ReadFiles.NS, "changed");
    private final Counter pinnedChanged = Metrics.counter(ReadFiles.NS, "changed-pinned");
    private final Counter noPh = Metrics.counter(ReadFiles.NS, "no-ph");
    private final Counter errors = Metrics.counter(ReadFiles.NS, "errors");
    private final EngineSpec before;
    private final EngineSpec after;
    private final double threshold;
    private final double temperature;
    private final double ionicStrength;
    private transient Speciation b;
    private transient Speciation a;

    ImpactFn(EngineSpec before, EngineSpec after, double threshold, double temperature, double ionicStrength) {
        this.before = before;
        this.after = after;
        this.threshold = threshold;
        this.temperature = temperature;
        this.ionicStrength = ionicStrength;
    }

    @Setup
    public void setup() {
        b = Engines.get(before);
        a = Engines.get(after);
    }

    @ProcessElement
    public void process(@Element Chunk chunk, MultiOutputReceiver out) {
        for (Structure s : chunk.structures()) {
            compare(s, out);
        }
    }

    private void compare(Structure s, MultiOutputReceiver out) {
        if (s.phs().isEmpty()) {
            noPh.inc();
            return;
        }
        for (double ph : s.phs()) {
            Conditions c = new Conditions(ph, temperature, ionicStrength);
            Analysis x;
            Analysis y;
            if (s.error() != null) {
                x = Analysis.failed(s.text(), c, "", s.error());
                y = x;
            } else {
                x = b.screen(s.text(), c);
                y = a.screen(s.text(), c);
            }
            compared.inc();
            if (!x.ok() && !y.ok()) {
                errors.inc();
            }
            Impact.compare(s, ph, x, y, threshold).ifPresent(o -> {
                if (s.pinnedVersion() > 0) {
                    pinnedChanged.inc();
                    out.get(PINNED).output(o.toString());
                } else {
                    changed.inc();
                    out.get(CHANGED).output(o.toString());
                }
            });
        }
    }
}
