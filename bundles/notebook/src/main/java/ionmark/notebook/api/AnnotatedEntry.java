package ionmark.notebook.api;

import java.util.List;

/**
 * An annotated entry.
 *
 * @param entry        the entry id
 * @param tableVersion the table version used, for example "v3 (1a2b3c4d)"
 * @param structures   every structure found, in entry order
 * @param warnings     what the reader must know about the entry as a whole (unreadable parts, a pinned table
 *                     version the store does not hold …)
 * @param separations  pH ranges in which one structure is neutral and another charged (work-up planning)
 */
public record AnnotatedEntry(String entry, String tableVersion, List<AnnotatedStructure> structures,
        List<String> warnings, List<Separation> separations) {
    public AnnotatedEntry {
        structures = List.copyOf(structures);
        warnings = List.copyOf(warnings);
        separations = List.copyOf(separations);
    }
}
