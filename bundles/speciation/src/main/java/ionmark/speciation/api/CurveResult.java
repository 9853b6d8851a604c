package ionmark.speciation.api;

/**
 * The answer of {@link Speciation#curve}: the curves, or why there are none. A call never throws for bad input
 * or an exhausted time budget; it returns a failure whose message a chemist can read.
 *
 * <pre>{@code
 * CurveResult r = speciation.curve("CC(=O)O", Conditions.noPh(), 0, 14, 0.1);
 * if (r.ok()) {
 *     double[] charge = r.curve().meanCharge();
 * } else {
 *     show(r.error());                             // for example "not annotated: ..." or a reading error
 * }
 * }</pre>
 *
 * @param curve         the curves; null on failure
 * @param error         one line for a chemist; null on success
 * @param errorPosition where the structure could not be read, when the reader can say (else null)
 */
public record CurveResult(Curve curve, String error, ErrorPosition errorPosition) {

    public CurveResult {
        if ((curve == null) == (error == null)) {
            throw new IllegalArgumentException("a curve result carries either a curve or an error");
        }
    }

    public static CurveResult of(Curve curve) {
        return new CurveResult(curve, null, null);
    }

    public static CurveResult failed(String error) {
        return new CurveResult(null, error, null);
    }

    public static CurveResult failed(String error, ErrorPosition at) {
        return new CurveResult(null, error, at);
    }

    public boolean ok() {
        return error == null;
    }
}
