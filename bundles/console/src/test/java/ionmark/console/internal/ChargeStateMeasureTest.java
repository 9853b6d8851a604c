package ionmark.console.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;

import ionmark.acidity.internal.TableSnapshotService;
import ionmark.speciation.internal.SpeciationService;

/**
 * The charge-state measure on the project's drug-like reference file ({@code docs/data/druglike-charge.tsv}:
 * common drugs and textbook compounds, macroscopic constants recalled from handbooks and marked "from
 * memory" in its source column). Floors sit just below the figures measured when they were set, so that
 * a change that loses charge states fails here; the target (0.97 of compound-pH cases) is tracked in
 * docs/charge-states-and-physics.md.
 */
class ChargeStateMeasureTest {
    /**
     * Measured with table v29 when the measure was added: overall 0.886 (pH 2 0.911, 7.4 0.870, 10 0.878),
     * 5 spurious constants; with table v31 (drug-like families, docs/druglike-families.md): overall 0.943
     * (pH 2 0.943, 7.4 0.967, 10 0.919), 3 spurious constants; with the families after v31 (sulfonyl amidines,
     * 2-sulfinyl benzimidazoles, 2,6-dialkyl phenols, nitroethenediamines, diarylamino, unmeasured sites of measured
     * compounds): overall 0.965 (pH 2 0.951, 7.4 0.976, 10 0.967), 3 spurious constants; with table v33 (piperazine
     * N-alkyl carbon as centre, phenyl guanidines with ring terms, phosphonate reach 0.6): overall 0.973 (pH 2 0.959,
     * 7.4 0.976, 10 0.984), 3 spurious constants.
     */
    static final double OVERALL_FLOOR = 0.968;
    static final int SPURIOUS_CEILING = 4;

    static final Path FILE = Path.of("../../docs/data/druglike-charge.tsv");

    @Test
    void druglikeReferenceChargeStatesDoNotRegress() throws IOException {
        assertTrue(Files.isRegularFile(FILE), "the drug-like reference file is part of the project: " + FILE);
        List<ChargeStates.Truth> data = ChargeStates.read(FILE);
        assertTrue(data.size() >= 80, "at least 80 compounds, found " + data.size());
        SpeciationService s = new SpeciationService(TableSnapshotService.shipped(), 300, 30_000);
        List<ChargeStates.Row> rows = ChargeStates.run(s, data);
        ChargeStates.Summary sum = ChargeStates.summarise(rows);
        System.out.println("drug-like reference: " + sum.line());
        // the compounds that disagree, for whoever has to find out why
        Files.writeString(Path.of("target/druglike-charge-report.md"), ChargeStates.markdown(rows, sum));
        assertEquals(0, sum.failed(), sum.line());
        assertTrue(sum.overall() >= OVERALL_FLOOR, sum.line());
        assertTrue(sum.spurious() <= SPURIOUS_CEILING, sum.line());
    }

    // closed forms of the experimental side: one acid, an amino acid, a diacid

    @Test
    void aceticAcidIsHalfChargedAtItsPka() {
        assertEquals(-0.5, ChargeStates.experimentalCharge(List.of(4.76), 0, 4.76), 1e-12);
    }

    @Test
    void glycineIsZwitterionicNeutralBetweenItsConstants() {
        // 2.35 and 9.78 (CRC, from memory): at 6.06, the midpoint, cation and anion are equal
        assertEquals(0.0, ChargeStates.experimentalCharge(List.of(2.35, 9.78), 1, 6.065), 1e-9);
        assertEquals(1.0 / (1 + Math.pow(10, 2.0 - 2.35)), ChargeStates.experimentalCharge(List.of(2.35, 9.78), 1, 2.0),
                1e-4);
    }

    @Test
    void aMonoanionFromTwoConstantsUsesTheSequentialProduct() {
        // H2A, HA-, A2-: fractions 1 : 10^(pH-pK1) : 10^(2pH-pK1-pK2)
        double ph = 5;
        double a = 1;
        double b = Math.pow(10, ph - 4.21);
        double c = Math.pow(10, 2 * ph - 4.21 - 5.64);
        assertEquals(-(b + 2 * c) / (a + b + c), ChargeStates.experimentalCharge(List.of(5.64, 4.21), 0, ph), 1e-12);
    }

    @Test
    void aFileWithoutZTopHasNoChargeRows(@org.junit.jupiter.api.io.TempDir Path dir) throws IOException {
        Path f = dir.resolve("t.tsv");
        Files.writeString(f, "id\tsmiles\tpka_values\nX1\tCC(=O)O\t4.76\n");
        assertTrue(ChargeStates.read(f).isEmpty());
    }

    @Test
    void frozenIdsAgreeWithAnIndependentImplementation() {
        // Python's hashlib with int(hex[:8], 16) % 100 < 15: of D00001..D00012, D00005, D00009 and D00012 are frozen
        for (int i = 1; i <= 12; i++) {
            String id = String.format("D%05d", i);
            assertEquals(i == 5 || i == 9 || i == 12, FrozenSplit.frozen(id), id);
        }
    }

    @Test
    void aboutFifteenPercentOfIdsAreFrozen() {
        int frozen = 0;
        for (int i = 0; i < 4000; i++) {
            frozen += FrozenSplit.frozen(String.format("D%05d", i)) ? 1 : 0;
        }
        // binomial(4000, 0.15): sd 22.6; four sd either side
        assertTrue(Math.abs(frozen - 600) < 91, "frozen " + frozen + " of 4000");
    }
}
