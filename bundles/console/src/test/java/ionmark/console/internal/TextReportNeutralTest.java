package ionmark.console.internal;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.Test;

import ionmark.acidity.internal.TableSnapshotService;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.internal.SpeciationService;

/** The text report's neutral line names zwitterions only where there are some. */
class TextReportNeutralTest {
    private static final SpeciationService S = new SpeciationService(TableSnapshotService.shipped(), 300, 30_000);

    @AfterAll
    static void close() {
        S.close();
    }

    private static String neutralLine(String smiles, double ph) {
        return TextReport.of(S.analyse(smiles, Conditions.atPh(ph))).lines().filter(l -> l.startsWith("net charge"))
                .findFirst().orElseThrow();
    }

    @Test
    void anAcidWithoutABaseHasNoZwitterionToName() {
        // acetic acid (4.76, CRC, from memory) at pH 3: all neutral species are the uncharged acid
        String line = neutralLine("CC(=O)O", 3);
        assertFalse(line.contains("zwitterion"), line);
    }

    @Test
    void glycineBetweenItsConstantsIsNamedAsZwitterion() {
        // glycine 2.35 and 9.78 (CRC, from memory): at pH 6 the neutral species is almost all zwitterion
        String line = neutralLine("NCC(=O)O", 6);
        assertTrue(line.matches(".*zwitterions (99\\.\\d|100\\.0) %.*"), line);
        assertTrue(line.contains("uncharged 0.0 %"), line);
    }
}
