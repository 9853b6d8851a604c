/**
 * The versioned record of the shared table.
 *
 * <pre>{@code
 * VersionInfo head = store.head().orElseThrow();
 * store.publish(draftJson, head.number(), "a.admin", "pKa of morpholine class from our 2026 series");
 * // a second admin who also based a draft on head.number() now gets a StoreConflictException
 * }</pre>
 */
@org.osgi.annotation.bundle.Export
@org.osgi.annotation.versioning.Version("1.0.0")
package ionmark.store.api;
