package ionmark.host.internal;

import java.util.Set;

import ionmark.host.api.HostUser;

/**
 * Who may change entries: a signed-in user holding an editing role. A visitor who has not signed in is
 * never an editor, whatever roles the host's configuration gives visitors.
 */
final class EditPolicy {
    /** Roles that may write entries. */
    static final Set<String> EDITING_ROLES = Set.of("editor", "admin");

    private EditPolicy() {
    }

    static boolean mayEdit(HostUser user, boolean signedIn) {
        return signedIn && user != null && EDITING_ROLES.stream().anyMatch(user::has);
    }

    static String refusal(boolean signedIn) {
        return signedIn ? "Editing needs the editor role; ask an administrator to give it to your account."
                : "Editing needs a signed-in user with the editor role: sign in first.";
    }
}
