package ionmark.host.internal;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.security.NoSuchAlgorithmException;
import java.security.SecureRandom;
import java.security.spec.InvalidKeySpecException;
import java.security.MessageDigest;
import java.util.Base64;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;

import javax.crypto.SecretKeyFactory;
import javax.crypto.spec.PBEKeySpec;

import ionmark.host.api.HostUser;

/**
 * The reference host's users: one line per user in a file, {@code name = role,role : pbkdf2-sha256$iterations$salt$hash}
 * (Base64), hashed with the JDK's PBKDF2. After three failed sign-ins from one address a name must wait there,
 * 2 s doubling per further failure up to 5 minutes; an address that fails twenty times over any names waits too.
 */
final class Users {
    static final int ITERATIONS = 310_000;
    static final int FREE_FAILURES = 3;
    static final long MAX_DELAY_MS = 300_000;

    private final Path file;
    private final Map<String, String[]> users = new LinkedHashMap<>(); // name -> {roles, hash}
    // "n" name NUL address, or "a" address -> {count, locked until, last failure}
    private final Map<String, long[]> failures = new ConcurrentHashMap<>();
    private final SecureRandom random = new SecureRandom();

    Users(Path file) throws IOException {
        this.file = file;
        if (Files.isRegularFile(file)) {
            for (String line : Files.readAllLines(file, StandardCharsets.UTF_8)) {
                if (line.isBlank() || line.startsWith("#")) {
                    continue;
                }
                int eq = line.indexOf('=');
                int colon = line.lastIndexOf(':');
                if (eq < 0 || colon < eq) {
                    throw new IllegalArgumentException(file + ": a line must read 'name = roles : hash', not: " + line);
                }
                users.put(line.substring(0, eq).strip(), new String[] {line.substring(eq + 1, colon).strip(),
                        line.substring(colon + 1).strip()});
            }
        }
    }

    boolean isEmpty() {
        return users.isEmpty();
    }

    /** Adds or replaces a user and rewrites the file (owner-only permissions where the file system has them). */
    synchronized void put(String name, Set<String> roles, char[] password) throws IOException {
        if (!NAME.matcher(name).matches()) {
            throw new IllegalArgumentException("user names are letters, digits, '.', '_' or '-': " + name);
        }
        users.put(name, new String[] {String.join(",", roles), hash(password)});
        StringBuilder sb = new StringBuilder("# Ionmark users: name = roles : pbkdf2-sha256$iterations$salt$hash\n");
        users.forEach((n, v) -> sb.append(n).append(" = ").append(v[0]).append(" : ").append(v[1]).append('\n'));
        // a bare file name has no parent: the folder is then the working directory
        Files.createDirectories(java.util.Objects.requireNonNull(file.toAbsolutePath().getParent(),
                "the users file needs a folder"));
        Files.writeString(file, sb, StandardCharsets.UTF_8);
        try {
            Files.setPosixFilePermissions(file, PosixFilePermissions.fromString("rw-------"));
        } catch (UnsupportedOperationException e) {
            // not a POSIX file system
        }
    }

    /** The outcome of a sign-in attempt. */
    record Attempt(Optional<HostUser> user, String outcome, long retryAfterMs) {
    }

    /** The names a user may have; anything else is never stored, compared or printed as a name. */
    static final java.util.regex.Pattern NAME = java.util.regex.Pattern.compile("[A-Za-z0-9._-]{1,64}");
    /** Failures an address may make (over all names) before it must wait as well. */
    static final int FREE_FAILURES_PER_ADDRESS = 20;
    /** Most throttle entries kept; the oldest are dropped beyond this, so the map cannot grow without bound. */
    static final int MAX_TRACKED = 10_000;
    /** A throttle entry is forgotten this long after its last failure (and after its lock ran out). */
    static final long FORGET_MS = 15 * 60_000L;

    /** A sign-in name as it may be printed or audited: the name itself when allowed, else a fixed marker. */
    static String printable(String name) {
        return name != null && NAME.matcher(name).matches() ? name : "(invalid name)";
    }

    /** Without an address (tests, the shell): one address for every caller. */
    Attempt signIn(String name, char[] password) {
        return signIn(name, password, "local");
    }

    /**
     * A sign-in. Failures are counted per name and address (so that one visitor cannot lock a user out
     * everywhere) and per address over all names; after the free failures each waits, 2 s doubling up to 5
     * minutes. An unknown or invalid name costs one password derivation like a known one.
     */
    Attempt signIn(String name, char[] password, String address) {
        long now = System.currentTimeMillis();
        prune(now);
        String who = NAME.matcher(name == null ? "" : name).matches() ? name : "";
        String addr = address == null ? "" : address;
        long[] byName = failures.computeIfAbsent("n" + who + "\u0000" + addr, k -> new long[3]);
        long[] byAddress = failures.computeIfAbsent("a" + addr, k -> new long[3]);
        synchronized (byAddress) {
            synchronized (byName) {
                long wait = Math.max(byName[1], byAddress[1]) - now;
                if (wait > 0) {
                    return new Attempt(Optional.empty(), "locked", wait);
                }
                String[] u = who.isEmpty() ? null : users.get(who);
                boolean ok = verify(password, u == null ? DUMMY : u[1]) && u != null;
                if (ok) {
                    byName[0] = 0;
                    byName[1] = 0;
                    return new Attempt(Optional.of(new HostUser(who, Set.of(u[0].split("\\s*,\\s*")))), "ok", 0);
                }
                fail(byName, FREE_FAILURES, now);
                fail(byAddress, FREE_FAILURES_PER_ADDRESS, now);
                return new Attempt(Optional.empty(), "failed", Math.max(0, Math.max(byName[1], byAddress[1]) - now));
            }
        }
    }

    private static void fail(long[] f, int free, long now) {
        f[0]++;
        f[2] = now;
        if (f[0] >= free) {
            f[1] = now + Math.min(MAX_DELAY_MS, 2000L << Math.min(20, f[0] - free));
        }
    }

    /** Drops entries whose lock ran out and whose last failure is old; beyond the cap, the oldest. */
    private void prune(long now) {
        if (failures.size() < MAX_TRACKED / 2) {
            return;
        }
        failures.entrySet().removeIf(e -> e.getValue()[1] < now && e.getValue()[2] < now - FORGET_MS);
        if (failures.size() >= MAX_TRACKED) {
            failures.entrySet().stream().sorted(java.util.Comparator.comparingLong(e -> e.getValue()[2]))
                    .limit(failures.size() - MAX_TRACKED / 2L).map(Map.Entry::getKey).toList()
                    .forEach(failures::remove);
        }
    }

    int tracked() {
        return failures.size();
    }

    /** A hash no password matches, compared against when the name is unknown (same cost as a real one). */
    private static final String DUMMY = "pbkdf2-sha256$" + ITERATIONS + "$AAAAAAAAAAAAAAAAAAAAAA==$"
            + "AAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAA=";

    String hash(char[] password) {
        byte[] salt = new byte[16];
        random.nextBytes(salt);
        return "pbkdf2-sha256$" + ITERATIONS + "$" + Base64.getEncoder().encodeToString(salt) + "$"
                + Base64.getEncoder().encodeToString(derive(password, salt, ITERATIONS));
    }

    static boolean verify(char[] password, String stored) {
        String[] p = stored.split("\\$");
        if (p.length != 4 || !p[0].equals("pbkdf2-sha256")) {
            return false;
        }
        byte[] expected = Base64.getDecoder().decode(p[3]);
        byte[] actual = derive(password, Base64.getDecoder().decode(p[2]), Integer.parseInt(p[1]));
        return MessageDigest.isEqual(expected, actual);
    }

    private static byte[] derive(char[] password, byte[] salt, int iterations) {
        try {
            return SecretKeyFactory.getInstance("PBKDF2WithHmacSHA256")
                    .generateSecret(new PBEKeySpec(password, salt, iterations, 256)).getEncoded();
        } catch (NoSuchAlgorithmException | InvalidKeySpecException e) {
            throw new IllegalStateException("PBKDF2WithHmacSHA256 is required by every Java platform", e);
        }
    }

    /** A random printable password for the first admin. */
    String randomPassword() {
        byte[] b = new byte[15];
        random.nextBytes(b);
        return Base64.getUrlEncoder().withoutPadding().encodeToString(b);
    }
}
