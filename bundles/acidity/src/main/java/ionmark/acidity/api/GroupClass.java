package ionmark.acidity.api;

import java.util.Map;
import java.util.Objects;

/**
 * An ionizable group class: a SMARTS with the ionizable atom mapped {@code :1} (and, optionally,
 * the reaction centre for substituent distances mapped {@code :2}), its reference pKa and how
 * substituents shift it.
 *
 * @param id          stable identifier, unique in the table
 * @param name        readable name
 * @param smarts      pattern; atom map 1 marks the ionizable atom
 * @param type        acid or base; {@link #pka()} is always the pKa of the protonated form
 * @param pka         reference pKa at 25 °C and zero ionic strength
 * @param relation    linear free-energy relation followed
 * @param rho         reaction constant (Hammett ρ or inductive ρI), pKa units per unit σ
 * @param attenuation factor per bond for inductive transmission (Taft), or the ortho factor (Hammett)
 * @param resonance   which para constant applies (σp, or σp⁻/σp⁺ in through-resonance); {@link Resonance#PARA} when
 *                    null
 * @param enthalpy    standard enthalpy of ionization, kJ/mol (van 't Hoff temperature correction)
 * @param sd          one standard deviation of the class estimate, pKa units
 * @param permanent   a permanently charged group: counted as a charge, never titrated
 * @param sources     reference id per numeric field name ("pka", "rho", "attenuation", "enthalpy", "sd"; "reach" for
 *                    the class's factor in {@link SiteInteraction#reach()})
 * @param note        free text for curators, may be empty
 * @param matches     example SMILES the class must match at its site atom (checked by the validator)
 * @param misses      example SMILES the class must not match
 */
public record GroupClass(String id, String name, String smarts, SiteType type, double pka, Relation relation,
        double rho, double attenuation, Resonance resonance, double enthalpy, double sd, boolean permanent,
        Map<String, String> sources, String note,
        java.util.List<String> matches, java.util.List<String> misses) {

    public GroupClass {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(smarts, "smarts");
        Objects.requireNonNull(type, "type");
        Objects.requireNonNull(relation, "relation");
        resonance = resonance == null ? Resonance.PARA : resonance;
        sources = Map.copyOf(sources == null ? Map.of() : sources);
        note = note == null ? "" : note;
        matches = java.util.List.copyOf(matches == null ? java.util.List.of() : matches);
        misses = java.util.List.copyOf(misses == null ? java.util.List.of() : misses);
    }

    /** The reference id that vouches for the named numeric field, or "" when none is given. */
    public String source(String field) {
        return sources.getOrDefault(field, "");
    }

    /** A copy with other calibrated numbers (reference pKa, reaction constant, sd) and their source. */
    public GroupClass withCalibration(double newPka, double newRho, double newSd, String source) {
        var s = new java.util.TreeMap<>(sources);
        s.put("pka", source);
        if (relation != Relation.NONE) {
            s.put("rho", source);
        }
        s.put("sd", source);
        return new GroupClass(id, name, smarts, type, newPka, relation, newRho, attenuation, resonance, enthalpy,
                newSd, permanent, s, note, matches, misses);
    }

    /** A copy with another attenuation (Taft: per bond; Hammett: the ortho factor) and its source. */
    public GroupClass withAttenuation(double value, String source) {
        return copy(pka, rho, value, sd, "attenuation", source);
    }

    /** A copy with another uncertainty and its source. */
    public GroupClass withSd(double value, String source) {
        return copy(pka, rho, attenuation, value, "sd", source);
    }

    /** A copy with another reaction constant and its source. */
    public GroupClass withRho(double value, String source) {
        return copy(pka, value, attenuation, sd, "rho", source);
    }

    /** A copy with another reference pKa and its source. */
    public GroupClass withPka(double value, String source) {
        return copy(value, rho, attenuation, sd, "pka", source);
    }

    /**
     * A copy with the source of a number kept outside the class (the class's reach factor in the
     * site-interaction rule, field "reach"). Since 1.3.
     */
    public GroupClass withSource(String field, String source) {
        return copy(pka, rho, attenuation, sd, field, source);
    }

    private GroupClass copy(double newPka, double newRho, double newAttenuation, double newSd, String field,
            String source) {
        var s = new java.util.TreeMap<>(sources);
        s.put(field, source);
        return new GroupClass(id, name, smarts, type, newPka, relation, newRho, newAttenuation, resonance, enthalpy,
                newSd, permanent, s, note, matches, misses);
    }
}
