package ionmark.speciation.internal.sites;

import ionmark.acidity.api.GroupClass;

/**
 * A site found by a group class pattern.
 *
 * @param atom    index of the ionizable atom
 * @param group   the winning (most specific) class
 * @param core    atoms of the class match (not substituents of this site), ascending, each once
 * @param centres atoms from which substituent distances are counted (the site atom when the class marks none)
 */
public record PerceivedSite(int atom, GroupClass group, int[] core, int[] centres) {
    /** Whether {@code a} is an atom of the class match. */
    public boolean inCore(int a) {
        return java.util.Arrays.binarySearch(core, a) >= 0;
    }
}
