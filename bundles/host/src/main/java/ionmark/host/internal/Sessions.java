package ionmark.host.internal;

import java.security.SecureRandom;
import java.util.HexFormat;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ConcurrentHashMap;

import ionmark.host.api.HostUser;

/** Signed-in sessions: a random id in an HttpOnly, SameSite=Strict cookie; each with its own CSRF token. */
final class Sessions {
    static final String COOKIE = "ionmark_session";
    static final long LIFETIME_MS = 8 * 3600_000L;

    record Session(HostUser user, String csrf, long expires) {
    }

    private final Map<String, Session> sessions = new ConcurrentHashMap<>();
    private final SecureRandom random = new SecureRandom();

    String open(HostUser user) {
        String id = token();
        sessions.put(id, new Session(user, token(), System.currentTimeMillis() + LIFETIME_MS));
        return id;
    }

    Optional<Session> get(String id) {
        if (id == null) {
            return Optional.empty();
        }
        Session s = sessions.get(id);
        if (s == null || s.expires() < System.currentTimeMillis()) {
            sessions.remove(id);
            return Optional.empty();
        }
        return Optional.of(s);
    }

    void close(String id) {
        if (id != null) {
            sessions.remove(id);
        }
    }

    static String cookie(String id, long maxAgeSeconds) {
        return COOKIE + "=" + id + "; Path=/; HttpOnly; SameSite=Strict; Max-Age=" + maxAgeSeconds;
    }

    String token() {
        byte[] b = new byte[24];
        random.nextBytes(b);
        return HexFormat.of().formatHex(b);
    }
}
