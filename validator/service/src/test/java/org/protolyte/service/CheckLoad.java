package org.protolyte.service;

import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Arrays;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;

/**
 * A bounded load run against a running service, to measure it (never a test): {@code CLIENTS} clients each send
 * {@code FILE} {@code REQUESTS} times after a warm-up; prints requests per second and p50/p99 latency.
 *
 * <pre>java -cp ... org.protolyte.service.CheckLoad http://127.0.0.1:8080/ FILE CLIENTS REQUESTS WARMUP</pre>
 */
public final class CheckLoad {

    private CheckLoad() {
    }

    public static void main(String[] args) throws Exception {
        URI base = URI.create(args[0]);
        byte[] doc = Files.readAllBytes(Path.of(args[1]));
        int clients = Integer.parseInt(args[2]);
        int requests = Integer.parseInt(args[3]);
        int warmup = Integer.parseInt(args[4]);
        HttpClient client = HttpClient.newBuilder().version(HttpClient.Version.HTTP_1_1).build();
        HttpRequest request = HttpRequest.newBuilder(base.resolve("v1/check")).header("Content-Type",
                "application/json").timeout(Duration.ofSeconds(60)).POST(HttpRequest.BodyPublishers.ofByteArray(doc))
                .build();
        ExecutorService pool = Executors.newFixedThreadPool(clients);
        run(pool, client, request, clients, warmup, new long[clients * warmup]);
        long[] latencies = new long[clients * requests];
        long start = System.nanoTime();
        int bad = run(pool, client, request, clients, requests, latencies);
        double seconds = (System.nanoTime() - start) / 1e9;
        pool.shutdown();
        Arrays.sort(latencies);
        System.out.printf("%d clients x %d requests: %.1f s, %.0f requests/s, p50 %.1f ms, p99 %.1f ms, "
                        + "max %.1f ms, not 200: %d%n", clients, requests, seconds, latencies.length / seconds,
                latencies[latencies.length / 2] / 1e6, latencies[(int) (latencies.length * 0.99)] / 1e6,
                latencies[latencies.length - 1] / 1e6, bad);
    }

    private static int run(ExecutorService pool, HttpClient client, HttpRequest request, int clients, int each,
                           long[] latencies) throws Exception {
        AtomicInteger bad = new AtomicInteger();
        Future<?>[] runs = new Future<?>[clients];
        for (int c = 0; c < clients; c++) {
            int first = c * each;
            runs[c] = pool.submit(() -> {
                for (int i = 0; i < each; i++) {
                    long t = System.nanoTime();
                    HttpResponse<byte[]> r = client.send(request, HttpResponse.BodyHandlers.ofByteArray());
                    latencies[first + i] = System.nanoTime() - t;
                    if (r.statusCode() != 200) {
                        bad.incrementAndGet();
                    }
                }
                return null;
            });
        }
        for (Future<?> f : runs) {
            f.get();
        }
        return bad.get();
    }
}
