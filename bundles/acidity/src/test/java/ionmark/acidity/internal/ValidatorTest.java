package ionmark.acidity.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.function.UnaryOperator;

import org.junit.jupiter.api.Test;

import ionmark.acidity.api.Problem;
import ionmark.acidity.api.ValidationReport;

/**
 * One test per validator finding: a small valid table is broken in one place and the report must
 * name that place by its JSON path, in plain words.
 */
class ValidatorTest {
    static final String VALID = """
            {
              "format": "ionmark-acidity-table/1",
              "version": {"number": 1, "author": "t", "time": "2026-01-01T00:00:00Z", "comment": "c", "hash": "", "parent": 0},
              "references": [
                {"id": "crc", "citation": "CRC Handbook (from memory)"}
              ],
              "groups": [
                {"id": "acid", "name": "Carboxylic acid", "smarts": "[CX4:2][CX3](=O)[OX2H1:1]", "type": "acid", "pka": 4.76, "relation": "taft", "rho": 3.95, "attenuation": 0.45, "sd": 0.5, "sources": {"attenuation": "crc", "pka": "crc", "rho": "crc", "sd": "crc"}, "matches": ["CC(=O)O"], "misses": ["CC(=O)OC"]},
                {"id": "amine", "name": "Primary amine", "smarts": "[CX4][NX3;H2:1]", "type": "base", "pka": 10.6, "relation": "none", "sd": 0.5, "sources": {"pka": "crc", "sd": "crc"}, "matches": ["CCN"]}
              ],
              "substituents": [
                {"id": "chloro", "name": "chloro", "smarts": "Cl", "sigmaMeta": 0.37, "sigmaPara": 0.23, "sigmaI": 0.47, "sources": {"sigmaI": "crc", "sigmaMeta": "crc", "sigmaPara": "crc"}}
              ],
              "measured": [
                {"id": "acetic-acid", "name": "acetic acid", "smiles": "CC(=O)O", "pka": [4.76], "temperature": 25.0, "ionicStrength": 0.0, "method": "m", "source": "crc", "groups": ["acid"]},
                {"id": "ethylamine", "name": "ethylamine", "smiles": "CCN", "pka": [10.67], "temperature": 25.0, "ionicStrength": 0.0, "method": "m", "source": "crc", "groups": ["amine"]}
              ],
              "interaction": {"shifts": [[2, 4.6], [3, 2.45]], "decay": 0.7, "cutoff": 0.02, "source": "crc"}
            }
            """;

    static ValidationReport broken(UnaryOperator<String> edit) {
        String text = edit.apply(VALID);
        assertFalse(text.equals(VALID), "the edit did not change the table");
        return TableValidator.validate(text);
    }

    static void expectError(ValidationReport r, String path, String words) {
        assertFalse(r.ok(), "expected an error at " + path);
        assertTrue(r.errors().stream().anyMatch(p -> p.path().equals(path) && p.message().contains(words)),
                () -> "no error at " + path + " saying '" + words + "' in " + r.problems());
    }

    @Test
    void theBaseTableIsValid() {
        ValidationReport r = TableValidator.validate(VALID);
        assertTrue(r.ok(), r.problems().toString());
        assertEquals(List.of(), r.warnings());
    }

    @Test
    void notJson() {
        expectError(TableValidator.validate("{\"format\": "), "$", "not valid JSON at line 1");
    }

    @Test
    void smartsThatDoesNotCompile() {
        expectError(broken(t -> t.replace("[CX4][NX3;H2:1]", "[CX4][NX3;H2:1")), "$.groups[1].smarts",
                "SMARTS does not compile");
    }

    @Test
    void smartsInSeveralParts() {
        // site perception matches each class rooted at its site atom, which needs one connected pattern
        expectError(broken(t -> t.replace("[CX4][NX3;H2:1]", "[CX4].[NX3;H2:1]")), "$.groups[1].smarts",
                "not one connected pattern");
    }

    @Test
    void noMarkedAtom() {
        expectError(broken(t -> t.replace("[CX4][NX3;H2:1]", "[CX4][NX3;H2]")), "$.groups[1].smarts",
                "no ionizable atom marked");
    }

    @Test
    void valueOutOfPhysicalRange() {
        expectError(broken(t -> t.replace("\"pka\": 10.6", "\"pka\": 31.0")), "$.groups[1].pka",
                "outside the physical range");
        expectError(broken(t -> t.replace("\"temperature\": 25.0, \"ionicStrength\": 0.0, \"method\": \"m\", "
                + "\"source\": \"crc\", \"groups\": [\"amine\"]", "\"temperature\": 250.0, \"ionicStrength\": 0.0, "
                        + "\"method\": \"m\", \"source\": \"crc\", \"groups\": [\"amine\"]")),
                "$.measured[1].temperature", "outside the physical range");
    }

    @Test
    void duplicateIds() {
        expectError(broken(t -> t.replace("\"id\": \"amine\"", "\"id\": \"acid\"")), "$.groups[1].id",
                "duplicate group id 'acid'");
    }

    @Test
    void identicalPatterns() {
        expectError(broken(t -> t.replace("[CX4][NX3;H2:1]", "[CX4:2][CX3](=O)[OX2H1:1]")), "$.groups[1].smarts",
                "identical pattern to $.groups[0]");
    }

    @Test
    void numberWithoutASource() {
        expectError(broken(t -> t.replace("\"sources\": {\"pka\": \"crc\", \"sd\": \"crc\"}",
                "\"sources\": {\"sd\": \"crc\"}")), "$.groups[1].pka", "has no source");
    }

    @Test
    void measuredStructureThatDoesNotParse() {
        expectError(broken(t -> t.replace("\"smiles\": \"CCN\"", "\"smiles\": \"CC(N\"")), "$.measured[1].smiles",
                "structure does not parse");
    }

    @Test
    void unknownReference() {
        expectError(broken(t -> t.replace("\"sigmaMeta\": \"crc\"", "\"sigmaMeta\": \"nowhere\"")),
                "$.substituents[0].sources.sigmaMeta", "unknown reference 'nowhere'");
        expectError(broken(t -> t.replace("\"source\": \"crc\", \"groups\": [\"acid\"]",
                "\"source\": \"nowhere\", \"groups\": [\"acid\"]")), "$.measured[0].source", "unknown reference");
    }

    @Test
    void unknownGroupClassInAMeasuredCompound() {
        expectError(broken(t -> t.replace("\"groups\": [\"amine\"]", "\"groups\": [\"amide\"]")),
                "$.measured[1].groups[0]", "unknown group class 'amide'");
    }

    @Test
    void measuredCompoundNotMatchedByItsClass() {
        expectError(broken(t -> t.replace("\"groups\": [\"amine\"]", "\"groups\": [\"acid\"]")),
                "$.measured[1].groups[0]", "does not match CCN");
    }

    @Test
    void patternThatMissesItsOwnExample() {
        expectError(broken(t -> t.replace("\"matches\": [\"CCN\"]", "\"matches\": [\"CCO\"]")),
                "$.groups[1].matches[0]", "does not match its own example");
        expectError(broken(t -> t.replace("\"misses\": [\"CC(=O)OC\"]", "\"misses\": [\"OC(=O)CC\"]")),
                "$.groups[0].misses[0]", "listed as an example it must not match");
    }

    @Test
    void wrongKindOfValue() {
        expectError(broken(t -> t.replace("\"type\": \"base\"", "\"type\": \"alkali\"")), "$.groups[1].type",
                "'acid' or 'base'");
        expectError(broken(t -> t.replace("\"rho\": 3.95", "\"rho\": \"big\"")), "$.groups[0].rho", "must be a number");
    }

    @Test
    void unknownResonanceDemand() {
        expectError(broken(t -> t.replace("\"relation\": \"taft\",", "\"relation\": \"taft\", \"resonance\": \"p*\",")),
                "$.groups[0].resonance", "resonance must be \"p\", \"p-\" or \"p+\", not \"p*\"");
    }

    @Test
    void unexercisedClassIsAWarningNotAnError() {
        ValidationReport r = broken(t -> t.replace("\"groups\": [\"amine\"]", "\"groups\": []"));
        assertTrue(r.ok(), r.problems().toString());
        assertTrue(r.warnings().stream().anyMatch(p -> p.path().equals("$.groups[1]")
                && p.message().contains("no measured compound exercises")), r.warnings().toString());
    }

    @Test
    void overlappingPatternsAreAWarning() {
        ValidationReport r = broken(t -> t.replace("\"id\": \"amine\", \"name\": \"Primary amine\", \"smarts\": "
                + "\"[CX4][NX3;H2:1]\"", "\"id\": \"amine\", \"name\": \"Primary amine\", \"smarts\": \"[CH3][NX3;H2:1]\"")
                .replace("\"matches\": [\"CCN\"]", "\"matches\": [\"CN\"]").replace("\"smiles\": \"CCN\"",
                        "\"smiles\": \"CN\"")
                .replace("{\"id\": \"chloro\"", "{\"id\": \"chloro\"").replace("\"groups\": [\n", "\"groups\": [\n")
                .replace("    {\"id\": \"amine\"", "    {\"id\": \"amine2\", \"name\": \"Amine on carbon\", \"smarts\": "
                        + "\"[CX4][NX3;H2:1]\", \"type\": \"base\", \"pka\": 10.6, \"relation\": \"none\", \"sd\": 0.5, "
                        + "\"sources\": {\"pka\": \"crc\", \"sd\": \"crc\"}, \"matches\": [\"CN\"]},\n    {\"id\": \"amine\""));
        assertTrue(r.warnings().stream().anyMatch(p -> p.message().contains("overlaps with")), r.problems().toString());
    }

    @Test
    void everyProblemIsReportedAtOnce() {
        ValidationReport r = broken(t -> t.replace("[CX4][NX3;H2:1]", "[CX4][NX3;H2]").replace("\"pka\": 4.76",
                "\"pka\": 40.0").replace("\"smiles\": \"CCN\"", "\"smiles\": \"CC(N\""));
        assertTrue(r.errors().size() >= 3, r.problems().toString());
        assertTrue(r.problems().stream().allMatch(p -> p.path().startsWith("$")));
        assertEquals(Problem.Severity.ERROR, r.errors().get(0).severity());
    }
}
