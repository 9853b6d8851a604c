package ionmark.acidity.patterns;

/**
 * The specificity of a class's SMARTS pattern: the table validator (classes that claim the same atom with the same
 * specificity) and the speciation bundle's compiled table (which class wins an atom) both rank classes by it. Kept
 * out of the API records, which hold plain values and parse nothing.
 */
public final class PatternSpecificity {
    private PatternSpecificity() {
    }

    /**
     * How much structure the pattern guarantees, which decides between classes that claim the same
     * atom (more wins; ties go to table order): its atoms, plus for every bracket atom with
     * non-negated recursive SMARTS the atoms of its smallest alternative beyond the first. So
     * {@code [n;$(n1cccc2ccccc12)]} (quinoline) counts 10 and outranks {@code [n;$(n1ccccc1)]} at 6.
     * Returns 0 for a pattern that does not parse.
     *
     * @param smarts a class's SMARTS pattern
     */
    public static int of(String smarts) {
        var q = new org.openscience.cdk.isomorphism.matchers.QueryAtomContainer(
                org.openscience.cdk.silent.SilentChemObjectBuilder.getInstance());
        if (!org.openscience.cdk.smarts.Smarts.parse(q, smarts)) {
            return 0;
        }
        int total = q.getAtomCount();
        int i = 0;
        while (i < smarts.length()) {
            if (smarts.charAt(i) != '[') {
                i++;
                continue;
            }
            int end = closing(smarts, i, '[', ']');
            String atom = smarts.substring(i, end + 1);
            int smallest = Integer.MAX_VALUE;
            int k = atom.indexOf("$(");
            while (k >= 0) {
                int close = closing(atom, k + 1, '(', ')');
                if (k == 0 || atom.charAt(k - 1) != '!') { // a negated recursion excludes; it guarantees nothing
                    var inner = new org.openscience.cdk.isomorphism.matchers.QueryAtomContainer(
                            org.openscience.cdk.silent.SilentChemObjectBuilder.getInstance());
                    if (org.openscience.cdk.smarts.Smarts.parse(inner, atom.substring(k + 2, close))) {
                        smallest = Math.min(smallest, inner.getAtomCount());
                    }
                }
                k = atom.indexOf("$(", close);
            }
            if (smallest != Integer.MAX_VALUE) {
                total += Math.max(0, smallest - 1);
            }
            i = end + 1;
        }
        return total;
    }

    private static int closing(String s, int open, char o, char c) {
        int depth = 0;
        for (int j = open; j < s.length(); j++) {
            if (s.charAt(j) == o) {
                depth++;
            } else if (s.charAt(j) == c && --depth == 0) {
                return j;
            }
        }
        return s.length() - 1;
    }
}
