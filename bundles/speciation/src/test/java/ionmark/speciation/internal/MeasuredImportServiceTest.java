package ionmark.speciation.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.internal.TableSnapshotService;
import ionmark.speciation.measured.MeasuredImport;

/**
 * Bulk import of measured values: every row checked, problems reported with their row number. Values:
 * 2,6-dimethylpyridine 6.72 and 4-chlorophenol 9.41 (CRC Handbook, 25 °C, from memory).
 */
class MeasuredImportServiceTest {
    static final AcidityTable HEAD = TableSnapshotService.shipped();
    static final String TSV = String.join("\n",
            "id\tsmiles\tpka_values\ttemperature\tionic_strength\tmethod\tsource\tname",
            "lut26\tCc1cccc(C)n1\t6.72\t25\t0\tpotentiometry\tcrc\t2,6-dimethylpyridine",
            "bad-smiles\tC1CC(\t4.0\t25\t0\tpotentiometry\tcrc\tbroken",
            "descending\tOC(=O)CCCCC(=O)O\t5.4;4.4\t25\t0\tpotentiometry\tcrc\tadipic acid",
            "too-many\tOc1cccc(Cl)c1\t9.12;10.2\t25\t0\tpotentiometry\tcrc\t3-chlorophenol",
            "out-of-range\tCC(C)(C)O\t19\t25\t0\tpotentiometry\tcrc\ttert-butanol",
            "clp\tClc1ccc(O)cc1\t9.41\t25\t0.1\tUV titration\tIn-house notebook ELN-0042, p. 12\t4-chlorophenol",
            "acetic\tCC(=O)O\t4.76\t25\t0\tpotentiometry\tcrc\tacetic acid again",
            "");

    static MeasuredImport.Result read(String text) {
        return new MeasuredImportService().read(text, MeasuredImport.Format.TSV, HEAD, "test");
    }

    static MeasuredImport.Row row(MeasuredImport.Result r, int line) {
        return r.rows().stream().filter(x -> x.line() == line).findFirst().orElseThrow();
    }

    @Test
    void everyRowIsCheckedAndProblemsCarryTheirRowNumber() {
        MeasuredImport.Result r = read(TSV);
        assertEquals(7, r.rows().size());
        assertTrue(row(r, 2).ok(), row(r, 2).problems().toString());
        assertTrue(row(r, 3).problems().get(0).contains("not readable"), row(r, 3).problems().toString());
        assertTrue(row(r, 4).problems().stream().anyMatch(p -> p.contains("ascending")), row(r, 4).problems().toString());
        assertTrue(row(r, 5).problems().stream().anyMatch(p -> p.contains("titratable site")), row(r, 5).problems()
                .toString());
        assertTrue(row(r, 6).problems().stream().anyMatch(p -> p.contains("outside")), row(r, 6).problems().toString());
        assertTrue(row(r, 7).ok(), row(r, 7).problems().toString());
        assertTrue(row(r, 8).problems().stream().anyMatch(p -> p.contains("already a measured compound")));
        assertFalse(r.ok());
    }

    @Test
    void aSourceThatIsNoReferenceIdBecomesANewReferenceWithThatCitation() {
        MeasuredImport.Result r = read(TSV);
        assertEquals(1, r.newReferences().size());
        assertEquals("In-house notebook ELN-0042, p. 12", r.newReferences().get(0).citation());
        assertEquals(r.newReferences().get(0).id(), row(r, 7).compound().source());
    }

    @Test
    void theDraftIsTheHeadWithTheReadyRowsAndValidates() {
        MeasuredImport.Result r = read(TSV);
        assertEquals(HEAD.measured().size() + 2, r.draft().measured().size());
        assertEquals(HEAD.version().number() + 1, r.draft().version().number());
        assertEquals(HEAD.version().number(), r.draft().version().parent());
        var svc = new TableSnapshotService(null);
        var v = svc.validate(svc.toJson(r.draft()));
        assertTrue(v.ok(), v.errors().toString());
        assertEquals(List.of("pyridine"), row(r, 2).sites());
    }

    @Test
    void sdfRecordsAreNumberedAndReadLikeRows() {
        String mol = String.join("\n", "", "  manual", "", "  2  1  0  0  0  0  0  0  0  0999 V2000",
                "    0.0000    0.0000    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0",
                "    1.5000    0.0000    0.0000 N   0  0  0  0  0  0  0  0  0  0  0  0", "  1  2  1  0", "M  END");
        String sdf = mol + "\n> <id>\nmethylamine-x\n\n> <pka_values>\n10.64\n\n> <source>\ncrc\n\n$$$$\n" + mol
                + "\n> <id>\nnovalue\n\n> <source>\ncrc\n\n$$$$\n";
        MeasuredImport.Result r = new MeasuredImportService().read(sdf, MeasuredImport.Format.SDF, HEAD, "test");
        assertEquals(2, r.rows().size());
        // methylamine is a measured compound of the shipped table already
        assertTrue(row(r, 1).problems().stream().anyMatch(p -> p.contains("already a measured compound")),
                row(r, 1).problems().toString());
        assertTrue(row(r, 2).problems().contains("no pKa values"), row(r, 2).problems().toString());
    }
}
