package ionmark.console.internal;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.PosixFilePermissions;
import java.security.SecureRandom;
import java.util.HexFormat;
import java.util.Optional;

/**
 * The file through which a running notebook tells the command line where its check channel listens:
 * {@code workspace/.ionmark/cli-channel}, one line {@code PORT TOKEN}, readable by its owner only (0600). The
 * notebook writes it at start and deletes it at stop; a file left by a killed notebook is stale and the command
 * line falls back to its own path.
 */
record ChannelFile(int port, String token) {
    static final String NAME = "cli-channel";

    /** One secure generator for the process: seeding a new one per token is waste, not extra safety. */
    private static final SecureRandom RANDOM = new SecureRandom();

    /** A fresh random token: 32 bytes from the system's secure generator, in hex. */
    static String newToken() {
        byte[] b = new byte[32];
        RANDOM.nextBytes(b);
        return HexFormat.of().formatHex(b);
    }

    /** The channel named in the workspace's {@code .ionmark} folder, if the file is there and well formed. */
    static Optional<ChannelFile> read(Path ionmarkDir) {
        try {
            String[] f = Files.readString(ionmarkDir.resolve(NAME), StandardCharsets.UTF_8).strip().split(" ");
            if (f.length != 2 || !f[1].matches("[0-9a-f]{64}")) {
                return Optional.empty();
            }
            int port = Integer.parseInt(f[0]);
            return port > 0 && port < 65536 ? Optional.of(new ChannelFile(port, f[1])) : Optional.empty();
        } catch (IOException | NumberFormatException e) {
            return Optional.empty();
        }
    }

    /**
     * Writes the file owner-only: the permissions are set on a private temporary file before the token goes in,
     * then it is moved into place, so no other user can read the token even for a moment.
     */
    void write(Path ionmarkDir) throws IOException {
        Files.createDirectories(ionmarkDir);
        Path tmp = ionmarkDir.resolve(NAME + "." + ProcessHandle.current().pid() + ".tmp");
        Files.deleteIfExists(tmp);
        try {
            Files.createFile(tmp, PosixFilePermissions.asFileAttribute(PosixFilePermissions.fromString("rw-------")));
        } catch (UnsupportedOperationException e) {
            Files.createFile(tmp); // not a POSIX file system
        } catch (FileAlreadyExistsException e) {
            throw new IOException("cannot create " + tmp + ": it exists", e);
        }
        Files.writeString(tmp, port + " " + token + "\n", StandardCharsets.UTF_8);
        Files.move(tmp, ionmarkDir.resolve(NAME), StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
    }

    /** Deletes the file if it still names this channel (another notebook may have replaced it since). */
    void deleteIfOurs(Path ionmarkDir) {
        if (read(ionmarkDir).filter(this::equals).isPresent()) {
            try {
                Files.deleteIfExists(ionmarkDir.resolve(NAME));
            } catch (IOException e) {
                System.err.println("ionmark: cannot delete " + ionmarkDir.resolve(NAME) + ": " + e.getMessage());
            }
        }
    }
}
