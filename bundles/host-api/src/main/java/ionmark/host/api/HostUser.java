package ionmark.host.api;

import java.util.Set;

/** The user the host vouches for, with roles such as "viewer" and "admin". */
public record HostUser(String name, Set<String> roles) {
    public HostUser {
        roles = Set.copyOf(roles);
    }

    public boolean has(String role) {
        return roles.contains(role);
    }
}
