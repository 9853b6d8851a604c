package ionmark.speciation.internal.profile;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleUnaryOperator;

import org.openscience.cdk.interfaces.IAtom;
import org.openscience.cdk.interfaces.IAtomContainer;

import ionmark.speciation.internal.estimate.EstimatedSite;
import ionmark.speciation.internal.microstates.SiteModel;

/**
 * What titrates in water between pH 0 and 14, for the macroscopic constants a card lists and for the
 * isoelectric point.
 *
 * <p>An aliphatic alcohol O–H (class {@value #ALCOHOL}) is a very weak acid: methanol 15.5, ethanol 15.9
 * (CRC, from memory). Its class value is fitted lower, and a β-amino or β-aryloxy alcohol then reads near
 * 13, which would list a constant and make a β-blocker an "ampholyte" with an isoelectric point near 11.
 * Such a site counts as titrating in water only when its estimate lies below 14 by more than its sd, or
 * when it is one O–H of a 1,2-diol: sugars and ribonucleosides are measured between 12 and 13.5 (glucose
 * 12.3, the 2',3'-diol of ribonucleosides 12.2–12.9, from memory).
 */
public final class WaterRange {
    public static final String ALCOHOL = "alcohol";
    public static final double TOP = 14;
    public static final double BOTTOM = 0;

    /** One titratable site as the rule reads it; {@code diol}: an O–H of a 1,2-diol. */
    public record Site(String group, boolean base, double pka, double sd, boolean diol) {
        public Site(String group, boolean base, double pka, double sd) {
            this(group, base, pka, sd, false);
        }
    }

    private WaterRange() {
    }

    /** The titratable sites of an analysis as the rule reads them: values from the model at the conditions. */
    public static List<Site> sites(List<EstimatedSite> est, SiteModel model, IAtomContainer mol) {
        List<Site> out = new ArrayList<>();
        int t = 0;
        for (EstimatedSite s : est) {
            if (!s.site().group().permanent()) {
                String id = s.site().group().id();
                out.add(new Site(id, model.base()[t], model.pka()[t], s.sd(),
                        ALCOHOL.equals(id) && vicinalDiol(mol, s.site().atom())));
                t++;
            }
        }
        return out;
    }

    /** Whether an alcohol O–H site is held out: its estimate is not below 14 by more than its sd. */
    public static boolean heldOut(Site s) {
        return !s.base() && !s.diol() && ALCOHOL.equals(s.group()) && s.pka() + s.sd() > TOP;
    }

    /** Whether the O–H on {@code atom} sits on a carbon next to a carbon that carries another O–H. */
    public static boolean vicinalDiol(IAtomContainer mol, int atom) {
        IAtom o = mol.getAtom(atom);
        for (IAtom c : mol.getConnectedAtomsList(o)) {
            for (IAtom c2 : mol.getConnectedAtomsList(c)) {
                if (c2.equals(o) || c2.getAtomicNumber() != 6) {
                    continue;
                }
                for (IAtom o2 : mol.getConnectedAtomsList(c2)) {
                    if (o2.getAtomicNumber() == 8 && mol.getConnectedBondsCount(o2) == 1
                            && o2.getImplicitHydrogenCount() != null && o2.getImplicitHydrogenCount() == 1) {
                        return true;
                    }
                }
            }
        }
        return false;
    }

    /**
     * The macroscopic constants without those of held-out alcohol sites: for each such site, the highest
     * remaining constant at or above 12 is dropped (an alcohol's constant is the last step).
     */
    public static List<Double> reportable(List<Double> ascending, List<Site> sites) {
        List<Double> out = new ArrayList<>(ascending);
        for (Site s : sites) {
            if (heldOut(s) && !out.isEmpty() && out.get(out.size() - 1) >= 12) {
                out.remove(out.size() - 1);
            }
        }
        return out;
    }

    /**
     * The isoelectric point of an ampholyte whose acid and base both titrate between pH 0 and 14: some
     * acid site (not a held-out alcohol) with its value at most 14, and some base site with its value at
     * least 0 or a permanent cation; the pH of zero mean charge found between the lowest and the highest
     * listed constant in 0–14, else null.
     *
     * @param macro      listed constants, ascending
     * @param meanCharge mean net charge at a pH, decreasing with pH
     */
    public static Double isoelectricPoint(List<Site> sites, boolean permanentCation, List<Double> macro,
            DoubleUnaryOperator meanCharge) {
        boolean acid = false;
        boolean base = permanentCation;
        for (Site s : sites) {
            if (s.base()) {
                base |= s.pka() >= BOTTOM;
            } else if (!heldOut(s)) {
                acid |= s.pka() <= TOP;
            }
        }
        List<Double> inRange = macro.stream().filter(v -> v >= BOTTOM && v <= TOP).toList();
        if (!acid || !base || inRange.isEmpty()) {
            return null;
        }
        double lo = inRange.get(0);
        double hi = inRange.get(inRange.size() - 1);
        if (meanCharge.applyAsDouble(lo) < 0 || meanCharge.applyAsDouble(hi) > 0) {
            return null;
        }
        for (int i = 0; i < 60; i++) {
            double mid = (lo + hi) / 2;
            if (meanCharge.applyAsDouble(mid) > 0) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return Math.round((lo + hi) / 2 * 1000) / 1000.0;
    }
}
