package ionmark.speciation.api;

import org.osgi.annotation.versioning.ProviderType;

/**
 * The speciation service. Thread-safe; a call never throws for bad input, it returns an
 * {@link Analysis} with {@link Analysis#error()} set.
 */
@ProviderType
public interface Speciation {

    /**
     * Reads a SMILES, molfile (V2000/V3000) or SDF record and analyses it at the given conditions; the result has
     * its {@link Profile}.
     */
    Analysis analyse(String structure, Conditions conditions);

    /**
     * The brief form of {@link #analyse} for large files: sites with their estimates and derivations,
     * macroscopic constants, site protonation, charge states, net charge and fraction neutral at the
     * conditions, with the same warnings. It leaves out what costs most and a screen rarely reads:
     * the {@link Profile} (logP and logD, the species structures, the pH windows and the isoelectric point):
     * {@link Analysis#profile()} is null.
     */
    Analysis screen(String structure, Conditions conditions);

    /**
     * Curves of charge and site protonation from pH {@code from} to {@code to} at {@code step}, under the same time
     * budget as an analysis; never throws for bad input or an exhausted budget (see {@link CurveResult}).
     */
    CurveResult curve(String structure, Conditions conditions, double from, double to, double step);

    /**
     * The same service bound to one table snapshot instead of the current one: what an entry pinned
     * to an earlier table version showed can be reproduced.
     */
    Speciation pinned(ionmark.acidity.api.AcidityTable table);
}
