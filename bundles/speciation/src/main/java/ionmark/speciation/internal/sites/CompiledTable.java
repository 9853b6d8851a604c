package ionmark.speciation.internal.sites;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

import org.openscience.cdk.CDKConstants;
import org.openscience.cdk.isomorphism.matchers.QueryAtomContainer;
import org.openscience.cdk.silent.SilentChemObjectBuilder;
import org.openscience.cdk.smarts.Smarts;
import org.openscience.cdk.smarts.SmartsPattern;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.GroupClass;
import ionmark.acidity.api.Substituent;

/**
 * A table snapshot with its SMARTS compiled once. Immutable; built when a snapshot arrives, shared
 * by all requests.
 */
public final class CompiledTable {
    /** A group class, its pattern, the query index of the site atom and of the centres. */
    public record Group(GroupClass group, SmartsPattern pattern, int site, int[] centres, int size, int order) {
    }

    /** A substituent and its pattern (query atom 0 is the attachment atom). */
    public record Sub(Substituent substituent, SmartsPattern pattern, int size, int order) {
    }

    private final AcidityTable table;
    private final List<Group> groups;
    private final List<Sub> substituents;

    public CompiledTable(AcidityTable table) {
        this.table = table;
        List<Group> g = new ArrayList<>();
        for (int i = 0; i < table.groups().size(); i++) {
            GroupClass gc = table.groups().get(i);
            QueryAtomContainer q = new QueryAtomContainer(SilentChemObjectBuilder.getInstance());
            if (!Smarts.parse(q, gc.smarts())) {
                continue; // the validator refuses such tables; a snapshot never carries one
            }
            int site = -1;
            List<Integer> centres = new ArrayList<>();
            for (int k = 0; k < q.getAtomCount(); k++) {
                Integer map = q.getAtom(k).getProperty(CDKConstants.ATOM_ATOM_MAPPING);
                if (map != null && map == 1) {
                    site = k;
                } else if (map != null && map == 2) {
                    centres.add(k);
                }
            }
            if (site < 0) {
                continue;
            }
            g.add(new Group(gc, SmartsPattern.create(gc.smarts(), SilentChemObjectBuilder.getInstance()), site,
                    centres.stream().mapToInt(Integer::intValue).toArray(), gc.specificity(),
                    i));
        }
        // most specific first: more pattern atoms, then table order
        g.sort(Comparator.comparingInt((Group x) -> -x.size()).thenComparingInt(Group::order));
        this.groups = List.copyOf(g);
        List<Sub> s = new ArrayList<>();
        for (int i = 0; i < table.substituents().size(); i++) {
            Substituent sub = table.substituents().get(i);
            QueryAtomContainer q = new QueryAtomContainer(SilentChemObjectBuilder.getInstance());
            if (!Smarts.parse(q, sub.smarts())) {
                continue;
            }
            s.add(new Sub(sub, SmartsPattern.create(sub.smarts(), SilentChemObjectBuilder.getInstance()),
                    q.getAtomCount(), i));
        }
        s.sort(Comparator.comparingInt((Sub x) -> -x.size()).thenComparingInt(Sub::order));
        this.substituents = List.copyOf(s);
    }

    public AcidityTable table() {
        return table;
    }

    public List<Group> groups() {
        return groups;
    }

    public List<Sub> substituents() {
        return substituents;
    }
}
