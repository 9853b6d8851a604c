package ionmark.acidity.api;

import java.util.List;
import java.util.Objects;

/**
 * A compound with measured values; they override estimates for an exact structure match.
 *
 * @param pka           macroscopic pKa values, ascending
 * @param temperature   °C
 * @param ionicStrength mol/L; 0 for thermodynamic (extrapolated) values
 * @param method        how it was measured (potentiometry, spectrophotometry, compilation value …)
 * @param source        reference id
 * @param groups        ids of the group classes whose sites these values belong to
 */
public record MeasuredCompound(String id, String name, String smiles, List<Double> pka, double temperature,
        double ionicStrength, String method, String source, List<String> groups) {

    public MeasuredCompound {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(smiles, "smiles");
        pka = List.copyOf(pka == null ? List.of() : pka);
        name = name == null ? id : name;
        method = method == null ? "" : method;
        source = source == null ? "" : source;
        groups = List.copyOf(groups == null ? List.of() : groups);
    }
}
