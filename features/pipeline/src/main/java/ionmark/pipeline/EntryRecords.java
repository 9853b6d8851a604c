package ionmark.pipeline;

import java.util.ArrayList;
import java.util.List;

import ionmark.host.api.Entry;
import ionmark.host.api.MarkdownEntries;
import ionmark.notebook.api.AnnotatedEntry;
import ionmark.notebook.api.AnnotatedStructure;
import ionmark.notebook.api.ConditionsUsed;
import ionmark.notebook.api.EntryAnnotation;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Speciation;

/**
 * The records of one Markdown entry, read by the notebook's own reader ({@link EntryAnnotation}: the path of
 * the notebook's cards and {@code ionmark annotate}), so the pipeline and the notebook give one answer per
 * structure and condition. One record per structure and analysed pH (two for a stated range), id
 * {@code entry#n}, n counting the entry's structures from 1 in the notebook's order (structure blocks, SMILES
 * in the text, reaction components). A structure the entry states no pH for is analysed at the run's
 * {@code --ph} values with the entry's temperature and ionic strength; without {@code --ph} it keeps the
 * notebook's one analysis without pH.
 */
final class EntryRecords {
    /** One record: its id and the analysis. */
    record Item(String id, Analysis analysis) {
    }

    /** An entry's records, the table version it is pinned to (0: none) and how many structures it holds. */
    record Read(List<Item> items, int pinnedVersion, int structures) {
    }

    private EntryRecords() {
    }

    static Read read(EntryAnnotation notebook, Speciation speciation, Structure entry) {
        Entry e = MarkdownEntries.parse(entry.id(), entry.text());
        AnnotatedEntry a = notebook.annotate(e);
        List<Item> out = new ArrayList<>();
        int n = 0;
        for (AnnotatedStructure s : a.structures()) {
            String id = entry.id() + "#" + ++n;
            ConditionsUsed c = s.conditions();
            if (s.error() != null || s.analyses().isEmpty()) {
                out.add(new Item(id, Analysis.failed(s.structure(), safe(c), "", s.error() != null ? s.error()
                        : "not annotated")));
            } else if (!s.analyses().get(0).ok()) {
                out.add(new Item(id, s.analyses().get(0)));
            } else if (c.ph() == null && !entry.phs().isEmpty()) {
                for (double ph : entry.phs()) {
                    out.add(new Item(id, analyse(speciation, s.structure(), new Conditions(ph, c.temperatureC(),
                            c.ionicStrengthM()))));
                }
            } else {
                s.analyses().forEach(x -> out.add(new Item(id, x)));
            }
        }
        return new Read(out, e.pinnedTableVersion(), n);
    }

    private static Analysis analyse(Speciation speciation, String structure, Conditions c) {
        try {
            return speciation.analyse(structure, c);
        } catch (IllegalArgumentException ex) {
            return Analysis.failed(structure, c, "", ex.getMessage());
        }
    }

    /** The conditions a failed record is written with (a failed record shows none; a bad stated value is the error). */
    private static Conditions safe(ConditionsUsed c) {
        try {
            return new Conditions(c.ph(), c.temperatureC(), c.ionicStrengthM());
        } catch (IllegalArgumentException ex) {
            return new Conditions(null, Conditions.STANDARD_TEMPERATURE, 0);
        }
    }
}
