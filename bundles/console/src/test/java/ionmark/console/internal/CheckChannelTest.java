package ionmark.console.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.net.InetAddress;
import java.net.ServerSocket;
import java.net.Socket;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The check channel between the command line and a running notebook: the answer through it is byte for byte what
 * the command line's own path prints; a wrong or missing token is refused and audited, and the command line then
 * falls back to its own path.
 */
class CheckChannelTest {
    @TempDir
    Path dir;

    private final List<String> denied = new CopyOnWriteArrayList<>();

    private static ChannelAnswer local(String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code = new Cli(CliTest.SPECIATION, CliTest.TABLES, null, null,
                new PrintStream(out, true, StandardCharsets.UTF_8), new PrintStream(err, true, StandardCharsets.UTF_8))
                .run(List.of(args));
        return new ChannelAnswer(code, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    private ChannelServer server(String token) throws Exception {
        return new ChannelServer(0, token,
                args -> CheckChannel.run(CliTest.SPECIATION, CliTest.TABLES, args),
                (address, why) -> denied.add(address + " " + why));
    }

    @Test
    void aCheckThroughTheChannelPrintsWhatTheLocalPathPrints() throws Exception {
        String token = ChannelFile.newToken();
        try (ChannelServer s = server(token)) {
            new ChannelFile(s.port(), token).write(dir);
            assertEquals("rw-------", PosixFilePermissions.toString(Files.getPosixFilePermissions(dir.resolve(ChannelFile.NAME))));
            for (String[] args : List.of(new String[] {"check", "OC(=O)c1ccccc1O", "--ph", "7.4"},
                    new String[] {"check", "NCC(=O)O", "--ph", "7", "--format", "json"},
                    new String[] {"check", "C1=CC=CC=C1N(", "--format", "json"}, // unreadable: exit 1, JSON error
                    new String[] {"check", "CCO", "--ionic", "5"}, // usage: exit 2
                    new String[] {"check", ""})) {
                ChannelAnswer expected = local(args);
                ChannelAnswer got = ChannelClient.check(dir, List.of(args)).orElseThrow(() -> new AssertionError(
                        "no answer through the channel for " + List.of(args)));
                assertEquals(expected, got, "through the channel: " + List.of(args));
            }
            assertTrue(local("check", "OC(=O)c1ccccc1O").out().contains(CliTest.TABLES.current().version().label()),
                    "the report names the table version, so the same output means the same table");
        }
        assertTrue(denied.isEmpty(), denied.toString());
    }

    @Test
    void aWrongTokenIsRefusedAuditedAndTheCommandLineFallsBack() throws Exception {
        try (ChannelServer s = server(ChannelFile.newToken())) {
            new ChannelFile(s.port(), ChannelFile.newToken()).write(dir); // a token from another notebook's run
            assertTrue(ChannelClient.check(dir, List.of("check", "CCO")).isEmpty(), "a refused token is no answer");
            assertEquals(List.of("127.0.0.1 wrong token"), denied);
            assertTrue(raw(s.port(), "Authorization: Bearer " + "0".repeat(64) + "\r\n").startsWith("HTTP/1.1 403 "));
            assertTrue(raw(s.port(), "").startsWith("HTTP/1.1 401 "));
            assertEquals(List.of("127.0.0.1 wrong token", "127.0.0.1 wrong token", "127.0.0.1 no token"), denied);
        }
    }

    @Test
    void aStaleChannelFileOrNoneIsNoAnswer() throws Exception {
        assertTrue(ChannelClient.check(dir, List.of("check", "CCO")).isEmpty(), "no file");
        int port;
        try (ServerSocket free = new ServerSocket(0, 1, InetAddress.getLoopbackAddress())) {
            port = free.getLocalPort();
        }
        new ChannelFile(port, ChannelFile.newToken()).write(dir); // a killed notebook's file: nothing listens
        long t0 = System.nanoTime();
        assertTrue(ChannelClient.check(dir, List.of("check", "CCO")).isEmpty());
        assertTrue(System.nanoTime() - t0 < 2_000_000_000L, "a stale file costs little");
    }

    @Test
    void theChannelAnswersCheckOnlyAndRefusesLargeBodies() throws Exception {
        String token = ChannelFile.newToken();
        try (ChannelServer s = server(token)) {
            String auth = "Authorization: Bearer " + token + "\r\n";
            assertTrue(raw(s.port(), auth, "table\0history\0").startsWith("HTTP/1.1 400 "));
            String big = raw(s.port(), auth + "Content-Length: " + (ChannelServer.MAX_BODY + 1) + "\r\n", null);
            assertTrue(big.startsWith("HTTP/1.1 413 "), big);
        }
        ChannelFile f = new ChannelFile(1234, token);
        f.write(dir);
        f.deleteIfOurs(dir);
        assertFalse(Files.exists(dir.resolve(ChannelFile.NAME)), "the notebook's stop deletes its file");
    }

    private static String raw(int port, String headers) throws Exception {
        return raw(port, headers, "check\0CCO\0");
    }

    /** A hand-made request: {@code body} null sends the headers only (with their own Content-Length). */
    private static String raw(int port, String headers, String body) throws Exception {
        try (Socket s = new Socket(InetAddress.getLoopbackAddress(), port)) {
            byte[] b = body == null ? new byte[0] : body.getBytes(StandardCharsets.UTF_8);
            String len = body == null ? "" : "Content-Length: " + b.length + "\r\n";
            s.getOutputStream().write(("POST /check HTTP/1.1\r\nHost: x\r\n" + headers + len + "\r\n")
                    .getBytes(StandardCharsets.ISO_8859_1));
            s.getOutputStream().write(b);
            s.getOutputStream().flush();
            return new String(s.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        }
    }
}
