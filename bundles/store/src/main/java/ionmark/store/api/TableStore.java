package ionmark.store.api;

import java.util.List;
import java.util.Optional;

import org.osgi.annotation.versioning.ProviderType;

/**
 * Versions of the shared table. Versions are numbered 1, 2, 3 … in publish order and never change;
 * a publish names the version it was based on and fails with {@link StoreConflictException} when the
 * head has moved (optimistic concurrency). Each publish is one transaction. Every action, accepted
 * or refused, is appended to the audit trail.
 */
@ProviderType
public interface TableStore {
    Optional<VersionInfo> head();

    List<VersionInfo> history();

    /** The table JSON of a version. */
    Optional<String> content(int version);

    /** Validates, then publishes as the new head if {@code basedOn} is still the head. */
    VersionInfo publish(String json, int basedOn, String author, String comment)
            throws StoreConflictException, StoreRejectedException;

    /** Publishes an earlier version's content as a new version. */
    VersionInfo rollback(int toVersion, int basedOn, String author, String comment)
            throws StoreConflictException, StoreRejectedException;

    /** Appends to the audit trail (for actions outside the store: sign-in, export, denied requests). */
    void audit(String user, String action, int version, String outcome, String detail);

    /** The newest audit events first. */
    List<AuditEvent> audit(int limit);

    /** Record-by-record differences between two versions, one line each ("changed groups[id].pka: 4.76 → 4.80"). */
    List<String> diff(int from, int to);
}
