package ionmark.acidity.api;

import java.util.Map;
import java.util.Objects;
import java.util.TreeMap;

/**
 * Where a record's fitted numbers came from: the calibration that set them, on how many compounds,
 * with what error, and the numbers before and after. Kept beside the record, never in its curator's
 * note. Since 1.4.
 *
 * <pre>{@code
 * table.fit("phenol").ifPresent(f -> System.out.println(f.source() + " n=" + f.n() + " RMSE " + f.rmse()));
 * }</pre>
 *
 * @param source reference id of the calibration (an entry of the table's references)
 * @param date   ISO date of the fit, may be empty
 * @param n      compounds the fit used (the larger of the per-class and the whole-model counts), 0 when unknown
 * @param rmse   root-mean-square error of the per-class fit in pKa units, NaN when unknown
 * @param before field name → value before the fit (what the curated base gave the calibration)
 * @param after  field name → value the fit set
 * @param log    the calibration's own words, verbatim
 */
public record ClassFit(String source, String date, int n, double rmse, Map<String, Double> before,
        Map<String, Double> after, String log) {
    public ClassFit {
        Objects.requireNonNull(source, "source");
        date = date == null ? "" : date;
        before = java.util.Collections.unmodifiableMap(new TreeMap<>(before == null ? Map.of() : before));
        after = java.util.Collections.unmodifiableMap(new TreeMap<>(after == null ? Map.of() : after));
        log = log == null ? "" : log;
    }

    /** A copy that no longer vouches for the named field (a curator set it by hand). */
    public ClassFit without(String field) {
        var b = new TreeMap<>(before);
        var a = new TreeMap<>(after);
        b.remove(field);
        a.remove(field);
        return new ClassFit(source, date, n, rmse, b, a, log);
    }
}
