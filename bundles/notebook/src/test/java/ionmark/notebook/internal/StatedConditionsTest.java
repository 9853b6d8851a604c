package ionmark.notebook.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

/** How chemists write conditions in entries, and text that must not be read as a condition. */
class StatedConditionsTest {

    @ParameterizedTest(name = "\"{0}\" → pH {1}–{2}")
    @CsvSource(delimiter = '|', value = {
        "acidified to pH 2.5 and extracted | 2.5 | 2.5",
        "mobile phase pH 3.0 | 3.0 | 3.0",
        "assay buffer pH 7.4 | 7.4 | 7.4",
        "pH = 2.5 | 2.5 | 2.5",
        "pH=7 | 7 | 7",
        "a pH of 9 | 9 | 9",
        "adjusted to a pH of 10.5 with NaOH | 10.5 | 10.5",
        "at pH 5–6 | 5 | 6",
        "at pH 5-6 | 5 | 6",
        "pH 5 to 6 | 5 | 6",
        "between pH 4 and 5 | 4 | 5",
        "pH: 8.2 | 8.2 | 8.2",
        "pH ~ 6 | 6 | 6",
        "pH ≈ 6.5 | 6.5 | 6.5",
        "(pH 1.2) | 1.2 | 1.2",
        "simulated gastric fluid at pH 1.2 and 37 °C | 1.2 | 1.2",
        "final pH was 4.8 | 4.8 | 4.8",
        "the pH is 7.0 | 7.0 | 7.0",
        "PBS, pH 7.4, 0.15 M NaCl | 7.4 | 7.4",
        "brought to pH 12 | 12 | 12",
        "pH 0.5 | 0.5 | 0.5",
        "pH 14 | 14 | 14",
        "pH 7.40 | 7.40 | 7.40",
        "washed at pH 9.5, | 9.5 | 9.5",
        "pH 6.8; | 6.8 | 6.8",
        "pH 3.0. | 3.0 | 3.0",
        "pH\t7 | 7 | 7",
        "pH 7 to 7.5 | 7 | 7.5",
        "pH 8–9. | 8 | 9",
        "pH of 2 | 2 | 2",
    })
    void readsStatedPh(String text, double low, double high) {
        List<StatedConditions.PhStatement> found = StatedConditions.ph(text);
        assertEquals(1, found.size(), () -> "statements in '" + text + "': " + found);
        assertEquals(low, found.get(0).low(), 1e-9);
        assertEquals(high, found.get(0).high(), 1e-9);
        assertTrue(text.contains(found.get(0).words().split("\\s")[0]), "keeps the words it read");
    }

    @ParameterizedTest(name = "no pH in \"{0}\"")
    @ValueSource(strings = {
        "pHenyl ring", "the pH meter was calibrated", "pH electrode rinsed", "checked the pH", "pHosphate",
        "phenol", "alpha", "graph 7", "pH paper", "a high pH", "ph 7 (lower case is not the unit)",
        "pH 25", "pH -5", "2 M HCl", "1.5 mM",
    })
    void ignoresTextThatIsNotAPhStatement(String text) {
        assertEquals(List.of(), StatedConditions.ph(text), text);
    }

    @ParameterizedTest(name = "\"{0}\" → {1} °C")
    @CsvSource(delimiter = '|', value = {"held at 37 °C | 37", "at 25°C | 25", "40 ℃ | 40", "heated to 60 deg C | 60",
        "at 4 degrees C | 4"})
    void readsTemperature(String text, double t) {
        assertEquals(t, StatedConditions.temperature(text).get(0).value(), 1e-9);
    }

    @ParameterizedTest(name = "\"{0}\" → I = {1} M")
    @CsvSource(delimiter = '|', value = {"0.15 M NaCl | 0.15", "I = 0.1 M | 0.1", "150 mM NaCl | 0.15",
        "in 0.5 M KCl | 0.5", "I=0.05 M | 0.05"})
    void readsIonicStrength(String text, double i) {
        assertEquals(i, StatedConditions.ionicStrength(text).get(0).value(), 1e-9);
    }

    @ParameterizedTest
    @ValueSource(strings = {"2 M HCl", "the I band", "1 M sucrose"})
    void noIonicStrengthWithoutASalt(String text) {
        assertEquals(List.of(), StatedConditions.ionicStrength(text), text);
    }

    @org.junit.jupiter.api.Test
    void severalStatementsInOneText() {
        var found = StatedConditions.ph("extracted at pH 2 then back-extracted at pH 10");
        assertEquals(2, found.size());
        assertEquals(2, found.get(0).low(), 1e-9);
        assertEquals(10, found.get(1).low(), 1e-9);
    }
}
