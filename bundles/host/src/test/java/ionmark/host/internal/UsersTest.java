package ionmark.host.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Set;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Users file, PBKDF2 hashes, lock-out, sessions. */
class UsersTest {
    @TempDir
    Path dir;

    @Test
    void passwordsAreStoredAsSaltedPbkdf2HashesAndVerify() throws IOException {
        Path f = dir.resolve("users.properties");
        Users u = new Users(f);
        u.put("alice", Set.of("viewer", "admin"), "correct horse".toCharArray());
        String text = Files.readString(f);
        assertFalse(text.contains("correct horse"), "no clear-text password in the file");
        assertTrue(text.contains("alice = ") && text.contains("pbkdf2-sha256$" + Users.ITERATIONS + "$"), text);
        Users again = new Users(f);
        var ok = again.signIn("alice", "correct horse".toCharArray());
        assertTrue(ok.user().orElseThrow().has("admin"));
        assertEquals("failed", again.signIn("alice", "wrong".toCharArray()).outcome());
        // the same password hashes differently each time (random salt)
        assertFalse(u.hash("x".toCharArray()).equals(u.hash("x".toCharArray())));
    }

    @Test
    void repeatedFailuresLockTheNameForAWhile() throws IOException {
        Users u = new Users(dir.resolve("u"));
        u.put("bob", Set.of("viewer"), "pw".toCharArray());
        for (int i = 0; i < Users.FREE_FAILURES; i++) {
            u.signIn("bob", "nope".toCharArray());
        }
        Users.Attempt locked = u.signIn("bob", "pw".toCharArray());
        assertEquals("locked", locked.outcome(), "even the right password waits while locked");
        assertTrue(locked.retryAfterMs() > 0);
    }

    @Test
    void unknownUsersFailWithoutRevealingWhichPartWasWrong() throws IOException {
        Users u = new Users(dir.resolve("u"));
        assertEquals("failed", u.signIn("nobody", "x".toCharArray()).outcome());
    }

    @Test
    void sessionsCarryTheirOwnCsrfTokenAndExpireOnSignOut() {
        Sessions s = new Sessions();
        String id = s.open(new ionmark.host.api.HostUser("alice", Set.of("admin")));
        var session = s.get(id).orElseThrow();
        assertEquals(48, session.csrf().length());
        assertTrue(Sessions.cookie(id, 60).contains("HttpOnly") && Sessions.cookie(id, 60).contains("SameSite=Strict"));
        s.close(id);
        assertTrue(s.get(id).isEmpty());
    }
}
