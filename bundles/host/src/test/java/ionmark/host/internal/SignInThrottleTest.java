package ionmark.host.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Set;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The failed-sign-in throttle: bounded, per address as well as per name, unknown names as costly as known ones. */
class SignInThrottleTest {
    @TempDir
    Path dir;

    @Test
    void oneVisitorCannotLockAUserOutFromAnotherAddress() throws Exception {
        Users u = new Users(dir.resolve("u"));
        u.put("admin", Set.of("admin"), "right".toCharArray());
        for (int i = 0; i < 5; i++) {
            u.signIn("admin", "wrong".toCharArray(), "10.0.0.9");
        }
        assertEquals("locked", u.signIn("admin", "right".toCharArray(), "10.0.0.9").outcome());
        assertEquals("ok", u.signIn("admin", "right".toCharArray(), "127.0.0.1").outcome());
    }

    @Test
    void oneAddressTryingManyNamesIsThrottled() throws Exception {
        Users u = new Users(dir.resolve("u"));
        u.put("admin", Set.of("admin"), "right".toCharArray());
        String last = "";
        for (int i = 0; i < Users.FREE_FAILURES_PER_ADDRESS + 1; i++) {
            last = u.signIn("name" + i, "x".toCharArray(), "10.0.0.7").outcome();
        }
        assertEquals("locked", u.signIn("admin", "right".toCharArray(), "10.0.0.7").outcome(), last);
    }

    @Test
    void invalidNamesAreNotKeptAndTheMapStaysBounded() throws Exception {
        Users u = new Users(dir.resolve("u"));
        String big = "n".repeat(64 * 1024);
        for (int i = 0; i < 30; i++) {
            u.signIn(big + i, "x".toCharArray(), "10.0.0.8");
        }
        // the 64 KB names were not stored: one entry for the invalid name at that address, one for the address
        assertEquals(2, u.tracked());
        assertEquals("(invalid name)", Users.printable("a\nb\u001b[31m"));
        assertEquals("a.admin", Users.printable("a.admin"));
    }

    @Test
    void anUnknownNameCostsAPasswordDerivationLikeAKnownOne() throws Exception {
        Users u = new Users(dir.resolve("u"));
        u.put("admin", Set.of("admin"), "right".toCharArray());
        long known = 0;
        long unknown = 0;
        for (int i = 0; i < 4; i++) { // alternate, different addresses, so the throttle does not answer early
            long t0 = System.nanoTime();
            u.signIn("admin", "wrong".toCharArray(), "10.1.0." + i);
            long t1 = System.nanoTime();
            u.signIn("nobody" + i, "wrong".toCharArray(), "10.2.0." + i);
            long t2 = System.nanoTime();
            known += t1 - t0;
            unknown += t2 - t1;
        }
        // PBKDF2 with 310,000 iterations takes tens of milliseconds; skipping it would make unknown names ~0 ms
        assertTrue(unknown > known / 3, "unknown " + unknown / 1_000_000 + " ms, known " + known / 1_000_000 + " ms");
    }
}
