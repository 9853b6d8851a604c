/**
 * The notebook host contract. A host shows {@link Entry entries}; bundles contribute by registering
 * {@link EntryDecorator} and {@link SidePanel} services. The host calls them and places their HTML.
 *
 * <pre>{@code
 * for (EntryDecorator d : decorators) {
 *     for (Decoration x : d.decorate(entry, user)) {
 *         page.insertAfterBlock(x.block(), x.html());   // host-specific placement
 *     }
 * }
 * }</pre>
 */
@org.osgi.annotation.bundle.Export
@org.osgi.annotation.versioning.Version("1.0.0")
package ionmark.host.api;
