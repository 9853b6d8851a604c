package ionmark.host.internal;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.concurrent.Semaphore;
import java.util.concurrent.TimeUnit;

import jakarta.servlet.ReadListener;
import jakarta.servlet.ServletInputStream;
import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletRequestWrapper;
import jakarta.servlet.http.HttpServletResponse;

/**
 * Security rules and limits of the web shell, kept out of its page code: who an action is audited as, framing,
 * request body limits (413), a cap on concurrent annotation work (503 "busy"), and plain-text answers instead of
 * error pages with stack frames. Limits are checked before anything reads a body or touches a store.
 */
final class RequestGuard {
    /** No page of the notebook may be framed by another site (clickjacking). */
    static final String FRAME_ANCESTORS = "frame-ancestors 'none'";
    /** Largest request body accepted: an entry's text or a preview (a long entry is a few tens of kB). */
    static final long MAX_BODY = 512 * 1024;
    /** Requests that annotate structures (entry pages, previews) running at once; more wait briefly, then 503. */
    static final int MAX_ANNOTATING = Math.max(2, Runtime.getRuntime().availableProcessors());
    static final long BUSY_WAIT_MS = 2000;

    /**
     * Fair: waiting requests get a slot in the order they came. An unfair semaphore let a request that arrived just
     * as a slot freed take it ahead of those already waiting, so under load some waited the full busy wait and were
     * turned away while later ones went first (the long tail).
     */
    private final Semaphore annotating = new Semaphore(MAX_ANNOTATING, true);

    /** A body over the limit, found while it is read. */
    static final class TooLarge extends RuntimeException {
        private static final long serialVersionUID = 1L;

        TooLarge() {
            super("the request body is larger than " + MAX_BODY / 1024 + " KB");
        }
    }

    /** Work that may run the request through: the servlet's own handling. */
    interface Handler {
        void handle(HttpServletRequest req, HttpServletResponse resp) throws IOException, jakarta.servlet.ServletException;
    }

    /**
     * Runs a request under the limits: a declared body over {@link #MAX_BODY} is answered 413 before it is read,
     * an undeclared one is cut off at the limit (413); annotating requests queue for a slot and get 503 when none
     * frees in time; any failure is answered with one plain line (400, 413, 500), never with stack frames.
     */
    void run(HttpServletRequest req, HttpServletResponse resp, Handler h) throws IOException {
        try {
            if (req.getContentLengthLong() > MAX_BODY) {
                plain(resp, 413, "too large: " + new TooLarge().getMessage());
                return;
            }
            String path = req.getPathInfo() == null ? req.getRequestURI() : req.getPathInfo();
            boolean heavy = path != null && (path.equals("/preview") || (path.startsWith("/entry/")
                    && !path.endsWith("/edit") && req.getMethod().equals("GET")));
            if (heavy && !annotating.tryAcquire(BUSY_WAIT_MS, TimeUnit.MILLISECONDS)) {
                resp.setHeader("Retry-After", "2");
                plain(resp, 503, "busy: the notebook is annotating other pages; try again in a moment");
                return;
            }
            try {
                h.handle(new Limited(req), resp);
            } finally {
                if (heavy) {
                    annotating.release();
                }
            }
        } catch (TooLarge e) {
            plain(resp, 413, "too large: " + e.getMessage());
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            plain(resp, 503, "busy: try again in a moment");
        } catch (RuntimeException | jakarta.servlet.ServletException e) {
            if (formLimit(e)) { // the servlet container's form limits (size, number of keys)
                plain(resp, 413, "too large: the form has too many fields or too much text");
                return;
            }
            // a malformed request (bad UTF-8 in a query, say) or a fault: one line, no frames, no SQL
            System.err.println("ionmark: request " + Users.printable(req.getMethod()) + " failed: " + e);
            plain(resp, e instanceof RuntimeException && isBadRequest(e) ? 400 : 500,
                    isBadRequest(e) ? "bad request: the address or form could not be read" : "the request failed");
        }
    }

    private static boolean formLimit(Throwable e) {
        for (Throwable t = e; t != null; t = t.getCause()) {
            String m = String.valueOf(t.getMessage()).toLowerCase(java.util.Locale.ROOT);
            if (m.contains("form") && (m.contains("too") || m.contains("larger") || m.contains("keys") || m.contains("max"))) {
                return true;
            }
        }
        return false;
    }

    private static boolean isBadRequest(Throwable e) {
        for (Throwable t = e; t != null; t = t.getCause()) {
            String n = t.getClass().getName();
            if (n.endsWith("BadMessageException") || t instanceof java.nio.charset.CharacterCodingException
                    || t instanceof IllegalArgumentException) {
                return true;
            }
        }
        return false;
    }

    private static void plain(HttpServletResponse resp, int status, String message) throws IOException {
        if (resp.isCommitted()) {
            return;
        }
        resp.reset();
        resp.setStatus(status);
        resp.setContentType("text/plain; charset=UTF-8");
        resp.setHeader("X-Content-Type-Options", "nosniff");
        resp.setHeader("Content-Security-Policy", "default-src 'none'; " + FRAME_ANCESTORS);
        resp.getOutputStream().write((message + "\n").getBytes(StandardCharsets.UTF_8));
    }

    /** The request with its body stream cut off at {@link #MAX_BODY}. */
    private static final class Limited extends HttpServletRequestWrapper {
        Limited(HttpServletRequest req) {
            super(req);
        }

        @Override
        public ServletInputStream getInputStream() throws IOException {
            ServletInputStream in = super.getInputStream();
            return new ServletInputStream() {
                private long read;

                @Override
                public int read() throws IOException {
                    int b = in.read();
                    if (b >= 0 && ++read > MAX_BODY) {
                        throw new TooLarge();
                    }
                    return b;
                }

                @Override
                public int read(byte[] buf, int off, int len) throws IOException {
                    int n = in.read(buf, off, len);
                    if (n > 0 && (read += n) > MAX_BODY) {
                        throw new TooLarge();
                    }
                    return n;
                }

                @Override
                public boolean isFinished() {
                    return in.isFinished();
                }

                @Override
                public boolean isReady() {
                    return in.isReady();
                }

                @Override
                public void setReadListener(ReadListener l) {
                    in.setReadListener(l);
                }
            };
        }
    }

    /**
     * The name an action is audited under: the signed-in user's, else {@code anonymous@ADDRESS} (the local viewer
     * has a display name, but no one proved it).
     */
    static String actor(boolean signedIn, String name, HttpServletRequest req) {
        if (signedIn) {
            return Users.printable(name);
        }
        String addr = req.getRemoteAddr();
        return "anonymous@" + (addr == null ? "unknown" : addr.replaceAll("[^0-9A-Fa-f.:\\[\\]%]", "?"));
    }
}
