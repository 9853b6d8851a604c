package ionmark.acidity.api;

import java.util.List;
import java.util.Map;

/**
 * How strongly two charged sites shift each other, in pKa units, as a function of the number of
 * bonds between them: like charges destabilise, opposite charges stabilise, by the same amount.
 *
 * @param shifts  pairs {@code [bonds, pKa units]} in ascending bond count
 * @param decay   factor per further bond beyond the last tabulated distance
 * @param cutoff  interactions below this (pKa units) are treated as zero when clustering sites
 * @param source  reference id
 * @param exempt  ids of group classes the distance rule leaves out: an acid whose anion's charge is
 *                already part of the substituent constants other sites see for it (a sulfonic acid, whose
 *                sulfo constants are those of the sulfonate), so adding the rule would count that charge twice
 * @param reach   per group class, a factor on the rule for every pair that class's site takes part in
 *                (1 when absent): the bond count stands for the distance between two unit charges, and
 *                a charge on a long-bonded, diffuse atom (thiolate sulfur) sits farther from its partner
 *                than the count says. A pair's interaction is {@code at(bonds)} times both sites' factors.
 *                Since 1.3.
 */
public record SiteInteraction(List<double[]> shifts, double decay, double cutoff, String source, List<String> exempt,
        Map<String, Double> reach) {

    public SiteInteraction {
        shifts = shifts == null ? List.of() : shifts.stream().map(double[]::clone).toList();
        exempt = exempt == null ? List.of() : List.copyOf(exempt);
        reach = reach == null ? Map.of() : java.util.Collections.unmodifiableMap(new java.util.TreeMap<>(reach));
    }

    /** The pairs {@code [bonds, pKa units]}, as copies: the rule cannot be changed through them. */
    @Override
    public List<double[]> shifts() {
        return shifts.stream().map(double[]::clone).toList();
    }

    /** The per-class factors, read-only, in class-id order. */
    @Override
    public Map<String, Double> reach() {
        return java.util.Collections.unmodifiableMap(reach);
    }

    /** Without per-class factors. */
    public SiteInteraction(List<double[]> shifts, double decay, double cutoff, String source, List<String> exempt) {
        this(shifts, decay, cutoff, source, exempt, Map.of());
    }

    /** Without exempt classes: every pair of charged sites interacts. */
    public SiteInteraction(List<double[]> shifts, double decay, double cutoff, String source) {
        this(shifts, decay, cutoff, source, List.of(), Map.of());
    }

    /** The factor on the rule for pairs with a site of group class {@code groupId} (0 when exempt). */
    public double reachOf(String groupId) {
        return exempts(groupId) ? 0.0 : reach.getOrDefault(groupId, 1.0);
    }

    /** The same rule with the factor of one group class set ({@code 1} removes it). */
    public SiteInteraction withReach(String groupId, double factor) {
        var m = new java.util.TreeMap<>(reach);
        if (factor == 1.0) {
            m.remove(groupId);
        } else {
            m.put(groupId, factor);
        }
        return new SiteInteraction(shifts, decay, cutoff, source, exempt, m);
    }

    /** Whether the distance rule leaves sites of group class {@code groupId} out. */
    public boolean exempts(String groupId) {
        return exempt.contains(groupId);
    }

    /** Interaction in pKa units between two unit charges {@code bonds} apart (0 when no bond path). */
    public double at(int bonds) {
        if (bonds <= 0 || shifts.isEmpty()) {
            return 0.0;
        }
        double last = 0;
        int lastBonds = 0;
        for (double[] s : shifts) {
            if ((int) s[0] == bonds) {
                return s[1];
            }
            if (s[0] > bonds) {
                return s[1];
            }
            last = s[1];
            lastBonds = (int) s[0];
        }
        return last * Math.pow(decay, bonds - lastBonds);
    }

    /** The shifts as an immutable map, for display. */
    public Map<Integer, Double> asMap() {
        var m = new java.util.TreeMap<Integer, Double>();
        shifts.forEach(s -> m.put((int) s[0], s[1]));
        return java.util.Collections.unmodifiableMap(m);
    }
}
