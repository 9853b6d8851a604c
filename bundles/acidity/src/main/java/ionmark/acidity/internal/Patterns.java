package ionmark.acidity.internal;

import java.util.ArrayList;
import java.util.List;

import org.openscience.cdk.CDKConstants;
import org.openscience.cdk.exception.InvalidSmilesException;
import org.openscience.cdk.interfaces.IAtom;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.isomorphism.matchers.QueryAtomContainer;
import org.openscience.cdk.silent.SilentChemObjectBuilder;
import org.openscience.cdk.smarts.Smarts;
import org.openscience.cdk.smarts.SmartsPattern;
import org.openscience.cdk.smiles.SmilesParser;

/** The chemistry the validator needs: compile a SMARTS, find its mapped atoms, match examples. */
final class Patterns {
    private Patterns() {
    }

    /** A compiled SMARTS with the query index of its atom mapped 1, or an error message. */
    record Compiled(SmartsPattern pattern, int siteIndex, int atomCount, String error) {
        boolean ok() {
            return error == null;
        }
    }

    static Compiled compile(String smarts, boolean needsSite) {
        if (smarts == null || smarts.isBlank()) {
            return new Compiled(null, -1, 0, "SMARTS is empty");
        }
        QueryAtomContainer q = new QueryAtomContainer(SilentChemObjectBuilder.getInstance());
        var result = Smarts.parseToResult(q, smarts);
        if (!result.ok()) {
            return new Compiled(null, -1, 0, "SMARTS does not compile: " + result.getMessage() + " at position "
                    + result.getPosition() + " in '" + smarts + "'");
        }
        if (q.getAtomCount() > 0 && !org.openscience.cdk.graph.ConnectivityChecker.isConnected(q)) {
            return new Compiled(null, -1, q.getAtomCount(), "SMARTS is not one connected pattern (no '.' parts): '"
                    + smarts + "'");
        }
        int site = -1;
        for (int i = 0; i < q.getAtomCount(); i++) {
            Integer map = q.getAtom(i).getProperty(CDKConstants.ATOM_ATOM_MAPPING);
            if (map != null && map == 1) {
                site = i;
            }
        }
        if (needsSite && site < 0) {
            return new Compiled(null, -1, q.getAtomCount(), "no ionizable atom marked: map one atom as :1 in '"
                    + smarts + "'");
        }
        SmartsPattern p = SmartsPattern.create(smarts, SilentChemObjectBuilder.getInstance());
        return new Compiled(p, site, q.getAtomCount(), null);
    }

    /** How many atoms of a SMARTS that compiles carry atom map {@code map}. */
    static int mapped(String smarts, int map) {
        QueryAtomContainer q = new QueryAtomContainer(SilentChemObjectBuilder.getInstance());
        if (!Smarts.parse(q, smarts)) {
            return 0;
        }
        int n = 0;
        for (IAtom a : q.atoms()) {
            Integer m = a.getProperty(CDKConstants.ATOM_ATOM_MAPPING);
            n += m != null && m == map ? 1 : 0;
        }
        return n;
    }

    static IAtomContainer parseSmiles(String smiles) throws InvalidSmilesException {
        return new SmilesParser(SilentChemObjectBuilder.getInstance()).parseSmiles(smiles);
    }

    /** Indices of the atoms a compiled pattern marks as site in the molecule (the molecule gets prepared). */
    static List<Integer> siteAtoms(Compiled c, IAtomContainer mol) {
        SmartsPattern.prepare(mol);
        List<Integer> out = new ArrayList<>();
        for (int[] m : c.pattern().matchAll(mol).uniqueAtoms()) {
            int idx = m[Math.max(0, c.siteIndex())];
            if (!out.contains(idx)) {
                out.add(idx);
            }
        }
        return out;
    }

    static String describe(IAtom a) {
        return a.getSymbol();
    }
}
