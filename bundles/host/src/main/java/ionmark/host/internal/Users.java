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
 * (Base64), hashed with the JDK's PBKDF2. After three failed sign-ins a name must wait, 2 s doubling
 * per further failure up to 5 minutes.
 */
final class Users {
    static final int ITERATIONS = 310_000;
    static final int FREE_FAILURES = 3;
    static final long MAX_DELAY_MS = 300_000;

    private final Path file;
    private final Map<String, String[]> users = new LinkedHashMap<>(); // name -> {roles, hash}
    private final Map<String, long[]> failures = new ConcurrentHashMap<>(); // name -> {count, locked until}
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
        if (!name.matches("[A-Za-z0-9._-]{1,64}")) {
            throw new IllegalArgumentException("user names are letters, digits, '.', '_' or '-': " + name);
        }
        users.put(name, new String[] {String.join(",", roles), hash(password)});
        StringBuilder sb = new StringBuilder("# Ionmark users: name = roles : pbkdf2-sha256$iterations$salt$hash\n");
        users.forEach((n, v) -> sb.append(n).append(" = ").append(v[0]).append(" : ").append(v[1]).append('\n'));
        Files.createDirectories(file.getParent());
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

    Attempt signIn(String name, char[] password) {
        long now = System.currentTimeMillis();
        long[] f = failures.computeIfAbsent(name == null ? "" : name, k -> new long[2]);
        synchronized (f) {
            if (now < f[1]) {
                return new Attempt(Optional.empty(), "locked", f[1] - now);
            }
            String[] u = users.get(name);
            if (u != null && verify(password, u[1])) {
                f[0] = 0;
                f[1] = 0;
                return new Attempt(Optional.of(new HostUser(name, Set.of(u[0].split("\\s*,\\s*")))), "ok", 0);
            }
            f[0]++;
            if (f[0] >= FREE_FAILURES) {
                f[1] = now + Math.min(MAX_DELAY_MS, 2000L << Math.min(20, f[0] - FREE_FAILURES));
            }
            return new Attempt(Optional.empty(), "failed", Math.max(0, f[1] - now));
        }
    }

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
