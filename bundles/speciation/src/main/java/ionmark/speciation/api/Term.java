package ionmark.speciation.api;

/**
 * One line of a site's derivation: what was added to the pKa, how much, and on whose authority.
 *
 * @param label  plain words, for example "Hammett σp(nitro) 0.78 × ρ 2.23, para"
 * @param value  contribution in pKa units (the first term is the class reference value itself)
 * @param source citation
 */
public record Term(String label, double value, String source) {
}
