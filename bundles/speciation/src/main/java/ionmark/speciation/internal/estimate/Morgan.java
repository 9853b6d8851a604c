package ionmark.speciation.internal.estimate;


import ionmark.speciation.internal.sites.MatchTarget;

/**
 * Circular (Morgan) atom identifiers, in the manner of extended-connectivity fingerprints
 * (Rogers, D.; Hahn, M. J. Chem. Inf. Model. 2010, 50, 742–754): every atom starts from a hash of
 * its own invariants (element, heavy-atom degree, hydrogens, formal charge, aromaticity, ring
 * membership, packed into one word); each round hashes the atom's identifier with the sorted
 * (bond, neighbour identifier) pairs around it. Only used to compare site environments of measured
 * analogs ({@link SiteEnvironment}), so the exact hash function is an internal matter; it is the
 * same for the query and the measured compounds.
 *
 * <p>Written over plain arrays because a general-purpose fingerprinter was the largest single cost
 * of an estimate.
 */
final class Morgan {

    private Morgan() {
    }

    /**
     * Every atom's identifier after rounds 0 to {@code radius}: {@code ids[r][atom]}, computed as
     * {@link #of} computes them (for the site environments of {@link SiteEnvironment}).
     */
    static int[][] identifiers(MatchTarget mol, int radius) {
        return identifiers(mol, radius, null);
    }

    /** {@link #identifiers(MatchTarget, int)} with the hydrogens of the atoms marked in {@code noH} (may be null) left out. */
    static int[][] identifiers(MatchTarget mol, int radius, boolean[] noH) {
        int n = mol.atomCount();
        int[][] nbr = mol.adjacency();
        int[][] ids = new int[radius + 1][n];
        for (int i = 0; i < n; i++) {
            int packed = Math.min(mol.atomicNumber(i), 255) | Math.min(nbr[i].length, 15) << 8
                    | (noH != null && noH[i] ? 0 : Math.min(mol.implicitHydrogens(i), 15)) << 12 | (Math.max(-8, Math.min(mol.formalCharge(i), 7)) + 8) << 16
                    | (mol.aromatic(i) ? 1 : 0) << 20 | (mol.inRing(i) ? 1 : 0) << 21;
            ids[0][i] = mix(0x9747b28c, packed);
        }
        long[] pairs = new long[8];
        for (int round = 1; round <= radius; round++) {
            int seed = mix(0x5bd1e995, round);
            for (int i = 0; i < n; i++) {
                int d = nbr[i].length;
                if (pairs.length < d) {
                    pairs = new long[d];
                }
                for (int k = 0; k < d; k++) {
                    pairs[k] = ((long) mol.bondCode(i, k) << 32) | (ids[round - 1][nbr[i][k]] & 0xffffffffL);
                }
                sort(pairs, d);
                int x = mix(seed, ids[round - 1][i]);
                for (int k = 0; k < d; k++) {
                    x = mix(x, (int) pairs[k] ^ (int) (pairs[k] >>> 32) * 0x9E3779B1);
                }
                ids[round][i] = x;
            }
        }
        return ids;
    }

    /** Insertion sort of the first {@code d} values: an atom has a handful of neighbours. */
    private static void sort(long[] v, int d) {
        for (int i = 1; i < d; i++) {
            long x = v[i];
            int j = i - 1;
            while (j >= 0 && v[j] > x) {
                v[j + 1] = v[j];
                j--;
            }
            v[j + 1] = x;
        }
    }

    /** One step of a 32-bit multiplicative hash (MurmurHash3's mixing constants). */
    static int mix(int h, int v) {
        int k = v * 0xcc9e2d51;
        k = Integer.rotateLeft(k, 15) * 0x1b873593;
        h ^= k;
        h = Integer.rotateLeft(h, 13) * 5 + 0xe6546b64;
        h ^= h >>> 16;
        h *= 0x85ebca6b;
        h ^= h >>> 13;
        return h;
    }
}
