package ionmark.speciation.internal.sites;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;

import org.junit.jupiter.api.Test;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.isomorphism.matchers.QueryAtomContainer;
import org.openscience.cdk.silent.SilentChemObjectBuilder;
import org.openscience.cdk.smarts.Smarts;
import org.openscience.cdk.smarts.SmartsPattern;

import ionmark.acidity.api.GroupClass;
import ionmark.acidity.api.Substituent;
import ionmark.acidity.internal.TableSnapshotService;
import ionmark.speciation.internal.structure.StructureReader;

/**
 * Rooted matching must find exactly what CDK's whole-molecule SMARTS matcher finds, filtered to the
 * root: CDK's {@link SmartsPattern} is the reference here, over every class and substituent pattern
 * of the shipped table and every structure of the project's reference set.
 */
class RootedPatternTest {
    static final CompiledTable TABLE = new CompiledTable(TableSnapshotService.shipped());

    static List<IAtomContainer> referenceMolecules() throws Exception {
        List<IAtomContainer> out = new ArrayList<>();
        StructureReader reader = new StructureReader(300);
        try (InputStream in = RootedPatternTest.class.getResourceAsStream("/ionmark/speciation/reference-set.tsv")) {
            for (String line : new String(in.readAllBytes(), StandardCharsets.UTF_8).split("\n")) {
                if (line.isBlank() || line.startsWith("#")) {
                    continue;
                }
                IAtomContainer mol = reader.read(line.split("\t")[1]).molecule();
                mol.setTitle(line.split("\t")[0]);
                out.add(mol);
            }
        }
        assertTrue(out.size() >= 150, "reference set read: " + out.size());
        return out;
    }

    static QueryAtomContainer query(String smarts) {
        QueryAtomContainer q = new QueryAtomContainer(SilentChemObjectBuilder.getInstance());
        assertTrue(Smarts.parse(q, smarts), smarts);
        return q;
    }

    /** Atom sets of all mappings, keyed by the molecule atom that query atom {@code root} sits on. */
    static Map<Integer, Set<Set<Integer>>> byRoot(Iterable<int[]> mappings, int root) {
        Map<Integer, Set<Set<Integer>>> out = new HashMap<>();
        for (int[] m : mappings) {
            Set<Integer> atoms = new TreeSet<>();
            for (int a : m) {
                atoms.add(a);
            }
            out.computeIfAbsent(m[root], k -> new HashSet<>()).add(atoms);
        }
        return out;
    }

    static Map<Integer, Set<Set<Integer>>> rooted(RootedPattern p, IAtomContainer mol, int root) {
        MatchTarget t = new MatchTarget(mol);
        List<int[]> all = new ArrayList<>();
        for (int a = 0; a < mol.getAtomCount(); a++) {
            p.forEach(t, a, m -> all.add(m.clone()));
        }
        return byRoot(all, root);
    }

    @Test
    void everyClassAndSubstituentMatchesWhereCdkMatchesOnTheReferenceSet() throws Exception {
        List<IAtomContainer> mols = referenceMolecules();
        int compared = 0;
        int hits = 0;
        for (CompiledTable.Group g : TABLE.groups()) {
            GroupClass gc = g.group();
            SmartsPattern cdk = SmartsPattern.create(gc.smarts(), SilentChemObjectBuilder.getInstance()).setPrepare(false);
            for (IAtomContainer mol : mols) {
                Map<Integer, Set<Set<Integer>>> want = byRoot(cdk.matchAll(mol), g.site());
                Map<Integer, Set<Set<Integer>>> got = rooted(g.pattern(), mol, g.site());
                assertEquals(want, got, gc.id() + " on " + mol.getTitle());
                compared++;
                hits += want.size();
            }
        }
        for (CompiledTable.Sub s : TABLE.substituents()) {
            Substituent sub = s.substituent();
            SmartsPattern cdk = SmartsPattern.create(sub.smarts(), SilentChemObjectBuilder.getInstance()).setPrepare(false);
            for (IAtomContainer mol : mols) {
                assertEquals(byRoot(cdk.matchAll(mol), 0), rooted(s.pattern(), mol, 0), sub.id());
                compared++;
            }
        }
        assertTrue(compared > 10_000, "pairs compared: " + compared);
        assertTrue(hits > 245, "class sites found: " + hits);
    }

    @Test
    void aSymmetricSubstituentAttachesByEitherEnd() throws Exception {
        // ethynyl, C#C: in HC≡C–C the attachment is the inner carbon; a whole-molecule match that keeps
        // one mapping per atom set may keep the other orientation and lose the attachment
        IAtomContainer mol = new StructureReader(300).read("C#CC(C)(C)N(C)C").molecule();
        RootedPattern ethynyl = new RootedPattern(query("C#C"), 0);
        MatchTarget t = new MatchTarget(mol);
        assertNotNull(ethynyl.first(t, 1));
        assertNotNull(ethynyl.first(t, 0));
        assertNull(ethynyl.first(t, 2));
    }

    @Test
    void ringClosuresInTheQueryAreChecked() throws Exception {
        RootedPattern sixRing = new RootedPattern(query("[NX3;R]1CCCCC1"), 0);
        assertNotNull(sixRing.first(new MatchTarget(new StructureReader(300).read("C1CCNCC1").molecule()), 3));
        // a five-membered ring and an open chain have no six-membered closure
        assertNull(sixRing.first(new MatchTarget(new StructureReader(300).read("C1CCNC1").molecule()), 3));
        assertNull(sixRing.first(new MatchTarget(new StructureReader(300).read("CCCNCCC").molecule()), 3));
    }

    /**
     * A pattern that states double-bond geometry ({@code /}, {@code \}) matches only molecules drawn with that
     * geometry, whichever way the SMILES is written; one drawn without it matches neither form. CDK's whole-
     * molecule matcher, which reads the geometry, is the reference.
     */
    @Test
    void doubleBondGeometryInThePatternIsRead() throws Exception {
        String cis = "[OX2H1:1][CX3](=O)/[CX3]=[CX3]\\[CX3](=O)[OX2H1:2]";
        RootedPattern p = new RootedPattern(query(cis), 0);
        SmartsPattern cdk = SmartsPattern.create(cis);
        StructureReader reader = new StructureReader(300);
        Map<String, Boolean> drawings = new java.util.LinkedHashMap<>();
        drawings.put("OC(=O)/C=C\\C(=O)O", true); // maleic acid
        drawings.put("OC(=O)\\C=C/C(=O)O", true);
        drawings.put("C(=O)(O)/C=C\\C(O)=O", true);
        drawings.put("O=C(O)/C(/[H])=C(/[H])C(=O)O", true);
        drawings.put("OC(=O)/C=C/C(=O)O", false); // fumaric acid
        drawings.put("C(\\C(=O)O)=C/C(=O)O", false);
        drawings.put("OC(=O)C=CC(=O)O", false); // geometry not stated
        for (Map.Entry<String, Boolean> d : drawings.entrySet()) {
            IAtomContainer mol = reader.read(d.getKey()).molecule();
            MatchTarget t = new MatchTarget(mol);
            boolean found = false;
            for (int a = 0; a < mol.getAtomCount(); a++) {
                found |= p.matchesAt(t, a);
            }
            assertEquals(d.getValue(), found, d.getKey());
            assertEquals(cdk.matches(mol), found, "CDK disagrees on " + d.getKey());
        }
    }

    @Test
    void rootElementsComeFromTheSiteExpression() {
        assertEquals(Set.of(7), new RootedPattern(query("[NX3;H2]C"), 0).rootElements());
        assertEquals(Set.of(7, 8), new RootedPattern(query("[N,O;H1]C"), 0).rootElements());
        assertNull(new RootedPattern(query("[!#6]C"), 0).rootElements());
        assertNull(new RootedPattern(query("*C"), 0).rootElements());
    }

    @Test
    void aDisconnectedQueryIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> new RootedPattern(query("C.O"), 0));
    }

    /**
     * Matching reads compiled primitives over precomputed invariants; each primitive, including the
     * ones no shipped pattern uses yet, must mean what it means in CDK's matcher, on molecules with
     * charges, isotopic explicit hydrogens, rings and unsaturation.
     */
    @Test
    void everyCompiledPrimitiveMeansWhatCdkMeans() throws Exception {
        List<IAtomContainer> mols = referenceMolecules();
        StructureReader reader = new StructureReader(300);
        for (String smi : List.of("[NH3+]CC([O-])=O", "[2H]OC(=O)C", "C[N+](C)(C)CC#N", "c1ccc(cc1)[N+](=O)[O-]",
                "OC(=O)/C=C/C#N", "[H]N([H])c1ccncc1", "O=C1NC(=O)C2=C1C=CS2", "C1CC2(CC1)CCNCC2", "[O-][n+]1ccccc1")) {
            IAtomContainer mol = reader.read(smi).molecule();
            mol.setTitle(smi);
            mols.add(mol);
        }
        List<String> smarts = List.of("[a]", "[A]", "[R]", "[!R]", "*", "[!*]", "[#7]", "[n]", "[N]", "[#1]",
                "[H0]", "[H1]", "[H2]", "[H3]", "[h1]", "[h0]", "[D1]", "[D3]", "[X2]", "[X4]", "[v3]", "[v4]",
                "[+1]", "[-1]", "[+0]", "[x2]", "[x3]", "[r6]", "[R2]", "[#6;!H0]", "[N;H2,H1;!$(NC=O)]",
                "[$(C=O)]", "[!$(C=O);#6]", "[$([OH]C=O),$([SH])]", "C=O", "C-O", "c:c", "C#N", "C~N", "C@C", "C!@C",
                "[#6]!:[#7]", "[#6]=,:[#7]", "[#6]-,:[#7]", "[#6]-,=[#6]", "[#7]!-[#8]", "[#6]-;!@[#7]");
        int hits = 0;
        for (String sm : smarts) {
            SmartsPattern cdk = SmartsPattern.create(sm, SilentChemObjectBuilder.getInstance()).setPrepare(false);
            RootedPattern ours = new RootedPattern(query(sm), 0);
            for (IAtomContainer mol : mols) {
                Map<Integer, Set<Set<Integer>>> want = byRoot(cdk.matchAll(mol), 0);
                assertEquals(want, rooted(ours, mol, 0), sm + " on " + mol.getTitle());
                hits += want.size();
            }
        }
        assertTrue(hits > 10_000, "matches compared: " + hits);
    }

    /**
     * The candidate lists (by signature, then by neighbourhood) may leave a class or substituent out
     * only where it cannot match: every rooted match on the reference set must come from a candidate.
     * The lists are cached by key across molecules, so this also checks that the keys hold everything
     * the screens read.
     */
    @Test
    void candidateListsKeepEveryPatternThatMatches() throws Exception {
        int checked = 0;
        for (IAtomContainer mol : referenceMolecules()) {
            MatchTarget t = new MatchTarget(mol);
            for (int a = 0; a < mol.getAtomCount(); a++) {
                List<CompiledTable.Group> groups = TABLE.groupsAt(t, a);
                for (CompiledTable.Group g : TABLE.groupsRootedAt(t.atomicNumber(a))) {
                    if (g.pattern().first(t, a) != null) {
                        assertTrue(groups.contains(g), g.group().id() + " on " + mol.getTitle() + " atom " + a);
                        checked++;
                    }
                }
                List<CompiledTable.Sub> subs = TABLE.substituentsAt(t, a);
                for (CompiledTable.Sub s : TABLE.substituentsRootedAt(t.atomicNumber(a))) {
                    if (s.pattern().first(t, a) != null) {
                        assertTrue(subs.contains(s), s.substituent().id() + " on " + mol.getTitle() + " atom " + a);
                        checked++;
                    }
                }
            }
        }
        assertTrue(checked > 1000, "matches checked: " + checked);
    }

    /** The neighbourhood screen drops a class whose root neighbour is not there, and keeps it where it is. */
    @Test
    void neighbourhoodScreenNeedsThePartnersOfTheRoot() throws Exception {
        StructureReader reader = new StructureReader(300);
        MatchTarget toluene = new MatchTarget(reader.read("Cc1ccccc1").molecule());
        MatchTarget nitromethane = new MatchTarget(reader.read("C[N+](=O)[O-]").molecule());
        CompiledTable.Group nitro = TABLE.groups().stream().filter(g -> g.group().id().equals("nitroalkane"))
                .findFirst().orElseThrow();
        assertTrue(TABLE.groupsRootedAt(6).contains(nitro));
        assertTrue(nitro.pattern().rootMayMatch(toluene, 0), "the methyl carbon passes the root screen");
        assertTrue(!nitro.pattern().neighboursMayMatch(toluene, 0) && !TABLE.groupsAt(toluene, 0).contains(nitro),
                "no N+ next to the methyl of toluene");
        assertTrue(nitro.pattern().neighboursMayMatch(nitromethane, 0) && TABLE.groupsAt(nitromethane, 0).contains(nitro));
    }
}
