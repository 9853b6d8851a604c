package ionmark.acidity.api;

/** The linear free-energy relation a group class follows for substituent corrections. */
public enum Relation {
    /** Hammett: ΔpKa = −ρ Σσ for substituents on the aromatic ring that carries the site. */
    HAMMETT,
    /** Taft/inductive: ΔpKa = −ρ Σ σI·a^(n−1) for substituents n bonds from the reaction centre. */
    TAFT,
    /** No substituent correction; the class value stands alone. */
    NONE;

    public String label() {
        return name().toLowerCase(java.util.Locale.ROOT);
    }

    public static Relation parse(String s) {
        for (Relation r : values()) {
            if (r.label().equals(s)) {
                return r;
            }
        }
        throw new IllegalArgumentException("relation must be 'hammett', 'taft' or 'none', not '" + s + "'");
    }
}
