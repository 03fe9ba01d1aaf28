package org.protolyte.service;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.net.URI;
import java.net.URISyntaxException;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;

import org.eclipse.jetty.server.HttpConfiguration;
import org.eclipse.jetty.server.HttpConnectionFactory;
import org.eclipse.jetty.server.Server;
import org.eclipse.jetty.server.ServerConnector;
import org.eclipse.jetty.util.thread.QueuedThreadPool;
import org.protolyte.api.Validator;

/**
 * The validator over HTTP, for a document-control system: {@code POST /v1/check} with a document gives its report.
 * Started from code with {@link #start}; {@link #close} stops it. No request ever touches the file system.
 *
 * <pre>{@code
 * Validator validator = Validator.builder().build();
 * try (ValidationService service = ValidationService.start(validator, Settings.defaults().withPort(8080))) {
 *     System.out.println("listening on " + service.uri());
 *     ...
 * }
 * }</pre>
 */
public final class ValidationService implements AutoCloseable {

    /** Where the OpenAPI description is packaged. */
    static final String OPENAPI = "/schemas/openapi.json";

    private final Server server;
    private final ServerConnector connector;
    private final Checks checks;
    private final String host;

    private ValidationService(Server server, ServerConnector connector, Checks checks, String host) {
        this.server = server;
        this.connector = connector;
        this.checks = checks;
        this.host = host;
    }

    /**
     * Listens with these settings and answers with this validator until closed.
     *
     * @throws IOException where the address cannot be bound (in use, not this machine's)
     */
    public static ValidationService start(Validator validator, Settings settings) throws IOException {
        Objects.requireNonNull(validator, "validator");
        Objects.requireNonNull(settings, "settings");
        Checks checks = new Checks(settings.workers(), settings.queue(), settings.checkLimit());
        // Jetty's own threads only read, route and write; they never wait on a check
        QueuedThreadPool io = new QueuedThreadPool(16, 4);
        io.setName("protolyte-http");
        io.setDaemon(true);
        Server server = new Server(io);
        HttpConfiguration http = new HttpConfiguration();
        http.setSendServerVersion(false);
        http.setSendXPoweredBy(false);
        ServerConnector connector = new ServerConnector(server, new HttpConnectionFactory(http));
        connector.setHost(settings.host());
        connector.setPort(settings.port());
        connector.setIdleTimeout(settings.idleTimeout().toMillis());
        server.addConnector(connector);
        AccessLog log = new AccessLog(settings.accessLog());
        server.setHandler(new Routes(new CheckEndpoint(validator, checks), rules(validator),
                Reply.json(200, "{\"version\":" + Json.quote(Validator.version()) + "}\n"), openApi(), log));
        try {
            server.start();
        } catch (Exception e) {
            checks.close();
            stop(server);
            throw new IOException("cannot listen on " + settings.host() + ":" + settings.port() + ": "
                    + e.getMessage(), e);
        }
        return new ValidationService(server, connector, checks, settings.host());
    }

    /** The port it listens on (the one chosen when the settings asked for 0). */
    public int port() {
        return connector.getLocalPort();
    }

    /** The base address, e.g. {@code http://127.0.0.1:8080/}. */
    public URI uri() {
        try {
            return new URI("http", null, host, port(), "/", null, null);
        } catch (URISyntaxException e) {
            throw new IllegalStateException("host '" + host + "' gives no address: " + e.getMessage(), e);
        }
    }

    /** Stops listening; requests still running are cut off. */
    @Override
    public void close() {
        try {
            stop(server);
        } finally {
            checks.close();
        }
    }

    private static void stop(Server server) {
        try {
            server.stop();
        } catch (Exception e) {
            throw new IllegalStateException("the service did not stop cleanly: " + e.getMessage(), e);
        }
    }

    private static Reply rules(Validator validator) {
        StringBuilder b = new StringBuilder("[");
        for (Validator.RuleSummary r : validator.rules()) {
            b.append(b.length() == 1 ? "\n" : ",\n")
                    .append("  {\"id\":").append(Json.quote(r.id()))
                    .append(",\"pack\":").append(Json.quote(r.pack()))
                    .append(",\"severity\":").append(Json.quote(r.severity().name().toLowerCase(Locale.ROOT)))
                    .append(",\"summary\":").append(Json.quote(r.summary())).append('}');
        }
        return Reply.json(200, b.append("\n]\n").toString());
    }

    private static Reply openApi() {
        try (InputStream in = ValidationService.class.getResourceAsStream(OPENAPI)) {
            if (in == null) {
                throw new IllegalStateException(OPENAPI + " is not on the class path; the service jar is incomplete");
            }
            return new Reply(200, "application/json", Map.of(), in.readAllBytes(), Optional.empty());
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read " + OPENAPI + ": " + e.getMessage(), e);
        }
    }
}
