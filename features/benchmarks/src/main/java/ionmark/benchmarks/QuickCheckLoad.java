package ionmark.benchmarks;

import java.net.URI;
import java.net.URLEncoder;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.atomic.AtomicInteger;

/**
 * N clients send quick checks (the drug-like molecules in turn, pH 7.4) to a running notebook for S seconds, each
 * as soon as its previous answer came. Counts an error for every answer that is not 200 with a card, or that says
 * "not annotated"; prints requests per second and latency percentiles. Not shipped.
 *
 * <pre>java -cp features/benchmarks/target/benchmarks.jar ionmark.benchmarks.QuickCheckLoad http://127.0.0.1:18281 50 60</pre>
 */
public final class QuickCheckLoad {
    private QuickCheckLoad() {
    }

    public static void main(String[] args) throws Exception {
        String base = args.length > 0 ? args[0] : "http://127.0.0.1:18281";
        int clients = args.length > 1 ? Integer.parseInt(args[1]) : 50;
        int seconds = args.length > 2 ? Integer.parseInt(args[2]) : 60;
        HttpClient http = HttpClient.newBuilder().connectTimeout(Duration.ofSeconds(10)).build();
        long end = System.nanoTime() + seconds * 1_000_000_000L;
        List<Long> latencies = Collections.synchronizedList(new ArrayList<>());
        AtomicInteger errors = new AtomicInteger();
        List<String> firstErrors = Collections.synchronizedList(new ArrayList<>());
        CountDownLatch done = new CountDownLatch(clients);
        for (int c = 0; c < clients; c++) {
            int me = c;
            Thread t = new Thread(() -> {
                int k = me;
                try {
                    while (System.nanoTime() < end) {
                        String smi = Molecules.DRUG_LIKE.get(k++ % Molecules.DRUG_LIKE.size());
                        URI uri = URI.create(base + "/panel/quick-check?ph=7.4&structure="
                                + URLEncoder.encode(smi, StandardCharsets.UTF_8));
                        long t0 = System.nanoTime();
                        try {
                            HttpResponse<String> r = http.send(HttpRequest.newBuilder(uri)
                                    .timeout(Duration.ofSeconds(30)).build(), HttpResponse.BodyHandlers.ofString());
                            latencies.add(System.nanoTime() - t0);
                            if (r.statusCode() != 200 || !r.body().contains("im-card")
                                    || r.body().contains("ot annotated")) {
                                errors.incrementAndGet();
                                if (firstErrors.size() < 3) {
                                    firstErrors.add(r.statusCode() + " " + smi);
                                }
                            }
                        } catch (java.io.IOException e) {
                            latencies.add(System.nanoTime() - t0);
                            errors.incrementAndGet();
                            if (firstErrors.size() < 3) {
                                firstErrors.add(e.toString());
                            }
                        }
                    }
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                } finally {
                    done.countDown();
                }
            }, "client-" + c);
            t.start();
        }
        done.await();
        List<Long> sorted = new ArrayList<>(latencies);
        Collections.sort(sorted);
        int n = sorted.size();
        System.out.printf(Locale.ROOT, "%d clients, %d s: %d requests (%.1f/s), %d errors; latency p50 %.0f ms, "
                + "p90 %.0f ms, p99 %.0f ms, max %.0f ms%n", clients, seconds, n, n / (double) seconds, errors.get(),
                pct(sorted, 0.50), pct(sorted, 0.90), pct(sorted, 0.99), n == 0 ? 0 : sorted.get(n - 1) / 1e6);
        firstErrors.forEach(e -> System.out.println("  error: " + e));
        System.exit(errors.get() == 0 ? 0 : 1);
    }

    private static double pct(List<Long> sorted, double p) {
        return sorted.isEmpty() ? 0 : sorted.get(Math.min(sorted.size() - 1, (int) Math.ceil(p * sorted.size()) - 1)) / 1e6;
    }
}
