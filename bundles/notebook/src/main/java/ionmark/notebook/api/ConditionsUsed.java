package ionmark.notebook.api;

import java.util.List;

/**
 * The conditions a structure was annotated at, each with the words it came from.
 *
 * @param ph            the pH (the low end of a range), or null when none applies
 * @param phHigh        the high end of a stated range, or null
 * @param phWords       the words the pH was read from, or null
 * @param implied       true when the pH is implied by a named reagent solution ("sat. NaHCO3"), not stated
 * @param temperatureC  °C (25 when none stated)
 * @param temperatureWords the words, or null
 * @param ionicStrengthM mol/L (0 when none stated)
 * @param ionicWords    the words, or null
 * @param notes         how each condition was found where it matters: a bound, a condition taken from outside
 *                      the structure's section, a statement not used because it is out of range
 */
public record ConditionsUsed(Double ph, Double phHigh, String phWords, boolean implied, double temperatureC,
        String temperatureWords, double ionicStrengthM, String ionicWords, List<String> notes) {
    public ConditionsUsed {
        notes = List.copyOf(notes);
    }
}
