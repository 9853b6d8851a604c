package ionmark.host.api;

import java.util.Map;

import org.osgi.annotation.versioning.ConsumerType;

/**
 * Contribution point: a panel beside the entry (for example a quick check). The host renders
 * {@link #html(Map, HostUser)} with the panel's form parameters, from a GET or a CSRF-checked POST.
 */
@ConsumerType
public interface SidePanel {
    /** Short stable id, used in URLs. */
    String id();

    /** Title shown above the panel. */
    String title();

    /** The panel's HTML for the given parameters (empty map: the blank form). */
    String html(Map<String, String> params, HostUser user);
}
