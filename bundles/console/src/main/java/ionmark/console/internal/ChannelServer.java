package ionmark.console.internal;

import java.io.BufferedInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.net.InetAddress;
import java.net.ServerSocket;
import java.net.Socket;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ArrayBlockingQueue;
import java.util.concurrent.ThreadPoolExecutor;
import java.util.concurrent.TimeUnit;

/**
 * The notebook's end of the command line's check channel: a small HTTP/1.1 listener bound to the loopback
 * address only. One request form is answered: {@code POST /check} with {@code Authorization: Bearer TOKEN} and
 * the command's arguments NUL-separated in the body. No or a wrong token: 401 or 403, and the attempt is
 * reported to {@link Denied}; a body over {@link #MAX_BODY}: 413; more than two checks at once plus sixteen
 * waiting: 503. The answer carries the exit code and the length of the standard output in headers, then the
 * standard output and the error output as the body.
 */
final class ChannelServer implements AutoCloseable {
    static final int MAX_BODY = 256 * 1024;
    static final int MAX_HEAD = 16 * 1024;
    static final int READ_TIMEOUT_MS = 10_000;

    /** Runs one command line and returns what it printed. */
    interface Handler {
        ChannelAnswer run(List<String> args);
    }

    /** Hears of every refused attempt: the remote address and why. */
    interface Denied {
        void denied(String address, String why);
    }

    private final ServerSocket socket;
    private final byte[] token;
    private final Handler handler;
    private final Denied denied;
    private final ThreadPoolExecutor workers;

    ChannelServer(int port, String token, Handler handler, Denied denied) throws IOException {
        this.socket = new ServerSocket(port, 50, InetAddress.getLoopbackAddress());
        this.token = token.getBytes(StandardCharsets.US_ASCII);
        this.handler = handler;
        this.denied = denied;
        this.workers = new ThreadPoolExecutor(2, 2, 0, TimeUnit.MILLISECONDS, new ArrayBlockingQueue<>(16), r -> {
            Thread t = new Thread(r, "ionmark-check-channel");
            t.setDaemon(true);
            return t;
        });
        Thread acceptor = new Thread(this::accept, "ionmark-check-channel-accept");
        acceptor.setDaemon(true);
        acceptor.start();
    }

    int port() {
        return socket.getLocalPort();
    }

    private void accept() {
        while (!socket.isClosed()) {
            try {
                Socket s = socket.accept();
                s.setSoTimeout(READ_TIMEOUT_MS);
                try {
                    workers.execute(() -> serve(s));
                } catch (java.util.concurrent.RejectedExecutionException e) {
                    try (s) {
                        respond(s.getOutputStream(), 503, "busy: too many checks at once", Map.of());
                    }
                }
            } catch (IOException e) {
                // closed while accepting, or the client went away before its answer: nothing to do
            }
        }
    }

    private void serve(Socket s) {
        try (s; InputStream in = new BufferedInputStream(s.getInputStream()); OutputStream out = s.getOutputStream()) {
            String head = readHead(in);
            if (head == null) {
                respond(out, 400, "bad request", Map.of());
                return;
            }
            String[] lines = head.split("\r\n");
            String[] request = lines[0].split(" ");
            Map<String, String> headers = new HashMap<>();
            for (int i = 1; i < lines.length; i++) {
                int colon = lines[i].indexOf(':');
                if (colon > 0) {
                    headers.put(lines[i].substring(0, colon).strip().toLowerCase(java.util.Locale.ROOT),
                            lines[i].substring(colon + 1).strip());
                }
            }
            String address = s.getInetAddress().getHostAddress();
            String auth = headers.getOrDefault("authorization", "");
            if (!auth.startsWith("Bearer ")) {
                denied.denied(address, "no token");
                respond(out, 401, "a token is needed", Map.of("WWW-Authenticate", "Bearer"));
                return;
            }
            if (!MessageDigest.isEqual(token, auth.substring(7).strip().getBytes(StandardCharsets.US_ASCII))) {
                denied.denied(address, "wrong token");
                respond(out, 403, "wrong token", Map.of());
                return;
            }
            if (request.length != 3 || !request[1].equals("/check")) {
                respond(out, 404, "not found", Map.of());
                return;
            }
            if (!request[0].equals("POST")) {
                respond(out, 405, "POST only", Map.of("Allow", "POST"));
                return;
            }
            long length;
            try {
                length = Long.parseLong(headers.getOrDefault("content-length", "-1"));
            } catch (NumberFormatException e) {
                length = -1;
            }
            if (length < 0) {
                respond(out, 411, "Content-Length is needed", Map.of());
                return;
            }
            if (length > MAX_BODY) {
                respond(out, 413, "too large: at most " + MAX_BODY + " bytes of arguments", Map.of());
                return;
            }
            List<String> args = CommandLineRunner.split(new String(in.readNBytes((int) length), StandardCharsets.UTF_8));
            if (args.isEmpty() || !args.get(0).equals("check")) {
                respond(out, 400, "this channel answers check only", Map.of());
                return;
            }
            ChannelAnswer a = handler.run(args);
            byte[] o = a.out().getBytes(StandardCharsets.UTF_8);
            byte[] e = a.err().getBytes(StandardCharsets.UTF_8);
            byte[] body = new byte[o.length + e.length];
            System.arraycopy(o, 0, body, 0, o.length);
            System.arraycopy(e, 0, body, o.length, e.length);
            write(out, 200, "OK", body,
                    Map.of("X-Ionmark-Exit", String.valueOf(a.code()), "X-Ionmark-Out-Length", String.valueOf(o.length)));
        } catch (IOException | RuntimeException e) {
            // a client that went away or sent garbage: its connection is closed, the notebook goes on
        }
    }

    /** The request line and headers, or null when they are longer than {@link #MAX_HEAD} or cut off. */
    private static String readHead(InputStream in) throws IOException {
        ByteArrayOutputStream b = new ByteArrayOutputStream();
        int state = 0;
        while (b.size() < MAX_HEAD) {
            int c = in.read();
            if (c < 0) {
                return null;
            }
            b.write(c);
            state = (c == '\r' && (state == 0 || state == 2)) || (c == '\n' && (state == 1 || state == 3)) ? state + 1
                    : 0;
            if (state == 4) {
                String h = b.toString(StandardCharsets.ISO_8859_1);
                return h.substring(0, h.length() - 4);
            }
        }
        return null;
    }

    private static void respond(OutputStream out, int status, String text, Map<String, String> headers)
            throws IOException {
        write(out, status, text, (text + "\n").getBytes(StandardCharsets.UTF_8), headers);
    }

    private static void write(OutputStream out, int status, String reason, byte[] body, Map<String, String> headers)
            throws IOException {
        StringBuilder h = new StringBuilder("HTTP/1.1 ").append(status).append(' ')
                .append(reason.replaceAll("[\\r\\n]", " ")).append("\r\n");
        h.append("Content-Type: text/plain; charset=utf-8\r\nContent-Length: ").append(body.length)
                .append("\r\nConnection: close\r\n");
        headers.forEach((k, v) -> h.append(k).append(": ").append(v).append("\r\n"));
        out.write(h.append("\r\n").toString().getBytes(StandardCharsets.ISO_8859_1));
        out.write(body);
        out.flush();
    }

    @Override
    public void close() {
        try {
            socket.close();
        } catch (IOException e) {
            // already closed
        }
        workers.shutdownNow();
    }
}
