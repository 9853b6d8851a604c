package ionmark.pipeline;

import org.apache.beam.sdk.metrics.Counter;
import org.apache.beam.sdk.metrics.Metrics;
import org.apache.beam.sdk.transforms.DoFn;
import org.apache.beam.sdk.values.TupleTag;

import ionmark.notebook.api.EntryAnnotation;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Speciation;

/**
 * Annotates each structure with both tables at each of its pH values and emits what changed: entries pinned
 * to a table version to {@link #PINNED}, the rest to {@link #CHANGED}. A structure without a pH cannot change
 * its charge state and is only counted. A Markdown entry is read by the notebook's reader with each table
 * ({@link EntryRecords}), so an entry is reported when its cards would read differently.
 */
final class ImpactFn extends DoFn<Chunk, String> {
    private static final long serialVersionUID = 1L;
    static final TupleTag<String> CHANGED = new TupleTag<>() {
        private static final long serialVersionUID = 1L;
    };
    static final TupleTag<String> PINNED = new TupleTag<>() {
        private static final long serialVersionUID = 1L;
    };
    /** Every comparison, changed or not, pinned or not (with {@code --parquet}: the Parquet rows). */
    static final TupleTag<String> ROWS = new TupleTag<>() {
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
    private final boolean rows;
    private transient Speciation b;
    private transient Speciation a;
    private transient EntryAnnotation nb;
    private transient EntryAnnotation na;

    /** @param rows also emit every comparison to {@link #ROWS} */
    ImpactFn(EngineSpec before, EngineSpec after, double threshold, double temperature, double ionicStrength,
            boolean rows) {
        this.rows = rows;
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
        nb = Engines.notebook(before);
        na = Engines.notebook(after);
    }

    @ProcessElement
    public void process(@Element Chunk chunk, MultiOutputReceiver out) {
        for (Structure s : chunk.structures()) {
            compare(s, out);
        }
    }

    private void compare(Structure s, MultiOutputReceiver out) {
        if (s.entry()) {
            entry(s, out);
            return;
        }
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
            emit(s, ph, x, y, out);
        }
    }

    /**
     * Both tables' readings of an entry, record by record: the structures and the conditions the notebook
     * finds do not depend on the table, so the two lists pair up in order.
     */
    private void entry(Structure s, MultiOutputReceiver out) {
        EntryRecords.Read x = EntryRecords.read(nb, b, s);
        EntryRecords.Read y = EntryRecords.read(na, a, s);
        if (x.items().size() != y.items().size()) {
            throw new IllegalStateException("entry " + s.id() + " read differently with the two tables");
        }
        for (int i = 0; i < x.items().size(); i++) {
            EntryRecords.Item bi = x.items().get(i);
            EntryRecords.Item ai = y.items().get(i);
            Double ph = bi.analysis().conditions().ph();
            if (bi.analysis().ok() && ph == null) {
                noPh.inc();
                continue;
            }
            compared.inc();
            if (!bi.analysis().ok() && !ai.analysis().ok()) {
                errors.inc();
            }
            Structure one = new Structure(s.source(), bi.id(), bi.analysis().input(), null, s.phs(), x.pinnedVersion(),
                    false);
            emit(one, ph == null ? Double.NaN : ph, bi.analysis(), ai.analysis(), out);
        }
    }

    private void emit(Structure s, double ph, Analysis x, Analysis y, MultiOutputReceiver out) {
        com.fasterxml.jackson.databind.node.ObjectNode o = Impact.row(s, ph, x, y, threshold);
        String json = o.toString();
        if (rows) {
            out.get(ROWS).output(json);
        }
        if (o.path("changed").isEmpty()) {
            return;
        }
        if (s.pinnedVersion() > 0) {
            pinnedChanged.inc();
            out.get(PINNED).output(json);
        } else {
            changed.inc();
            out.get(CHANGED).output(json);
        }
    }
}
