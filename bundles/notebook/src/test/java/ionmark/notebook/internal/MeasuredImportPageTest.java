package ionmark.notebook.internal;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import ionmark.acidity.internal.TableSnapshotService;
import ionmark.speciation.internal.MeasuredImportService;
import ionmark.speciation.measured.MeasuredImport;

/** The per-row preview of the measured-values import page. */
class MeasuredImportPageTest {
    static String preview(String tsv) {
        return MeasuredImportPage.rows(new MeasuredImportService().read(tsv, MeasuredImport.Format.TSV,
                TableSnapshotService.shipped(), "admin"));
    }

    @Test
    void everyRowIsShownWithItsNumberAndProblemsEscaped() {
        // 2,6-dimethylpyridine 6.72 (CRC Handbook, 25 °C, from memory); the second row is deliberately broken
        String html = preview("lut26\tCc1cccc(C)n1\t6.72\t25\t0\tpotentiometry\tcrc\t2,6-dimethylpyridine\n"
                + "x<b>\tC1CC(\t4.0\t25\t0\tpotentiometry\tcrc\tbroken\n");
        assertTrue(html.contains("<td>1</td><td>lut26</td>"), html);
        assertTrue(html.contains("<td>2</td>"), html);
        assertTrue(html.contains("structure not readable"), html);
        assertTrue(html.contains("x&lt;b&gt;"), html);
        assertFalse(html.contains("x<b>"), html);
        assertTrue(html.contains("1 ready, 1 with problems"), html);
    }
}
