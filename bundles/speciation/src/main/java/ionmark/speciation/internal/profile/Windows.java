package ionmark.speciation.internal.profile;

import java.util.List;

import ionmark.speciation.api.Window;
import ionmark.speciation.internal.microstates.Problem;

/** The pH ranges (0–14) in which at least 99 % of the compound is uncharged, or charged. */
public final class Windows {
    static final double STEP = 0.05;

    private Windows() {
    }

    public static void scan(Problem p, List<Window> neutral, List<Window> charged) {
        Double nStart = null;
        Double cStart = null;
        double last = 0;
        for (double ph = 0; ph <= 14 + 1e-9; ph += STEP) {
            double f0 = ChargeProfile.neutralAt(p, ph);
            if (f0 >= 0.99 && nStart == null) {
                nStart = ph;
            } else if (f0 < 0.99 && nStart != null) {
                neutral.add(new Window(round(nStart), round(last)));
                nStart = null;
            }
            if (1 - f0 >= 0.99 && cStart == null) {
                cStart = ph;
            } else if (1 - f0 < 0.99 && cStart != null) {
                charged.add(new Window(round(cStart), round(last)));
                cStart = null;
            }
            last = ph;
        }
        if (nStart != null) {
            neutral.add(new Window(round(nStart), 14.0));
        }
        if (cStart != null) {
            charged.add(new Window(round(cStart), 14.0));
        }
    }

    private static double round(double v) {
        return Math.round(v * 100) / 100.0;
    }
}
