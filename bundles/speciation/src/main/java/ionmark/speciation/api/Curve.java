package ionmark.speciation.api;

import java.util.Arrays;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * Titration curves over a pH range: an immutable value. The arrays are copied when the curve is made and each
 * accessor returns a fresh copy, so a caller can never change a curve another caller (or a cache) holds; the
 * indexed accessors ({@link #phAt(int)}, {@link #meanChargeAt(int)}, {@link #protonatedAt(int, int)}) read one
 * point without copying. Two curves are equal when their values are.
 *
 * @param ph             the pH grid
 * @param meanCharge     mean net charge at each pH
 * @param siteProtonated per site atom index (in site order), protonated fraction at each pH
 * @param chargeStates   per net charge (ascending), its fraction at each pH
 */
public record Curve(double[] ph, double[] meanCharge, Map<Integer, double[]> siteProtonated,
        Map<Integer, double[]> chargeStates) {

    public Curve {
        ph = ph.clone();
        meanCharge = meanCharge.clone();
        if (meanCharge.length != ph.length) {
            throw new IllegalArgumentException("mean charge has " + meanCharge.length + " points, pH grid " + ph.length);
        }
        siteProtonated = frozen(new LinkedHashMap<>(), siteProtonated, ph.length);
        chargeStates = frozen(new TreeMap<>(), chargeStates, ph.length);
    }

    private static Map<Integer, double[]> frozen(Map<Integer, double[]> into, Map<Integer, double[]> from, int n) {
        from.forEach((k, v) -> {
            if (v.length != n) {
                throw new IllegalArgumentException("curve " + k + " has " + v.length + " points, pH grid " + n);
            }
            into.put(k, v.clone());
        });
        return Collections.unmodifiableMap(into);
    }

    /** The pH grid (a copy). */
    @Override
    public double[] ph() {
        return ph.clone();
    }

    /** Mean net charge at each pH (a copy). */
    @Override
    public double[] meanCharge() {
        return meanCharge.clone();
    }

    /** Per site atom index, its protonated fraction at each pH (copies, in site order). */
    @Override
    public Map<Integer, double[]> siteProtonated() {
        return copies(new LinkedHashMap<>(), siteProtonated);
    }

    /** Per net charge, its fraction at each pH (copies, ascending charge). */
    @Override
    public Map<Integer, double[]> chargeStates() {
        return copies(new TreeMap<>(), chargeStates);
    }

    private static Map<Integer, double[]> copies(Map<Integer, double[]> into, Map<Integer, double[]> from) {
        from.forEach((k, v) -> into.put(k, v.clone()));
        return Collections.unmodifiableMap(into);
    }

    /** Number of points on the pH grid. */
    public int size() {
        return ph.length;
    }

    /** The pH of point {@code k}. */
    public double phAt(int k) {
        return ph[k];
    }

    /** The mean net charge at point {@code k}. */
    public double meanChargeAt(int k) {
        return meanCharge[k];
    }

    /** The protonated fraction of the site on atom {@code atom} at point {@code k}; NaN for an atom with no curve. */
    public double protonatedAt(int atom, int k) {
        double[] f = siteProtonated.get(atom);
        return f == null ? Double.NaN : f[k];
    }

    /** The atoms that have a curve, in site order. */
    public List<Integer> siteAtoms() {
        return List.copyOf(siteProtonated.keySet());
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Curve c && Arrays.equals(ph, c.ph) && Arrays.equals(meanCharge, c.meanCharge)
                && same(siteProtonated, c.siteProtonated) && same(chargeStates, c.chargeStates);
    }

    private static boolean same(Map<Integer, double[]> a, Map<Integer, double[]> b) {
        if (!a.keySet().equals(b.keySet())) {
            return false;
        }
        for (var e : a.entrySet()) {
            if (!Arrays.equals(e.getValue(), b.get(e.getKey()))) {
                return false;
            }
        }
        return true;
    }

    @Override
    public int hashCode() {
        int h = 31 * Arrays.hashCode(ph) + Arrays.hashCode(meanCharge);
        for (var e : siteProtonated.entrySet()) {
            h = 31 * h + e.getKey() * 7 + Arrays.hashCode(e.getValue());
        }
        for (var e : chargeStates.entrySet()) {
            h = 31 * h + e.getKey() * 11 + Arrays.hashCode(e.getValue());
        }
        return h;
    }

    @Override
    public String toString() {
        return "Curve[" + ph.length + " points, pH " + (ph.length == 0 ? "-" : ph[0] + "–" + ph[ph.length - 1])
                + ", sites " + siteProtonated.keySet() + ", charges " + chargeStates.keySet() + "]";
    }
}
