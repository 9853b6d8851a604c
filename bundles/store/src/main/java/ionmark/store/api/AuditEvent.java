package ionmark.store.api;

import java.time.Instant;

/**
 * One line of the append-only audit trail.
 *
 * @param action  sign-in, validate, publish, rollback, export, read … (free text, lower case)
 * @param version the version concerned, or 0
 * @param outcome "ok", "conflict", "rejected" or "denied"
 */
public record AuditEvent(long id, Instant time, String user, String action, int version, String outcome,
        String detail) {
}
