package ionmark.speciation.internal.sites;

import java.util.Set;

import ionmark.acidity.api.GroupClass;

/**
 * A site found by a group class pattern.
 *
 * @param atom    index of the ionizable atom
 * @param group   the winning (most specific) class
 * @param core    atoms of the class match (not substituents of this site)
 * @param centres atoms from which substituent distances are counted (the site atom when the class marks none)
 */
public record PerceivedSite(int atom, GroupClass group, Set<Integer> core, int[] centres) {
}
