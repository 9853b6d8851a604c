package ionmark.speciation.internal.microstates;

import java.util.List;
import java.util.Locale;

import ionmark.speciation.api.Conditions;

/**
 * Temperature (van 't Hoff with each class's ionization enthalpy; water's ion product) and ionic
 * strength (Davies equation) corrections of a site pKa.
 */
public final class Conditioning {
    static final double R = 8.314462618;
    static final double LN10 = Math.log(10);
    static final double T0 = 298.15;

    private Conditioning() {
    }

    /** ΔpKa on going from 25 °C to t °C for an ionization enthalpy in kJ/mol (van 't Hoff). */
    public static double temperatureShift(double enthalpyKj, double tCelsius) {
        if (Double.isNaN(enthalpyKj)) {
            return 0;
        }
        double t = tCelsius + 273.15;
        return enthalpyKj * 1000 / (R * LN10) * (1 / t - 1 / T0);
    }

    /** pKw at t °C: 4470.99/T − 6.0875 + 0.01706·T (a standard fit to the measured ion product, 0–60 °C). */
    static double pKw(double tCelsius) {
        double t = tCelsius + 273.15;
        return 4470.99 / t - 6.0875 + 0.01706 * t;
    }

    /** Debye–Hückel A at t °C (0.509 at 25 °C, about 0.0008 per °C; common practice). */
    static double debyeA(double tCelsius) {
        return 0.5085 + 0.00085 * (tCelsius - 25);
    }

    /** Davies: log γ for a charge z. */
    static double logGamma(int z, double ionicStrength, double tCelsius) {
        double s = Math.sqrt(ionicStrength);
        return -debyeA(tCelsius) * z * z * (s / (1 + s) - 0.3 * ionicStrength);
    }

    /**
     * Apparent (mixed) pKa at ionic strength I for a step from a species of charge zHa to one of charge
     * zA: pKa' = pKa + log γ(A) − log γ(HA), with pH read as activity. The charges are those of the
     * whole species ({@code microstates.SpeciesActivity} applies it so), not of one site.
     */
    static double ionicShift(int zHa, int zA, double ionicStrength, double tCelsius) {
        if (ionicStrength <= 0) {
            return 0;
        }
        return logGamma(zA, ionicStrength, tCelsius) - logGamma(zHa, ionicStrength, tCelsius);
    }

    /** k of the Davies term: log γ(z) = −k·z² (0 at I = 0). */
    public static double davies(double ionicStrength, double tCelsius) {
        return ionicStrength <= 0 ? 0 : -logGamma(1, ionicStrength, tCelsius);
    }

    public static void describe(Conditions c, List<String> out, List<String> warnings) {
        if (c.temperature() != Conditions.STANDARD_TEMPERATURE) {
            out.add(String.format(Locale.ROOT,
                    "temperature %.1f °C: each site pKa moved by van 't Hoff with its class ionization enthalpy; "
                            + "pKw %.2f", c.temperature(), pKw(c.temperature())));
        }
        if (c.ionicStrength() > 0) {
            out.add(String.format(Locale.ROOT,
                    "ionic strength %.3f M: Davies equation (A = %.4f) on the net charge of each whole species, "
                            + "so a site's apparent constant depends on the charges elsewhere in the molecule",
                    c.ionicStrength(), debyeA(c.temperature())));
        }
        if (c.ionicStrength() > 0.5) {
            warnings.add("ionic strength above 0.5 M: the Davies equation no longer holds; corrections are rough");
        }
    }
}
