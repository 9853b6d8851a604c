package ionmark.acidity.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;

import org.junit.jupiter.api.Test;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.SiteInteraction;
import ionmark.acidity.api.ValidationReport;

/** Per-class reach factors on the distance rule: read, written back unchanged, sourced and range-checked. */
class InteractionReachTest {
    static String withReach(String reach, boolean sourced) {
        String t = ValidatorTest.VALID.replace("\"source\": \"crc\"}\n}", "\"source\": \"crc\", \"reach\": {" + reach
                + "}}\n}");
        if (sourced) {
            t = t.replace("\"sources\": {\"attenuation\": \"crc\", \"pka\": \"crc\", \"rho\": \"crc\", \"sd\": \"crc\"}",
                    "\"sources\": {\"attenuation\": \"crc\", \"pka\": \"crc\", \"reach\": \"crc\", \"rho\": \"crc\", "
                            + "\"sd\": \"crc\"}");
        }
        return t;
    }

    @Test
    void aReachFactorIsReadAndKeptThroughWriting() {
        ValidationReport r = TableValidator.validate(withReach("\"acid\": 0.7", true));
        assertTrue(r.ok(), r.problems().toString());
        AcidityTable t = r.table().orElseThrow();
        assertEquals(Map.of("acid", 0.7), t.interaction().reach());
        assertEquals(0.7, t.interaction().reachOf("acid"), 1e-12);
        assertEquals(1.0, t.interaction().reachOf("amine"), 1e-12);
        AcidityTable again = TableCodec.read(TableWriter.write(t)).table();
        assertEquals(t.interaction().reach(), again.interaction().reach());
        assertEquals(TableWriter.hash(t), TableWriter.hash(again));
    }

    @Test
    void aTableWithoutFactorsIsWrittenWithoutTheKey() {
        // older tables keep their content hash: no empty map appears
        AcidityTable t = TableValidator.validate(ValidatorTest.VALID).table().orElseThrow();
        assertTrue(t.interaction().reach().isEmpty());
        assertFalse(TableWriter.write(t).contains("\"reach\""));
    }

    @Test
    void aFactorNeedsAKnownClassASourceAndAPhysicalValue() {
        ValidatorTest.expectError(TableValidator.validate(withReach("\"nothing\": 0.7", true)),
                "$.interaction.reach.nothing", "unknown group class 'nothing'");
        ValidatorTest.expectError(TableValidator.validate(withReach("\"acid\": 0.7", false)),
                "$.interaction.reach.acid", "has no source");
        ValidatorTest.expectError(TableValidator.validate(withReach("\"acid\": 3.0", true)),
                "$.interaction.reach.acid", "outside the physical range");
    }

    @Test
    void anExemptClassHasNoReachAndOneFactorRemovesTheEntry() {
        SiteInteraction si = new SiteInteraction(java.util.List.of(new double[] {3, 2.45}), 0.7, 0.02, "crc",
                java.util.List.of("acid"), Map.of("amine", 0.8));
        assertEquals(0.0, si.reachOf("acid"), 1e-12);
        assertEquals(0.8, si.reachOf("amine"), 1e-12);
        assertTrue(si.withReach("amine", 1.0).reach().isEmpty());
        assertEquals(0.6, si.withReach("thiol", 0.6).reachOf("thiol"), 1e-12);
    }
}
