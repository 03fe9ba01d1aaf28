package org.protolyte.maven;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;

/**
 * The README's pom for a repository of recipes is the one the integration test {@code passing-recipes} builds with the
 * plugin just made ({@code src/it}), its {@code <build>} section line for line, the version as released.
 */
class ReadmeSnippetTest {

    private static final Path ROOT = Path.of(System.getProperty("protolyte.projectRoot", "../.."));

    @Test
    void theReadmeShowsThePomTheIntegrationTestBuilds() throws Exception {
        String pom = Files.readString(Path.of("src/it/passing-recipes/pom.xml"));
        String build = pom.substring(pom.indexOf("  <build>"), pom.indexOf("</build>") + "</build>".length());
        String version = System.getProperty("project.version");   // the build's own, set by surefire
        String shown = build.replace("@project.version@", version).lines().map(l -> l.substring(Math.min(2,
                l.length()))).reduce((a, b) -> a + "\n" + b).orElseThrow();
        String readme = Files.readString(ROOT.resolve("README.md"));
        assertTrue(readme.contains("```xml\n" + shown + "\n```"), "README lacks the pom's build section:\n" + shown);
    }
}
