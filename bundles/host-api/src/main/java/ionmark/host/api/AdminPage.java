package ionmark.host.api;

import java.util.Map;

import org.osgi.annotation.versioning.ConsumerType;

/**
 * Contribution point: an administration page. The host lists it only for users with
 * {@link #requiredRole()}, refuses everyone else with 403, and passes form parameters from a GET or
 * a CSRF-checked POST (the host checks the token before calling {@link #handle}).
 */
@ConsumerType
public interface AdminPage {
    /** Short stable id, used in URLs. */
    String id();

    /** Title shown in the admin menu. */
    String title();

    /** The role a user needs, for example "admin". */
    String requiredRole();

    /**
     * The page's HTML.
     *
     * @param params form parameters (empty for the first view)
     * @param post   true for a state-changing request (already CSRF-checked by the host)
     * @param csrf   the token the page must put in every form it renders ({@code name="token"})
     */
    String handle(Map<String, String> params, boolean post, HostUser user, String csrf);
}
