package ionmark.speciation.internal.estimate;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.Arrays;
import java.util.List;
import java.util.Map;

import ionmark.speciation.internal.sites.CompiledTable;
import ionmark.speciation.internal.sites.MatchTarget;

/**
 * Substituent matches in one molecule by attachment atom, largest pattern first. One map per
 * molecule; each attachment atom is matched when first asked about. Not thread-safe.
 */
final class SubstituentMap {
    record Hit(CompiledTable.Sub sub, int[] atoms) {
        boolean touches(boolean[] forbidden) {
            for (int a : atoms) {
                if (forbidden[a]) {
                    return true;
                }
            }
            return false;
        }
    }

    private final CompiledTable table;
    private final MatchTarget target;
    /** Filled per attachment atom on first use: most estimates ask about a handful of atoms. */
    private final Map<Integer, List<Hit>> byAttachment = new HashMap<>();

    SubstituentMap(CompiledTable table, MatchTarget target) {
        this.table = table;
        this.target = target;
    }

    private List<Hit> hits(int atom) {
        List<Hit> hits = byAttachment.get(atom);
        if (hits != null) {
            return hits;
        }
        hits = new ArrayList<>();
        for (CompiledTable.Sub s : table.substituentsAt(target, atom)) {
            // one hit per set of atoms: symmetric patterns map the same atoms several ways
            List<int[]> seen = new ArrayList<>();
            List<Hit> found = hits;
            s.pattern().forEach(target, atom, m -> {
                int[] atoms = m.clone();
                Arrays.sort(atoms);
                for (int[] other : seen) {
                    if (Arrays.equals(other, atoms)) {
                        return true;
                    }
                }
                seen.add(atoms);
                found.add(new Hit(s, m.clone()));
                return true;
            });
        }
        byAttachment.put(atom, hits);
        return hits;
    }

    /** The most specific substituent attached by {@code atom} that stays clear of {@code forbidden}. */
    Hit at(int atom, boolean[] forbidden) {
        for (Hit h : hits(atom)) {
            if (!h.touches(forbidden)) {
                return h;
            }
        }
        return null;
    }
}
