package ionmark.acidity.api;

/**
 * Which Hammett para constant a class's site takes: plain σp, or σp⁻/σp⁺ where the site is in through-resonance
 * with the substituent. {@link #code()} is how the table file writes it.
 */
public enum Resonance {
    /** σp: no through-resonance with the site ("p", the default). */
    PARA("p"),
    /** σp⁻: through-resonance with an anionic or lone-pair centre such as a phenolate or an aniline ("p-"). */
    PARA_MINUS("p-"),
    /** σp⁺: through-resonance with an electron-poor centre ("p+"). */
    PARA_PLUS("p+");

    private final String code;

    Resonance(String code) {
        this.code = code;
    }

    /** "p", "p-" or "p+", as in the table file and in the derivation lines (σp, σp-, σp+). */
    public String code() {
        return code;
    }

    public static Resonance parse(String s) {
        for (Resonance r : values()) {
            if (r.code.equals(s)) {
                return r;
            }
        }
        throw new IllegalArgumentException("resonance must be \"p\", \"p-\" or \"p+\", not \"" + s + "\"");
    }
}
