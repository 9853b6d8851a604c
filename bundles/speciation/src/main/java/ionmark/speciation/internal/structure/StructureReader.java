package ionmark.speciation.internal.structure;

import java.io.StringReader;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

import org.openscience.cdk.exception.CDKException;
import org.openscience.cdk.exception.InvalidSmilesException;
import org.openscience.cdk.interfaces.IAtom;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.interfaces.IBond;
import org.openscience.cdk.interfaces.IAtomContainerSet;
import org.openscience.cdk.io.MDLV2000Reader;
import org.openscience.cdk.io.MDLV3000Reader;
import org.openscience.cdk.silent.SilentChemObjectBuilder;
import org.openscience.cdk.smarts.SmartsPattern;
import org.openscience.cdk.smiles.SmiFlavor;
import org.openscience.cdk.smiles.SmilesGenerator;
import org.openscience.cdk.smiles.SmilesParser;
import org.openscience.cdk.tools.CDKHydrogenAdder;
import org.openscience.cdk.tools.manipulator.AtomContainerManipulator;

/**
 * Reads SMILES, molfiles (V2000, V3000) and SDF records, keeps the parent component, and
 * normalises it to the reference protonation: ionised acids and bases are taken back to their
 * neutral forms, permanent charges and charge-separated groups (nitro, N-oxide) stay.
 * Aromaticity: CDK's Daylight model, applied by {@link SmartsPattern#prepare}.
 *
 * <p>The returned molecule is freshly built and owned by the caller; it is prepared once here and
 * must not be shared across threads.
 */
public final class StructureReader {
    private final int maxHeavyAtoms;

    public StructureReader(int maxHeavyAtoms) {
        this.maxHeavyAtoms = maxHeavyAtoms;
    }

    /**
     * A parent structure ready for perception. Its SMILES is written only when asked for: the brief
     * analysis does without it when the input SMILES already is the parent, unchanged.
     */
    public static final class Prepared {
        private final IAtomContainer molecule;
        private final String asRead;
        private final List<String> stripped;
        private final List<String> notes;
        private String smiles;

        Prepared(IAtomContainer molecule, String asRead, List<String> stripped, List<String> notes) {
            this.molecule = molecule;
            this.asRead = asRead;
            this.stripped = List.copyOf(stripped);
            this.notes = List.copyOf(notes);
        }

        public IAtomContainer molecule() {
            return molecule;
        }

        /** The parent as SMILES, written by CDK from the prepared molecule (aromatic symbols, stereo). */
        public String smiles() {
            if (smiles == null) {
                smiles = StructureReader.smiles(molecule);
            }
            return smiles;
        }

        /**
         * The input SMILES itself when it was read as SMILES, had one component and needed no
         * normalisation (so it denotes the parent exactly); otherwise {@link #smiles()}.
         */
        public String smilesAsRead() {
            return asRead != null ? asRead : smiles();
        }

        public List<String> stripped() {
            return stripped;
        }

        public List<String> notes() {
            return notes;
        }
    }

    public Prepared read(String text) throws StructureException {
        if (text == null || text.isBlank()) {
            throw new StructureException("empty input: give a SMILES, a molfile or an SDF record");
        }
        boolean molfile = looksLikeMolfile(text);
        IAtomContainer mol = molfile ? readMolfile(text) : readSmiles(text.strip());
        List<String> notes = new ArrayList<>();
        AtomContainerManipulator.suppressHydrogens(mol);
        for (IAtom a : mol.atoms()) {
            if (a.getAtomicNumber() == null || a.getAtomicNumber() == 0) {
                throw new StructureException("unknown element '" + a.getSymbol() + "'");
            }
        }
        List<String> stripped = new ArrayList<>();
        mol = parent(mol, stripped);
        if (mol.getAtomCount() > maxHeavyAtoms) {
            throw new StructureException("molecule has " + mol.getAtomCount() + " heavy atoms; the limit is "
                    + maxHeavyAtoms);
        }
        Treatable.check(mol);
        Valences.check(mol);
        Normaliser.toReferenceForm(mol, notes);
        SmartsPattern.prepare(mol);
        Tautomers.Moved moved = Tautomers.toReference(mol);
        if (moved.any()) {
            SmartsPattern.prepare(mol);
        }
        KetoEnol.Moved carbon = KetoEnol.toReference(mol);
        if (carbon.any()) {
            // the carbon skeleton changed: the heteroatom hydrogens are placed again on it
            SmartsPattern.prepare(mol);
            Tautomers.Moved again = Tautomers.toReference(mol);
            if (again.any()) {
                SmartsPattern.prepare(mol);
                moved = moved.any() ? moved : again;
            }
            notes.add("input was drawn as another tautomer (" + carbon.describe() + "); analysed as the reference "
                    + "tautomer: keto over enol, except the stable enols of ring vinylogous acids (tetronic acids, "
                    + "4-hydroxy-2-pyrones and -coumarins, ascorbic acid), cyclic 1,2-diones (hydroxyquinones) and "
                    + "1,3-ketoaldehydes");
        }
        if (moved.any()) {
            notes.add("input was drawn as another tautomer (" + moved.describe() + "); analysed as the reference "
                    + "tautomer: amide and lactam over iminol and lactim, thione over thiol, amino over imino, benzene "
                    + "rings kept");
        }
        if (moved.capped() > 0) {
            notes.add("too many tautomers to compare in " + moved.capped() + " conjugated system(s); analysed as drawn");
        }
        String asRead = !molfile && stripped.isEmpty() && notes.isEmpty() ? firstToken(text.strip()) : null;
        return new Prepared(mol, asRead, stripped, notes);
    }

    static boolean looksLikeMolfile(String text) {
        return text.contains("V2000") || text.contains("V3000") || text.contains("M  END");
    }

    /** One parser per thread: a parser keeps state between calls and is not thread-safe. */
    private static final ThreadLocal<SmilesParser> PARSER = ThreadLocal
            .withInitial(() -> new SmilesParser(SilentChemObjectBuilder.getInstance()));

    private static String firstToken(String smi) {
        int eol = smi.indexOf('\n');
        String first = (eol < 0 ? smi : smi.substring(0, eol)).strip();
        int ws = indexOfWhitespace(first);
        return ws < 0 ? first : first.substring(0, ws);
    }

    static IAtomContainer readSmiles(String smi) throws StructureException {
        String s = firstToken(smi);
        try {
            return PARSER.get().parseSmiles(s);
        } catch (InvalidSmilesException e) {
            String msg = e.getMessage() == null ? "invalid SMILES" : e.getMessage().replace('\n', ' ')
                    .replaceAll("\\s+", " ");
            throw new StructureException("cannot read SMILES '" + abbreviate(s) + "': " + msg,
                    SmilesCaret.position(e.getMessage(), s));
        } catch (RuntimeException e) {
            throw new StructureException("cannot read SMILES '" + abbreviate(s) + "': " + e);
        }
    }

    private static int indexOfWhitespace(String s) {
        for (int i = 0; i < s.length(); i++) {
            if (Character.isWhitespace(s.charAt(i))) {
                return i;
            }
        }
        return -1;
    }

    static IAtomContainer readMolfile(String text) throws StructureException {
        String record = text;
        int end = record.indexOf("$$$$");
        if (end >= 0) {
            record = record.substring(0, end);
        }
        IAtomContainer empty = SilentChemObjectBuilder.getInstance().newAtomContainer();
        try {
            if (record.contains("V3000")) {
                try (MDLV3000Reader r = new MDLV3000Reader(new StringReader(record))) {
                    IAtomContainer mol = r.read(empty);
                    if (mol == null) {
                        throw new StructureException("cannot read molfile: the V3000 record is damaged or incomplete");
                    }
                    addImplicitHydrogens(mol);
                    return mol;
                }
            }
            try (MDLV2000Reader r = new MDLV2000Reader(new StringReader(record))) {
                IAtomContainer mol = r.read(empty);
                if (mol == null) {
                    throw new StructureException("cannot read molfile: the record is damaged or incomplete");
                }
                return mol;
            }
        } catch (CDKException | java.io.IOException | RuntimeException e) {
            throw new StructureException("cannot read molfile: " + String.valueOf(e.getMessage()).lines().findFirst()
                    .orElse("unreadable"));
        }
    }

    private static void addImplicitHydrogens(IAtomContainer mol) throws CDKException {
        boolean missing = false;
        for (IAtom a : mol.atoms()) {
            missing |= a.getImplicitHydrogenCount() == null;
        }
        if (missing) {
            AtomContainerManipulator.percieveAtomTypesAndConfigureAtoms(mol);
            CDKHydrogenAdder.getInstance(mol.getBuilder()).addImplicitHydrogens(mol);
        }
    }

    /** Keeps the largest component that contains carbon (the parent); names the others. */
    private static IAtomContainer parent(IAtomContainer mol, List<String> stripped) throws StructureException {
        if (mol.getAtomCount() == 0) {
            throw new StructureException("the structure has no atoms");
        }
        if (connected(mol)) {
            return mol;
        }
        IAtomContainerSet parts = org.openscience.cdk.graph.ConnectivityChecker.partitionIntoMolecules(mol);
        List<IAtomContainer> all = new ArrayList<>();
        parts.atomContainers().forEach(all::add);
        IAtomContainer best = all.stream()
                .max(Comparator.comparingInt((IAtomContainer c) -> hasCarbon(c) ? 1 : 0)
                        .thenComparingInt(IAtomContainer::getAtomCount))
                .orElseThrow();
        for (IAtomContainer c : all) {
            if (c != best) {
                stripped.add(smiles(c));
            }
        }
        return best;
    }

    /**
     * Whether the bonds join every atom into one component (union–find over the bond list). A bond to an atom
     * outside the structure (a molfile bond line naming an atom number beyond the atom block, which the reader
     * accepts) is a damaged record.
     */
    static boolean connected(IAtomContainer mol) throws StructureException {
        int n = mol.getAtomCount();
        int[] parent = new int[n];
        for (int i = 0; i < n; i++) {
            parent[i] = i;
        }
        int components = n;
        for (IBond b : mol.bonds()) {
            int bi = b.getBegin().getIndex();
            int ei = b.getEnd().getIndex();
            if (bi < 0 || ei < 0 || bi >= n || ei >= n) {
                throw new StructureException("cannot read molfile: a bond names an atom the atom block does not have");
            }
            int u = root(parent, bi);
            int w = root(parent, ei);
            if (u != w) {
                parent[u] = w;
                components--;
            }
        }
        return components == 1;
    }

    private static int root(int[] parent, int i) {
        while (parent[i] != i) {
            parent[i] = parent[parent[i]];
            i = parent[i];
        }
        return i;
    }

    private static boolean hasCarbon(IAtomContainer c) {
        for (IAtom a : c.atoms()) {
            if (a.getAtomicNumber() != null && a.getAtomicNumber() == 6) {
                return true;
            }
        }
        return false;
    }

    public static String smiles(IAtomContainer mol) {
        try {
            return new SmilesGenerator(SmiFlavor.Stereo | SmiFlavor.UseAromaticSymbols).create(mol);
        } catch (CDKException e) {
            return "";
        }
    }

    private static String abbreviate(String s) {
        return s.length() <= 60 ? s : s.substring(0, 57) + "...";
    }
}
