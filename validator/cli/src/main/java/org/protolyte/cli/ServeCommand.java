package org.protolyte.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.Callable;

import org.protolyte.api.ConfigurationException;
import org.protolyte.api.Severity;
import org.protolyte.api.Validator;
import org.protolyte.report.Printable;
import org.protolyte.service.Settings;
import org.protolyte.service.ValidationService;

import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** {@code protolyte serve}: the validation service, until interrupted (Ctrl-C). */
@Command(name = "serve", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = "Answers POST /v1/check with a document's report over HTTP, for a document-control system "
                + "(also /v1/rules, /v1/version, /v1/health, /v1/openapi.json). Prints 'listening on URI' when ready; "
                + "one JSON line per request goes to standard error. Ctrl-C stops it.")
public final class ServeCommand implements Callable<Integer> {

    @Option(names = "--port", paramLabel = "PORT", description = "TCP port (default 8080; 0 for any free one).")
    int port = 8080;

    @Option(names = "--host", paramLabel = "HOST", description = "Address to listen on (default 127.0.0.1).")
    String host = "127.0.0.1";

    @Option(names = "--threads", paramLabel = "N", description = "Checks run at once (default twice the processors).")
    Integer threads;

    @Option(names = "--fail-on", paramLabel = "SEVERITY",
            description = "Lowest finding severity that fails a document: error (default), warning or note.")
    Severity failOn = Severity.ERROR;

    @Mixin
    Setup setup;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        Validator validator;
        Settings settings;
        try {
            if (threads != null && (threads < 1 || threads > 1024)) {
                throw new Setup.UsageException("--threads takes 1 to 1024, not " + threads);
            }
            validator = validator();
            Settings d = Settings.defaults();
            settings = d.withHost(host).withPort(port).withWorkers(threads == null ? d.workers() : threads)
                    .withAccessLog(line -> {
                        err.println(line);
                        err.flush();
                    });
        } catch (Setup.UsageException e) {
            return Setup.usage(err, e);
        } catch (ConfigurationException | IllegalArgumentException e) {
            return Setup.usage(err, new Setup.UsageException(e.getMessage()));
        } catch (IOException e) {
            return Setup.usage(err, new Setup.UsageException("cannot read the configuration: " + e.getMessage()));
        }
        ValidationService service;
        try {
            service = ValidationService.start(validator, settings);
        } catch (IOException e) {
            err.println("protolyte: " + Printable.text(e.getMessage()));
            return 2;
        }
        CountDownLatch stopped = new CountDownLatch(1);
        Thread hook = new Thread(() -> {
            service.close();
            stopped.countDown();
        }, "protolyte-serve-stop");
        Runtime.getRuntime().addShutdownHook(hook);
        out.println("listening on " + service.uri());
        out.flush();
        try {
            stopped.await();
        } catch (InterruptedException e) {
            // interrupted by the caller that runs it (a test, a ToolProvider's host): stop as Ctrl-C would
            Runtime.getRuntime().removeShutdownHook(hook);
            service.close();
            Thread.currentThread().interrupt();
            err.println("protolyte: stopped (" + e.getClass().getSimpleName() + ")");
            err.flush();
        }
        return 0;
    }

    /** The validator the check command would use: the same libraries, packs and failing severity. */
    private Validator validator() throws Setup.UsageException, IOException, ConfigurationException {
        Validator.Builder b = Validator.builder().failOn(failOn);
        setup.substances.forEach(b::substanceLibrary);
        if (setup.pluginFolder != null) {
            b.plugins(setup.pluginFolder);
        }
        b.rules(Path.of(""), setup.rules);     // as check takes them: NAME or FILE replaces the choice, +... joins it
        return b.build();
    }
}
