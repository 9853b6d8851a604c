package ionmark.console.internal;

import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.io.PrintStream;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import ionmark.acidity.internal.TableSnapshotService;
import ionmark.calibration.api.Observation;
import ionmark.calibration.api.TruthFile;
import ionmark.speciation.internal.SpeciationService;

/**
 * Accuracy on the development set (../shared/data/iupac-dev.tsv, IUPAC Digitized pKa Dataset subset,
 * CC BY-NC 4.0; read at test time, never copied into the project). Floors just below today's
 * measured figures, so that a change cannot silently lose accuracy; the targets (80 %, 0.6) are not
 * met yet and are tracked in the README.
 */
@Tag("slow")
class DevelopmentSetAccuracyTest {
    static final double WITHIN1_FLOOR = 0.64;
    static final double MAE_CEILING = 1.0;

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
