package ionmark.speciation.internal.estimate;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.HashSet;
import java.util.Set;

import org.openscience.cdk.exception.CDKException;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.smiles.SmiFlavor;
import org.openscience.cdk.smiles.SmilesGenerator;

import ionmark.acidity.api.MeasuredCompound;
import ionmark.speciation.api.Term;
import ionmark.speciation.internal.sites.CompiledTable;
import ionmark.speciation.internal.sites.PerceivedSite;
import ionmark.speciation.internal.sites.RootedPattern;
import ionmark.speciation.internal.sites.SitePerceiver;
import ionmark.speciation.internal.structure.StructureException;
import ionmark.speciation.internal.structure.StructureReader;

/**
 * Measured compounds of the table: exact matches override estimates; single-site compounds also
 * serve as analogs whose measured-minus-estimated shift is applied to a query site of the same
 * class, damped by similarity (shift × T², T the Tanimoto similarity of circular fingerprints of
 * radius 2, {@link Morgan}, from {@link #MIN_SIMILARITY} upwards).
 */
public final class Overrides {
    public static final double MIN_SIMILARITY = 0.55;

    record Analog(MeasuredCompound compound, String group, double shift, long[] fp) {
    }

    private final Map<String, MeasuredCompound> exact = new HashMap<>();
    /** Formula keys of the measured compounds: a canonical SMILES is made only when the key is one of these. */
    private final Set<Long> formulas = new HashSet<>();
    /** Single-site measured compounds by the class of their site. */
    private final Map<String, List<Analog>> analogs = new HashMap<>();

    public Overrides(CompiledTable table) {
        StructureReader reader = new StructureReader(1000);
        for (MeasuredCompound m : table.table().measured()) {
            try {
                IAtomContainer mol = reader.read(m.smiles()).molecule();
                exact.putIfAbsent(canonical(mol), m);
                formulas.add(formula(new RootedPattern.Target(mol)));
                List<PerceivedSite> sites = SitePerceiver.perceive(table, mol).stream()
                        .filter(s -> !s.group().permanent()).toList();
                if (sites.size() == 1 && m.pka().size() == 1) {
                    EstimatedSite e = LferEstimator.estimate(table, mol, sites).get(0);
                    String group = sites.get(0).group().id();
                    analogs.computeIfAbsent(group, g -> new ArrayList<>())
                            .add(new Analog(m, group, m.pka().get(0) - e.pka(), fingerprint(new RootedPattern.Target(mol))));
                }
            } catch (StructureException | RuntimeException e) {
                // the validator has parsed every measured structure; nothing to do for one that fails here
            }
        }
    }

    /** The measured compound that is this structure, if the table has it. */
    public Optional<MeasuredCompound> exact(RootedPattern.Target mol) {
        if (!formulas.contains(formula(mol))) {
            return Optional.empty();
        }
        return Optional.ofNullable(exact.get(canonical(mol.molecule())));
    }

    /** Whether any measured single-site compound of this class can serve as an analog. */
    public boolean hasAnalogs(String groupId) {
        return analogs.containsKey(groupId);
    }

    /**
     * A hash of the element counts (with implicit hydrogens) and the total formal charge. Equal
     * canonical SMILES imply equal formulas and so equal keys, which makes this a safe screen before
     * the costlier canonical form; a collision only costs that canonical form.
     */
    static long formula(RootedPattern.Target mol) {
        int[] count = new int[120];
        int charge = 0;
        for (int i = 0; i < mol.atomCount(); i++) {
            int z = mol.atomicNumber(i);
            count[z < count.length ? z : 0]++;
            count[1] += mol.implicitHydrogens(i);
            charge += mol.formalCharge(i);
        }
        long key = charge;
        for (int z = 0; z < count.length; z++) {
            if (count[z] > 0) {
                key = key * 0x9E3779B97F4A7C15L + ((long) z << 20 | count[z]);
            }
        }
        return key;
    }

    /** The query site shifted by its nearest analog, or unchanged. */
    public EstimatedSite analog(IAtomContainer mol, long[] fp, EstimatedSite site) {
        Analog best = null;
        double bestSim = 0;
        for (Analog a : analogs.getOrDefault(site.site().group().id(), List.of())) {
            double sim = tanimoto(fp, a.fp());
            if (sim > bestSim) {
                bestSim = sim;
                best = a;
            }
        }
        if (best == null || bestSim < MIN_SIMILARITY || Math.abs(best.shift()) < 0.005) {
            return site;
        }
        double delta = best.shift() * bestSim * bestSim;
        Term t = new Term(String.format(Locale.ROOT,
                "analog %s (measured %.2f, estimate off by %+.2f), similarity %.2f, damped ×%.2f", best.compound().name(),
                best.compound().pka().get(0), best.shift(), bestSim, bestSim * bestSim), delta,
                "measured value in the shared table: " + best.compound().source());
        double sd = Math.max(0.2, site.sd() * (1 - 0.5 * bestSim * bestSim));
        return site.shifted(delta, t, "analog", sd);
    }

    public static long[] fingerprint(RootedPattern.Target mol) {
        return Morgan.of(mol);
    }

    static double tanimoto(long[] a, long[] b) {
        int and = 0;
        int or = 0;
        for (int i = 0; i < a.length; i++) {
            and += Long.bitCount(a[i] & b[i]);
            or += Long.bitCount(a[i] | b[i]);
        }
        return or == 0 ? 0 : (double) and / or;
    }

    public static String canonical(IAtomContainer mol) {
        try {
            return new SmilesGenerator(SmiFlavor.Unique).create(mol);
        } catch (CDKException e) {
            return "";
        }
    }
}
