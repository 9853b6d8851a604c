package ionmark.speciation.internal.estimate;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.openscience.cdk.interfaces.IAtomContainer;

import ionmark.speciation.internal.sites.CompiledTable;

/**
 * Every substituent match in one molecule, indexed by attachment atom, largest pattern first.
 * Built once per molecule.
 */
final class SubstituentMap {
    record Hit(CompiledTable.Sub sub, int[] atoms) {
        boolean touches(java.util.Set<Integer> forbidden) {
            for (int a : atoms) {
                if (forbidden.contains(a)) {
                    return true;
                }
            }
            return false;
        }
    }

    private final Map<Integer, List<Hit>> byAttachment = new HashMap<>();

    SubstituentMap(CompiledTable table, IAtomContainer mol) {
        for (CompiledTable.Sub s : table.substituents()) {
            for (int[] m : s.pattern().matchAll(mol).uniqueAtoms()) {
                byAttachment.computeIfAbsent(m[0], k -> new ArrayList<>()).add(new Hit(s, m));
            }
        }
    }

    /** The most specific substituent attached by {@code atom} that stays clear of {@code forbidden}. */
    Hit at(int atom, java.util.Set<Integer> forbidden) {
        for (Hit h : byAttachment.getOrDefault(atom, List.of())) {
            if (!h.touches(forbidden)) {
                return h;
            }
        }
        return null;
    }
}
