package ionmark.acidity.api;

/** Whether a site's neutral reference form loses a proton (acid) or gains one (base). */
public enum SiteType {
    /** HA ⇌ A⁻ + H⁺; the tabulated pKa is that of HA. */
    ACID,
    /** BH⁺ ⇌ B + H⁺; the tabulated pKa is that of BH⁺ (the protonated form). */
    BASE;

    public String label() {
        return name().toLowerCase(java.util.Locale.ROOT);
    }

    public static SiteType parse(String s) {
        for (SiteType t : values()) {
            if (t.label().equals(s)) {
                return t;
            }
        }
        throw new IllegalArgumentException("type must be 'acid' or 'base', not '" + s + "'");
    }
}
