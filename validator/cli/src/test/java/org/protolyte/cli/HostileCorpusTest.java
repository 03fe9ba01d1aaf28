package org.protolyte.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.PrintStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.concurrent.TimeUnit;
import java.util.function.Function;
import java.util.regex.Pattern;
import java.util.stream.Collectors;
import java.util.stream.IntStream;
import java.util.stream.Stream;

import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Named;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ArrayNode;
import tools.jackson.databind.node.ObjectNode;
import tools.jackson.databind.node.StringNode;

/**
 * The hostile corpus: bad and extreme inputs, each with the exit code and a phrase a fail-closed checker must give,
 * in the manner of a compiler's negative test suite. The cases are data ({@code hostile/cases.tsv}, described at its
 * top); huge inputs come from the named generators below. Every case also holds the properties of the whole corpus:
 * never exit 4, no stack trace, no hang, no wrong pass, no lost report of a good file, no input changed and no
 * file left behind. Cases listed in {@code hostile/pending.txt} fail today: they are reported as aborted with their
 * reason, and a pending case that passes fails the run, so the list can only shrink.
 */
class HostileCorpusTest {

    private static final Path ROOT = Path.of(System.getProperty("protolyte.projectRoot", "../.."));
    private static final Duration HANG_GUARD = Duration.ofSeconds(20);
    /** A case pending for a hang is known to hang: a short guard keeps the suite quick, and a fixed tool takes ms. */
    private static final Duration KNOWN_HANG_GUARD = Duration.ofSeconds(5);
    private static final Pattern STACK_FRAME = Pattern.compile("(?m)^\\s+at [\\w.$]+\\(.*\\)\\s*$");
    private static final String HOLE = "@@hostile-value@@";
    private static final JsonMapper JSON = JsonMapper.builder().build();

    /** One line of the manifest. */
    record Case(int line, String id, String base, List<String> edits, String args, Set<Integer> exits,
            List<String> phrases, List<String> keep, String why) {
        @Override
        public String toString() {
            return id;
        }
    }

    /** What a run gave: exit code (4 for anything thrown), everything printed and any report written by -o. */
    record Outcome(int exit, String printed, String thrown) {
    }

    // ---------------------------------------------------------------- the manifest

    static List<Case> manifest() {
        List<Case> out = new ArrayList<>();
        List<String> lines = resourceLines("/hostile/cases.tsv");
        for (int i = 0; i < lines.size(); i++) {
            String l = lines.get(i);
            if (l.isBlank() || l.startsWith("#")) {
                continue;
            }
            String[] f = l.split("\t", -1);
            if (f.length != 8) {
                throw new IllegalStateException("cases.tsv:" + (i + 1) + ": 8 tab-separated fields expected, got " + f.length);
            }
            Set<Integer> exits = Arrays.stream(f[4].split("\\|")).map(Integer::valueOf).collect(Collectors.toSet());
            out.add(new Case(i + 1, f[0], f[1], listOf(f[2], " ;; "), f[3], exits,
                    listOf(f[5], " && ").stream().map(HostileCorpusTest::unescape).toList(), listOf(f[6], ","), f[7]));
        }
        return out;
    }

    private static List<String> listOf(String field, String sep) {
        return field.equals("-") ? List.of() : List.of(field.split(Pattern.quote(sep)));
    }

    /** Pending ids with their reasons: cases a correct tool passes that today's code does not. */
    static Map<String, String> pending() {
        Map<String, String> out = new LinkedHashMap<>();
        for (String l : resourceLines("/hostile/pending.txt")) {
            if (l.isBlank() || l.startsWith("#")) {
                continue;
            }
            String[] f = l.trim().split("\\s+", 2);
            out.put(f[0], f.length > 1 ? f[1] : "");
        }
        return out;
    }

    private static List<String> resourceLines(String name) {
        try (InputStream in = HostileCorpusTest.class.getResourceAsStream(name)) {
            if (in == null) {
                throw new IllegalStateException("missing test resource " + name);
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8).lines().toList();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    static Stream<Arguments> cases() {
        return manifest().stream().map(c -> Arguments.of(Named.of(c.id() + ": " + c.why(), c)));
    }

    // ---------------------------------------------------------------- the corpus

    @Test
    void corpusIsLargeWellFormedAndNeverExpectsAFault() {
        List<Case> all = manifest();
        assertTrue(all.size() >= 300, "the corpus holds " + all.size() + " cases, at least 300 are wanted");
        Set<String> ids = new HashSet<>();
        for (Case c : all) {
            assertTrue(ids.add(c.id()), "duplicate case id " + c.id());
            assertFalse(c.exits().contains(4), c.id() + " expects an internal fault");
            assertFalse(c.phrases().isEmpty(), c.id() + " names no phrase");
            assertFalse(c.why().isBlank(), c.id() + " says not why");
        }
        for (String p : pending().keySet()) {
            assertTrue(ids.contains(p), "pending.txt names " + p + ", which is not in cases.tsv");
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void hostileInput(Case c, @TempDir Path tmp) throws IOException {
        List<String> broken = judge(c, tmp);
        String reason = pending().get(c.id());
        if (reason != null) {
            assertFalse(broken.isEmpty(), c.id() + " is listed in pending.txt but now passes: remove it from the list");
            Assumptions.abort("pending (" + reason + "): " + String.join("; ", broken));
        }
        if (!broken.isEmpty()) {
            fail(c.id() + " (cases.tsv:" + c.line() + ", " + c.why() + "):\n  " + String.join("\n  ", broken));
        }
    }

    /** Runs one case and returns what is wrong with the outcome; empty when all is right. */
    private List<String> judge(Case c, Path tmp) throws IOException {
        Path w = workspace(tmp);
        Path f = prepare(c, w);
        byte[] stdin = new byte[0];
        for (String e : c.edits()) {
            if (e.startsWith("stdin ")) {
                stdin = Files.readAllBytes(resolve(e.substring(6), w, f));
            }
        }
        String[] args = args(c.args(), w, f);
        Map<Path, String> before = hashes(w);
        Outcome o = pending().getOrDefault(c.id(), "").startsWith("hang")
                ? runInChild(args, stdin, w)
                : runInProcess(args, stdin);
        Path report = outputTarget(args);
        String text = o.printed();
        if (report != null && !before.containsKey(report) && Files.isRegularFile(report, LinkOption.NOFOLLOW_LINKS)) {
            text += Files.readString(report, StandardCharsets.UTF_8);
        }
        List<String> broken = new ArrayList<>();
        if (o.thrown() != null) {
            broken.add("FAULT: " + o.thrown());
        }
        if (o.exit() == 4) {
            broken.add("FAULT: exit 4");
        }
        if (o.exit() == 0 && !c.exits().contains(0)) {
            broken.add("WRONG PASS: exit 0");
        }
        if (!c.exits().contains(o.exit())) {
            broken.add("exit " + o.exit() + ", expected " + c.exits());
        }
        if (STACK_FRAME.matcher(text).find() || text.contains("Exception") || text.contains("\tat org.")) {
            broken.add("STACK TRACE or exception name in the output");
        }
        for (String p : c.phrases()) {
            boolean absent = p.startsWith("!");
            String want = absent ? p.substring(1) : p;
            if (text.contains(want) == absent) {
                broken.add((absent ? "must not print " : "missing phrase ") + quote(want));
            }
        }
        for (String id : c.keep()) {
            if (!text.contains("[" + id + "]") && !text.contains("\"" + id + "\"")) {
                broken.add("LOST REPORT of the good document " + id);
            }
        }
        Map<Path, String> after = hashes(w);
        for (Map.Entry<Path, String> e : before.entrySet()) {
            if (!e.getValue().equals(after.get(e.getKey()))) {
                broken.add("INPUT CHANGED: " + w.relativize(e.getKey()));
            }
        }
        for (Path p : after.keySet()) {
            if (!before.containsKey(p) && !p.equals(report)) {
                broken.add("FILE LEFT BEHIND: " + w.relativize(p));
            }
        }
        if (!broken.isEmpty()) {
            broken.add("output was: " + quote(text.length() > 1500 ? text.substring(0, 1500) + "…" : text));
        }
        return broken;
    }

    private static String quote(String s) {
        return "«" + s + "»";
    }

    // ---------------------------------------------------------------- running

    private static Outcome runInProcess(String[] args, byte[] stdin) {
        return assertTimeoutPreemptively(HANG_GUARD, () -> {
            PrintStream oldOut = System.out;
            PrintStream oldErr = System.err;
            InputStream oldIn = System.in;
            ByteArrayOutputStream out = new ByteArrayOutputStream();
            int code;
            String thrown = null;
            try {
                PrintStream both = new PrintStream(out, true, StandardCharsets.UTF_8);
                System.setOut(both);
                System.setErr(both);
                System.setIn(new ByteArrayInputStream(stdin));
                code = Main.run(args);
            } catch (Throwable t) { // a thrown error is the fault the corpus looks for; it is reported, not dropped
                code = 4;
                thrown = t.toString();
            } finally {
                System.out.flush();
                System.setOut(oldOut);
                System.setErr(oldErr);
                System.setIn(oldIn);
            }
            return new Outcome(code, out.toString(StandardCharsets.UTF_8), thrown);
        }, "HANG: no answer within " + HANG_GUARD.toSeconds() + " s");
    }

    /**
     * A case pending for a hang runs in a child JVM, which the guard can kill: a thread stuck in a regular
     * expression cannot be stopped and would slow every later test.
     */
    private static Outcome runInChild(String[] args, byte[] stdin, Path w) throws IOException {
        List<String> cmd = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-cp", System.getProperty("java.class.path"), Child.class.getName()));
        cmd.addAll(List.of(args));
        Path log = Files.createTempFile(w.getParent(), "child", ".log");
        Path in = Files.createTempFile(w.getParent(), "child", ".in");
        Files.write(in, stdin);
        Process p = new ProcessBuilder(cmd).redirectErrorStream(true).redirectOutput(log.toFile())
                .redirectInput(in.toFile()).directory(w.toFile()).start();
        try {
            if (!p.waitFor(KNOWN_HANG_GUARD.toSeconds(), TimeUnit.SECONDS)) {
                p.destroyForcibly().waitFor();
                return new Outcome(-1, "HANG: no answer within " + KNOWN_HANG_GUARD.toSeconds() + " s", null);
            }
        } catch (InterruptedException e) {
            p.destroyForcibly();
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while a child ran", e);
        }
        return new Outcome(p.exitValue(), Files.readString(log, StandardCharsets.UTF_8), null);
    }

    /** The child JVM's entry: the command line's own run, its code as the exit status. */
    static final class Child {
        public static void main(String[] args) {
            System.exit(Main.run(args));
        }
    }

    // ---------------------------------------------------------------- preparing a case

    /** A fresh copy of the samples, with the rule packs under rules/ and the corpus's own bases under hostile/. */
    private static Path workspace(Path tmp) throws IOException {
        Path w = tmp.resolve("w");
        copyTree(ROOT.resolve("sample-formulations"), w);
        copyTree(ROOT.resolve("rules"), w.resolve("rules"));
        copyTree(resourceDir("/hostile/bases"), w.resolve("hostile"));
        return w;
    }

    private static Path resourceDir(String name) {
        try {
            return Path.of(HostileCorpusTest.class.getResource(name).toURI());
        } catch (java.net.URISyntaxException e) {
            throw new IllegalStateException(e);
        }
    }

    private static void copyTree(Path from, Path to) throws IOException {
        try (Stream<Path> s = Files.walk(from)) {
            for (Path p : s.toList()) {
                Path t = to.resolve(from.relativize(p).toString());
                if (Files.isDirectory(p)) {
                    Files.createDirectories(t);
                } else {
                    Files.copy(p, t);
                }
            }
        }
    }

    /** Writes the case's file $F: its base (a sample, generator or inline text) with the edits applied. */
    private static Path prepare(Case c, Path w) throws IOException {
        Doc d;
        Path dir;
        if (c.base().startsWith("gen:")) {
            Function<Path, String> g = GENERATORS.get(c.base().substring(4));
            if (g == null) {
                throw new IllegalStateException(c.id() + ": no generator " + c.base());
            }
            d = new Doc(g.apply(w));
            dir = w;
        } else if (c.base().startsWith("text:")) {
            d = new Doc(unescape(c.base().substring(5)));
            dir = w;
        } else {
            Path b = w.resolve(c.base());
            d = new Doc(Files.readString(b, StandardCharsets.UTF_8));
            dir = b.getParent();
        }
        String name = "x-" + c.id() + ".json";
        for (String e : c.edits()) {
            String[] t = e.split(" ", 2);
            String op = t[0];
            String rest = t.length > 1 ? t[1] : "";
            switch (op) {
                case "set" -> {
                    String[] pv = rest.split(" ", 2);
                    d.set(unescape(pv[0]), pv[1]);
                }
                case "del" -> d.delete(unescape(rest));
                case "raw", "rawall" -> {
                    String[] ab = rest.split("=>", 2);
                    d.replace(unescape(ab[0]), unescape(ab[1]), op.equals("rawall"), c.id());
                }
                case "text" -> d = new Doc(unescape(rest));
                case "bom" -> d.bytes = concat(new byte[] {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF}, d.bytes());
                case "utf16le" -> d.bytes = d.text().getBytes(StandardCharsets.UTF_16LE);
                case "utf16be" -> d.bytes = d.text().getBytes(StandardCharsets.UTF_16BE);
                case "utf16bom" -> d.bytes = d.text().getBytes(StandardCharsets.UTF_16);
                case "latin1" -> d.bytes = d.text().getBytes(StandardCharsets.ISO_8859_1);
                case "truncate" -> d.bytes = Arrays.copyOf(d.bytes(), Integer.parseInt(rest));
                case "byte" -> { // byte OFFSET HEX: inserts that raw byte
                    String[] ob = rest.split(" ");
                    byte[] b = d.bytes();
                    int at = Integer.parseInt(ob[0]);
                    d.bytes = concat(concat(Arrays.copyOf(b, at), new byte[] {(byte) Integer.parseInt(ob[1], 16)}),
                            Arrays.copyOfRange(b, at, b.length));
                }
                case "name" -> name = unescape(rest);
                case "mkdir" -> Files.createDirectories(w.resolve(rest));
                case "write" -> {
                    String[] pv = rest.split(" ", 2);
                    Files.createDirectories(w.resolve(pv[0]).getParent());
                    Files.writeString(w.resolve(pv[0]), unescape(pv[1]), StandardCharsets.UTF_8);
                }
                case "copy" -> {
                    String[] pv = rest.split(" ", 2);
                    Files.createDirectories(w.resolve(pv[1]).getParent());
                    Files.copy(w.resolve(pv[0]), w.resolve(pv[1]));
                }
                case "symlink" -> {
                    String[] pv = rest.split(" ", 2);
                    Files.createDirectories(w.resolve(pv[0]).getParent());
                    Files.createSymbolicLink(w.resolve(pv[0]), Path.of(pv[1]));
                }
                case "mkfifo", "mknod" -> {
                    List<String> cmd = op.equals("mkfifo") ? List.of("mkfifo", w.resolve(rest).toString())
                            : List.of("mknod", w.resolve(rest).toString(), "c", "1", "3");
                    Assumptions.assumeTrue(exec(cmd), op + " is not available here");
                }
                case "stdin" -> {
                    // read after the file is written, in judge()
                }
                default -> throw new IllegalStateException(c.id() + ": unknown edit " + op);
            }
        }
        Path f = dir.resolve(name);
        Files.createDirectories(f.getParent());
        Files.write(f, d.bytes());
        return f;
    }

    private static boolean exec(List<String> cmd) {
        try {
            return new ProcessBuilder(cmd).redirectErrorStream(true).start().waitFor() == 0;
        } catch (IOException e) {
            return false;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return false;
        }
    }

    private static byte[] concat(byte[] a, byte[] b) {
        byte[] r = Arrays.copyOf(a, a.length + b.length);
        System.arraycopy(b, 0, r, a.length, b.length);
        return r;
    }

    /** The document being edited: as JSON text while text edits apply, as bytes once an encoding edit has. */
    private static final class Doc {
        private String text;
        private byte[] bytes;

        Doc(String text) {
            this.text = text;
        }

        String text() {
            if (text == null) {
                throw new IllegalStateException("a text edit after a byte edit");
            }
            return text;
        }

        byte[] bytes() {
            return bytes != null ? bytes : text.getBytes(StandardCharsets.UTF_8);
        }

        void replace(String old, String now, boolean all, String id) {
            if (!text().contains(old)) {
                throw new IllegalStateException(id + ": raw edit finds no " + quote(old));
            }
            text = all ? text.replace(old, now) : text.replaceFirst(Pattern.quote(old),
                    java.util.regex.Matcher.quoteReplacement(now));
        }

        /** Puts {@code raw} (JSON text, taken literally: NaN, -0, 1e999 and duplicate keys survive) at the pointer. */
        void set(String pointer, String raw) {
            JsonNode root = JSON.readTree(text());
            List<String> tokens = tokens(pointer);
            if (tokens.isEmpty()) {
                text = raw;
                return;
            }
            JsonNode parent = walk(root, tokens.subList(0, tokens.size() - 1), pointer);
            String last = tokens.get(tokens.size() - 1);
            StringNode hole = StringNode.valueOf(HOLE);
            if (parent instanceof ObjectNode o) {
                o.set(last, hole);
            } else if (parent instanceof ArrayNode a) {
                int i = last.equals("-") ? a.size() : Integer.parseInt(last);
                if (i == a.size()) {
                    a.add(hole);
                } else {
                    a.set(i, hole);
                }
            } else {
                throw new IllegalStateException("no container at " + pointer);
            }
            text = JSON.writerWithDefaultPrettyPrinter().writeValueAsString(root).replace("\"" + HOLE + "\"", raw);
        }

        void delete(String pointer) {
            JsonNode root = JSON.readTree(text());
            List<String> tokens = tokens(pointer);
            JsonNode parent = walk(root, tokens.subList(0, tokens.size() - 1), pointer);
            String last = tokens.get(tokens.size() - 1);
            JsonNode gone = parent instanceof ObjectNode o ? o.remove(last)
                    : parent instanceof ArrayNode a ? a.remove(Integer.parseInt(last)) : null;
            if (gone == null) {
                throw new IllegalStateException("nothing to delete at " + pointer);
            }
            text = JSON.writerWithDefaultPrettyPrinter().writeValueAsString(root);
        }

        private static JsonNode walk(JsonNode n, List<String> tokens, String pointer) {
            for (String t : tokens) {
                n = n.isArray() ? n.get(Integer.parseInt(t)) : n.get(t);
                if (n == null) {
                    throw new IllegalStateException("no node at " + pointer);
                }
            }
            return n;
        }

        private static List<String> tokens(String pointer) {
            if (pointer.equals("/") || pointer.isEmpty()) {
                return List.of();
            }
            return Arrays.stream(pointer.substring(1).split("/", -1))
                    .map(s -> s.replace("~1", "/").replace("~0", "~")).toList();
        }
    }

    /** \n \t \r \b \0 \\ and \\uXXXX, so that the manifest stays one line per case and shows what it puts. */
    static String unescape(String s) {
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < s.length(); i++) {
            char ch = s.charAt(i);
            if (ch != '\\' || i + 1 == s.length()) {
                b.append(ch);
                continue;
            }
            char n = s.charAt(++i);
            switch (n) {
                case 'n' -> b.append('\n');
                case 't' -> b.append('\t');
                case 'r' -> b.append('\r');
                case 'b' -> b.append('\b');
                case '0' -> b.append('\0');
                case 'u' -> {
                    b.append((char) Integer.parseInt(s.substring(i + 1, i + 5), 16));
                    i += 4;
                }
                default -> b.append(n);
            }
        }
        return b.toString();
    }

    /** Splits the args field on spaces; $F is the case's file, $W the workspace, '' an empty argument. */
    private static String[] args(String field, Path w, Path f) {
        if (field.equals("-")) {
            return new String[0];
        }
        return Arrays.stream(field.split(" ")).map(a -> a.equals("''") ? "" : unescape(a.replace("$F", f.toString())
                .replace("$W", w.toString()))).toArray(String[]::new);
    }

    private static Path resolve(String token, Path w, Path f) {
        return Path.of(token.replace("$F", f.toString()).replace("$W", w.toString()));
    }

    /** The path given to -o or --output, if any and if inside the workspace. */
    private static Path outputTarget(String[] args) {
        for (int i = 0; i < args.length; i++) {
            if ((args[i].equals("-o") || args[i].equals("--output")) && i + 1 < args.length && !args[i + 1].isEmpty()) {
                return Path.of(args[i + 1]).toAbsolutePath().normalize();
            }
            if (args[i].startsWith("--output=")) {
                return Path.of(args[i].substring(9)).toAbsolutePath().normalize();
            }
        }
        return null;
    }

    /** SHA-256 of every file below the workspace (links and nodes by what they are), to prove nothing was changed. */
    private static Map<Path, String> hashes(Path w) throws IOException {
        Map<Path, String> out = new TreeMap<>();
        try (Stream<Path> s = Files.walk(w)) {
            for (Path p : s.toList()) {
                Path k = p.toAbsolutePath().normalize();
                if (Files.isSymbolicLink(p)) {
                    out.put(k, "link " + Files.readSymbolicLink(p));
                } else if (Files.isRegularFile(p, LinkOption.NOFOLLOW_LINKS)) {
                    out.put(k, sha256(Files.readAllBytes(p)) + " " + Files.getPosixFilePermissions(p));
                } else if (!Files.isDirectory(p, LinkOption.NOFOLLOW_LINKS)) {
                    out.put(k, "special");
                }
            }
        }
        return out;
    }

    private static String sha256(byte[] b) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(b));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }

    // ---------------------------------------------------------------- generators of huge inputs

    private static final String TRIS = "laboratory-tris-buffer-37c.json";

    private static String tris(Path w, String pointer, String raw) {
        try {
            Doc d = new Doc(Files.readString(w.resolve(TRIS), StandardCharsets.UTF_8));
            d.set(pointer, raw);
            return d.text();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static String site(Path w, String pointer, String raw) {
        try {
            Doc d = new Doc(Files.readString(w.resolve("site-library/site-substances.json"), StandardCharsets.UTF_8));
            d.set(pointer, raw);
            return d.text();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static String jsonString(String s) {
        return "\"" + s + "\"";
    }

    private static String conditions(int n) {
        return IntStream.range(0, n).mapToObj(i -> "{\"name\": \"c" + i + "\", \"temperature\": \"" + (4 + i % 30) + " Cel\"}")
                .collect(Collectors.joining(",\n", "[", "]"));
    }

    private static final Map<String, Function<Path, String>> GENERATORS = Map.ofEntries(
            Map.entry("unit-200k-spaces", w -> tris(w, "/components/0/amount", jsonString("1 g" + " ".repeat(200_000) + "x"))),
            Map.entry("unit-200k-digits", w -> tris(w, "/components/0/amount", jsonString("1" + "0".repeat(200_000) + " g"))),
            Map.entry("unit-100k-digits-two-line-ends", w -> tris(w, "/components/0/amount", jsonString("1".repeat(100_000) + "\\n\\n"))),
            Map.entry("temperature-100k-digits-two-line-ends", w -> tris(w, "/conditions/0/temperature", jsonString("1".repeat(100_000) + "\\n\\n"))),
            Map.entry("unit-200k-leading-spaces", w -> tris(w, "/components/0/amount", jsonString(" ".repeat(200_000) + "1 gx"))),
            Map.entry("temperature-200k-spaces", w -> tris(w, "/conditions/0/temperature", jsonString("22" + " ".repeat(200_000) + "Celx"))),
            Map.entry("name-4mib", w -> tris(w, "/components/0/substance", jsonString("tromethamin" + "e".repeat(4 << 20)))),
            Map.entry("name-1mib", w -> tris(w, "/components/0/substance", jsonString("x".repeat(1 << 20)))),
            Map.entry("title-4mib", w -> tris(w, "/title", jsonString("T".repeat(4 << 20)))),
            Map.entry("keys-200k", w -> tris(w, "/k0", "0" + IntStream.range(1, 200_000)
                    .mapToObj(i -> ", \"k" + i + "\": 0").collect(Collectors.joining()))),
            Map.entry("key-50k-chars", w -> tris(w, "/" + "k".repeat(50_000), "1")),
            Map.entry("number-1000-digits", w -> tris(w, "/targets/pH/value", "7." + "1".repeat(1_000))),
            Map.entry("integer-1000-digits", w -> tris(w, "/formatVersion", "1" + "0".repeat(1_000))),
            Map.entry("nesting-100k-arrays", w -> tris(w, "/description", "[".repeat(100_000) + "]".repeat(100_000))),
            Map.entry("nesting-100k-objects", w -> tris(w, "/description",
                    "{\"a\":".repeat(100_000) + "1" + "}".repeat(100_000))),
            Map.entry("nesting-unclosed-200k", w -> "[".repeat(200_000)),
            Map.entry("whitespace-200k-around", w -> " ".repeat(200_000) + tris(w, "/title", "\"ok\"") + "\n".repeat(200_000)),
            Map.entry("components-100k", w -> tris(w, "/components", IntStream.range(0, 100_000)
                    .mapToObj(i -> "{\"substance\": \"sodium chloride\", \"amount\": \"1 mg\"}")
                    .collect(Collectors.joining(",", "[", "]")))),
            Map.entry("conditions-1000", w -> tris(w, "/conditions", conditions(1_000))),
            Map.entry("conditions-5000", w -> tris(w, "/conditions", conditions(5_000))),
            Map.entry("file-17mib", w -> tris(w, "/description", jsonString("d".repeat(17 << 20)))),
            Map.entry("formula-200k-parens", w -> site(w, "/substances/0/formula",
                    jsonString("(".repeat(200_000) + "C4H10N2O4S" + ")".repeat(200_000)))),
            Map.entry("formula-overflow", w -> site(w, "/substances/0/formula", jsonString("((C4H10N2O4S)65536)65536"))),
            Map.entry("formula-4mib", w -> site(w, "/substances/0/formula", jsonString("C".repeat(4 << 20)))),
            Map.entry("synonyms-100k", w -> site(w, "/substances/0/synonyms", IntStream.range(0, 100_000)
                    .mapToObj(i -> "\"aces synonym " + i + "\"").collect(Collectors.joining(",", "[", "]")))),
            Map.entry("string-escapes-1m", w -> tris(w, "/title", jsonString("\\u0000".repeat(1 << 20)))));
}
