package ionmark.notebook.api;

import ionmark.notebook.internal.Annotator;
import ionmark.speciation.api.Speciation;

/**
 * The notebook's reading of entries outside an OSGi framework (a pipeline worker, a script): the same reader
 * the notebook's cards and {@code ionmark annotate} use, so every caller gets one answer per structure and
 * condition.
 *
 * <pre>{@code
 * EntryAnnotation notebook = EntryAnnotations.of(speciation);
 * AnnotatedEntry a = notebook.annotate(MarkdownEntries.parse("workup-17", text));
 * }</pre>
 */
public final class EntryAnnotations {
    private EntryAnnotations() {
    }

    /**
     * Reads entries with {@code speciation}'s table. There is no table store here: an entry pinned to a table
     * version ({@code Table version: v3}) is annotated with this table, and its {@link AnnotatedEntry#warnings()}
     * say so.
     */
    public static EntryAnnotation of(Speciation speciation) {
        if (speciation == null) {
            throw new IllegalArgumentException("the notebook's reading needs a speciation engine, got null");
        }
        return new Annotator(speciation);
    }
}
