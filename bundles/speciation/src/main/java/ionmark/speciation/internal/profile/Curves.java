package ionmark.speciation.internal.profile;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import ionmark.speciation.api.Curve;
import ionmark.speciation.internal.estimate.EstimatedSite;
import ionmark.speciation.internal.microstates.MicrostateSolver;
import ionmark.speciation.internal.microstates.Populations;
import ionmark.speciation.internal.microstates.Problem;

/** Titration curves: mean charge, each site's protonated fraction and each charge state over a pH grid. */
public final class Curves {
    private Curves() {
    }

    /** Refuses a grid that is empty, runs backwards or has more than 100,000 points. */
    public static void check(double from, double to, double step) {
        if (!(step > 0) || !(to >= from) || (to - from) / step > 100_000) {
            throw new IllegalArgumentException("curve needs from <= to and a positive step (at most 100000 points)");
        }
    }

    public static Curve of(Problem p, MicrostateSolver solver, double from, double to, double step) {
        int n = (int) Math.round((to - from) / step) + 1;
        double[] ph = new double[n];
        double[] mean = new double[n];
        Map<Integer, double[]> site = new LinkedHashMap<>();
        Map<Integer, double[]> states = new TreeMap<>();
        List<EstimatedSite> titr = p.sites().stream().filter(s -> !s.site().group().permanent()).toList();
        titr.forEach(s -> site.put(s.site().atom(), new double[n]));
        // a measured compound whose values all found a site: charge and charge states from its measured macroscopic
        // constants, as the analysis at one pH gives them (the site model's statistical factors would move them)
        boolean measured = p.measured().isPresent() && ChargeProfile.measuredFit(p);
        for (int k = 0; k < n; k++) {
            ph[k] = from + k * step;
            Populations pop = solver.solve(p.model(), ph[k]);
            for (int i = 0; i < titr.size(); i++) {
                site.get(titr.get(i).site().atom())[k] = pop.protonated()[i];
            }
            Map<Integer, Double> at = measured ? ChargeProfile.fromMeasured(p, ph[k])
                    : ChargeProfile.shift(pop.chargeStates(), p.permanentCharge());
            double m = 0;
            for (var e : at.entrySet()) {
                states.computeIfAbsent(e.getKey(), z -> new double[n])[k] = e.getValue();
                m += e.getKey() * e.getValue();
            }
            mean[k] = measured ? m : pop.meanCharge() + p.permanentCharge();
        }
        return new Curve(ph, mean, site, states);
    }
}
