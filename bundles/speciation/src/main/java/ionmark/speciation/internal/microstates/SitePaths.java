package ionmark.speciation.internal.microstates;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;

import ionmark.acidity.api.SiteInteraction;

/**
 * The bond paths that join two sites, and the charge interaction they carry.
 *
 * <p>The table's distance rule is a function of one bond count, and it was derived from open-chain
 * compounds (phosphoric acid, the dicarboxylic acids, the α,ω-diamines), where one path joins the two
 * sites. Where a saturated ring joins them by more than one path (piperazine, DABCO, 1,4-diazepane,
 * the cyclic polyamines), the ring holds the two charges at the short separation that the open chain
 * only reaches in some of its conformations, and the shortest path alone says too little. Rule: the
 * pair's interaction is the distance rule at the shortest path plus {@link #EXTRA_PATH} times the rule
 * at each further path that shares no atom with the paths already counted (taken shortest first), where
 * a further path counts only if every atom between the two sites, on it and on the shortest path, is
 * saturated (not aromatic, single bonds only): a shortest path through an aromatic ring or a double bond
 * already holds the charges at a fixed separation. Aromatic rings are left to their classes, the reach
 * factors and the azine pair rules, which were fitted and derived with the shortest path alone; rings
 * closed through a carbonyl (barbiturates, hydantoins, imides), whose anions spread their charge over
 * the C=O, keep the shortest path too.
 *
 * <p>{@link #EXTRA_PATH} from the two-site algebra (two equivalent sites: pK1 − pK2 = W + log 4):
 * <ul>
 * <li>ethylenediamine 9.93 / 6.85 (one path of 3 bonds): W = 3.08 − 0.60 = 2.48, the rule's 2.45 at 3 bonds;</li>
 * <li>piperazine 9.73 / 5.35 (two paths of 3 bonds): W = 4.38 − 0.60 = 3.78 = 2.45 · (1 + 0.54);</li>
 * <li>DABCO 8.82 / 2.97 (three paths of 3 bonds): W = 5.85 − 0.60 = 5.25 = 2.45 · (1 + 2 · 0.57).</li>
 * </ul>
 * Both cyclic bases give 0.54–0.57 (handbook constants, CRC and Perrin 1965, from memory); 0.54 is
 * piperazine's, the commoner ring in drugs.
 */
public final class SitePaths {

    /** Weight of each further, atom-disjoint path through saturated atoms, relative to the rule at its length. */
    public static final double EXTRA_PATH = 0.54;

    /** Further paths longer than this are not searched (the rule is below 0.2 pKa units there). */
    public static final int MAX_EXTRA_BONDS = 8;

    private SitePaths() {
    }

    /**
     * The bond counts of the paths between atoms {@code a} and {@code b}: the shortest path first (any
     * atoms), then each further path that shares no atom between the ends with those already taken and
     * runs through saturated atoms only ({@code saturated}: not aromatic, single bonds only), shortest
     * first, up to {@link #MAX_EXTRA_BONDS}. Empty when
     * the atoms are not connected; {@code [0]} when they are one atom.
     */
    public static int[] between(int[][] adj, boolean[] saturated, int a, int b) {
        ionmark.speciation.internal.work.Budget.check();
        if (a == b) {
            return new int[] {0};
        }
        int n = adj.length;
        boolean[] blocked = new boolean[n];
        int[] parent = new int[n];
        List<Integer> out = new ArrayList<>(2);
        int first = shortest(adj, a, b, blocked, parent, Integer.MAX_VALUE);
        if (first < 0) {
            return new int[0];
        }
        out.add(first);
        block(parent, a, b, blocked);
        // a shortest path through an aromatic ring or a double bond already holds the two sites at a fixed
        // separation (1,2,3,4-tetrahydroquinoxaline spreads as o-phenylenediamine does): no further paths
        boolean rigid = false;
        for (int u = parent[b]; u != a && u >= 0; u = parent[u]) {
            rigid |= !saturated[u];
        }
        if (first > 1 && !rigid) {
            // further paths (none for two bonded atoms): saturated atoms only between the ends
            for (int i = 0; i < n; i++) {
                if (!saturated[i] && i != a && i != b) {
                    blocked[i] = true;
                }
            }
            int d;
            while ((d = shortest(adj, a, b, blocked, parent, MAX_EXTRA_BONDS)) > 0) {
                out.add(d);
                block(parent, a, b, blocked);
            }
        }
        return out.stream().mapToInt(Integer::intValue).toArray();
    }

    /** The interaction of two unit charges joined by {@code paths} (from {@link #between}), before reach factors. */
    public static double interaction(SiteInteraction rule, int[] paths) {
        if (paths.length == 0) {
            return 0.0;
        }
        double w = rule.at(paths[0]);
        for (int k = 1; k < paths.length; k++) {
            w += EXTRA_PATH * rule.at(paths[k]);
        }
        return w;
    }

    /** "3 bonds" or "3 bonds, and 0.54 × the rule for 1 more path of 3 bonds", for the derivation lines. */
    public static String describe(int[] paths) {
        if (paths.length == 0) {
            return "no bond path";
        }
        String s = paths[0] + " bonds";
        if (paths.length > 1) {
            int[] more = Arrays.copyOfRange(paths, 1, paths.length);
            s += String.format(Locale.ROOT, ", and %.2f × the rule for %d more path%s through saturated atoms of %s bonds",
                    EXTRA_PATH, more.length, more.length == 1 ? "" : "s",
                    String.join(" and ", Arrays.stream(more).mapToObj(Integer::toString).toList()));
        }
        return s;
    }

    /** Breadth-first bond count from a to b avoiding blocked atoms, at most {@code limit}; -1 if none. */
    private static int shortest(int[][] adj, int a, int b, boolean[] blocked, int[] parent, int limit) {
        int n = adj.length;
        int[] d = new int[n];
        Arrays.fill(d, -1);
        int[] queue = new int[n];
        d[a] = 0;
        parent[a] = -1;
        queue[0] = a;
        for (int head = 0, tail = 1; head < tail; head++) {
            int u = queue[head];
            if (d[u] >= limit) {
                break;
            }
            for (int v : adj[u]) {
                if (d[v] >= 0 || (blocked[v] && v != b)) {
                    continue;
                }
                d[v] = d[u] + 1;
                parent[v] = u;
                if (v == b) {
                    return d[v];
                }
                queue[tail++] = v;
            }
        }
        return -1;
    }

    /** Blocks the atoms between the ends of the path found last. */
    private static void block(int[] parent, int a, int b, boolean[] blocked) {
        for (int u = parent[b]; u != a && u >= 0; u = parent[u]) {
            blocked[u] = true;
        }
    }
}
