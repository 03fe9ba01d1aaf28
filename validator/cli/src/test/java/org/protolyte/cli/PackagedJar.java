package org.protolyte.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.Assumptions;

/** The shaded jar run as a separate process with the running JVM's java, for the integration tests. */
final class PackagedJar {

    static final Path ROOT = Path.of(System.getProperty("protolyte.projectRoot", "../.."));

    record Run(int exitCode, Path out, String err) {
    }

    private final Path jar;

    private PackagedJar(Path jar) {
        this.jar = jar;
    }

    /** The packaged jar; the calling test is skipped when it has not been built. */
    static PackagedJar find() {
        Path jar = Path.of(System.getProperty("protolyte.jar", ROOT.resolve("validator/target/protolyte.jar").toString()));
        Assumptions.assumeTrue(Files.isRegularFile(jar), "no packaged jar at " + jar + "; run mvn verify");
        return new PackagedJar(jar);
    }

    /** {@code java JVM_OPTIONS -jar protolyte.jar ARGS}, not yet started, in {@code dir}. */
    ProcessBuilder command(Path dir, List<String> jvmOptions, String... args) {
        boolean windows = System.getProperty("os.name", "").toLowerCase(Locale.ROOT).startsWith("windows");
        Path java = Path.of(System.getProperty("java.home"), "bin", windows ? "java.exe" : "java");
        List<String> command = new ArrayList<>(List.of(java.toString()));
        command.addAll(jvmOptions);
        command.addAll(List.of("-jar", jar.toAbsolutePath().toString()));
        command.addAll(List.of(args));
        return new ProcessBuilder(command).directory(dir.toFile());
    }

    /** Runs to the end (standard output kept in a file, it may be large); a hang guard of {@code seconds}. */
    Run run(Path dir, long seconds, List<String> jvmOptions, String... args) throws IOException, InterruptedException {
        Path out = Files.createTempFile(dir, "stdout", ".txt");
        Path err = Files.createTempFile(dir, "stderr", ".txt");
        Process p = command(dir, jvmOptions, args).redirectOutput(out.toFile()).redirectError(err.toFile()).start();
        if (!p.waitFor(seconds, TimeUnit.SECONDS)) {
            p.destroyForcibly().waitFor();
            throw new AssertionError("protolyte did not finish in " + seconds + " s: " + p.info().commandLine());
        }
        return new Run(p.exitValue(), out, Files.readString(err));
    }
}
