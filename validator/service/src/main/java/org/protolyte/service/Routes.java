package org.protolyte.service;

import java.util.UUID;

import org.eclipse.jetty.server.Handler;
import org.eclipse.jetty.server.Request;
import org.eclipse.jetty.server.Response;
import org.eclipse.jetty.util.Callback;

/** The service's paths under {@code /v1/}, each with the one method it answers; everything else is 404 or 405. */
final class Routes extends Handler.Abstract.NonBlocking {

    private final CheckEndpoint check;
    private final Reply rules;
    private final Reply version;
    private final Reply health;
    private final Reply openApi;
    private final AccessLog log;

    Routes(CheckEndpoint check, Reply rules, Reply version, Reply openApi, AccessLog log) {
        this.check = check;
        this.rules = rules;
        this.version = version;
        this.health = Reply.json(200, "{\"status\":\"up\"}\n");
        this.openApi = openApi;
        this.log = log;
    }

    @Override
    public boolean handle(Request request, Response response, Callback callback) {
        Exchange x = new Exchange(request, response, callback, log, UUID.randomUUID().toString());
        String path = request.getHttpURI().getPath();
        String method = request.getMethod();
        switch (path == null ? "" : path) {
            case "/v1/check" -> {
                if (method.equals("POST")) {
                    check.handle(x);
                } else {
                    x.send(notAllowed(method, "POST"));
                }
            }
            case "/v1/rules" -> get(x, method, rules);
            case "/v1/version" -> get(x, method, version);
            case "/v1/health" -> get(x, method, health);
            case "/v1/openapi.json" -> get(x, method, openApi);
            default -> x.send(Reply.error(404, "not-found", "no such path; the service answers /v1/check, "
                    + "/v1/rules, /v1/version, /v1/health and /v1/openapi.json"));
        }
        return true;
    }

    private static void get(Exchange x, String method, Reply reply) {
        x.send(method.equals("GET") ? reply : notAllowed(method, "GET"));
    }

    private static Reply notAllowed(String method, String allowed) {
        return Reply.error(405, "method-not-allowed", method + " is not answered here; use " + allowed)
                .withHeader("Allow", allowed);
    }
}
