package ionmark.speciation.internal.structure;

import java.util.ArrayList;
import java.util.List;

import org.openscience.cdk.interfaces.IAtomContainer;

/**
 * One reference tautomer per compound: the hydrogens that can move between the nitrogen, oxygen and
 * sulfur atoms of a conjugated system (1,3-, 1,5- and longer shifts at once) are placed by one stated
 * rule, whatever drawing came in.
 *
 * <p>The mobile positions of a conjugated system are its uncharged N, O and S atoms that either carry
 * a hydrogen and only single bonds next to a conjugated atom (donors: N-H, O-H on carbon, S-H on
 * carbon) or carry one double bond and room for a hydrogen (acceptors: C=O, C=S, C=N, ring N). Taking
 * the mobile hydrogens off gives a skeleton that every drawing of the compound shares; each way of
 * putting them back on the mobile positions for which a Kekulé structure exists is a tautomer. Of
 * those the reference is the one that, in this order:
 * <ol>
 * <li>breaks the fewest carbocyclic rings: fewest ring carbons of all-carbon rings (every ring atom able to
 * carry a double bond) with a double bond
 * out of their rings (a benzene ring stays benzenoid: phenol over cyclohexadienone, azo-phenol over
 * quinone hydrazone, hydroxy groups on a benzo ring stay);
 * <li>has the most C=O and C=S (amide over iminol, lactam over lactim, keto over enol between
 * heteroatoms, thione over thiol; 2-pyridone, uracil, barbiturates); of those with as many, the most
 * C=O on ester and lactone carbons (a tetronic acid or a 4-hydroxycoumarin is HO-C=C-C(=O)-O, not the
 * ketene acetal O=C-C=C(OH)-O);
 * <li>has the most aromatic rings (six-membered: a double bond on every atom; five-membered: on four, and
 * one N, O or S lone pair): amino over imino (2-aminopyridine, a sulfonamide on a ring N over the
 * sulfonylimine), the imidazole N-H of purines over pyrimidine-ring N-H;
 * <li>has the fewest ring atoms with a double bond out of their rings (cytosine's amino-oxo form);
 * <li>has the most N-H next to a C=O or C=S (amide resonance: 4(3H)- over 4(1H)-pyrimidinone);
 * <li>puts an open-chain imine on the unsubstituted nitrogen rather than on an alkyl-bearing one
 * (HN=C(NH2)NHR), and on an aryl-bearing one rather than on an unsubstituted one (Ar-N=C(R)NH2);
 * <li>ties (ring N-H of 4(5)-substituted imidazoles, 1H/2H-tetrazoles, amidine and guanidine N-H) go
 * to the structure with the smallest hash of atom invariants refined over the whole graph, which does
 * not depend on the input's atom order.
 * </ol>
 * Hydrogens on carbon are {@link KetoEnol}'s, which runs first. A conjugated system
 * with fewer than two mobile positions, or no mobile hydrogen, is skipped before any search; one with
 * more than {@value #MAX_CANDIDATES} placements is left as drawn.
 *
 * <p>The work is split by stage: {@link MobileSites} perceives the mobile positions and conjugated
 * systems once per molecule (and screens out most structures), {@link TautomerRanking} picks the
 * reference placement of each system (screening acids and drawings that already are the amide, lactam or
 * urea form before trying other placements), {@link KekuleSearch} finds the double bonds of a placement.
 */
public final class Tautomers {
    /** Placements tried per conjugated system; beyond it the system is left as drawn. */
    static final int MAX_CANDIDATES = 256;
    /** What the move did, for the reader's note. */
    record Moved(int oxo, int thione, int nitrogen, int hydroxy, int capped) {
        boolean any() {
            return oxo + thione + nitrogen + hydroxy > 0;
        }

        /** For the note: which hydrogens moved, in a chemist's words. */
        String describe() {
            List<String> parts = new ArrayList<>();
            if (oxo > 0) {
                parts.add(oxo + " hydroxy group(s) to C=O: lactim or iminol to lactam or amide");
            }
            if (thione > 0) {
                parts.add(thione + " mercapto group(s) to C=S: thiol to thione");
            }
            if (hydroxy > 0) {
                parts.add(hydroxy + " C=O to hydroxy: a benzene ring kept");
            }
            if (nitrogen > 0) {
                parts.add(nitrogen + " N-H moved to another nitrogen");
            }
            return String.join("; ", parts);
        }
    }

    private Tautomers() {
    }

    /**
     * Moves {@code mol} (hydrogens suppressed, Kekulé bond orders, rings perceived) to its reference
     * tautomer in place; aromatic flags are stale afterwards.
     */
    static Moved toReference(IAtomContainer mol) {
        MobileSites m = MobileSites.of(mol);
        if (m == null) {
            return new Moved(0, 0, 0, 0, 0);
        }
        List<int[]> systems = m.systems();
        if (systems.isEmpty()) {
            return new Moved(0, 0, 0, 0, 0);
        }
        TautomerRanking ranking = new TautomerRanking(m);
        int oxo = 0;
        int thione = 0;
        int nitrogen = 0;
        int hydroxy = 0;
        int capped = 0;
        for (int[] atoms : systems) {
            TautomerRanking.Choice best = ranking.choose(atoms);
            if (best.capped()) {
                capped++;
                continue;
            }
            if (best.keep()) {
                continue;
            }
            for (int p : atoms) {
                if (!m.pool[p]) {
                    continue;
                }
                int now = MobileSites.contains(best.placement(), p) ? 1 : 0;
                if (now == m.mobile[p]) {
                    continue;
                }
                int z = m.z(p);
                if (z == 7) {
                    nitrogen += now == 1 ? 1 : 0;
                } else if (now == 0) {
                    oxo += z == 8 ? 1 : 0;
                    thione += z == 16 ? 1 : 0;
                } else {
                    hydroxy++;
                }
            }
            m.place(atoms, best.placement(), best.bonds());
        }
        return new Moved(oxo, thione, nitrogen, hydroxy, capped);
    }

    /** {@link #toReference} for the other stages: a charged pair cancelled in a microstate's structure. */
    public static void toReferenceTautomer(IAtomContainer mol) {
        toReference(mol);
    }

    /**
     * Every tautomer this rule set generates for {@code mol} (the drawing included), as new
     * containers: what the reference choice is tested against.
     */
    static List<IAtomContainer> enumerate(IAtomContainer mol) throws CloneNotSupportedException {
        List<IAtomContainer> out = new ArrayList<>();
        MobileSites m = MobileSites.of(mol);
        if (m == null) {
            out.add(mol.clone());
            return out;
        }
        List<int[]> systems = m.systems();
        List<List<int[]>> perSystem = new ArrayList<>();
        TautomerRanking ranking = new TautomerRanking(m);
        for (int[] atoms : systems) {
            perSystem.add(ranking.feasible(atoms));
        }
        // the product over systems, capped
        List<int[]> choice = new ArrayList<>();
        choice.add(new int[systems.size()]);
        for (int s = 0; s < systems.size(); s++) {
            List<int[]> next = new ArrayList<>();
            for (int[] c : choice) {
                for (int k = 0; k < Math.max(1, perSystem.get(s).size()) && next.size() < 64; k++) {
                    int[] d = c.clone();
                    d[s] = k;
                    next.add(d);
                }
            }
            choice = next;
        }
        for (int[] c : choice) {
            IAtomContainer copy = mol.clone();
            MobileSites mc = MobileSites.of(copy);
            for (int s = 0; s < systems.size(); s++) {
                if (!perSystem.get(s).isEmpty()) {
                    int[] placement = perSystem.get(s).get(c[s]);
                    mc.place(systems.get(s), placement, new KekuleSearch(mc, systems.get(s), true).solve(placement));
                }
            }
            out.add(copy);
        }
        return out;
    }

    /**
     * The tautomers this rule set generates for a neutral drawing, as Kekulé SMILES (the drawing
     * included): every other way the same compound can be drawn, for checking that all get one answer.
     */
    public static List<String> drawings(String smiles) throws StructureException {
        try {
            IAtomContainer mol = new org.openscience.cdk.smiles.SmilesParser(
                    org.openscience.cdk.silent.SilentChemObjectBuilder.getInstance()).parseSmiles(smiles);
            org.openscience.cdk.tools.manipulator.AtomContainerManipulator.suppressHydrogens(mol);
            org.openscience.cdk.smiles.SmilesGenerator gen = new org.openscience.cdk.smiles.SmilesGenerator(
                    org.openscience.cdk.smiles.SmiFlavor.Stereo);
            List<String> out = new ArrayList<>();
            for (IAtomContainer t : enumerate(mol)) {
                String s = gen.create(t);
                if (!out.contains(s)) {
                    out.add(s);
                }
            }
            return out;
        } catch (org.openscience.cdk.exception.CDKException | CloneNotSupportedException e) {
            throw new StructureException("cannot enumerate tautomers of '" + smiles + "': " + e.getMessage());
        }
    }

}
