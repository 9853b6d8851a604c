package ionmark.console.internal;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;

/**
 * The frozen 15 % of the development compounds that no design decision may see: compound id ID is
 * frozen iff the first eight hex digits of SHA-256("ionmark-frozen-1:" + ID), read as an unsigned
 * integer, are below 15 modulo 100. {@code --subset open|frozen} of the accuracy command keeps one side.
 */
final class FrozenSplit {
    static final String SALT = "ionmark-frozen-1:";

    private FrozenSplit() {
    }

    static boolean frozen(String id) {
        try {
            byte[] h = MessageDigest.getInstance("SHA-256").digest((SALT + id).getBytes(StandardCharsets.UTF_8));
            String hex = HexFormat.of().formatHex(h);
            // read as an unsigned number: Java's % on the int that parseUnsignedInt returns would be negative for
            // half the ids (and freeze more than half); the split in use is the unsigned one
            return Long.parseLong(hex.substring(0, 8), 16) % 100 < 15;
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required of every Java platform", e);
        }
    }

    /** Whether an id belongs to the named subset: "open", "frozen", or null for all. */
    static boolean in(String subset, String id) {
        if (subset == null) {
            return true;
        }
        return switch (subset) {
            case "open" -> !frozen(id);
            case "frozen" -> frozen(id);
            default -> throw new Cli.UsageException("--subset needs open or frozen, not '" + subset + "'");
        };
    }
}
