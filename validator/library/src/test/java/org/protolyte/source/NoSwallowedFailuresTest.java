package org.protolyte.source;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;

/**
 * No catch block in the main code drops a failure. A block must use what it caught (its message, caveat or
 * problems become a diagnostic, a reason or a cause) or throw; the rare block that does neither must say why in a
 * comment that starts {@code // caught:} with its justification (at least four words). An empty block without one
 * never passes.
 */
class NoSwallowedFailuresTest {

    /** Every module's main sources: validator/<module>/src/main/java. */
    private static final Path MODULES = Path.of(System.getProperty("protolyte.projectRoot", "../.."), "validator");
    private static final Pattern CATCH = Pattern.compile("catch\\s*\\(([^)]*?)\\s(\\w+)\\s*\\)\\s*\\{");
    private static final Pattern MARKER = Pattern.compile("//\\s*caught:\\s*\\S+(\\s+\\S+){3,}");

    /** A catch block: where it is, the variable it binds and its body. */
    record Block(String where, String variable, String body) {
        boolean empty() {
            return body.replaceAll("//[^\n]*", "").isBlank();
        }

        boolean usesWhatItCaught() {
            return Pattern.compile("\\b" + variable + "\\b").matcher(body.replaceAll("//[^\n]*", "")).find();
        }

        boolean rethrows() {
            return Pattern.compile("\\bthrow\\b").matcher(body).find();
        }

        boolean justified() {
            return MARKER.matcher(body).find();
        }
    }

    static List<Block> blocks(String source, String file) {
        List<Block> out = new ArrayList<>();
        Matcher m = CATCH.matcher(source);
        while (m.find()) {
            int depth = 1;
            int i = m.end();
            while (depth > 0 && i < source.length()) {
                char c = source.charAt(i++);
                depth += c == '{' ? 1 : c == '}' ? -1 : 0;
            }
            int line = (int) source.substring(0, m.start()).chars().filter(c -> c == '\n').count() + 1;
            out.add(new Block(file + ":" + line, m.group(2), source.substring(m.end(), i - 1)));
        }
        return out;
    }

    static boolean swallows(Block b) {
        return !b.justified() && (b.empty() || !b.usesWhatItCaught() && !b.rethrows());
    }

    @Test
    void noCatchBlockInTheMainCodeDropsAFailure() throws IOException {
        List<String> swallowing = new ArrayList<>();
        int seen = 0;
        try (Stream<Path> files = Files.walk(MODULES).filter(p -> MODULES.relativize(p).toString()
                .matches("[^/]+/src/main/java/.*"))) {
            for (Path p : files.filter(f -> f.toString().endsWith(".java")).sorted().toList()) {
                for (Block b : blocks(Files.readString(p), MODULES.relativize(p).toString())) {
                    seen++;
                    if (swallows(b)) {
                        swallowing.add(b.where() + ": " + b.body().strip().replaceAll("\\s+", " "));
                    }
                }
            }
        }
        assertTrue(seen > 20, "the scan found only " + seen + " catch blocks: is it reading the sources?");
        assertEquals(List.of(), swallowing, "catch blocks that drop what they caught (use it, throw, or justify with "
                + "'// caught: why')");
    }

    /** The scan itself: each kind of block it must tell apart. */
    @Test
    void theScanTellsASwallowingBlockFromOneThatKeepsTheReason() {
        String src = """
                try { a(); } catch (IllegalStateException e) { }
                try { a(); } catch (IllegalStateException e) { return Optional.empty(); }
                try { a(); } catch (IllegalStateException e) { // caught: ok
                    return null; }
                try { a(); } catch (IOException | RuntimeException e) { caveats.add(warn(e.getMessage())); }
                try { a(); } catch (IOException e) { throw new UncheckedIOException("x", x); }
                try { a(); } catch (IOException e) { // caught: the file is optional, its absence is shown
                    return List.of(); }
                try { a(); } catch (IOException e) { // e is not used here
                    return 0; }
                """;
        List<Boolean> swallowing = blocks(src, "t").stream().map(NoSwallowedFailuresTest::swallows).toList();
        assertEquals(List.of(true, true, true, false, false, false, true), swallowing);
    }
}
