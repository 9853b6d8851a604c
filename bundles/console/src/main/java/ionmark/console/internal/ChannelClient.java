package ionmark.console.internal;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.net.InetAddress;
import java.net.InetSocketAddress;
import java.net.Socket;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

/**
 * The command line's end of the check channel: sends {@code check ...} to the notebook named in the workspace's
 * {@link ChannelFile}. Any failure (no file, nothing listening, a refused token, a malformed answer, a notebook
 * that takes longer than {@link #ANSWER_TIMEOUT_MS}) is an empty answer, and the caller runs the check itself.
 */
final class ChannelClient {
    static final int CONNECT_TIMEOUT_MS = 500;
    static final int ANSWER_TIMEOUT_MS = 60_000;

    private ChannelClient() {
    }

    static Optional<ChannelAnswer> check(Path ionmarkDir, List<String> args) {
        Optional<ChannelFile> f = ChannelFile.read(ionmarkDir);
        if (f.isEmpty()) {
            return Optional.empty();
        }
        StringBuilder body = new StringBuilder();
        args.forEach(a -> body.append(a).append('\0'));
        byte[] b = body.toString().getBytes(StandardCharsets.UTF_8);
        try (Socket s = new Socket()) {
            s.connect(new InetSocketAddress(InetAddress.getLoopbackAddress(), f.get().port()), CONNECT_TIMEOUT_MS);
            s.setSoTimeout(ANSWER_TIMEOUT_MS);
            OutputStream out = s.getOutputStream();
            out.write(("POST /check HTTP/1.1\r\nHost: 127.0.0.1\r\nAuthorization: Bearer " + f.get().token()
                    + "\r\nContent-Type: application/octet-stream\r\nContent-Length: " + b.length
                    + "\r\nConnection: close\r\n\r\n").getBytes(StandardCharsets.ISO_8859_1));
            out.write(b);
            out.flush();
            InputStream in = s.getInputStream();
            return parse(in.readAllBytes());
        } catch (IOException | RuntimeException e) {
            return Optional.empty();
        }
    }

    /** A 200 answer with its exit code and output lengths, or empty. */
    static Optional<ChannelAnswer> parse(byte[] answer) {
        String text = new String(answer, StandardCharsets.ISO_8859_1);
        int end = text.indexOf("\r\n\r\n");
        if (end < 0 || !text.startsWith("HTTP/1.1 200 ")) {
            return Optional.empty();
        }
        Integer code = null;
        int outLength = -1;
        int length = -1;
        for (String line : text.substring(0, end).split("\r\n")) {
            String l = line.toLowerCase(java.util.Locale.ROOT);
            if (l.startsWith("x-ionmark-exit:")) {
                code = Integer.parseInt(line.substring(15).strip());
            } else if (l.startsWith("x-ionmark-out-length:")) {
                outLength = Integer.parseInt(line.substring(21).strip());
            } else if (l.startsWith("content-length:")) {
                length = Integer.parseInt(line.substring(15).strip());
            }
        }
        int start = end + 4;
        if (code == null || outLength < 0 || length != answer.length - start || outLength > length) {
            return Optional.empty();
        }
        return Optional.of(new ChannelAnswer(code,
                new String(answer, start, outLength, StandardCharsets.UTF_8),
                new String(answer, start + outLength, length - outLength, StandardCharsets.UTF_8)));
    }
}
