package ionmark.speciation.internal.estimate;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

import org.openscience.cdk.exception.CDKException;
import org.openscience.cdk.fingerprint.CircularFingerprinter;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.smiles.SmiFlavor;
import org.openscience.cdk.smiles.SmilesGenerator;

import ionmark.acidity.api.MeasuredCompound;
import ionmark.speciation.api.Term;
import ionmark.speciation.internal.sites.CompiledTable;
import ionmark.speciation.internal.sites.PerceivedSite;
import ionmark.speciation.internal.sites.SitePerceiver;
import ionmark.speciation.internal.structure.StructureException;
import ionmark.speciation.internal.structure.StructureReader;

/**
 * Measured compounds of the table: exact matches override estimates; single-site compounds also
 * serve as analogs whose measured-minus-estimated shift is applied to a query site of the same
 * class, damped by similarity (shift × T², T the Tanimoto similarity of ECFP4 fingerprints, from
 * {@link #MIN_SIMILARITY} upwards).
 */
public final class Overrides {
    public static final double MIN_SIMILARITY = 0.55;

    record Analog(MeasuredCompound compound, String group, double shift, BitSet fp) {
    }

    private final Map<String, MeasuredCompound> exact = new HashMap<>();
    private final List<Analog> analogs = new ArrayList<>();

    public Overrides(CompiledTable table) {
        StructureReader reader = new StructureReader(1000);
        for (MeasuredCompound m : table.table().measured()) {
            try {
                IAtomContainer mol = reader.read(m.smiles()).molecule();
                exact.putIfAbsent(canonical(mol), m);
                List<PerceivedSite> sites = SitePerceiver.perceive(table, mol).stream()
                        .filter(s -> !s.group().permanent()).toList();
                if (sites.size() == 1 && m.pka().size() == 1) {
                    EstimatedSite e = LferEstimator.estimate(table, mol, sites).get(0);
                    analogs.add(new Analog(m, sites.get(0).group().id(), m.pka().get(0) - e.pka(), fingerprint(mol)));
                }
            } catch (StructureException | RuntimeException e) {
                // the validator has parsed every measured structure; nothing to do for one that fails here
            }
        }
    }

    public Optional<MeasuredCompound> exact(IAtomContainer mol) {
        return Optional.ofNullable(exact.get(canonical(mol)));
    }

    /** The query site shifted by its nearest analog, or unchanged. */
    public EstimatedSite analog(IAtomContainer mol, BitSet fp, EstimatedSite site) {
        Analog best = null;
        double bestSim = 0;
        for (Analog a : analogs) {
            if (!a.group().equals(site.site().group().id())) {
                continue;
            }
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

    public static BitSet fingerprint(IAtomContainer mol) {
        try {
            return new CircularFingerprinter(CircularFingerprinter.CLASS_ECFP4).getBitFingerprint(mol).asBitSet();
        } catch (CDKException | RuntimeException e) {
            return new BitSet();
        }
    }

    static double tanimoto(BitSet a, BitSet b) {
        BitSet and = (BitSet) a.clone();
        and.and(b);
        BitSet or = (BitSet) a.clone();
        or.or(b);
        return or.isEmpty() ? 0 : (double) and.cardinality() / or.cardinality();
    }

    public static String canonical(IAtomContainer mol) {
        try {
            return new SmilesGenerator(SmiFlavor.Unique).create(mol);
        } catch (CDKException e) {
            return "";
        }
    }
}
