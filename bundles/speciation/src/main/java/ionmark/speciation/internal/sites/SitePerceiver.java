package ionmark.speciation.internal.sites;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

import org.openscience.cdk.interfaces.IAtom;
import org.openscience.cdk.interfaces.IAtomContainer;

/**
 * One site per ionizable atom: for each atom the most specific class whose pattern matches with its
 * site on that atom (the one with the most pattern atoms; ties go to table order) wins.
 */
public final class SitePerceiver {
    private SitePerceiver() {
    }

    /**
     * The molecule must have been prepared (aromaticity, rings) by the structure reader. Each atom
     * tries the classes whose site can be its element, most specific first; the first that matches
     * with its site on the atom wins.
     */
    public static List<PerceivedSite> perceive(CompiledTable table, IAtomContainer mol) {
        return perceive(table, new MatchTarget(mol));
    }

    public static List<PerceivedSite> perceive(CompiledTable table, MatchTarget target) {
        List<PerceivedSite> out = new ArrayList<>();
        for (int atom = 0; atom < target.atomCount(); atom++) {
            ionmark.speciation.internal.work.Budget.check();
            List<CompiledTable.Group> candidates = table.groupsAt(target, atom);
            for (int c = 0; c < candidates.size(); c++) {
                CompiledTable.Group g = candidates.get(c);
                int[] m = g.pattern().first(target, atom);
                if (m == null) {
                    continue;
                }
                int[] core = m.clone();
                Arrays.sort(core);
                int distinct = 0;
                for (int i = 0; i < core.length; i++) {
                    if (i == 0 || core[i] != core[i - 1]) {
                        core[distinct++] = core[i];
                    }
                }
                int[] centres = centres(g.centres(), m, atom);
                out.add(new PerceivedSite(atom, g.group(), Arrays.copyOf(core, distinct), centres));
                break;
            }
        }
        return out;
    }

    /** The molecule atoms of the class's centres, first occurrence kept; the site atom when none. */
    private static int[] centres(int[] queryCentres, int[] mapping, int atom) {
        if (queryCentres.length == 0) {
            return new int[] {atom};
        }
        int[] out = new int[queryCentres.length];
        int n = 0;
        next:
        for (int q : queryCentres) {
            int a = mapping[q];
            for (int i = 0; i < n; i++) {
                if (out[i] == a) {
                    continue next;
                }
            }
            out[n++] = a;
        }
        return n == out.length ? out : Arrays.copyOf(out, n);
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
