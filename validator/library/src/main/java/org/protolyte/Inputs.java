package org.protolyte;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileSystemLoopException;
import java.nio.file.FileSystems;
import java.nio.file.FileVisitOption;
import java.nio.file.FileVisitResult;
import java.nio.file.LinkOption;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.PathMatcher;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.attribute.BasicFileAttributes;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.EnumSet;
import java.util.List;
import java.util.Optional;
import java.util.regex.PatternSyntaxException;

import org.protolyte.report.Skipped;

/**
 * What the command line names: files as given, {@code -} as standard input, folders as every *.json below them in
 * order of relative path. A folder's files are left out only by a glob of its ignore file or of {@code --exclude},
 * and each one left out is listed with the pattern that did it. A path below a folder that cannot be read becomes an
 * input of its own, reported invalid, so the others are still checked.
 */
public final class Inputs {

    /** The name that stands for standard input. */
    public static final String STANDARD_INPUT = "-";
    public static final String STANDARD_INPUT_SOURCE = "<stdin>";

    /** The inputs to check, and the files found in folders that were excluded. */
    public record Found(List<Protolyte.Input> inputs, List<Skipped> excluded) {
    }

    /** What was named cannot be used as it is (an empty name, a pattern that is not a glob, an empty folder). */
    public static final class Unusable extends Exception {
        private static final long serialVersionUID = 1L;

        Unusable(String message) {
            super(message);
        }
    }

    /** One glob, gitignore-like: with no '/' it matches a name at any depth; a trailing '/' means a folder. */
    record Exclusion(String glob, String origin, PathMatcher matcher, boolean anyDepth, boolean folder) {

        static Exclusion parse(String line, String origin) throws Unusable {
            String g = line;
            boolean folder = g.endsWith("/");
            if (folder) {
                g = g.substring(0, g.length() - 1);
            }
            boolean anchored = g.startsWith("/");
            if (anchored) {
                g = g.substring(1);
            }
            if (g.isEmpty() || line.startsWith("!")) {
                throw new Unusable(origin + ": '" + line + "' is not a usable pattern"
                        + (line.startsWith("!") ? " (a '!' that takes a file back in is not supported)" : ""));
            }
            try {
                PathMatcher m = FileSystems.getDefault().getPathMatcher("glob:" + g);
                return new Exclusion(line, origin, m, !anchored && !g.contains("/"), folder);
            } catch (PatternSyntaxException e) {
                throw new Unusable(origin + ": '" + line + "' is not a valid glob: " + e.getDescription());
            }
        }

        /** Whether the path at {@code relative} (to the folder's root) is left out; {@code isFolder} for a folder. */
        boolean excludes(Path relative, boolean isFolder) {
            int names = relative.getNameCount();
            // a folder pattern matches any folder above the file (or the folder itself); a file pattern the file
            for (int end = folder ? 1 : names; end <= (folder && !isFolder ? names - 1 : names); end++) {
                Path p = anyDepth ? relative.getName(end - 1) : relative.subpath(0, end);
                if (matcher.matches(p)) {
                    return true;
                }
            }
            return false;
        }
    }

    private Inputs() {
    }

    /** The inputs that {@code named} files, folders and '-' stand for, less those {@code excludes} globs leave out. */
    public static Found expand(List<Path> named, List<String> excludes, InputStream standardInput)
            throws Unusable, IOException {
        List<Protolyte.Input> out = new ArrayList<>();
        List<Skipped> excluded = new ArrayList<>();
        List<Exclusion> common = new ArrayList<>();
        for (String g : excludes) {
            common.add(Exclusion.parse(g, "--exclude"));
        }
        boolean stdinTaken = false;
        for (Path p : named) {
            if (p.toString().isEmpty()) {
                // Path.of("") is the working folder: an empty argument (an unset variable) must not check all of it
                throw new Unusable("an empty file argument ('') names no file; give a file or folder");
            }
            if (p.toString().equals(STANDARD_INPUT)) {
                if (stdinTaken) {
                    throw new Unusable("'-' (standard input) is named more than once");
                }
                stdinTaken = true;
                out.add(standardInput(standardInput));
            } else if (Files.isDirectory(p)) {
                List<Exclusion> rules = new ArrayList<>(common);
                rules.addAll(ignoreFile(p));
                folder(p, rules, out, excluded);
            } else {
                out.add(new Protolyte.Input(p, false));
            }
        }
        return new Found(out, excluded);
    }

    private static Protolyte.Input standardInput(InputStream in) {
        try {
            return Protolyte.Input.ofBytes(STANDARD_INPUT_SOURCE, Protolyte.readBounded(in));
        } catch (IOException e) {
            return new Protolyte.Input(STANDARD_INPUT_SOURCE, Optional.empty(), false, Path.of("").toAbsolutePath(),
                    Optional.empty(), Optional.of(e.getMessage()));
        }
    }

    /** The glob lines of the ignore file at the folder's root: '#' begins a comment, blank lines are passed over. */
    static List<Exclusion> ignoreFile(Path folder) throws Unusable, IOException {
        Path file = folder.resolve(Protolyte.IGNORE_FILE);
        if (!Files.exists(file)) {
            return List.of();
        }
        if (!Files.isRegularFile(file) || Files.size(file) > 1024 * 1024) {
            throw new Unusable(file + ": not a regular file of at most 1 MiB");
        }
        List<Exclusion> out = new ArrayList<>();
        List<String> lines = Files.readAllLines(file, StandardCharsets.UTF_8);
        for (int i = 0; i < lines.size(); i++) {
            String line = lines.get(i).strip();
            if (!line.isEmpty() && !line.startsWith("#")) {
                out.add(Exclusion.parse(line, file + " line " + (i + 1)));
            }
        }
        return out;
    }

    /**
     * Every *.json below the folder, links followed (a linked folder is checked, not passed over); a loop, or a
     * folder or file that cannot be read, becomes an input that is reported invalid.
     */
    private static void folder(Path root, List<Exclusion> rules, List<Protolyte.Input> out, List<Skipped> excluded)
            throws IOException, Unusable {
        List<Protolyte.Input> found = new ArrayList<>();
        Files.walkFileTree(root, EnumSet.of(FileVisitOption.FOLLOW_LINKS), Integer.MAX_VALUE,
                new SimpleFileVisitor<>() {
                    @Override
                    public FileVisitResult visitFile(Path f, BasicFileAttributes attrs) {
                        if (f.getFileName().toString().endsWith(".json")) {
                            found.add(new Protolyte.Input(f, true, root));
                        }
                        return FileVisitResult.CONTINUE;
                    }

                    @Override
                    public FileVisitResult visitFileFailed(Path f, IOException e) {
                        // a folder (or a link to one) may hold documents, so its failure is never passed over
                        if (e instanceof FileSystemLoopException || Files.isDirectory(f, LinkOption.NOFOLLOW_LINKS)
                                || Files.isSymbolicLink(f) || f.getFileName().toString().endsWith(".json")) {
                            found.add(Protolyte.Input.unreadable(f, root, reason(e)));
                        }
                        return FileVisitResult.CONTINUE;
                    }
                });
        if (found.isEmpty()) {
            throw new Unusable(root + ": no *.json files below this folder");
        }
        found.sort(Comparator.comparing(in -> root.relativize(in.path().orElseThrow()).toString()));
        for (Protolyte.Input in : found) {
            Path relative = root.relativize(in.path().orElseThrow());
            boolean isFolder = in.unreadable().isPresent() && !in.source().endsWith(".json");
            Optional<Exclusion> rule = rules.stream().filter(x -> x.excludes(relative, isFolder)).findFirst();
            if (rule.isPresent()) {
                excluded.add(new Skipped(in.source(), "excluded by " + rule.get().origin() + " ('"
                        + rule.get().glob() + "')"));
            } else {
                out.add(in);
            }
        }
    }

    private static String reason(IOException e) {
        if (e instanceof FileSystemLoopException) {
            return "a link that leads back into a folder above it (a loop)";
        }
        if (e instanceof java.nio.file.AccessDeniedException) {
            return "permission denied";
        }
        if (e instanceof java.nio.file.NoSuchFileException) {
            return "a link to a file or folder that does not exist";
        }
        return e.getClass().getSimpleName() + ": " + e.getMessage();
    }
}
