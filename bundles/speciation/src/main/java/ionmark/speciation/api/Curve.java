package ionmark.speciation.api;

import java.util.List;
import java.util.Map;

/**
 * Titration curves over a pH range.
 *
 * @param ph            the pH grid
 * @param meanCharge    mean net charge at each pH
 * @param siteProtonated per site atom index, protonated fraction at each pH
 * @param chargeStates  per net charge, its fraction at each pH
 */
public record Curve(double[] ph, double[] meanCharge, Map<Integer, double[]> siteProtonated,
        Map<Integer, double[]> chargeStates) {
    public List<Integer> siteAtoms() {
        return List.copyOf(siteProtonated.keySet());
    }
}
