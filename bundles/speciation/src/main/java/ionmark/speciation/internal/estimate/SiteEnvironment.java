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

    /** Sorted distinct feature hashes of the site's environment. */
    public static int[] of(MatchTarget mol, PerceivedSite site, int radius) {
        return of(mol, Morgan.identifiers(mol, radius), site, radius);
    }

    /** {@link #of(MatchTarget, PerceivedSite, int)} with the molecule's identifiers ({@link Morgan#identifiers}) given. */
    static int[] of(MatchTarget mol, int[][] ids, PerceivedSite site, int radius) {
        int[][] nbr = mol.adjacency();
        int n = mol.atomCount();
        int[] dist = distances(nbr, site.atom(), radius);
        int[] f = new int[n * (radius + 1) + 64];
        int size = 0;
        for (int a = 0; a < n; a++) {
            if (dist[a] < 0) {
                continue;
            }
            for (int r = 0; r <= Math.min(2, radius - dist[a]); r++) {
                if (size == f.length) {
                    f = Arrays.copyOf(f, size * 2);
                }
                f[size++] = Morgan.mix(Morgan.mix(0x1f3d5b79, dist[a] * 16 + r), ids[r][a]);
            }
        }
        int centre = site.centres().length > 0 ? site.centres()[0] : site.atom();
        for (int[] path : mol.rings()) {
            int[] ring = Arrays.copyOf(path, path.length - 1); // closed path: the first atom repeats at the end
            int at = indexOf(ring, centre);
            if (at < 0) {
                continue;
            }
            for (int k = 0; k < ring.length; k++) {
                int pos = Math.min(Math.abs(k - at), ring.length - Math.abs(k - at));
                int ra = ring[k];
                if (size + nbr[ra].length + 1 >= f.length) {
                    f = Arrays.copyOf(f, f.length * 2 + nbr[ra].length + 1);
                }
                f[size++] = Morgan.mix(Morgan.mix(0x2b7e1516, ring.length * 16 + pos), ids[0][ra]);
                for (int b : nbr[ra]) {
                    if (indexOf(ring, b) < 0 && !site.inCore(b)) {
                        f[size++] = Morgan.mix(Morgan.mix(0x3c6ef372, ring.length * 16 + pos),
                                ids[Math.min(1, radius)][b]);
                    }
                }
            }
        }
        Arrays.sort(f, 0, size);
        int distinct = 0;
        for (int i = 0; i < size; i++) {
            if (distinct == 0 || f[i] != f[distinct - 1]) {
                f[distinct++] = f[i];
            }
        }
        return Arrays.copyOf(f, distinct);
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
