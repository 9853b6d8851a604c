package ionmark.speciation.internal;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

import ionmark.acidity.api.AcidityTable;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Site;
import ionmark.speciation.api.Term;
import ionmark.speciation.measured.MeasuredImport;

/**
 * The part of a draft's regression report that says what new measurements move through their analogs:
 * site values of reference-set compounds and given structures that differ between head and draft while
 * the draft's derivation names measured analogs it did not name with the head, with those analogs' names.
 */
final class AnalogMoves {
    /** Smaller moves are not listed. */
    static final double LISTED = 0.01;
    private static final String PREFIX = "measured analog ";

    private AnalogMoves() {
    }

    static List<MeasuredImport.Move> of(AcidityTable head, AcidityTable draft, List<String> structures, int maxHeavyAtoms) {
        Engine eh = new Engine(head, maxHeavyAtoms);
        Engine ed = new Engine(draft, maxHeavyAtoms);
        List<String[]> todo = new ArrayList<>();
        Regression.referenceSet().forEach(c -> todo.add(new String[] {c.smiles(), c.name()}));
        structures.forEach(s -> todo.add(new String[] {s, s}));
        List<MeasuredImport.Move> out = new ArrayList<>();
        for (String[] t : todo) {
            Analysis a = eh.analyse(t[0], Conditions.noPh(), true);
            Analysis b = ed.analyse(t[0], Conditions.noPh(), true);
            if (!a.ok() || !b.ok() || a.sites().size() != b.sites().size()) {
                continue;
            }
            for (int i = 0; i < b.sites().size(); i++) {
                Site sa = a.sites().get(i);
                Site sb = b.sites().get(i);
                List<String> by = new ArrayList<>(analogs(sb));
                by.removeAll(analogs(sa)); // the measured compounds new to this site: what moved it
                if (Math.abs(sb.pka() - sa.pka()) >= LISTED && !by.isEmpty()) {
                    out.add(new MeasuredImport.Move(t[0], t[1], sb.group() + " on atom " + (sb.atom() + 1), sa.pka(),
                            sb.pka(), by));
                }
            }
        }
        out.sort(Comparator.comparingDouble((MeasuredImport.Move m) -> -Math.abs(m.draft() - m.head())));
        return out;
    }

    /** Names of the measured analogs in a site's derivation. */
    static List<String> analogs(Site s) {
        List<String> names = new ArrayList<>();
        for (Term t : s.derivation()) {
            if (t.label().startsWith(PREFIX)) {
                int cut = t.label().indexOf(" (", PREFIX.length());
                names.add(t.label().substring(PREFIX.length(), cut < 0 ? t.label().length() : cut));
            }
        }
        return names;
    }
}
