package ionmark.speciation.api;

import java.util.List;
import java.util.Map;

/**
 * What Ionmark says about one structure at one set of conditions. A failed analysis carries {@link #error()}
 * (and, where the reader can say, {@link #errorPosition()}) and empty lists; it never throws. What only a full
 * analysis computes (species, logP/logD, windows, isoelectric point) is in {@link #profile()}, which a brief and a
 * failed analysis do not have.
 *
 * @param input             the text as given
 * @param smiles            the parent structure analysed, in its reference protonation; in a brief analysis, the
 *                          input SMILES itself when it already was that parent unchanged
 * @param stripped          components removed from a mixture or salt
 * @param sites             titratable and permanent sites
 * @param macroPka          macroscopic pKa values, ascending
 * @param conditions        the conditions used
 * @param netCharge         mean net charge at the stated pH (null without pH)
 * @param fractionNeutral   fraction with net charge 0, zwitterions included (null without pH)
 * @param fractionUncharged fraction with no charged site at all: the neutral fraction less its zwitterions; 0 with
 *                          a permanent charge (null without pH)
 * @param chargeStates      fraction per net charge (empty without pH)
 * @param corrections       temperature and ionic-strength corrections applied, in words
 * @param warnings          what the reader must know (estimated not measured, sampled, outside the table …)
 * @param sampled           true when populations were sampled rather than enumerated
 * @param tableVersion      the table version used, for example "v1 (cafd59fb)"
 * @param uncoveredAtoms    atoms that look ionizable but no class of the table covers, as indices from 0 like
 *                          {@link Site#atom()}; the warning that names them counts from 1
 * @param profile           what only a full analysis computes; null for a brief or a failed analysis
 * @param error             one-line error for bad input, else null
 * @param errorPosition     where the input could not be read, when the reader can say; else null
 */
public record Analysis(String input, String smiles, List<String> stripped, List<Site> sites, List<Double> macroPka,
        Conditions conditions, Double netCharge, Double fractionNeutral, Double fractionUncharged,
        Map<Integer, Double> chargeStates, List<String> corrections, List<String> warnings, boolean sampled,
        String tableVersion, List<Integer> uncoveredAtoms, Profile profile, String error,
        ErrorPosition errorPosition) {

    public Analysis {
        stripped = List.copyOf(stripped);
        sites = List.copyOf(sites);
        macroPka = List.copyOf(macroPka);
        chargeStates = Map.copyOf(chargeStates);
        corrections = List.copyOf(corrections);
        warnings = List.copyOf(warnings);
        uncoveredAtoms = List.copyOf(uncoveredAtoms == null ? List.of() : uncoveredAtoms);
    }

    public static Analysis failed(String input, Conditions c, String tableVersion, String error) {
        return failed(input, c, tableVersion, error, null);
    }

    /** A failure that says where the input could not be read ({@code at} may be null). */
    public static Analysis failed(String input, Conditions c, String tableVersion, String error, ErrorPosition at) {
        return new Analysis(input, "", List.of(), List.of(), List.of(), c, null, null, null, Map.of(), List.of(),
                List.of(), false, tableVersion, List.of(), null, error, at);
    }

    /** The same analysis under another input text (the cache answers equal structures written differently). */
    public Analysis withInput(String text) {
        return new Analysis(text, smiles, stripped, sites, macroPka, conditions, netCharge, fractionNeutral,
                fractionUncharged, chargeStates, corrections, warnings, sampled, tableVersion, uncoveredAtoms, profile,
                error, errorPosition);
    }

    public boolean ok() {
        return error == null;
    }

    /** Whether this is a full analysis with its {@link #profile()}. */
    public boolean hasProfile() {
        return profile != null;
    }
}
