package ionmark.notebook.api;

/**
 * Where a structure goes in a two-phase step at one pH: the fraction in the organic phase from its logD and
 * the phase volume ratio, f = D·r / (1 + D·r) with D = 10^logD and r = V(organic)/V(water). An estimate for
 * planning.
 *
 * @param ph               the aqueous phase's pH
 * @param logD             logD at that pH
 * @param solvent          the organic solvent named in the step, or "organic solvent" when none is named
 * @param ratio            V(organic) / V(water)
 * @param ratioAssumed     true when the step states no ratio and 1:1 was assumed
 * @param fractionOrganic  0 to 1
 */
public record Partition(double ph, double logD, String solvent, double ratio, boolean ratioAssumed,
        double fractionOrganic) {
}
