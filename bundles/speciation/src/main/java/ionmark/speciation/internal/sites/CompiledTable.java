package ionmark.speciation.internal.sites;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.concurrent.ConcurrentHashMap;
import java.util.function.Function;
import java.util.function.Predicate;

import org.openscience.cdk.CDKConstants;
import org.openscience.cdk.isomorphism.matchers.QueryAtomContainer;
import org.openscience.cdk.silent.SilentChemObjectBuilder;
import org.openscience.cdk.smarts.Smarts;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.GroupClass;
import ionmark.acidity.api.PairRule;
import ionmark.acidity.api.Substituent;

/**
 * A table snapshot with its SMARTS compiled once. Immutable; built when a snapshot arrives, shared
 * by all requests.
 */
public final class CompiledTable {
    /** A group class, its pattern, the query index of the site atom and of the centres. */
    public record Group(GroupClass group, RootedPattern pattern, int site, int[] centres, int size, int order) {
    }

    /** A substituent and its pattern, rooted at query atom 0, the attachment atom. */
    public record Sub(Substituent substituent, RootedPattern pattern, int size, int order) {
    }

    /** A pair rule, its pattern rooted at the :1 site, and the query index of the :2 site. */
    public record Pair(PairRule rule, RootedPattern pattern, int partner) {
    }

    private final AcidityTable table;
    private final List<Pair> pairs;
    private final List<Group> groups;
    private final List<Sub> substituents;
    /** Indexed by atomic number; elements no root names share the list of unconfined roots. */
    private final List<List<Group>> groupsByElement;
    private final List<List<Sub>> subsByElement;

    public CompiledTable(AcidityTable table) {
        this.table = table;
        RootedPattern.Recursions recursions = new RootedPattern.Recursions();
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
            g.add(new Group(gc, new RootedPattern(q, site, recursions), site,
                    centres.stream().mapToInt(Integer::intValue).toArray(), ionmark.acidity.patterns.PatternSpecificity.of(gc.smarts()),
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
            s.add(new Sub(sub, new RootedPattern(q, 0, recursions), q.getAtomCount(), i));
        }
        s.sort(Comparator.comparingInt((Sub x) -> -x.size()).thenComparingInt(Sub::order));
        this.substituents = List.copyOf(s);
        List<Pair> pr = new ArrayList<>();
        for (PairRule r : table.pairs()) {
            QueryAtomContainer q = new QueryAtomContainer(SilentChemObjectBuilder.getInstance());
            if (!Smarts.parse(q, r.smarts())) {
                continue;
            }
            int one = -1;
            int two = -1;
            for (int k = 0; k < q.getAtomCount(); k++) {
                Integer map = q.getAtom(k).getProperty(CDKConstants.ATOM_ATOM_MAPPING);
                one = map != null && map == 1 ? k : one;
                two = map != null && map == 2 ? k : two;
            }
            if (one >= 0 && two >= 0) {
                pr.add(new Pair(r, new RootedPattern(q, one, recursions), two));
            }
        }
        this.pairs = List.copyOf(pr);
        this.groupsByElement = byAtomicNumber(byRootElement(this.groups, Group::pattern),
                anyRootElement(this.groups, Group::pattern));
        this.subsByElement = byAtomicNumber(byRootElement(this.substituents, Sub::pattern),
                anyRootElement(this.substituents, Sub::pattern));
    }

    /**
     * For each element some root names: the patterns whose root can be that element, in the list's
     * order (most specific first). Patterns whose root does not confine the element are in every
     * list.
     */
    private static <T> Map<Integer, List<T>> byRootElement(List<T> all, Function<T, RootedPattern> p) {
        Set<Integer> named = new TreeSet<>();
        for (T x : all) {
            Set<Integer> e = p.apply(x).rootElements();
            if (e != null) {
                named.addAll(e);
            }
        }
        Map<Integer, List<T>> out = new HashMap<>();
        for (int z : named) {
            List<T> l = new ArrayList<>();
            for (T x : all) {
                Set<Integer> e = p.apply(x).rootElements();
                if (e == null || e.contains(z)) {
                    l.add(x);
                }
            }
            out.put(z, List.copyOf(l));
        }
        return Map.copyOf(out);
    }

    private static <T> List<T> anyRootElement(List<T> all, Function<T, RootedPattern> p) {
        List<T> l = new ArrayList<>();
        for (T x : all) {
            if (p.apply(x).rootElements() == null) {
                l.add(x);
            }
        }
        return List.copyOf(l);
    }

    private static final int ELEMENTS = 119;

    private static <T> List<List<T>> byAtomicNumber(Map<Integer, List<T>> named, List<T> any) {
        List<List<T>> out = new ArrayList<>(ELEMENTS);
        for (int z = 0; z < ELEMENTS; z++) {
            out.add(named.getOrDefault(z, any));
        }
        return List.copyOf(out);
    }

    /**
     * Candidate lists in two steps. By atom signature: the patterns whose root screen the atom passes.
     * Then by the atom's neighbourhood (its signature with each bond and neighbour signature): those of
     * the first list whose root neighbours can find partners there. Both screens are necessary
     * conditions that read only what the keys hold, so a cached list is exact for every atom with the
     * same key.
     */
    private final Map<Long, List<Group>> groupsBySignature = new ConcurrentHashMap<>();
    private final Map<Long, List<Sub>> subsBySignature = new ConcurrentHashMap<>();
    private final Map<Neighbourhood, List<Group>> groupsByNeighbourhood = new ConcurrentHashMap<>();
    private final Map<Neighbourhood, List<Sub>> subsByNeighbourhood = new ConcurrentHashMap<>();
    /** Distinct keys are few in practice; past this many, lists are filtered per atom instead. */
    private static final int MAX_SIGNATURES = 20_000;
    private static final int MAX_NEIGHBOURHOODS = 50_000;

    /**
     * The classes whose site may be atom {@code atom}, most specific first: those rooted at its
     * element whose root and root neighbours pass the screens on the atom and its neighbourhood.
     */
    public List<Group> groupsAt(MatchTarget t, int atom) {
        List<Group> bySignature = screened(groupsBySignature, groupsRootedAt(t.atomicNumber(atom)), Group::pattern, t,
                atom);
        return nearby(groupsByNeighbourhood, bySignature, Group::pattern, t, atom);
    }

    /** The substituents that may attach by atom {@code atom}, most specific first; as {@link #groupsAt}. */
    public List<Sub> substituentsAt(MatchTarget t, int atom) {
        List<Sub> bySignature = screened(subsBySignature, substituentsRootedAt(t.atomicNumber(atom)), Sub::pattern, t,
                atom);
        return nearby(subsByNeighbourhood, bySignature, Sub::pattern, t, atom);
    }

    private static <T> List<T> screened(Map<Long, List<T>> cache, List<T> all, Function<T, RootedPattern> p,
            MatchTarget t, int atom) {
        long key = t.signature(atom);
        return filtered(cache, key < 0 ? null : key, MAX_SIGNATURES, all, x -> p.apply(x).rootMayMatch(t, atom));
    }

    private static <T> List<T> nearby(Map<Neighbourhood, List<T>> cache, List<T> candidates,
            Function<T, RootedPattern> p, MatchTarget t, int atom) {
        if (candidates.isEmpty()) {
            return candidates;
        }
        return filtered(cache, Neighbourhood.of(t, atom), MAX_NEIGHBOURHOODS, candidates,
                x -> p.apply(x).neighboursMayMatch(t, atom));
    }

    /**
     * The entries of {@code from} that {@code keep} accepts, kept under {@code key} (null: not cached)
     * while the cache holds fewer than {@code max} lists.
     */
    private static <K, T> List<T> filtered(Map<K, List<T>> cache, K key, int max, List<T> from, Predicate<T> keep) {
        List<T> known = key == null ? null : cache.get(key);
        if (known != null) {
            return known;
        }
        List<T> out = new ArrayList<>();
        for (T x : from) {
            if (keep.test(x)) {
                out.add(x);
            }
        }
        out = out.size() == from.size() ? from : List.copyOf(out);
        if (key != null && cache.size() < max) {
            cache.put(key, out);
        }
        return out;
    }

    /**
     * An atom's signature followed by its neighbours' signatures, each with the bond's order,
     * aromaticity and ring membership, sorted: what {@link RootedPattern#neighboursMayMatch} reads.
     */
    private record Neighbourhood(long[] words) {
        static Neighbourhood of(MatchTarget t, int atom) {
            long own = t.signature(atom);
            if (own < 0) {
                return null;
            }
            int[] nbrs = t.adjacency()[atom];
            long[] w = new long[nbrs.length + 1];
            w[0] = own;
            for (int k = 0; k < nbrs.length; k++) {
                long s = t.signature(nbrs[k]);
                int bond = t.bondInvariants(atom, k);
                if (s < 0 || bond < 0) {
                    return null;
                }
                long x = (long) bond << 48 | s;
                int j = k; // insertion sort: a handful of neighbours
                while (j > 0 && w[j] > x) {
                    w[j + 1] = w[j];
                    j--;
                }
                w[j + 1] = x;
            }
            return new Neighbourhood(w);
        }

        @Override
        public boolean equals(Object o) {
            return o instanceof Neighbourhood n && Arrays.equals(words, n.words);
        }

        @Override
        public int hashCode() {
            return Arrays.hashCode(words);
        }
    }

    /** The classes whose site can be an atom of this element, most specific first. */
    public List<Group> groupsRootedAt(int atomicNumber) {
        return groupsByElement.get(atomicNumber >= 0 && atomicNumber < ELEMENTS ? atomicNumber : 0);
    }

    /** The substituents whose attachment atom can be of this element, most specific first. */
    public List<Sub> substituentsRootedAt(int atomicNumber) {
        return subsByElement.get(atomicNumber >= 0 && atomicNumber < ELEMENTS ? atomicNumber : 0);
    }

    /** The table's pair rules, compiled. */
    public List<Pair> pairs() {
        return pairs;
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
