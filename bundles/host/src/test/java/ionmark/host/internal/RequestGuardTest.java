package ionmark.host.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.lang.reflect.Proxy;
import java.nio.charset.StandardCharsets;
import java.util.HashMap;
import java.util.Map;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.atomic.AtomicBoolean;

import org.junit.jupiter.api.Test;

import jakarta.servlet.ReadListener;
import jakarta.servlet.ServletInputStream;
import jakarta.servlet.ServletOutputStream;
import jakarta.servlet.WriteListener;
import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletResponse;

/** Body limits, the annotation cap and error answers without stack frames, on requests built as proxies. */
class RequestGuardTest {
    /** A response that records status, headers and body. */
    static final class Answer {
        int status = 200;
        final Map<String, String> headers = new HashMap<>();
        final ByteArrayOutputStream body = new ByteArrayOutputStream();

        String text() {
            return body.toString(StandardCharsets.UTF_8);
        }

        HttpServletResponse proxy() {
            ServletOutputStream out = new ServletOutputStream() {
                @Override
                public void write(int b) {
                    body.write(b);
                }

                @Override
                public boolean isReady() {
                    return true;
                }

                @Override
                public void setWriteListener(WriteListener l) {
                }
            };
            return (HttpServletResponse) Proxy.newProxyInstance(getClass().getClassLoader(),
                    new Class<?>[] {HttpServletResponse.class}, (p, m, a) -> switch (m.getName()) {
                        case "setStatus" -> { status = (Integer) a[0]; yield null; }
                        case "setHeader", "setContentType" -> {
                            headers.put(a.length > 1 ? (String) a[0] : "Content-Type", (String) a[a.length - 1]);
                            yield null;
                        }
                        case "getOutputStream" -> out;
                        case "isCommitted" -> false;
                        default -> null;
                    });
        }
    }

    static HttpServletRequest request(String method, String path, long length, byte[] body) {
        ServletInputStream in = new ServletInputStream() {
            final ByteArrayInputStream b = new ByteArrayInputStream(body);

            @Override
            public int read() {
                return b.read();
            }

            @Override
            public boolean isFinished() {
                return b.available() == 0;
            }

            @Override
            public boolean isReady() {
                return true;
            }

            @Override
            public void setReadListener(ReadListener l) {
            }
        };
        return (HttpServletRequest) Proxy.newProxyInstance(RequestGuardTest.class.getClassLoader(),
                new Class<?>[] {HttpServletRequest.class}, (p, m, a) -> switch (m.getName()) {
                    case "getContentLengthLong" -> length;
                    case "getPathInfo", "getRequestURI" -> path;
                    case "getMethod" -> method;
                    case "getInputStream" -> in;
                    case "getRemoteAddr" -> "127.0.0.1";
                    default -> null;
                });
    }

    @Test
    void aDeclaredLargeBodyIs413BeforeItIsRead() throws Exception {
        AtomicBoolean ran = new AtomicBoolean();
        Answer a = new Answer();
        new RequestGuard().run(request("POST", "/preview", 20L << 20, new byte[0]), a.proxy(), (q, s) -> ran.set(true));
        assertEquals(413, a.status);
        assertFalse(ran.get(), "the handler never saw the request");
        assertTrue(a.text().startsWith("too large"), a.text());
    }

    @Test
    void anUndeclaredLargeBodyIsCutOffAt413() throws Exception {
        Answer a = new Answer();
        byte[] big = new byte[(int) RequestGuard.MAX_BODY + 10];
        new RequestGuard().run(request("POST", "/preview", -1, big), a.proxy(),
                (q, s) -> q.getInputStream().readAllBytes());
        assertEquals(413, a.status);
    }

    @Test
    void faultsAreOneLineWithoutFramesOrSql() throws Exception {
        Answer a = new Answer();
        new RequestGuard().run(request("POST", "/admin/table", 10, new byte[0]), a.proxy(), (q, s) -> {
            throw new IllegalStateException("cannot publish: Value too long for column \"COMMENT CHARACTER VARYING(4000)\"");
        });
        assertEquals(500, a.status);
        assertEquals("the request failed\n", a.text());
        Answer keys = new Answer();
        new RequestGuard().run(request("POST", "/entry/x", 10, new byte[0]), keys.proxy(), (q, s) -> {
            throw new IllegalStateException("Form with too many keys [1001 > 1000]");
        });
        assertEquals(413, keys.status);
        Answer utf = new Answer();
        new RequestGuard().run(request("GET", "/panel/x", 0, new byte[0]), utf.proxy(), (q, s) -> {
            throw new IllegalArgumentException("Invalid UTF-8");
        });
        assertEquals(400, utf.status);
        assertFalse(utf.text().contains("\tat "), utf.text());
    }

    @Test
    void annotatingRequestsBeyondTheCapAreTurnedAwayAsBusy() throws Exception {
        RequestGuard g = new RequestGuard();
        CountDownLatch started = new CountDownLatch(RequestGuard.MAX_ANNOTATING);
        CountDownLatch release = new CountDownLatch(1);
        for (int i = 0; i < RequestGuard.MAX_ANNOTATING; i++) {
            new Thread(() -> {
                try {
                    g.run(request("GET", "/entry/e", 0, new byte[0]), new Answer().proxy(), (q, s) -> {
                        started.countDown();
                        try {
                            release.await();
                        } catch (InterruptedException e) {
                            Thread.currentThread().interrupt();
                        }
                    });
                } catch (java.io.IOException e) {
                    throw new AssertionError(e);
                }
            }).start();
        }
        started.await();
        Answer a = new Answer();
        g.run(request("POST", "/preview", 5, "C".getBytes(StandardCharsets.UTF_8)), a.proxy(), (q, s) -> { });
        release.countDown();
        assertEquals(503, a.status);
        assertTrue(a.text().startsWith("busy"), a.text());
        Answer signIn = new Answer(); // sign-in and other light pages are not held up
        g.run(request("GET", "/signin", 0, new byte[0]), signIn.proxy(), (q, s) -> { });
        assertEquals(200, signIn.status);
    }

    @Test
    void aFreedSlotGoesToTheRequestThatWaitedLongestNotToANewcomer() throws Exception {
        RequestGuard g = new RequestGuard();
        int slots = RequestGuard.MAX_ANNOTATING;
        CountDownLatch held = new CountDownLatch(slots);
        CountDownLatch release = new CountDownLatch(1);
        CountDownLatch releaseFirst = new CountDownLatch(1);
        java.util.List<String> order = java.util.Collections.synchronizedList(new java.util.ArrayList<>());
        Thread[] holders = new Thread[slots];
        for (int i = 0; i < slots; i++) {
            boolean comesBack = i == 0;
            holders[i] = new Thread(() -> {
                try {
                    g.run(request("GET", "/entry/e", 0, new byte[0]), new Answer().proxy(), (q, s) -> {
                        held.countDown();
                        try {
                            (comesBack ? releaseFirst : release).await();
                        } catch (InterruptedException e) {
                            Thread.currentThread().interrupt();
                        }
                    });
                    if (comesBack) { // frees its slot and asks again at once: a newcomer at the moment a slot frees
                        g.run(request("GET", "/entry/e", 0, new byte[0]), new Answer().proxy(),
                                (q, s) -> order.add("newcomer"));
                    }
                } catch (java.io.IOException e) {
                    throw new AssertionError(e);
                }
            });
            holders[i].start();
        }
        held.await();
        Thread waiter = new Thread(() -> {
            try {
                g.run(request("GET", "/entry/w", 0, new byte[0]), new Answer().proxy(), (q, s) -> order.add("waiter"));
            } catch (java.io.IOException e) {
                throw new AssertionError(e);
            }
        });
        waiter.start();
        while (waiter.getState() != Thread.State.TIMED_WAITING) {
            Thread.sleep(5);
        }
        releaseFirst.countDown(); // one slot frees; the other slots stay held until the end
        holders[0].join(10_000);
        waiter.join(10_000);
        release.countDown();
        for (Thread t : holders) {
            t.join(10_000);
        }
        assertEquals(java.util.List.of("waiter", "newcomer"), order);
    }
}
