package ionmark.acidity.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.ValidationReport;

/** Classes the distance rule leaves out: read, written back unchanged, and checked by the validator. */
class InteractionExemptTest {
    static String withExempt(String ids) {
        return ValidatorTest.VALID.replace("\"source\": \"crc\"}\n}", "\"source\": \"crc\", \"exempt\": [" + ids + "]}\n}");
    }

    @Test
    void anExemptAcidIsReadAndKeptThroughWriting() {
        ValidationReport r = TableValidator.validate(withExempt("\"acid\""));
        assertTrue(r.ok(), r.problems().toString());
        AcidityTable t = r.table().orElseThrow();
        assertEquals(List.of("acid"), t.interaction().exempt());
        assertTrue(t.interaction().exempts("acid"));
        assertFalse(t.interaction().exempts("amine"));
        AcidityTable again = TableCodec.read(TableWriter.write(t)).table();
        assertEquals(t.interaction().exempt(), again.interaction().exempt());
        assertEquals(TableWriter.hash(t), TableWriter.hash(again));
    }

    @Test
    void aTableWithoutExemptClassesIsWrittenWithoutTheKey() {
        // older tables keep their content hash: no empty list appears
        AcidityTable t = TableValidator.validate(ValidatorTest.VALID).table().orElseThrow();
        assertTrue(t.interaction().exempt().isEmpty());
        assertFalse(TableWriter.write(t).contains("\"exempt\""));
    }

    @Test
    void anExemptClassMustExistAndBeAnAcid() {
        ValidatorTest.expectError(TableValidator.validate(withExempt("\"nothing\"")), "$.interaction.exempt[0]",
                "unknown group class 'nothing'");
        ValidatorTest.expectError(TableValidator.validate(withExempt("\"acid\", \"amine\"")), "$.interaction.exempt[1]",
                "'amine' is a base");
    }
}
