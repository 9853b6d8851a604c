package ionmark.speciation.api;

import org.osgi.annotation.versioning.ProviderType;

/**
 * The speciation service. Thread-safe; a call never throws for bad input, it returns an
 * {@link Analysis} with {@link Analysis#error()} set.
 */
@ProviderType
public interface Speciation {

    /** Reads a SMILES, molfile (V2000/V3000) or SDF record and analyses it at the given conditions. */
    Analysis analyse(String structure, Conditions conditions);

    /**
     * The brief form of {@link #analyse} for large files: sites with their estimates and derivations,
     * macroscopic constants, site protonation, charge states, net charge and fraction neutral at the
     * conditions, with the same warnings. It leaves out what costs most and a screen rarely reads:
     * logP and logD (NaN and null), the species structures, the pH windows and the isoelectric point
     * (empty and null).
     *
     * @since 1.1
     */
    Analysis screen(String structure, Conditions conditions);

    /** Curves of charge and site protonation from pH {@code from} to {@code to} at {@code step}. */
    Curve curve(String structure, Conditions conditions, double from, double to, double step);

    /**
     * The same service bound to one table snapshot instead of the current one: what an entry pinned
     * to an earlier table version showed can be reproduced.
     */
    Speciation pinned(ionmark.acidity.api.AcidityTable table);
}
