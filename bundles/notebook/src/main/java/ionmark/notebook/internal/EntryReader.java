package ionmark.notebook.internal;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import ionmark.host.api.Block;
import ionmark.host.api.Entry;
import ionmark.notebook.api.AnnotatedEntry;
import ionmark.notebook.api.AnnotatedStructure;
import ionmark.notebook.api.ConditionsUsed;
import ionmark.notebook.api.Partition;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Curve;
import ionmark.speciation.api.Speciation;

/**
 * The one reading of an entry that the notebook's cards and {@code ionmark annotate} share: structures (blocks,
 * inline SMILES, reaction components), the conditions that apply to each ({@link ConditionScope}), the
 * analyses, the work-up answer and the separating pH ranges. A problem with one structure is that structure's
 * error; the rest of the entry is annotated.
 */
final class EntryReader {
    /** A structure found in the entry, before analysis. */
    record Found(int block, int start, String words, String source, String structure, String error) {
        Found(int block, int start, String words, String source, String structure) {
            this(block, start, words, source, structure, null);
        }
    }

    private final Speciation speciation;

    EntryReader(Speciation speciation) {
        this.speciation = speciation;
    }

    /**
     * Structures annotated per entry, quick check or request: each may take its whole time budget, so an entry
     * with hundreds of structures would hold a request for minutes.
     */
    static final int MAX_STRUCTURES = Integer.getInteger("ionmark.maxStructuresPerRequest", 50);

    AnnotatedEntry read(Entry entry, List<String> entryWarnings) {
        ConditionScope scope = new ConditionScope(entry, new SolutionPh(speciation));
        List<AnnotatedStructure> out = new ArrayList<>();
        List<Found> found = structures(entry);
        for (int i = 0; i < found.size(); i++) {
            out.add(i < MAX_STRUCTURES ? annotate(entry, scope, found.get(i)) : failed(found.get(i), NOT_READ,
                    overCap(found.size())));
        }
        List<String> warnings = new ArrayList<>(entryWarnings);
        if (found.size() > MAX_STRUCTURES) {
            warnings.add("This entry has " + found.size() + " structures; the first " + MAX_STRUCTURES
                    + " are annotated (the limit per page or request). Split the entry to see the rest.");
        }
        entry.notices().forEach(warnings::add);
        String version = out.stream().filter(AnnotatedStructure::ok).map(s -> s.analyses().get(0).tableVersion())
                .findFirst().orElse("");
        List<String> words = new ArrayList<>();
        List<Analysis> analyses = new ArrayList<>();
        for (AnnotatedStructure s : out) {
            if (s.ok()) {
                words.add(s.words());
                analyses.add(s.analyses().get(0));
            }
        }
        return new AnnotatedEntry(entry.id(), version, out, warnings, WorkupPhases.separations(words, analyses));
    }

    List<Found> structures(Entry entry) {
        List<Found> out = new ArrayList<>();
        List<Found> names = new ArrayList<>();
        List<Block> blocks = entry.blocks();
        for (int i = 0; i < blocks.size(); i++) {
            Block b = blocks.get(i);
            if (b.kind() == Block.Kind.TEXT) {
                for (InlineStructures.Token t : InlineStructures.tokens(b.content())) {
                    out.add(new Found(i, t.start(), t.smiles(), t.reaction() ? "reaction" : "smiles", t.smiles()));
                }
                for (ChemicalNames.Name n : ChemicalNames.find(b.content())) {
                    names.add(n.ok() ? new Found(i, n.start(), n.words(), "name", n.smiles())
                            : new Found(i, n.start(), n.words(), "name", n.words(), n.error()));
                }
            } else if (b.kind() == Block.Kind.STRUCTURE && !b.content().isBlank()) {
                String c = b.content();
                if (Components.isReaction(c)) {
                    List<String> parts = Components.ofReaction(c);
                    for (int k = 0; k < parts.size(); k++) {
                        String p = parts.get(k);
                        out.add(new Found(i, -1, c.strip().startsWith("$RXN") ? "component " + (k + 1)
                                + " of the RXN block" : p, "reaction", p));
                    }
                } else if (looksLikeMolfile(c)) {
                    String title = c.lines().findFirst().orElse("").strip();
                    out.add(new Found(i, -1, title.isEmpty() ? "molfile" : "molfile '" + title + "'", "molfile", c));
                } else if (ChemicalNames.whole(c) != null) {
                    ChemicalNames.Name n = ChemicalNames.whole(c);
                    out.add(n.ok() ? new Found(i, -1, n.words(), "name", n.smiles())
                            : new Found(i, -1, n.words(), "name", n.words(), n.error()));
                } else {
                    for (String p : Components.ofSmiles(c)) {
                        out.add(new Found(i, -1, p, "smiles", p));
                    }
                }
            }
        }
        out.addAll(NamedOnce.filter(names, out, blocks));
        out.sort(java.util.Comparator.comparingInt(Found::block).thenComparingInt(Found::start));
        return out;
    }

    static boolean looksLikeMolfile(String text) {
        return text.contains("V2000") || text.contains("V3000") || text.contains("M  END");
    }

    private AnnotatedStructure annotate(Entry entry, ConditionScope scope, Found f) {
        if (f.error() != null) {
            return failed(f, new ConditionsUsed(null, null, null, false, Conditions.STANDARD_TEMPERATURE, null, 0, null,
                    List.of()), f.error());
        }
        Block b = entry.blocks().get(f.block());
        ConditionScope.Place at = scope.place(f.block(), f.start());
        List<String> notes = new ArrayList<>();
        Double ph = null;
        Double phHigh = null;
        String phWords = null;
        boolean implied = false;
        if (b.kind() == Block.Kind.STRUCTURE && b.ph() != null) {
            phWords = "ph=" + StatedConditions.format(b.ph()) + " on the structure block";
            if (b.ph() < -2 || b.ph() > 16) {
                ConditionsUsed c = new ConditionsUsed(b.ph(), null, phWords, false, Conditions.STANDARD_TEMPERATURE, null,
                        0, null, notes);
                return failed(f, c, "the block states pH " + StatedConditions.format(b.ph()) + " (ph=" + StatedConditions
                        .format(b.ph()) + "), outside pH −2…16, the range Ionmark computes: correct the block's ph= value");
            }
            ph = b.ph();
        } else {
            ConditionScope.Pick<ConditionScope.PhFound> p = scope.pick(scope.phs, at, "pH");
            if (p.value() != null) {
                ph = p.value().low();
                phHigh = p.value().high() > p.value().low() ? p.value().high() : null;
                phWords = p.value().words();
                implied = p.value().implied();
                if (implied) {
                    notes.add("pH ≈ " + String.format(Locale.ROOT, "%.1f", ph) + ", implied by '" + phWords + "' ("
                            + p.value().how() + ")");
                }
                if (p.value().note() != null) {
                    notes.add(p.value().note());
                }
            }
            if (p.note() != null) {
                notes.add(p.note());
            }
        }
        double t = Conditions.STANDARD_TEMPERATURE;
        ConditionScope.Pick<StatedConditions.Value> pt = scope.pick(scope.temps, at, "temperature");
        String tWords = null;
        if (pt.value() != null) {
            t = pt.value().value();
            tWords = pt.value().words();
            if (pt.value().note() != null) {
                notes.add(pt.value().note());
            }
            if (pt.note() != null) {
                notes.add(pt.note());
            }
        }
        double is = 0;
        ConditionScope.Pick<StatedConditions.Value> pi = scope.pick(scope.ionic, at, "ionic strength");
        String iWords = null;
        if (pi.value() != null) {
            is = pi.value().value();
            iWords = pi.value().words();
            if (pi.value().note() != null) {
                notes.add(pi.value().note());
            }
            if (pi.note() != null) {
                notes.add(pi.note());
            }
        }
        notes.addAll(scope.flaggedAt(at));
        ConditionsUsed used = new ConditionsUsed(ph, phHigh, phWords, implied, t, tWords, is, iWords, notes);
        List<Analysis> analyses = new ArrayList<>();
        try {
            for (Double p : phHigh == null ? java.util.Collections.singletonList(ph) : List.of(ph, phHigh)) {
                analyses.add(speciation.analyse(f.structure(), new Conditions(p, t, is)));
            }
        } catch (IllegalArgumentException e) {
            return failed(f, used, e.getMessage());
        }
        if (!analyses.get(0).ok()) {
            return new AnnotatedStructure(f.block(), f.words(), f.source(), f.structure(), used, analyses, null, List.of(),
                    analyses.get(0).error());
        }
        Curve curve = speciation.curve(f.structure(), new Conditions(null, t, is), 0, 14, 0.1).curve(); // null: no plot
        List<Partition> phases = WorkupPhases.partitions(WorkupPhases.step(sectionText(entry, b.section())), analyses);
        return new AnnotatedStructure(f.block(), f.words(), f.source(), f.structure(), used, analyses, curve, phases,
                null);
    }

    private static final ConditionsUsed NOT_READ = new ConditionsUsed(null, null, null, false,
            Conditions.STANDARD_TEMPERATURE, null, 0, null, List.of());

    static String overCap(int count) {
        return "not annotated: more than " + MAX_STRUCTURES + " structures in one entry or request (" + count
                + " found); split the entry";
    }

    private static AnnotatedStructure failed(Found f, ConditionsUsed c, String error) {
        return new AnnotatedStructure(f.block(), f.words(), f.source(), f.structure(), c, List.of(), null, List.of(),
                error);
    }

    private static String sectionText(Entry entry, int section) {
        StringBuilder sb = new StringBuilder();
        for (Block b : entry.blocks()) {
            if (b.section() == section && b.kind() == Block.Kind.TEXT) {
                sb.append(b.content()).append('\n');
            }
        }
        return sb.toString();
    }
}
