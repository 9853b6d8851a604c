package ionmark.console.internal;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

import org.osgi.framework.Bundle;
import org.osgi.framework.FrameworkUtil;
import org.osgi.util.tracker.ServiceTracker;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

import ionmark.host.api.Entry;
import ionmark.host.api.MarkdownEntries;
import ionmark.notebook.api.AnnotatedEntry;
import ionmark.notebook.api.AnnotatedStructure;
import ionmark.notebook.api.ConditionsUsed;
import ionmark.notebook.api.EntryAnnotation;
import ionmark.notebook.api.Partition;
import ionmark.notebook.api.Separation;

/**
 * {@code ionmark annotate ENTRY.md [--format json|text]}: annotates one Markdown entry through the notebook's own
 * {@link EntryAnnotation} service (the path its cards take) and prints the result. Exit 0 when every structure
 * was annotated, 1 when one could not be (its error is in the output) or the file cannot be read, 2 usage.
 */
final class AnnotateCommand {
    static final long WAIT_MS = 20_000;

    private final EntryAnnotation annotation;
    private final PrintStream out;
    private final PrintStream err;

    AnnotateCommand(EntryAnnotation annotation, PrintStream out, PrintStream err) {
        this.annotation = annotation;
        this.out = out;
        this.err = err;
    }

    /** The command with the notebook's service from the running framework (null when it is not there in time). */
    static AnnotateCommand inFramework(PrintStream out, PrintStream err) {
        Bundle b = FrameworkUtil.getBundle(AnnotateCommand.class);
        if (b == null || b.getBundleContext() == null) {
            return new AnnotateCommand(null, out, err);
        }
        ServiceTracker<EntryAnnotation, EntryAnnotation> t = new ServiceTracker<>(b.getBundleContext(),
                EntryAnnotation.class, null);
        t.open();
        try {
            return new AnnotateCommand(t.waitForService(WAIT_MS), out, err);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return new AnnotateCommand(null, out, err);
        }
    }

    int run(List<String> raw) {
        Cli.Args a = Cli.Args.parse(raw, java.util.Set.of("--format"));
        if (a.positional().size() != 1) {
            throw new Cli.UsageException("annotate takes one Markdown entry file");
        }
        String format = a.flags().getOrDefault("--format", "json");
        if (!format.equals("text") && !format.equals("json")) {
            throw new Cli.UsageException("--format must be json or text, not '" + format + "'");
        }
        if (annotation == null) {
            err.println("ionmark: the notebook bundle is not running: cannot annotate");
            return 1;
        }
        Path p = Path.of(a.positional().get(0));
        String text;
        try {
            text = Files.readString(p, StandardCharsets.UTF_8);
        } catch (IOException e) {
            err.println("ionmark: cannot read " + p + ": " + e.getMessage());
            return 1;
        }
        String name = String.valueOf(p.getFileName()).replaceFirst("\\.md$", "");
        Entry entry = MarkdownEntries.parse(name, text);
        AnnotatedEntry r = annotation.annotate(entry);
        if (format.equals("json")) {
            out.println(json(r).toString());
        } else {
            out.print(text(r));
        }
        return r.structures().stream().allMatch(AnnotatedStructure::ok) ? 0 : 1;
    }

    static ObjectNode json(AnnotatedEntry r) {
        ObjectNode o = AnalysisJson.JSON.createObjectNode();
        o.put("entry", r.entry());
        o.put("tableVersion", r.tableVersion());
        ArrayNode arr = o.putArray("structures");
        for (AnnotatedStructure s : r.structures()) {
            ObjectNode j = arr.addObject();
            j.put("words", s.words());
            j.put("source", s.source());
            ConditionsUsed c = s.conditions();
            ObjectNode cj = j.putObject("conditions");
            if (c.ph() == null) {
                cj.putNull("pH");
            } else {
                cj.put("pH", AnalysisJson.round(c.ph()));
            }
            if (c.phHigh() != null) {
                cj.put("pHHigh", AnalysisJson.round(c.phHigh()));
            }
            cj.put("pHWords", c.phWords());
            cj.put("implied", c.implied());
            cj.put("temperatureC", AnalysisJson.round(c.temperatureC()));
            cj.put("ionicStrengthM", c.ionicStrengthM());
            c.notes().forEach(cj.putArray("notes")::add);
            if (s.analyses().isEmpty()) {
                j.putNull("analysis");
            } else {
                j.set("analysis", AnalysisJson.of(null, s.analyses().get(0)));
                if (s.analyses().size() > 1) {
                    j.set("analysisHigh", AnalysisJson.of(null, s.analyses().get(1)));
                }
            }
            if (!s.phases().isEmpty()) {
                ArrayNode ph = j.putArray("phases");
                for (Partition p : s.phases()) {
                    ObjectNode pj = ph.addObject();
                    pj.put("pH", AnalysisJson.round(p.ph()));
                    pj.put("solvent", p.solvent());
                    pj.put("ratioOrganicToWater", p.ratio());
                    pj.put("ratioAssumed", p.ratioAssumed());
                    pj.put("logD", AnalysisJson.round(p.logD()));
                    pj.put("fractionOrganic", AnalysisJson.round4(p.fractionOrganic()));
                }
            }
            if (s.error() != null) {
                j.put("error", s.error());
            }
        }
        r.warnings().forEach(o.putArray("warnings")::add);
        ArrayNode sep = o.putArray("separations");
        for (Separation s : r.separations()) {
            sep.addObject().put("extracted", s.extracted()).put("retained", s.retained())
                    .put("from", AnalysisJson.round(s.from())).put("to", AnalysisJson.round(s.to()));
        }
        return o;
    }

    static String text(AnnotatedEntry r) {
        StringBuilder sb = new StringBuilder();
        sb.append("entry ").append(r.entry()).append(", table ").append(r.tableVersion()).append('\n');
        r.warnings().forEach(w -> sb.append("warning: ").append(w).append('\n'));
        for (AnnotatedStructure s : r.structures()) {
            ConditionsUsed c = s.conditions();
            sb.append("\n").append(s.source()).append(" '").append(s.words()).append("'");
            sb.append(c.ph() == null ? ", no pH" : String.format(Locale.ROOT, ", pH %s%.2f%s from '%s'",
                    c.implied() ? "≈ " : "", c.ph(), c.phHigh() == null ? "" : String.format(Locale.ROOT, "–%.2f",
                            c.phHigh()), c.phWords()));
            sb.append(String.format(Locale.ROOT, ", %.1f °C, I = %s M%n", c.temperatureC(), c.ionicStrengthM()));
            c.notes().forEach(n -> sb.append("  note: ").append(n).append('\n'));
            if (!s.ok()) {
                sb.append("  error: ").append(s.error() != null ? s.error() : s.analyses().get(0).error()).append('\n');
                if (!s.analyses().isEmpty()) {
                    sb.append(TextReport.caret(s.analyses().get(0)));
                }
                continue;
            }
            var a = s.analyses().get(0);
            sb.append("  macroscopic pKa ").append(a.macroPka().stream().map(v -> String.format(Locale.ROOT, "%.2f", v))
                    .toList()).append('\n');
            if (a.netCharge() != null) {
                sb.append(String.format(Locale.ROOT, "  net charge %.2f, neutral %.1f %%%n", a.netCharge() + 0.0,
                        100 * a.fractionNeutral()));
            }
            for (Partition p : s.phases()) {
                sb.append(String.format(Locale.ROOT, "  work-up at pH %.2f: %.1f %% in the %s layer (ratio %s:1%s)%n",
                        p.ph(), 100 * p.fractionOrganic(), p.solvent(), p.ratio(), p.ratioAssumed() ? ", assumed" : ""));
            }
        }
        for (Separation s : r.separations()) {
            sb.append(String.format(Locale.ROOT, "%nseparates at pH %.1f–%.1f: '%s' to the organic phase, '%s' stays in "
                    + "water", s.from(), s.to(), s.extracted(), s.retained()));
        }
        sb.append("\n\nEstimates for planning and write-up; partition estimates are for planning. Verify "
                + "experimentally where safety or regulatory decisions depend on them.\n");
        return sb.toString();
    }
}
