package ionmark.console.internal;

import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.io.PrintStream;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;

import ionmark.acidity.internal.TableSnapshotService;
import ionmark.calibration.api.Observation;
import ionmark.calibration.api.TruthFile;
import ionmark.speciation.internal.SpeciationService;

/**
 * Accuracy on the development set (../shared/data/iupac-dev.tsv, IUPAC Digitized pKa Dataset subset,
 * CC BY-NC 4.0; read at test time, never copied into the project), so that a change cannot silently
 * lose accuracy. The test scores the whole file, compounds the fit has seen included: table v31 measures
 * within 1.0 = 83.0 %, MAE 0.585 here (December 2026), above the 5-fold cross-validated figures on the
 * open 85 % (80.5 %, 0.627; README §7). The floors sit a small margin below what this test measures
 * (1.5 points, 0.025 units): floors at the cross-validated figures would let a loss of four points pass.
 * A recalibration that moves the figure resets the floors the same way. It takes under a minute, so it runs in
 * every {@code mvn -B verify} (and in CI, where the data is present) rather than only with {@code -Pslow}.
 */
class DevelopmentSetAccuracyTest {
    static final double WITHIN1_FLOOR = 0.815;
    static final double MAE_CEILING = 0.61;

    @Test
    void developmentSetAccuracyDoesNotRegress() throws IOException {
        Path shared = Path.of(System.getProperty("ionmark.shared", "../../../shared"));
        Path truth = shared.resolve("data/iupac-dev.tsv");
        assumeTrue(Files.isRegularFile(truth), "development data not present at " + truth + ": accuracy test skipped");
        List<Observation> data = TruthFile.read(truth);
        SpeciationService s = new SpeciationService(TableSnapshotService.shipped(), 300, 30_000);
        var scored = Accuracy.run(s, data, null, new Progress(new PrintStream(OutputStream.nullOutputStream()), 0));
        Accuracy.Summary sum = Accuracy.summarise(scored, s);
        System.out.println("development set: " + sum.line());
        assertTrue(sum.within1() >= WITHIN1_FLOOR, sum.line());
        assertTrue(sum.mae() <= MAE_CEILING, sum.line());
    }
}
