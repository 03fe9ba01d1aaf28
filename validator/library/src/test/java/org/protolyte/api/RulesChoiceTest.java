package org.protolyte.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The command line's {@code --rules} syntax on the validator's builder ({@link Validator.Builder#rules}), as the command
 * line, the service and the build plugin's {@code rules} take it.
 */
class RulesChoiceTest {

    private static final Path MEDIUM = Path.of(System.getProperty("protolyte.projectRoot", "../.."),
            "sample-formulations", "cell-culture-hepes-basal-medium.json");

    private static final String SITE_PACK = "{\"document\": \"rule-pack\", \"formatVersion\": 1, \"name\": \"site-strict\", "
            + "\"version\": \"1.0.0\", \"extends\": \"general\", \"rules\": [{\"id\": \"pka-near-target\", "
            + "\"severity\": \"error\", \"parameters\": {\"maxDistance\": 0.3}}]}";

    @TempDir
    Path project;

    /** The packs that judged the HEPES medium (intended use: cell culture) under these rules. */
    private List<String> packsFor(String... rules) throws ConfigurationException {
        Validator v = Validator.builder().rules(project, List.of(rules)).build();
        Result r = v.check(Source.of(MEDIUM));
        return List.copyOf(r.rulePacks().keySet());
    }

    @Test
    void aShippedNameReplacesTheIntendedUsesChoice() throws Exception {
        assertEquals(List.of("general", "parenteral"), packsFor("parenteral"));
    }

    @Test
    void aPlusJoinsTheIntendedUsesChoice() throws Exception {
        assertEquals(List.of("general", "cell-culture", "ophthalmic"), packsFor("+ophthalmic"));
    }

    @Test
    void aFileIsReadFromTheProjectsFolderAndReplacesTheChoice() throws Exception {
        Files.createDirectories(project.resolve("packs"));
        Path pack = Files.writeString(project.resolve("packs/site-strict.json"), SITE_PACK);
        assertEquals(List.of("general", "site-strict"), packsFor("packs/site-strict.json"));
    }

    @Test
    void aFileAfterAPlusJoinsAReplacedChoice() throws Exception {
        Path pack = Files.writeString(project.resolve("site-strict.json"), SITE_PACK);
        assertEquals(List.of("general", "parenteral", "site-strict"), packsFor("parenteral", "+site-strict.json"));
    }

    @Test
    void aFileNamedTwiceIsLoadedOnce() throws Exception {
        Path pack = Files.writeString(project.resolve("site-strict.json"), SITE_PACK);
        assertEquals(List.of("general", "site-strict"), packsFor("site-strict.json", "+./site-strict.json"));
    }

    @Test
    void aMissingFileIsAConfigurationProblemThatNamesIt() {
        ConfigurationException e = assertThrows(ConfigurationException.class, () -> packsFor("no-such-pack.json"));
        assertEquals(List.of("rule pack " + project.resolve("no-such-pack.json") + ": file not found"), e.problems());
    }

    @Test
    void anUnknownNameIsAConfigurationProblemThatNamesIt() {
        ConfigurationException e = assertThrows(ConfigurationException.class, () -> packsFor("+veterinary"));
        assertEquals(1, e.problems().size(), e::getMessage);
        assertTrue(e.problems().get(0).startsWith("unknown rule pack 'veterinary': not a shipped pack ("), e::getMessage);
        assertTrue(e.problems().get(0).endsWith(" and no file " + project.resolve("veterinary")), e::getMessage);
    }

    @Test
    void aPlusAloneNamesNoPack() {
        ConfigurationException e = assertThrows(ConfigurationException.class,
                () -> Validator.builder().rules(project, List.of("+", " ")).build());
        assertEquals(2, e.problems().size(), e::getMessage);
    }
}
