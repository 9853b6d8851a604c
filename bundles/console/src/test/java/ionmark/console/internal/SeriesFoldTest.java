package ionmark.console.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.stream.IntStream;

import org.junit.jupiter.api.Test;

/** Series folds: a series always falls into the same fold, and the folds are filled about evenly. */
class SeriesFoldTest {
    @Test
    void aSeriesAlwaysFallsIntoTheSameFold() {
        String key = "[C]=1[C]=[C][C]=[C][C]1 | phenol";
        assertEquals(SeriesExperiment.seriesFold(key, 5), SeriesExperiment.seriesFold(key, 5));
        assertEquals(SeriesExperiment.seriesFold(key, 2), SeriesExperiment.seriesFold(key, 2));
    }

    @Test
    void foldsAreFilledAboutEvenly() {
        int[] n = new int[5];
        IntStream.range(0, 1000).forEach(i -> n[SeriesExperiment.seriesFold("series " + i, 5)]++);
        for (int c : n) {
            assertTrue(c > 150 && c < 250, java.util.Arrays.toString(n));
        }
    }
}
