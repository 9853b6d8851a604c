package ionmark.notebook.internal;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Speciation;
import ionmark.speciation.api.Basis;

/**
 * The pH of a reagent solution from its composition by charge balance, with each weak acid system's charge taken
 * from Ionmark's own speciation solver: the solver reads the reagent's structure (carbonic acid, phosphoric
 * acid, ammonia, acetic acid, citric acid, TRIS…) and uses the table's constants, measured where the table holds
 * the compound. Ideal solution, 25 °C. A reagent the table does not hold comes with its constants and their
 * source ({@link Constants}).
 */
final class SolutionPh {
    /** One weak acid system of a solution: by structure (the table's constants) or by named constants. */
    record Part(String name, double molar, String smiles, Constants constants) {
        static Part table(String name, String smiles, double molar) {
            return new Part(name, molar, smiles, null);
        }
    }

    /** Macroscopic constants the table lacks, ascending, with the charge of the most protonated form and a source. */
    record Constants(double[] pka, int topCharge, String source) {
    }

    /** The pH and how it was obtained, in words for the card. */
    record Result(double ph, String how) {
    }

    private static final int CACHE_LIMIT = 512;
    private static final Map<String, Result> SOLVED = new ConcurrentHashMap<>();

    private final Speciation speciation;

    SolutionPh(Speciation speciation) {
        this.speciation = speciation;
    }

    /**
     * @param strongNet net charge of the fully dissociated ions, M (Na⁺ positive, Cl⁻ negative)
     * @param basis     what was assumed about the composition ("saturated, taken as 1.1 M"), or null
     * @return the pH, or null when the solver cannot read one of the reagents (no implied pH rather than a guess)
     */
    Result ph(double strongNet, List<Part> parts, String basis) {
        List<ChargeBalance.Weak> weak = new ArrayList<>();
        List<String> said = new ArrayList<>();
        StringBuilder key = new StringBuilder().append(strongNet).append('|').append(basis);
        for (Part p : parts) {
            if (p.constants() != null) {
                Constants c = p.constants();
                weak.add(new ChargeBalance.Weak(p.molar(), ph -> ChargeBalance.meanCharge(ph, c.pka(), c.topCharge())));
                said.add(p.name() + " pKa " + list(c.pka()) + " (" + c.source() + "; not in the table)");
                key.append('|').append(p.molar()).append(' ').append(Arrays.toString(c.pka()));
                continue;
            }
            Analysis a = speciation.screen(p.smiles(), new Conditions(7.0, Conditions.STANDARD_TEMPERATURE, 0));
            if (!a.ok()) {
                return null;
            }
            // the solver's net charge at each trial pH; not its pH curve, which for carbonic acid (table v30) follows
            // micro constants giving pKa 5.74 and about 10.9 instead of the measured 6.35 and 10.33 that analyse uses
            weak.add(new ChargeBalance.Weak(p.molar(), ph -> netCharge(p.smiles(), ph)));
            boolean measured = !a.sites().isEmpty() && a.sites().stream().filter(s -> !s.permanent())
                    .allMatch(s -> s.basis() == Basis.MEASURED);
            said.add(p.name() + " pKa " + list(a.macroPka().stream().mapToDouble(Double::doubleValue).toArray())
                    + " (table " + a.tableVersion() + (measured ? ", measured" : ", estimated") + ")");
            key.append('|').append(p.molar()).append(' ').append(p.smiles()).append('@').append(a.tableVersion());
        }
        Result known = SOLVED.get(key.toString());
        if (known != null) {
            return known;
        }
        double ph = ChargeBalance.ph(strongNet, weak);
        StringBuilder how = new StringBuilder("charge balance");
        if (!said.isEmpty()) {
            how.append(" with Ionmark's solver: ").append(String.join("; ", said));
        }
        if (basis != null) {
            how.append("; ").append(basis);
        }
        Result r = new Result(ph, how.append("; ideal solution, 25 °C").toString());
        if (SOLVED.size() >= CACHE_LIMIT) {
            SOLVED.clear();
        }
        SOLVED.put(key.toString(), r);
        return r;
    }

    private double netCharge(String smiles, double ph) {
        Analysis a = speciation.screen(smiles, new Conditions(Math.max(-2, Math.min(16, ph)),
                Conditions.STANDARD_TEMPERATURE, 0));
        return a.ok() && a.netCharge() != null ? a.netCharge() : 0;
    }

    private static String list(double[] v) {
        List<String> out = new ArrayList<>();
        for (double d : v) {
            out.add(String.format(Locale.ROOT, "%.2f", d));
        }
        return String.join(", ", out);
    }
}
