package ionmark.speciation.internal.estimate;

import java.util.HashMap;
import java.util.Map;
import java.util.Optional;
import java.util.HashSet;
import java.util.Set;

import org.openscience.cdk.exception.CDKException;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.smiles.SmiFlavor;
import org.openscience.cdk.smiles.SmilesGenerator;

import ionmark.acidity.api.MeasuredCompound;
import ionmark.speciation.internal.sites.CompiledTable;
import ionmark.speciation.internal.sites.MatchTarget;
import ionmark.speciation.internal.structure.StructureException;
import ionmark.speciation.internal.structure.StructureReader;

/**
 * Measured compounds of the table that are this structure: an exact match overrides the estimates.
 * Their analogs are corrected site by site ({@link SiteAnalogIndex}, {@link AnalogCorrection}).
 */
public final class Overrides {

    private final Map<String, MeasuredCompound> exact = new HashMap<>();
    /** Formula keys of the measured compounds: a canonical SMILES is made only when the key is one of these. */
    private final Set<Long> formulas = new HashSet<>();

    public Overrides(CompiledTable table) {
        StructureReader reader = new StructureReader(1000);
        for (MeasuredCompound m : table.table().measured()) {
            try {
                IAtomContainer mol = reader.read(m.smiles()).molecule();
                exact.putIfAbsent(canonical(mol), m);
                formulas.add(formula(new MatchTarget(mol)));
            } catch (StructureException | RuntimeException e) {
                // the validator has parsed every measured structure; nothing to do for one that fails here
            }
        }
    }

    /** The measured compound that is this structure, if the table has it. */
    public Optional<MeasuredCompound> exact(MatchTarget mol) {
        if (!formulas.contains(formula(mol))) {
            return Optional.empty();
        }
        return Optional.ofNullable(exact.get(canonical(mol.molecule())));
    }

    /**
     * A hash of the element counts (with implicit hydrogens) and the total formal charge. Equal
     * canonical SMILES imply equal formulas and so equal keys, which makes this a safe screen before
     * the costlier canonical form; a collision only costs that canonical form.
     */
    static long formula(MatchTarget mol) {
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

    public static String canonical(IAtomContainer mol) {
        try {
            return new SmilesGenerator(SmiFlavor.Unique).create(mol);
        } catch (CDKException e) {
            return "";
        }
    }
}
