package ionmark.acidity.api;

import java.util.Map;
import java.util.Objects;

/**
 * A substituent and its electronic constants. The SMARTS's first atom is the one bonded to the
 * skeleton. A constant that is not defined is {@code NaN}.
 *
 * @param sigmaMeta      Hammett σm
 * @param sigmaPara      Hammett σp
 * @param sigmaParaMinus Hammett σp⁻ (through-resonance with electron-rich centres), NaN where not defined
 * @param sigmaParaPlus  Hammett σp⁺ (through-resonance with electron-poor centres), NaN where not defined
 * @param sigmaI         inductive constant σI (used along sp3 paths)
 * @param sources        reference id per field name
 */
public record Substituent(String id, String name, String smarts, double sigmaMeta, double sigmaPara,
        double sigmaParaMinus, double sigmaParaPlus, double sigmaI, Map<String, String> sources) {

    public Substituent {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(smarts, "smarts");
        sources = Map.copyOf(sources == null ? Map.of() : sources);
    }

    /** The para constant for a class's resonance demand, falling back to σp where the special one is undefined. */
    public double sigmaPara(Resonance resonance) {
        return switch (resonance) {
            case PARA_MINUS -> Double.isNaN(sigmaParaMinus) ? sigmaPara : sigmaParaMinus;
            case PARA_PLUS -> Double.isNaN(sigmaParaPlus) ? sigmaPara : sigmaParaPlus;
            case PARA -> sigmaPara;
        };
    }

    public String source(String field) {
        return sources.getOrDefault(field, "");
    }
}
