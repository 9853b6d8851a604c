package ionmark.speciation.api;

import java.util.List;

/**
 * One line of a site's derivation: what was added to the pKa, how much, and on whose authority.
 *
 * @param label  plain words, for example "Hammett σp(nitro) 0.78 × ρ 2.23, para"; atoms it names are numbered
 *               from 1, as a chemist counts them
 * @param value  contribution in pKa units (the first term is the class reference value itself)
 * @param source citation
 * @param atoms  the other atoms the line is about, as indices from 0 like {@link Site#atom()} (a coupled or
 *               paired site); empty when it names none (since 1.3)
 */
public record Term(String label, double value, String source, List<Integer> atoms) {
    public Term {
        atoms = List.copyOf(atoms == null ? List.of() : atoms);
    }

    /** A line that names no other atom. */
    public Term(String label, double value, String source) {
        this(label, value, source, List.of());
    }
}
