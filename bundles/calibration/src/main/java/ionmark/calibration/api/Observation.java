package ionmark.calibration.api;

import java.util.List;

/** A compound with experimental macroscopic pKa values, ascending: calibration and accuracy input. */
public record Observation(String id, String structure, List<Double> pka) {
    public Observation {
        pka = List.copyOf(pka);
    }
}
