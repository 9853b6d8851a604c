/**
 * What the notebook reads in an entry and what it says about each structure, as values: the notebook's cards
 * and {@code ionmark annotate} both render an {@link ionmark.notebook.api.AnnotatedEntry}, so they cannot
 * disagree.
 *
 * <pre>{@code
 * AnnotatedEntry a = annotation.annotate(MarkdownEntries.parse("e1", text));
 * for (AnnotatedStructure s : a.structures()) {
 *     System.out.println(s.words() + " at pH " + s.conditions().ph());
 * }
 * }</pre>
 *
 * <p>Outside a framework, {@link ionmark.notebook.api.EntryAnnotations#of} gives the same reading.
 */
@org.osgi.annotation.bundle.Export
@org.osgi.annotation.versioning.Version("1.0.0")
package ionmark.notebook.api;
