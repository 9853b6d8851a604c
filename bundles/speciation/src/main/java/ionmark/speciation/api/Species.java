package ionmark.speciation.api;

/**
 * A microstate and its share of the population.
 *
 * @param smiles   the structure with formal charges
 * @param charge   net charge
 * @param fraction share of all molecules, 0 to 1
 */
public record Species(String smiles, int charge, double fraction) {
}
