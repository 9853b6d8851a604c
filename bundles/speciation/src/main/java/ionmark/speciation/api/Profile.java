package ionmark.speciation.api;

import java.util.List;

/**
 * What only a full analysis ({@link Speciation#analyse}) computes; a brief one ({@link Speciation#screen}) and a
 * failed one have none ({@link Analysis#profile()} is null). The titration curve is a call of its own
 * ({@link Speciation#curve}).
 *
 * @param species          leading microstates, largest first (empty without pH)
 * @param isoelectricPoint pH of zero mean charge for an ampholyte whose acid and base both titrate between pH 0 and
 *                         14, found between its lowest and highest listed constant; else null
 * @param logP             octanol/water logP of the uncharged form (CDK JPlogP), NaN if unavailable
 * @param logD             logD at the stated pH over all species: uncharged at logP, zwitterions and ions at
 *                         logP − 3.5 per unit of net charge (a zwitterion as one), common practice (null without pH)
 * @param neutralWindows   pH ranges (0–14) in which at least 99 % has net charge 0
 *                         ({@link Analysis#fractionNeutral()}, zwitterions included)
 * @param chargedWindows   pH ranges (0–14) in which at least 99 % has a net charge
 */
public record Profile(List<Species> species, Double isoelectricPoint, double logP, Double logD,
        List<Window> neutralWindows, List<Window> chargedWindows) {

    public Profile {
        species = List.copyOf(species);
        neutralWindows = List.copyOf(neutralWindows);
        chargedWindows = List.copyOf(chargedWindows);
    }
}
