package ionmark.calibration.internal;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.GroupClass;
import ionmark.acidity.api.Reference;
import ionmark.acidity.api.Relation;
import ionmark.calibration.api.ClassFit;
import ionmark.calibration.api.TableCalibration;
import ionmark.speciation.spi.CalibrationPoint;

/**
 * Per-class least squares: pKa_exp = pKa0 − ρ·Σ, Σ the class's substituent sum for that compound.
 * One pass of trimming drops residuals beyond max(3·1.4826·MAD, 1.5); the fitted values are then
 * shrunk toward the current ones with the weight of {@link TableCalibration#PRIOR_WEIGHT} compounds.
 * ρ is fitted only with at least 8 compounds and a spread of Σ above 0.15, and kept only when it has
 * the prior's sign and lies within a factor of two of it; otherwise it stays. A reference value that
 * would move by more than max(2.5, 3·sd) is not applied (the class definition, not its number, is
 * then in question): the fit is reported with {@code rejected} and the class keeps its values.
 */
final class Calibration {
    static final double MIN_SD = 0.25;

    private Calibration() {
    }

    static TableCalibration.Result fit(AcidityTable base, List<CalibrationPoint> points, String refId, String citation) {
        Map<String, List<CalibrationPoint>> byGroup = new LinkedHashMap<>();
        points.forEach(p -> byGroup.computeIfAbsent(p.group(), k -> new ArrayList<>()).add(p));
        List<GroupClass> groups = new ArrayList<>();
        List<ClassFit> fits = new ArrayList<>();
        for (GroupClass g : base.groups()) {
            List<CalibrationPoint> ps = byGroup.getOrDefault(g.id(), List.of());
            if (ps.isEmpty() || g.permanent()) {
                groups.add(g);
                continue;
            }
            ClassFit f = fitOne(g, ps);
            fits.add(f);
            if (f.rejected()) {
                groups.add(g);
                continue;
            }
            String note = String.format(Locale.ROOT, "%s fit (%s): n=%d, trimmed %d, RMSE %.2f%s; before pKa %.2f%s",
                    refId, java.time.LocalDate.now(), f.n(), f.trimmed(), f.rmse(), Double.isNaN(f.r2()) ? ""
                            : String.format(Locale.ROOT, ", r² %.2f", f.r2()), f.pkaBefore(),
                    Double.isNaN(f.rhoBefore()) ? "" : String.format(Locale.ROOT, ", rho %.2f", f.rhoBefore()));
            GroupClass fitted = g.withCalibration(round(f.pkaAfter()), round(f.rhoAfter()), round(f.sdAfter()), refId);
            groups.add(new GroupClass(fitted.id(), fitted.name(), fitted.smarts(), fitted.type(), fitted.pka(),
                    fitted.relation(), fitted.rho(), fitted.attenuation(), fitted.resonance(), fitted.enthalpy(),
                    fitted.sd(), fitted.permanent(), fitted.sources(), note, fitted.matches(), fitted.misses()));
        }
        List<Reference> refs = new ArrayList<>(base.references().stream().filter(r -> !r.id().equals(refId)).toList());
        refs.add(new Reference(refId, citation + " " + "Least-squares calibration per class on compounds with one "
                + "value and sites of one type (the value given to the site that titrates first), then a "
                + "whole-model refinement of class values, reaction constants and pair rules, " + java.time.LocalDate.now() + "; the fit statistics are in each class's and "
                + "pair rule's note."));
        return new TableCalibration.Result(base.withGroups(groups).withReferences(refs), fits);
    }

    static ClassFit fitOne(GroupClass g, List<CalibrationPoint> ps) {
        boolean withRho = g.relation() != Relation.NONE && ps.size() >= 8 && spread(ps) > 0.15;
        double[] ab = ols(ps, withRho, g.rho());
        List<CalibrationPoint> kept = new ArrayList<>();
        double[] res = residuals(ps, ab);
        double[] abs = Arrays.stream(res).map(Math::abs).sorted().toArray();
        double mad = abs.length == 0 ? 0 : abs[abs.length / 2];
        double cut = Math.max(3 * 1.4826 * mad, 1.5);
        for (int i = 0; i < ps.size(); i++) {
            if (Math.abs(res[i]) <= cut) {
                kept.add(ps.get(i));
            }
        }
        if (kept.size() >= 2) {
            withRho = withRho && kept.size() >= 8 && spread(kept) > 0.15;
            ab = ols(kept, withRho, g.rho());
        } else {
            kept = ps;
        }
        if (withRho && !(ab[1] / g.rho() >= 0.5 && ab[1] / g.rho() <= 2.0)) {
            withRho = false;
            ab = ols(kept, false, g.rho());
        }
        double[] r = residuals(kept, ab);
        double ss = 0;
        for (double v : r) {
            ss += v * v;
        }
        int n = kept.size();
        int params = withRho ? 2 : 1;
        double rmse = Math.sqrt(ss / n);
        double sdFit = n > params ? Math.sqrt(ss / (n - params)) : Math.max(rmse, g.sd());
        int k = TableCalibration.PRIOR_WEIGHT;
        double prior = g.pka();
        double pka = (n * ab[0] + k * prior) / (n + k);
        double rho = g.relation() == Relation.NONE ? g.rho() : (n * ab[1] + k * g.rho()) / (n + k);
        double sd = Math.max(MIN_SD, Math.sqrt((n * sdFit * sdFit + k * g.sd() * g.sd()) / (n + k)));
        double r2 = Double.NaN;
        if (withRho) {
            double mean = kept.stream().mapToDouble(CalibrationPoint::pka).average().orElse(0);
            double tot = kept.stream().mapToDouble(p -> (p.pka() - mean) * (p.pka() - mean)).sum();
            r2 = tot > 0 ? 1 - ss / tot : Double.NaN;
        }
        boolean rejected = Math.abs(pka - prior) > Math.max(2.5, 3 * g.sd());
        if (rejected) {
            return new ClassFit(g.id(), n, ps.size() - n, g.pka(), g.pka(), g.rho(), g.rho(), rmse, r2, g.sd(), true);
        }
        return new ClassFit(g.id(), n, ps.size() - n, g.pka(), pka, g.rho(), rho, rmse, r2, sd, false);
    }

    /** [pKa0, ρ] by ordinary least squares (ρ fixed when not fitted). */
    static double[] ols(List<CalibrationPoint> ps, boolean withRho, double rho) {
        int n = ps.size();
        if (!withRho) {
            double r = Double.isNaN(rho) ? 0 : rho;
            double a = ps.stream().mapToDouble(p -> p.pka() + r * p.sigma()).sum() / n;
            return new double[] {a, rho};
        }
        double mx = ps.stream().mapToDouble(CalibrationPoint::sigma).average().orElse(0);
        double my = ps.stream().mapToDouble(CalibrationPoint::pka).average().orElse(0);
        double sxy = 0;
        double sxx = 0;
        for (CalibrationPoint p : ps) {
            sxy += (p.sigma() - mx) * (p.pka() - my);
            sxx += (p.sigma() - mx) * (p.sigma() - mx);
        }
        double slope = sxy / sxx; // pKa = a + slope·Σ, and slope = −ρ
        return new double[] {my - slope * mx, -slope};
    }

    static double[] residuals(List<CalibrationPoint> ps, double[] ab) {
        double rho = Double.isNaN(ab[1]) ? 0 : ab[1];
        return ps.stream().mapToDouble(p -> p.pka() - (ab[0] - rho * p.sigma())).toArray();
    }

    static double spread(List<CalibrationPoint> ps) {
        double m = ps.stream().mapToDouble(CalibrationPoint::sigma).average().orElse(0);
        return Math.sqrt(ps.stream().mapToDouble(p -> (p.sigma() - m) * (p.sigma() - m)).sum() / ps.size());
    }

    static double round(double v) {
        return Double.isNaN(v) ? v : Math.round(v * 100) / 100.0;
    }
}
