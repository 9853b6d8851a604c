package ionmark.speciation.internal.microstates;

import java.util.List;
import java.util.Map;

/**
 * Solved populations at one pH.
 *
 * @param protonated   protonated fraction per site
 * @param chargeStates fraction per net charge of the titratable part (fixed charges not included)
 * @param meanCharge   mean charge of the titratable part
 * @param top          leading microstates: bit i set = site i deprotonated, with fractions
 * @param sampled      true when a Monte Carlo estimate
 * @param stdError     largest standard error of a site fraction (0 when exact)
 */
public record Populations(double[] protonated, Map<Integer, Double> chargeStates, double meanCharge,
        List<Microstate> top, boolean sampled, double stdError) {

    /** One microstate; {@code deprotonated[i]} for site i. */
    public record Microstate(boolean[] deprotonated, double fraction) {
    }
}
