package org.protolyte.service;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.file.Files;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ConcurrentLinkedQueue;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.LongAdder;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.protolyte.api.Format;
import org.protolyte.api.Source;
import org.protolyte.api.Validator;

/**
 * A bounded load run on loopback: 50 clients send the HEPES medium 1,000 times each. Every request is answered 200,
 * none is lost, and every report is the API's for the same bytes but for its time stamp. The run's rate is printed,
 * never asserted.
 */
class LoadIT {

    private static final int CLIENTS = 50;
    private static final int REQUESTS_EACH = 1_000;
    private static final Pattern GENERATED_AT = Pattern.compile("\"generatedAt\" : \"[^\"]*\",?");

    static String withoutTimeStamp(String report) {
        return GENERATED_AT.matcher(report).replaceAll("");
    }

    @Test
    @Timeout(value = 10, unit = TimeUnit.MINUTES)
    void fiftyClientsOfAThousandRequestsAreAllAnsweredWithTheApisReport() throws Exception {
        byte[] doc = Files.readAllBytes(ValidationServiceTest.HEPES);
        Validator validator = Validator.builder().build();
        String expected = withoutTimeStamp(validator.check(Source.of(CheckEndpoint.SOURCE_NAME, doc))
                .render(Format.JSON));
        LongAdder logged = new LongAdder();
        AtomicInteger answered = new AtomicInteger();
        ConcurrentLinkedQueue<String> wrong = new ConcurrentLinkedQueue<>();
        try (ValidationService service = ValidationService.start(validator,
                Settings.defaults().withAccessLog(line -> logged.increment()))) {
            HttpClient client = HttpClient.newBuilder().version(HttpClient.Version.HTTP_1_1)
                    .connectTimeout(Duration.ofSeconds(10)).build();
            HttpRequest request = HttpRequest.newBuilder(service.uri().resolve("v1/check"))
                    .header("Content-Type", "application/json").timeout(Duration.ofSeconds(60))
                    .POST(HttpRequest.BodyPublishers.ofByteArray(doc)).build();
            ExecutorService clients = Executors.newFixedThreadPool(CLIENTS);
            long start = System.nanoTime();
            List<Future<?>> runs = new ArrayList<>();
            for (int c = 0; c < CLIENTS; c++) {
                runs.add(clients.submit(() -> {
                    for (int i = 0; i < REQUESTS_EACH; i++) {
                        HttpResponse<String> r = client.send(request, HttpResponse.BodyHandlers.ofString());
                        answered.incrementAndGet();
                        if (r.statusCode() != 200 || !expected.equals(withoutTimeStamp(r.body()))) {
                            wrong.add(r.statusCode() + " " + r.body());
                        }
                    }
                    return null;
                }));
            }
            for (Future<?> f : runs) {
                f.get();
            }
            double seconds = (System.nanoTime() - start) / 1e9;
            clients.shutdown();
            System.out.printf("LoadIT: %d requests in %.1f s, %.0f requests/s, %d processors%n", answered.get(),
                    seconds, answered.get() / seconds, Runtime.getRuntime().availableProcessors());
        }
        assertEquals(CLIENTS * REQUESTS_EACH, answered.get(), "requests answered");
        assertEquals(List.of(), wrong.stream().limit(3).map(w -> w.substring(0, Math.min(300, w.length()))).toList(),
                wrong.size() + " answers were not 200 with the API's report");
        assertEquals(CLIENTS * REQUESTS_EACH, logged.sum(), "access log lines");
    }
}
