package ionmark.host.api;

import org.osgi.annotation.versioning.ConsumerType;

/**
 * Whiteboard service: hears of every sign-in, failed sign-in and denied request the host sees, so
 * that a bundle can keep them in its audit trail.
 */
@ConsumerType
@FunctionalInterface
public interface HostAuditor {
    /**
     * @param user    who (the name given, for a failed sign-in)
     * @param action  "sign-in" or "request"
     * @param outcome "ok", "failed", "locked" or "denied"
     * @param detail  what was attempted
     */
    void record(String user, String action, String outcome, String detail);
}
