package ionmark.speciation.api;

/**
 * The conditions an entry states. A missing pH is allowed (sites and pKa values are still reported).
 *
 * @param ph            pH on the activity scale, or {@code null} when none was stated
 * @param temperature   °C, 0 to 100
 * @param ionicStrength mol/L, 0 or more (the Davies equation is used; above 0.5 M it is only a rough guide)
 */
public record Conditions(Double ph, double temperature, double ionicStrength) {
    public static final double STANDARD_TEMPERATURE = 25.0;

    public Conditions {
        if (ph != null && (ph.isNaN() || ph < -2 || ph > 16)) {
            throw new IllegalArgumentException("pH must be a number from -2 to 16, not " + ph);
        }
        if (Double.isNaN(temperature) || temperature < 0 || temperature > 100) {
            throw new IllegalArgumentException("temperature must be from 0 to 100 °C, not " + temperature);
        }
        if (Double.isNaN(ionicStrength) || ionicStrength < 0 || Double.isInfinite(ionicStrength)) {
            throw new IllegalArgumentException("ionic strength must be 0 mol/L or more, not " + ionicStrength);
        }
    }

    public static Conditions atPh(double ph) {
        return new Conditions(ph, STANDARD_TEMPERATURE, 0.0);
    }

    public static Conditions noPh() {
        return new Conditions(null, STANDARD_TEMPERATURE, 0.0);
    }

    public boolean hasPh() {
        return ph != null;
    }

    public Conditions withTemperature(double t) {
        return new Conditions(ph, t, ionicStrength);
    }

    public Conditions withIonicStrength(double i) {
        return new Conditions(ph, temperature, i);
    }
}
