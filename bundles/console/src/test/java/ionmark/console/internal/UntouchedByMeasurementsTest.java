package ionmark.console.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

import ionmark.acidity.api.AcidityTable;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Speciation;
import ionmark.speciation.internal.MeasuredImportService;
import ionmark.speciation.measured.MeasuredImport;

/**
 * "No loss elsewhere": after a bulk import of measured pyridines, a compound none of whose sites has one
 * of them as an analog gives byte-identical JSON (apart from the table version) under the draft and the head,
 * and a close analog moves with its derivation naming the measurement. Values: 2,6-dimethylpyridine 6.72,
 * 2,4-dimethylpyridine 6.99 (CRC Handbook, 25 °C, from memory).
 */
class UntouchedByMeasurementsTest {
    static final String TSV = String.join("\n", "id\tsmiles\tpka_values\ttemperature\tionic_strength\tmethod\tsource\tname",
            "lut26\tCc1cccc(C)n1\t6.72\t25\t0\tpotentiometry\tcrc\t2,6-dimethylpyridine",
            "lut24\tCc1ccnc(C)c1\t6.99\t25\t0\tpotentiometry\tcrc\t2,4-dimethylpyridine", "");

    static final AcidityTable HEAD = CliTest.TABLES.current();
    static final AcidityTable DRAFT = draft();

    static AcidityTable draft() {
        MeasuredImport.Result r = new MeasuredImportService().read(TSV, MeasuredImport.Format.TSV, HEAD, "test");
        assertTrue(r.ok(), r.rows().toString());
        // a version hash of its own: the pinned service is cached by version
        var v = r.draft().version();
        return r.draft().withVersion(new ionmark.acidity.api.TableVersion(v.number(), v.author(), v.time(), v.comment(),
                "untouched-test", v.parent()));
    }

    static Analysis analyse(Speciation s, String smiles, Conditions c) {
        Analysis a = s.analyse(smiles, c);
        assertTrue(a.ok(), a.error());
        return a;
    }

    static String full(Analysis a) {
        var o = AnalysisJson.of(null, a);
        o.remove("tableVersion");
        return o.toString();
    }

    @Test
    void theDraftKeepsTheHeadsClassesRulesAndFitProvenance() {
        assertEquals(HEAD.groups(), DRAFT.groups());
        assertEquals(HEAD.substituents(), DRAFT.substituents());
        assertEquals(HEAD.pairs(), DRAFT.pairs());
        assertEquals(HEAD.interaction(), DRAFT.interaction());
        assertEquals(HEAD.fits(), DRAFT.fits());
        assertEquals(HEAD.measured().size() + 2, DRAFT.measured().size());
    }

    @Test
    void compoundsWithoutAMeasuredAnalogGiveByteIdenticalJson() {
        Speciation taught = CliTest.SPECIATION.pinned(DRAFT);
        // an aliphatic acid, a phenol, an amino acid, a tertiary amine, a pyrimidine with an effective fitted class
        for (String smiles : List.of("CC(=O)O", "Oc1ccc(Cl)cc1", "NCC(=O)O", "CN1CCCCC1", "CC(=O)N1CCNc2nc(N)nc(N)c21")) {
            for (Conditions c : List.of(Conditions.noPh(), Conditions.atPh(7.4))) {
                Analysis before = analyse(CliTest.SPECIATION, smiles, c);
                Analysis after = analyse(taught, smiles, c);
                // the head's own measured compounds may be analogs here; the two new ones must not be
                assertTrue(after.sites().stream().flatMap(s -> s.derivation().stream())
                        .noneMatch(t -> t.label().contains("dimethylpyridine")), smiles);
                assertNotEquals(before.tableVersion(), after.tableVersion());
                assertEquals(AnalogFiring.json(before), AnalogFiring.json(after), smiles + " at " + c);
                assertEquals(full(before), full(after), smiles + " (full record)");
            }
        }
    }

    @Test
    void aCloseAnalogMovesAndItsDerivationNamesTheMeasurement() {
        Speciation taught = CliTest.SPECIATION.pinned(DRAFT);
        // 2,4,6-trimethylpyridine: the two lutidines' ring patterns together
        Analysis before = analyse(CliTest.SPECIATION, "Cc1cc(C)nc(C)c1", Conditions.noPh());
        Analysis after = analyse(taught, "Cc1cc(C)nc(C)c1", Conditions.noPh());
        AnalogFiring.Stats st = AnalogFiring.of(List.of(before), List.of(after));
        assertEquals(1, st.corrected(), st.line());
        // the local similarity of the nearest analog; the weight comes from it blended with the whole molecules'
        assertTrue(st.similarity() > 0 && st.similarity() <= 1 && st.weight() > 0, st.line());
        // and the whole-molecule similarity of that same analog, which the summary prints beside it
        assertTrue(st.whole() > 0 && st.whole() <= 1, st.line());
        assertTrue(st.line().contains("whole-molecule similarity"), st.line());
        var lines = after.sites().get(0).derivation().stream().filter(t -> t.label().startsWith(AnalogFiring.LINE))
                .toList();
        assertTrue(lines.stream().anyMatch(t -> t.label().contains("2,6-dimethylpyridine")), lines.toString());
        assertTrue(lines.stream().allMatch(t -> t.source().contains("CRC")), lines.toString());
        assertNotEquals(before.macroPka().get(0), after.macroPka().get(0));
    }
}
