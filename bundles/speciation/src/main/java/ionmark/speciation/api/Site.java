package ionmark.speciation.api;

import java.util.List;

import ionmark.acidity.api.SiteType;

/**
 * One ionizable site.
 *
 * @param atom       0-based atom index in the parent structure (heavy atoms in input order)
 * @param element    element symbol of the site atom
 * @param group      group class id, or "outside-table" for an atom the table does not cover
 * @param groupName  readable class name
 * @param type       acid or base (pKa is always that of the protonated form)
 * @param pka        estimated (or measured) site pKa at the stated temperature and ionic strength
 * @param sd         one standard deviation of the estimate, pKa units
 * @param protonated fraction of molecules with this site protonated at the stated pH, or null without a pH
 * @param derivation the class value and every correction, in order
 * @param basis      how the value was obtained
 * @param permanent  a permanent charge (never titrated)
 */
public record Site(int atom, String element, String group, String groupName, SiteType type, double pka, double sd,
        Double protonated, List<Term> derivation, Basis basis, boolean permanent) {
    public Site {
        derivation = List.copyOf(derivation);
    }

    public Site withProtonated(Double p) {
        return new Site(atom, element, group, groupName, type, pka, sd, p, derivation, basis, permanent);
    }
}
