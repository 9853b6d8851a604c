package ionmark.speciation.internal.profile;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Set;

import org.openscience.cdk.AtomRef;
import org.openscience.cdk.interfaces.IAtom;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.isomorphism.matchers.Expr;
import org.openscience.cdk.isomorphism.matchers.QueryAtom;
import org.openscience.cdk.isomorphism.matchers.QueryAtomContainer;
import org.openscience.cdk.silent.SilentChemObjectBuilder;
import org.openscience.cdk.smarts.Smarts;
import org.openscience.cdk.smarts.SmartsPattern;

import ionmark.speciation.internal.estimate.EstimatedSite;

/**
 * Structures whose estimate the project knows to be off (the list in {@code known-gaps.tsv}, each line with
 * its reason and an example compound with handbook values): a card for such a structure carries a warning
 * naming the gap, so a chemist does not read the estimate as the method's usual accuracy.
 *
 * <p>A gap names the site classes it concerns; its pattern is matched only when the molecule has a site of
 * one of them (or for '*' gaps), on the analysed structure as the reader prepared it (no second ring or
 * aromaticity perception), so the check costs next to nothing for the structures outside every gap.
 */
public final class KnownGaps {
    static final String RESOURCE = "/ionmark/speciation/known-gaps.tsv";
    static final String PREFIX = "known gap of the estimator: ";

    /** One line of the list. */
    record Gap(Set<String> classes, String smarts, String warning, String example, String exampleSmiles,
            String exampleValues, String source) {
    }

    private static final List<Gap> GAPS = read();
    /**
     * Per gap, how many atoms of each element its pattern needs at least (element → count; query atoms that
     * do not name one element are not counted): a molecule with fewer cannot match, and is not handed to CDK's
     * matcher. A necessary condition only, so the warnings are the same with or without it.
     */
    private static final List<int[]> NEEDS = GAPS.stream().map(g -> elementsNeeded(g.smarts())).toList();
    /** Compiled patterns per thread: a compiled pattern keeps matching state. Bounded by the list's length. */
    private static final ThreadLocal<List<SmartsPattern>> PATTERNS = ThreadLocal.withInitial(KnownGaps::compile);

    private KnownGaps() {
    }

    static List<Gap> gaps() {
        return GAPS;
    }

    /**
     * The warnings for {@code mol} (the prepared, analysed structure) with sites of the given classes, in the
     * list's order.
     */
    public static List<String> warnings(IAtomContainer mol, List<EstimatedSite> sites) {
        List<String> siteClasses = new ArrayList<>(sites.size());
        for (EstimatedSite s : sites) {
            siteClasses.add(s.site().group().id());
        }
        return forClasses(mol, siteClasses);
    }

    /** {@link #warnings(IAtomContainer, List)} with the site classes given by id. */
    static List<String> forClasses(IAtomContainer mol, Collection<String> siteClasses) {
        List<String> out = new ArrayList<>(0);
        List<SmartsPattern> patterns = null;
        int[] has = null;
        for (int i = 0; i < GAPS.size(); i++) {
            Gap g = GAPS.get(i);
            if (!g.classes().contains("*") && g.classes().stream().noneMatch(siteClasses::contains)) {
                continue;
            }
            if (has == null) {
                has = elementCounts(mol);
            }
            if (!enough(has, NEEDS.get(i))) {
                continue;
            }
            if (patterns == null) {
                patterns = PATTERNS.get();
            }
            if (patterns.get(i).matches(mol)) {
                out.add(PREFIX + g.warning() + " (example: " + g.example() + ", measured " + g.exampleValues().replace(
                        ";", " and ") + ", " + g.source() + ")");
            }
        }
        return out;
    }

    /** Atoms per atomic number (index 0 for any atom without one). */
    private static int[] elementCounts(IAtomContainer mol) {
        int[] has = new int[ELEMENTS];
        for (IAtom a : mol.atoms()) {
            Integer z = a.getAtomicNumber();
            has[z == null || z < 0 || z >= ELEMENTS ? 0 : z]++;
        }
        return has;
    }

    private static boolean enough(int[] has, int[] needs) {
        for (int z = 1; z < ELEMENTS; z++) {
            if (has[z] < needs[z]) {
                return false;
            }
        }
        return true;
    }

    private static final int ELEMENTS = 128;

    /** The least atom count per element a match of {@code smarts} needs (hydrogen never counted). */
    static int[] elementsNeeded(String smarts) {
        QueryAtomContainer q = new QueryAtomContainer(SilentChemObjectBuilder.getInstance());
        if (!Smarts.parse(q, smarts)) {
            throw new IllegalStateException("known-gaps pattern cannot be read: " + smarts);
        }
        int[] needs = new int[ELEMENTS];
        for (IAtom a : q.atoms()) {
            IAtom atom = AtomRef.deref(a);
            int z = atom instanceof QueryAtom qa ? element(qa.getExpression()) : 0;
            if (z > 1 && z < ELEMENTS) {
                needs[z]++;
            }
        }
        return needs;
    }

    /** The one element an atom expression requires, 0 when it allows several or says nothing about it. */
    private static int element(Expr e) {
        if (e == null) {
            return 0;
        }
        switch (e.type()) {
            case ELEMENT:
            case ALIPHATIC_ELEMENT:
            case AROMATIC_ELEMENT:
                return e.value();
            case AND: {
                int l = element(e.left());
                return l != 0 ? l : element(e.right());
            }
            case OR: {
                int l = element(e.left());
                return l != 0 && l == element(e.right()) ? l : 0;
            }
            default:
                return 0;
        }
    }

    private static List<SmartsPattern> compile() {
        List<SmartsPattern> out = new ArrayList<>();
        for (Gap g : GAPS) {
            SmartsPattern p = SmartsPattern.create(g.smarts(), SilentChemObjectBuilder.getInstance());
            p.setPrepare(false); // the reader has perceived rings and aromaticity already
            out.add(p);
        }
        return out;
    }

    private static List<Gap> read() {
        List<Gap> out = new ArrayList<>();
        InputStream in = KnownGaps.class.getResourceAsStream(RESOURCE);
        if (in == null) {
            throw new IllegalStateException("the known-gaps list " + RESOURCE + " is missing from the bundle");
        }
        try (BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8))) {
            for (String line = r.readLine(); line != null; line = r.readLine()) {
                if (line.isBlank() || line.startsWith("#")) {
                    continue;
                }
                String[] f = line.split("\t");
                if (f.length != 7) {
                    throw new IllegalStateException("known-gaps line needs 7 tab-separated fields: " + line);
                }
                out.add(new Gap(Set.of(f[0].split(",")), f[1], f[2], f[3], f[4], f[5], f[6]));
            }
        } catch (IOException e) {
            throw new IllegalStateException("cannot read the known-gaps list", e);
        }
        return List.copyOf(out);
    }
}
