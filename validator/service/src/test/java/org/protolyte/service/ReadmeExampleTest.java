package org.protolyte.service;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.net.InetAddress;
import java.net.ServerSocket;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.protolyte.api.Severity;
import org.protolyte.api.Validator;

/** The README's example of the service started from code, run as written, and the README held to it line by line. */
class ReadmeExampleTest {

    private static final Path TEST = Path.of("src/test/java/org/protolyte/service/ReadmeExampleTest.java");

    private static boolean portFree(int port) {
        try (ServerSocket s = new ServerSocket(port, 1, InetAddress.getLoopbackAddress())) {
            return true;
        } catch (IOException e) {
            return false;   // caught: the port is taken, the answer
        }
    }

    @Test
    @Timeout(60)
    void theReadmeExampleStartsAServiceThatAnswers() throws Exception {
        Assumptions.assumeTrue(portFree(8080), "port 8080 is taken on this machine; the README's example needs it");
        int[] status = new int[1];
        String[] body = new String[1];
        runTheExample(uri -> {
            HttpResponse<String> r = HttpClient.newHttpClient().send(HttpRequest.newBuilder(uri.resolve("v1/health"))
                    .build(), HttpResponse.BodyHandlers.ofString());
            status[0] = r.statusCode();
            body[0] = r.body();
        });
        assertEquals(200, status[0]);
        assertTrue(body[0].contains("up"), body[0]);
    }

    interface WhileUp {
        void at(URI uri) throws Exception;
    }

    private static void runTheExample(WhileUp whileUp) throws Exception {
        // README example begins
        Validator validator = Validator.builder().failOn(Severity.ERROR).build();
        try (ValidationService service = ValidationService.start(validator, Settings.defaults().withPort(8080))) {
            System.out.println("listening on " + service.uri());
            // ... until the application stops
            // README example ends
            assertEquals(8080, service.uri().getPort());
            whileUp.at(service.uri());
        }
    }

    @Test
    void theReadmeShowsTheExampleAsTheTestRunsIt() throws Exception {
        String test = Files.readString(TEST, StandardCharsets.UTF_8);
        String snippet = test.substring(test.indexOf("// README example begins") + 25,
                test.indexOf("            // README example ends"));
        String readme = Files.readString(ValidationServiceTest.ROOT.resolve("README.md"), StandardCharsets.UTF_8);
        String section = readme.substring(readme.indexOf("## The validation service"));
        int lines = 0;
        for (String line : snippet.lines().map(String::strip).filter(l -> !l.isEmpty()).toList()) {
            assertTrue(section.contains(line), "README's service section lacks the example's line: " + line);
            lines++;
        }
        assertEquals(4, lines, "the example's lines were found in the test");
    }
}
