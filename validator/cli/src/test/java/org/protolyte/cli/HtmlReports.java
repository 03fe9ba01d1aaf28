package org.protolyte.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.stream.Stream;


import tools.jackson.databind.DeserializationFeature;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/** The samples, and their reports written by {@code protolyte check} as a person would run it. */
final class HtmlReports {

    static final Path ROOT = Path.of(System.getProperty("protolyte.projectRoot", "../..")).toAbsolutePath().normalize();
    static final Path OUT = ROOT.resolve("validator/target/html");

    /** Numbers as BigDecimal, so a cell's digits compare with the number the JSON report printed. */
    private static final JsonMapper JSON = JsonMapper.builder()
            .enable(DeserializationFeature.USE_BIG_DECIMAL_FOR_FLOATS).build();

    private HtmlReports() {}

    /** The top-level samples and the batch records, sorted; their names must not collide. */
    static List<Path> samples() throws IOException {
        Path dir = ROOT.resolve("sample-formulations");
        List<Path> all = new ArrayList<>();
        for (Path d : List.of(dir, dir.resolve("batch-records"))) {
            try (Stream<Path> s = Files.list(d)) {
                s.filter(p -> Files.isRegularFile(p) && p.toString().endsWith(".json")).sorted().forEach(all::add);
            }
        }
        assertFalse(all.isEmpty(), "no samples under " + dir);
        assertEquals(all.size(), new HashSet<>(all.stream().map(HtmlReports::name).toList()).size(),
                "two samples share a name: " + all);
        return all;
    }

    static String name(Path sample) {
        return sample.getFileName().toString().replaceFirst("\\.json$", "");
    }

    /** {@code check --format html -o TARGET --batch-size 250L SAMPLE}. */
    static Path html(Path sample, Path target) throws IOException {
        return check(sample, target, "--format", "html");
    }

    /** {@code check --format json --curves -o TARGET --batch-size 250L SAMPLE}. */
    static Path json(Path sample, Path target) throws IOException {
        return check(sample, target, "--format", "json", "--curves");
    }

    private static Path check(Path sample, Path target, String... format) throws IOException {
        Files.createDirectories(target.getParent());
        Files.deleteIfExists(target);
        List<String> args = new ArrayList<>(List.of("check"));
        args.addAll(List.of(format));
        args.addAll(List.of("-o", target.toString(), "--batch-size", "250L", sample.toString()));
        InProcess.Result r = InProcess.run(args.toArray(String[]::new));
        String said = String.join(" ", args) + "\nexit " + r.exitCode() + "\n" + r.out() + r.err();
        // 0 pass, 1 fail, 2 invalid, 3 indeterminate: each is a report; 4 is a fault
        assertTrue(r.exitCode() >= 0 && r.exitCode() <= 3, said);
        assertTrue(Files.isRegularFile(target) && Files.size(target) > 0, "no report written:\n" + said);
        return target;
    }

    static JsonNode readJson(Path file) {
        return JSON.readTree(file.toFile());
    }

    /** The contract's {@code documents[i]}: the report schema's {@code reports[i]}. */
    static List<JsonNode> documents(JsonNode report) {
        JsonNode reports = report.path("reports");
        if (!reports.isArray()) {
            fail("the JSON report has no array 'reports'");
        }
        List<JsonNode> out = new ArrayList<>();
        reports.forEach(out::add);
        return out;
    }
}
