package org.protolyte.maven;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.protolyte.api.ConfigurationException;
import org.protolyte.api.Result;
import org.protolyte.api.Source;
import org.protolyte.api.Validator;

/** The command line's {@code --rules} syntax, as the goal's {@code rules}, on the validator's builder. */
class RuleChoiceTest {

    private static final Path MEDIUM = Path.of("../../sample-formulations/cell-culture-hepes-basal-medium.json");

    private static final String SITE_PACK = "{\"document\": \"rule-pack\", \"formatVersion\": 1, \"name\": \"site-strict\", "
            + "\"version\": \"1.0.0\", \"extends\": \"general\", \"rules\": [{\"id\": \"pka-near-target\", "
            + "\"severity\": \"error\", \"parameters\": {\"maxDistance\": 0.3}}]}";

    @TempDir
    Path project;

    /** The packs that judged the HEPES medium (intended use: cell culture) under these rules. */
    private List<String> packsFor(String... rules) throws ConfigurationException {
        Validator v = RuleChoice.of(List.of(rules), project).applyTo(Validator.builder()).build();
        Result r = v.check(Source.of(MEDIUM));
        return List.copyOf(r.rulePacks().keySet());
    }

    @Test
    void aShippedNameReplacesTheIntendedUsesChoice() throws Exception {
        assertEquals(new RuleChoice(List.of(), List.of("parenteral"), List.of()),
                RuleChoice.of(List.of("parenteral"), project));
        assertEquals(List.of("general", "parenteral"), packsFor("parenteral"));
    }

    @Test
    void aPlusJoinsTheIntendedUsesChoice() throws Exception {
        assertEquals(new RuleChoice(List.of(), List.of(), List.of("ophthalmic")),
                RuleChoice.of(List.of("+ophthalmic"), project));
        assertEquals(List.of("general", "cell-culture", "ophthalmic"), packsFor("+ophthalmic"));
    }

    @Test
    void aFileIsReadFromTheProjectsFolderAndReplacesTheChoice() throws Exception {
        Files.createDirectories(project.resolve("packs"));
        Path pack = Files.writeString(project.resolve("packs/site-strict.json"), SITE_PACK);
        assertEquals(new RuleChoice(List.of(pack), List.of(pack.toString()), List.of()),
                RuleChoice.of(List.of("packs/site-strict.json"), project));
        assertEquals(List.of("general", "site-strict"), packsFor("packs/site-strict.json"));
    }

    @Test
    void aFileAfterAPlusJoinsAReplacedChoice() throws Exception {
        Path pack = Files.writeString(project.resolve("site-strict.json"), SITE_PACK);
        assertEquals(new RuleChoice(List.of(pack), List.of("parenteral"), List.of(pack.toString())),
                RuleChoice.of(List.of("parenteral", "+site-strict.json"), project));
        assertEquals(List.of("general", "parenteral", "site-strict"), packsFor("parenteral", "+site-strict.json"));
    }

    @Test
    void aFileNamedTwiceIsLoadedOnce() throws Exception {
        Path pack = Files.writeString(project.resolve("site-strict.json"), SITE_PACK);
        assertEquals(List.of(pack), RuleChoice.of(List.of("site-strict.json", "+./site-strict.json"), project).files());
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
        assertEquals(true, e.problems().get(0).startsWith("unknown rule pack 'veterinary'"), e::getMessage);
    }

    @Test
    void aPlusAloneNamesNoPack() {
        ConfigurationException e = assertThrows(ConfigurationException.class,
                () -> RuleChoice.of(List.of("+", " "), project));
        assertEquals(2, e.problems().size(), e::getMessage);
    }
}
