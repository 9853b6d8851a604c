package ionmark.speciation.api;

import java.util.List;
import java.util.Map;

/**
 * Everything Ionmark says about one structure at one set of conditions. A failed analysis carries
 * {@link #error()} and empty lists; it never throws.
 *
 * @param input          the text as given
 * @param smiles         the parent structure analysed, in its reference protonation; in a brief analysis,
 *                       the input SMILES itself when it already was that parent unchanged
 * @param stripped       components removed from a mixture or salt
 * @param sites          titratable and permanent sites
 * @param macroPka       macroscopic pKa values, ascending
 * @param conditions     the conditions used
 * @param netCharge      mean net charge at the stated pH (null without pH)
 * @param fractionNeutral fraction with net charge 0, zwitterions included (null without pH)
 * @param fractionUncharged fraction with no charged site at all: the neutral fraction less its zwitterions;
 *                       0 with a permanent charge (null without pH; since 1.2)
 * @param chargeStates   fraction per net charge (empty without pH)
 * @param species        leading microstates, largest first (empty without pH)
 * @param isoelectricPoint pH of zero mean charge for an ampholyte whose acid and base both titrate between
 *                       pH 0 and 14, found between its lowest and highest listed constant; else null
 * @param logP           octanol/water logP of the uncharged form (CDK JPlogP), NaN if unavailable
 * @param logD           logD at the stated pH over all species: uncharged at logP, zwitterions and ions at
 *                       logP − 3.5 per unit of net charge (a zwitterion as one), common practice (null without pH)
 * @param neutralWindows pH ranges (0–14) in which at least 99 % has net charge 0 ({@code fractionNeutral},
 *                       zwitterions included)
 * @param chargedWindows pH ranges (0–14) in which at least 99 % has a net charge ({@code 1 − fractionNeutral})
 * @param corrections    temperature and ionic-strength corrections applied, in words
 * @param warnings       what the reader must know (estimated not measured, sampled, outside the table …)
 * @param sampled        true when populations were sampled rather than enumerated
 * @param tableVersion   the table version used, for example "v1 (cafd59fb)"
 * @param error          one-line error for bad input, else null
 * @param uncoveredAtoms atoms that look ionizable but no class of the table covers, as indices from 0 like
 *                       {@link Site#atom()}; the warning that names them counts from 1 (since 1.3)
 */
public record Analysis(String input, String smiles, List<String> stripped, List<Site> sites, List<Double> macroPka,
        Conditions conditions, Double netCharge, Double fractionNeutral, Double fractionUncharged,
        Map<Integer, Double> chargeStates,
        List<Species> species, Double isoelectricPoint, double logP, Double logD, List<Window> neutralWindows, List<Window> chargedWindows,
        List<String> corrections, List<String> warnings, boolean sampled, String tableVersion, String error,
        List<Integer> uncoveredAtoms) {

    public Analysis {
        uncoveredAtoms = List.copyOf(uncoveredAtoms == null ? List.of() : uncoveredAtoms);
        stripped = List.copyOf(stripped);
        sites = List.copyOf(sites);
        macroPka = List.copyOf(macroPka);
        chargeStates = Map.copyOf(chargeStates);
        species = List.copyOf(species);
        neutralWindows = List.copyOf(neutralWindows);
        chargedWindows = List.copyOf(chargedWindows);
        corrections = List.copyOf(corrections);
        warnings = List.copyOf(warnings);
    }

    /** The 1.2 form, without {@code uncoveredAtoms} (empty). */
    public Analysis(String input, String smiles, List<String> stripped, List<Site> sites, List<Double> macroPka,
            Conditions conditions, Double netCharge, Double fractionNeutral, Double fractionUncharged,
            Map<Integer, Double> chargeStates, List<Species> species, Double isoelectricPoint, double logP, Double logD,
            List<Window> neutralWindows, List<Window> chargedWindows, List<String> corrections, List<String> warnings,
            boolean sampled, String tableVersion, String error) {
        this(input, smiles, stripped, sites, macroPka, conditions, netCharge, fractionNeutral, fractionUncharged,
                chargeStates, species, isoelectricPoint, logP, logD, neutralWindows, chargedWindows, corrections, warnings,
                sampled, tableVersion, error, List.of());
    }

    /** The 1.1 form, without {@code fractionUncharged} (null). */
    public Analysis(String input, String smiles, List<String> stripped, List<Site> sites, List<Double> macroPka,
            Conditions conditions, Double netCharge, Double fractionNeutral, Map<Integer, Double> chargeStates,
            List<Species> species, Double isoelectricPoint, double logP, Double logD, List<Window> neutralWindows,
            List<Window> chargedWindows, List<String> corrections, List<String> warnings, boolean sampled,
            String tableVersion, String error) {
        this(input, smiles, stripped, sites, macroPka, conditions, netCharge, fractionNeutral, null, chargeStates,
                species, isoelectricPoint, logP, logD, neutralWindows, chargedWindows, corrections, warnings, sampled,
                tableVersion, error);
    }

    public static Analysis failed(String input, Conditions c, String tableVersion, String error) {
        return new Analysis(input, "", List.of(), List.of(), List.of(), c, null, null, null, Map.of(), List.of(), null, Double.NaN,
                null, List.of(), List.of(), List.of(), List.of(), false, tableVersion, error);
    }

    public boolean ok() {
        return error == null;
    }
}
