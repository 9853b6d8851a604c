package ionmark.console.internal;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.util.List;

import org.junit.jupiter.api.Test;

import ionmark.acidity.api.AcidityTable;
import ionmark.calibration.api.Observation;

/**
 * A calibration that makes the reference set worse than the margin is refused. The "fit" here is the
 * shipped table with the aliphatic carboxylic acid class moved 1.5 units up, as a department file with a
 * systematic error would pull it; the reference set holds many such acids (acetic 4.76, propanoic 4.87,
 * CRC, from memory), so its MAE must grow.
 */
class CalibrationGuardTest {
    static final AcidityTable HEAD = CliTest.TABLES.current();

    static AcidityTable pulled(double by) {
        return HEAD.withGroups(HEAD.groups().stream().map(g -> g.id().equals("carboxylic-aliphatic")
                ? g.withPka(g.pka() + by, g.source("pka")) : g).toList());
    }

    static CalibrationGuard.Verdict guard(AcidityTable fitted, double margin) {
        PrintStream sink = new PrintStream(new ByteArrayOutputStream(), true, StandardCharsets.UTF_8);
        // butanoic acid 4.82 (CRC, from memory) as the department's truth file
        return CalibrationGuard.report(CliTest.SPECIATION, CliTest.SPECIATION, HEAD, fitted,
                List.of(new Observation("T1", "CCCC(=O)O", List.of(4.82))), margin, sink, sink);
    }

    @Test
    void aFitThatMakesTheReferenceSetWorseThanTheMarginIsRefused() {
        CalibrationGuard.Verdict v = guard(pulled(1.5), CalibrationGuard.MARGIN);
        assertTrue(v.maeFitted() > v.maeHead() + CalibrationGuard.MARGIN, v.message());
        assertFalse(v.accepted(), v.message());
        assertTrue(v.message().contains("REFUSED"), v.message());
    }

    @Test
    void theSameFitIsAcceptedWhenTheMarginIsWidenedKnowingly() {
        assertTrue(guard(pulled(1.5), 5).accepted());
    }

    @Test
    void decisionFollowsTheMargin() {
        assertFalse(CalibrationGuard.decide(0.30, 0.40, 0.05).accepted());
        assertTrue(CalibrationGuard.decide(0.30, 0.34, 0.05).accepted());
        assertTrue(CalibrationGuard.decide(0.30, 0.20, 0.0).accepted());
        assertFalse(CalibrationGuard.decide(0.30, Double.NaN, 0.05).accepted());
    }
}
