package ionmark.speciation.spi;

/**
 * One experimental value attributed to a group class: {@code pka} = pKa0 − ρ·{@code sigma} is what the
 * one-site least-squares fit solves for.
 *
 * @param group class id
 * @param sigma the substituent sum of the site (0 for classes without a relation)
 * @param pka   the experimental value
 */
public record CalibrationPoint(String group, double sigma, double pka) {
}
