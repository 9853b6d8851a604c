package ionmark.speciation.internal.estimate;

import java.util.Arrays;

import ionmark.speciation.internal.sites.PerceivedSite;
import ionmark.speciation.internal.sites.MatchTarget;

/**
 * The local environment of one site as a set of hashed features, compared by Tanimoto similarity:
 * <ul>
 * <li>a circular fingerprint rooted at the site atom: every atom within {@code radius} bonds of it
 * contributes its circular identifiers of rounds 0 to min(2, radius − distance), each tagged with its
 * distance from the site atom. Higher rounds were left out: they change with every substituent near
 * the site, and close analogs of a series then compared near 0.4;</li>
 * <li>the substituent pattern of the ring that carries the site: for each ring through the site's
 * centre, every ring atom and every group hanging on it (its round-1 identifier), tagged with its ring
 * position counted from the centre (1 ortho, 2 meta, 3 para).</li>
 * </ul>
 * Two sites of different molecules compare near 1 when the same groups sit at the same places around
 * them, whatever the rest of the molecules look like.
 */
public final class SiteEnvironment {
    private SiteEnvironment() {
    }

    /**
     * What the environments of one molecule's sites share: the circular identifiers and the azole ring nitrogens
     * whose hydrogen they leave out (null when none).
     */
    record Prepared(int[][] ids, boolean[] annular) {
    }

    /**
     * The identifiers of {@code mol} for environments of {@code radius} bonds; with {@code annular}, azole ring
     * nitrogens that pass the ring's N-H between them ({@link #annularNitrogens}) are described without their hydrogen.
     */
    static Prepared prepare(MatchTarget mol, int radius, boolean annular) {
        boolean[] ring = annular ? annularNitrogens(mol) : null;
        return new Prepared(Morgan.identifiers(mol, radius, ring), ring);
    }

    /**
     * The whole molecule's features: every atom's circular identifiers of rounds 0 to 2 (an ECFP4-like set; rounds 0
     * to the radius when the index's radius is below 2), sorted and distinct. Series members share most of them even
     * where their sites' local environments differ.
     */
    static int[] molecule(Prepared prep) {
        int[][] ids = prep.ids();
        int rounds = Math.min(2, ids.length - 1);
        Features f = new Features(ids[0].length * (rounds + 1));
        for (int r = 0; r <= rounds; r++) {
            for (int id : ids[r]) {
                f.add(Morgan.mix(Morgan.mix(0x5be0cd19, r), id));
            }
        }
        return f.distinct();
    }

    /** {@link #molecule(Prepared)} of {@code mol} read with the index's radius and azole rule. */
    public static int[] molecule(MatchTarget mol, int radius, boolean annular) {
        return molecule(prepare(mol, radius, annular));
    }

    /** Sorted distinct feature hashes of the site's environment (azoles in the tautomer read). */
    public static int[] of(MatchTarget mol, PerceivedSite site, int radius) {
        return of(mol, site, radius, false);
    }

    /** Sorted distinct feature hashes of the site's environment; {@code annular}: see {@link #prepare}. */
    public static int[] of(MatchTarget mol, PerceivedSite site, int radius, boolean annular) {
        return of(mol, prepare(mol, radius, annular), site, radius);
    }

    /**
     * {@link #of(MatchTarget, PerceivedSite, int)} with the molecule's identifiers ({@link #prepare}) given. A site on
     * an azole ring N that takes part in annular tautomerism is described from every such N of its ring (the union of
     * their features): 4-methylimidazole's basic N and 5-methylimidazole's are then the same environment, whichever
     * tautomer each structure was read in.
     */
    static int[] of(MatchTarget mol, Prepared prep, PerceivedSite site, int radius) {
        Features f = new Features(mol.atomCount() * (radius + 1) + 64);
        int centre = site.centres().length > 0 ? site.centres()[0] : site.atom();
        collect(mol, prep.ids(), site, site.atom(), centre, radius, f);
        if (prep.annular() != null && prep.annular()[site.atom()]) {
            for (int other : partners(mol, prep.annular(), site.atom())) {
                collect(mol, prep.ids(), site, other, other, radius, f);
            }
        }
        return f.distinct();
    }

    private static void collect(MatchTarget mol, int[][] ids, PerceivedSite site, int root, int centre, int radius,
            Features f) {
        int[][] nbr = mol.adjacency();
        int[] dist = distances(nbr, root, radius);
        for (int a = 0; a < dist.length; a++) {
            if (dist[a] < 0) {
                continue;
            }
            for (int r = 0; r <= Math.min(2, radius - dist[a]); r++) {
                f.add(Morgan.mix(Morgan.mix(0x1f3d5b79, dist[a] * 16 + r), ids[r][a]));
            }
        }
        for (int[] path : mol.rings()) {
            int[] ring = Arrays.copyOf(path, path.length - 1); // closed path: the first atom repeats at the end
            int at = indexOf(ring, centre);
            if (at < 0) {
                continue;
            }
            for (int k = 0; k < ring.length; k++) {
                int pos = Math.min(Math.abs(k - at), ring.length - Math.abs(k - at));
                int ra = ring[k];
                f.add(Morgan.mix(Morgan.mix(0x2b7e1516, ring.length * 16 + pos), ids[0][ra]));
                for (int b : nbr[ra]) {
                    if (indexOf(ring, b) < 0 && !site.inCore(b)) {
                        f.add(Morgan.mix(Morgan.mix(0x3c6ef372, ring.length * 16 + pos), ids[Math.min(1, radius)][b]));
                    }
                }
            }
        }
    }

    /**
     * Ring nitrogens of aromatic five-membered rings that can carry the ring's N-H in turn (imidazole, pyrazole,
     * triazoles, tetrazole, the azole ring of benzimidazole or purine): two or more ring N without an exocyclic
     * substituent, one of them with a hydrogen. Null when the molecule has none.
     */
    static boolean[] annularNitrogens(MatchTarget mol) {
        boolean[] out = null;
        int[][] nbr = mol.adjacency();
        for (int[] path : mol.rings()) {
            if (path.length != 6) {
                continue; // closed path of five atoms
            }
            int n = 0;
            boolean h = false;
            boolean aromatic = true;
            for (int k = 0; k < 5; k++) {
                int a = path[k];
                aromatic &= mol.aromatic(a);
                if (mol.atomicNumber(a) == 7 && nbr[a].length == 2) {
                    n++;
                    h |= mol.implicitHydrogens(a) > 0;
                }
            }
            if (!aromatic || n < 2 || !h) {
                continue;
            }
            if (out == null) {
                out = new boolean[mol.atomCount()];
            }
            for (int k = 0; k < 5; k++) {
                int a = path[k];
                out[a] |= mol.atomicNumber(a) == 7 && nbr[a].length == 2;
            }
        }
        return out;
    }

    /** The other annular nitrogens of the five-membered rings through {@code n}. */
    private static int[] partners(MatchTarget mol, boolean[] annular, int n) {
        int[] out = new int[0];
        for (int[] path : mol.rings()) {
            if (path.length != 6 || indexOf(Arrays.copyOf(path, 5), n) < 0) {
                continue;
            }
            for (int k = 0; k < 5; k++) {
                if (path[k] != n && annular[path[k]] && indexOf(out, path[k]) < 0) {
                    out = Arrays.copyOf(out, out.length + 1);
                    out[out.length - 1] = path[k];
                }
            }
        }
        return out;
    }

    /** A growing list of feature hashes. */
    private static final class Features {
        private int[] f;
        private int size;

        Features(int capacity) {
            f = new int[capacity];
        }

        void add(int x) {
            if (size == f.length) {
                f = Arrays.copyOf(f, size * 2 + 16);
            }
            f[size++] = x;
        }

        int[] distinct() {
            Arrays.sort(f, 0, size);
            int d = 0;
            for (int i = 0; i < size; i++) {
                if (d == 0 || f[i] != f[d - 1]) {
                    f[d++] = f[i];
                }
            }
            return Arrays.copyOf(f, d);
        }
    }

    /** Tanimoto similarity of two sorted distinct feature sets. */
    public static double tanimoto(int[] a, int[] b) {
        int i = 0;
        int j = 0;
        int common = 0;
        while (i < a.length && j < b.length) {
            if (a[i] == b[j]) {
                common++;
                i++;
                j++;
            } else if (a[i] < b[j]) {
                i++;
            } else {
                j++;
            }
        }
        int union = a.length + b.length - common;
        return union == 0 ? 0 : (double) common / union;
    }

    /** Bond distances from {@code root}, −1 beyond {@code max}. */
    private static int[] distances(int[][] nbr, int root, int max) {
        int[] d = new int[nbr.length];
        Arrays.fill(d, -1);
        int[] queue = new int[nbr.length];
        int head = 0;
        int tail = 0;
        d[root] = 0;
        queue[tail++] = root;
        while (head < tail) {
            int u = queue[head++];
            if (d[u] == max) {
                continue;
            }
            for (int v : nbr[u]) {
                if (d[v] < 0) {
                    d[v] = d[u] + 1;
                    queue[tail++] = v;
                }
            }
        }
        return d;
    }

    private static int indexOf(int[] ring, int a) {
        for (int i = 0; i < ring.length; i++) {
            if (ring[i] == a) {
                return i;
            }
        }
        return -1;
    }
}
