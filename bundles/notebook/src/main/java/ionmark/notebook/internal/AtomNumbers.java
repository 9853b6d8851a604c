package ionmark.notebook.internal;

/**
 * One atom numbering on every card: from 1, in the order of the analysed structure's heavy atoms. Structured
 * indices from the solver ({@code Site.atom()}, {@code Term.atoms()}, {@code Analysis.uncoveredAtoms()}) count
 * from 0 and are shown plus one here; the solver's and the reader's own words already count from 1.
 */
final class AtomNumbers {
    private AtomNumbers() {
    }

    static int shown(int solverIndex) {
        return solverIndex + 1;
    }
}
