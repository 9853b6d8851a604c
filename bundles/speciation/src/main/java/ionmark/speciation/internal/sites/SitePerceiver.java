package ionmark.speciation.internal.sites;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.openscience.cdk.interfaces.IAtom;
import org.openscience.cdk.interfaces.IAtomContainer;

/**
 * One site per ionizable atom: every class pattern is matched, and for each atom the most specific
 * class (the one with the most pattern atoms; ties go to table order) wins.
 */
public final class SitePerceiver {
    private SitePerceiver() {
    }

    /** The molecule must have been prepared (aromaticity, rings) by the structure reader. */
    public static List<PerceivedSite> perceive(CompiledTable table, IAtomContainer mol) {
        Map<Integer, PerceivedSite> byAtom = new LinkedHashMap<>();
        for (CompiledTable.Group g : table.groups()) {
            for (int[] m : g.pattern().matchAll(mol)) {
                int atom = m[g.site()];
                if (byAtom.containsKey(atom)) {
                    continue; // a more specific class already holds this atom
                }
                Set<Integer> core = new HashSet<>();
                for (int a : m) {
                    core.add(a);
                }
                int[] centres = g.centres().length == 0 ? new int[] {atom}
                        : java.util.Arrays.stream(g.centres()).map(k -> m[k]).distinct().toArray();
                byAtom.put(atom, new PerceivedSite(atom, g.group(), Set.copyOf(core), centres));
            }
        }
        List<PerceivedSite> out = new ArrayList<>(byAtom.values());
        out.sort(java.util.Comparator.comparingInt(PerceivedSite::atom));
        return out;
    }

    /**
     * Atoms that look ionizable in water but no class covers: O-H, S-H and N-H on atoms with a
     * polar environment, and basic-looking amine nitrogens. Reported, never guessed.
     */
    public static List<Integer> uncovered(IAtomContainer mol, List<PerceivedSite> sites) {
        Set<Integer> taken = new HashSet<>();
        sites.forEach(s -> taken.add(s.atom()));
        List<Integer> out = new ArrayList<>();
        for (int i = 0; i < mol.getAtomCount(); i++) {
            IAtom a = mol.getAtom(i);
            int h = a.getImplicitHydrogenCount() == null ? 0 : a.getImplicitHydrogenCount();
            int z = a.getAtomicNumber();
            if (taken.contains(i)) {
                continue;
            }
            if ((z == 8 || z == 16) && h > 0) {
                out.add(i);
            }
        }
        return out;
    }
}
