package ionmark.acidity.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.PairRule;
import ionmark.acidity.api.ValidationReport;

/** Pair rules in the table file: read, written back unchanged, and checked by the validator. */
class PairRuleValidatorTest {
    static final String RULE = "{\"id\": \"malonic\", \"name\": \"dialkylmalonic acid\", "
            + "\"smarts\": \"[OX2H1:1][CX3](=O)[CX4H0][CX3](=O)[OX2H1:2]\", \"singly\": 1.1, \"doubly\": 1.2, "
            + "\"source\": \"crc\", \"note\": \"n\", \"matches\": [\"CCC(CC)(C(=O)O)C(=O)O\"]}";
    static final String PAIR = "  \"pairs\": [\n    " + RULE + "\n  ],";

    static String withPair(String pair) {
        return ValidatorTest.VALID.replace("  \"interaction\":", pair + "\n  \"interaction\":");
    }

    @Test
    void aTableWithAPairRuleIsValidAndKeepsItThroughWriting() {
        ValidationReport r = TableValidator.validate(withPair(PAIR));
        assertTrue(r.ok(), r.problems().toString());
        AcidityTable t = r.table().orElseThrow();
        assertEquals(1, t.pairs().size());
        PairRule p = t.pairs().get(0);
        assertEquals(1.1, p.singly());
        assertEquals(1.2, p.doubly());
        assertEquals(3.4, p.interaction(), 1e-12);
        AcidityTable again = TableCodec.read(TableWriter.write(t)).table();
        assertEquals(t.pairs(), again.pairs());
        assertEquals(TableWriter.hash(t), TableWriter.hash(again));
    }

    @Test
    void aTableWithoutPairRulesIsWrittenWithoutThem() {
        // older tables keep their content hash: no empty block appears
        AcidityTable t = TableValidator.validate(ValidatorTest.VALID).table().orElseThrow();
        assertTrue(t.pairs().isEmpty());
        assertFalse(TableWriter.write(t).contains("\"pairs\""));
    }

    @Test
    void bothSiteAtomsMustBeMapped() {
        ValidationReport r = TableValidator.validate(withPair(PAIR.replace("[OX2H1:2]", "[OX2H1]")));
        ValidatorTest.expectError(r, "$.pairs[0].smarts", "one atom :1 and one atom :2");
    }

    @Test
    void valuesStayInTheirRange() {
        ValidationReport r = TableValidator.validate(withPair(PAIR.replace("\"doubly\": 1.2", "\"doubly\": -0.5")));
        ValidatorTest.expectError(r, "$.pairs[0].doubly", "doubly charged");
        r = TableValidator.validate(withPair(PAIR.replace("\"singly\": 1.1", "\"singly\": 9")));
        ValidatorTest.expectError(r, "$.pairs[0].singly", "singly charged");
    }

    @Test
    void theSourceMustBeAKnownReference() {
        ValidationReport r = TableValidator.validate(withPair(PAIR.replace("\"source\": \"crc\"", "\"source\": \"nobody\"")));
        ValidatorTest.expectError(r, "$.pairs[0].source", "unknown reference 'nobody'");
    }

    @Test
    void theExampleMustMatch() {
        ValidationReport r = TableValidator.validate(withPair(PAIR.replace("CCC(CC)(C(=O)O)C(=O)O", "OC(=O)CC(=O)O")));
        ValidatorTest.expectError(r, "$.pairs[0].matches[0]", "does not match its own example");
    }

    @Test
    void idsAreUnique() {
        ValidationReport r = TableValidator.validate(withPair("  \"pairs\": [\n    " + RULE + ",\n    " + RULE + "\n  ],"));
        ValidatorTest.expectError(r, "$.pairs[1].id", "duplicate pair rule id 'malonic'");
    }
}
