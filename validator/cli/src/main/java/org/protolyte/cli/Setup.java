package org.protolyte.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.protolyte.document.DocumentException;
import org.protolyte.document.Problem;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.plugin.Plugins;
import org.protolyte.rules.CheckKinds;
import org.protolyte.rules.Checker;
import org.protolyte.rules.RuleBook;
import org.protolyte.rules.RulePack;
import org.protolyte.rules.WaiverFile;
import org.protolyte.rules.Waivers;
import org.protolyte.substance.LibraryLoader;
import org.protolyte.substance.SubstanceLibrary;
import org.protolyte.report.Printable;

import picocli.CommandLine.Option;

/** The options every command shares: which substance libraries and which rule packs. */
final class Setup {

    @Option(names = "--substances", paramLabel = "FILE",
            description = "A user substance library that extends the shipped one (repeatable).")
    List<Path> substances = new ArrayList<>();

    @Option(names = "--rules", paramLabel = "PACK_OR_FILE",
            description = "Rule pack (shipped name or file) to use instead of the packs chosen by intendedUse; "
                    + "'+PACK_OR_FILE' adds to that choice instead (repeatable).")
    List<String> rules = new ArrayList<>();

    @Option(names = "--plugins", paramLabel = "DIR",
            description = "A folder of plugin jars: a site's check kinds and substance libraries. It holds jars only; "
                    + "reports name each with its SHA-256.")
    Path pluginFolder;

    final SchemaCatalog schemas = new SchemaCatalog();
    private Plugins plugins;
    private CheckKinds kinds;

    /** Thrown when the setup itself is unusable; the message is for the user, the exit code is 2. */
    static final class UsageException extends Exception {
        private static final long serialVersionUID = 1L;

        UsageException(String message) {
            super(message);
        }
    }

    /** The plugins of --plugins and of the class path, each jar read once per command. */
    Plugins plugins() throws UsageException {
        if (plugins == null) {
            try {
                plugins = Plugins.found(Optional.ofNullable(pluginFolder));
                kinds = CheckKinds.load(plugins);
            } catch (Plugins.Unusable e) {
                throw new UsageException(String.join(System.lineSeparator() + "protolyte: ", e.problems()));
            }
        }
        return plugins;
    }

    SubstanceLibrary library() throws UsageException, IOException {
        LibraryLoader loader = new LibraryLoader(schemas).addShipped();
        for (Plugins.Library l : plugins().libraries()) {
            try {
                loader.add(l.name(), l.content(), true);
            } catch (DocumentException e) {
                throw new UsageException(describe("substance library " + l.name(), e));
            }
        }
        for (Path p : substances) {
            try {
                loader.add(p.toString(), read(p, "substance library"), true);
            } catch (DocumentException e) {
                throw new UsageException(describe("substance library " + p, e));
            }
        }
        return loader.build();
    }

    RuleBook ruleBook() throws UsageException, IOException {
        plugins();
        RuleBook book = RuleBook.shipped(schemas, kinds);
        for (String r : rules) {
            String name = r.startsWith("+") ? r.substring(1) : r;
            if (book.pack(name).isEmpty()) {
                load(book, name);
            }
        }
        return book;
    }

    Checker checker(RuleBook book) throws UsageException {
        List<String> replace = new ArrayList<>();
        List<String> add = new ArrayList<>();
        for (String r : rules) {
            boolean adds = r.startsWith("+");
            String name = packName(book, adds ? r.substring(1) : r);
            (adds ? add : replace).add(name);
        }
        try {
            return new Checker(book, replace, add);
        } catch (DocumentException e) {
            throw new UsageException(describe("rule packs " + String.join(", ", rules) + " cannot be combined", e));
        }
    }

    private static String packName(RuleBook book, String nameOrFile) throws UsageException {
        if (book.pack(nameOrFile).isPresent()) {
            return nameOrFile;
        }
        return book.packs().values().stream().filter(p -> p.document().source().equals(nameOrFile))
                .map(RulePack::name).findFirst()
                .orElseThrow(() -> new UsageException("unknown rule pack '" + nameOrFile + "'"));
    }

    private static void load(RuleBook book, String nameOrFile) throws UsageException, IOException {
        Path p = Path.of(nameOrFile);
        if (Files.isDirectory(p)) {
            throw new UsageException("rule pack " + p + ": is a folder, not a file");
        }
        if (!Files.exists(p)) {
            throw new UsageException("unknown rule pack '" + nameOrFile + "': not a shipped pack ("
                    + String.join(", ", book.packs().keySet()) + ") and no such file");
        }
        try {
            book.add(nameOrFile, read(p, "rule pack"), false);
        } catch (DocumentException e) {
            throw new UsageException(describe("rule pack " + nameOrFile, e));
        }
    }

    /** The files these options name, so that a report is never written over one of them. */
    List<Path> files() {
        List<Path> out = new ArrayList<>(substances);
        rules.stream().map(r -> r.startsWith("+") ? r.substring(1) : r).map(Path::of).filter(Files::exists)
                .forEach(out::add);
        return out;
    }

    static byte[] read(Path p, String what) throws UsageException, IOException {
        if (Files.isDirectory(p)) {
            throw new UsageException(what + " " + p + ": is a folder, not a file");
        }
        if (!Files.isRegularFile(p)) {
            throw new UsageException(what + " " + p + ": file not found");
        }
        if (Files.size(p) > 16L * 1024 * 1024) {
            throw new UsageException(what + " " + p + ": file is larger than 16 MiB");
        }
        return Files.readAllBytes(p);
    }

    private static String describe(String what, DocumentException e) {
        StringBuilder b = new StringBuilder();
        for (Problem p : e.problems()) {
            b.append(b.length() == 0 ? "" : System.lineSeparator() + "protolyte: ").append(what).append(": ")
                    .append(p);
        }
        return b.toString();
    }

    Waivers waivers(Path file, LocalDate today) throws UsageException, IOException {
        if (file == null) {
            return Waivers.none(today);
        }
        try {
            return new Waivers(WaiverFile.read(schemas, file.toString(), read(file, "waiver file")), today);
        } catch (DocumentException e) {
            throw new UsageException(describe("waiver file " + file, e));
        }
    }

    static int usage(PrintWriter err, UsageException e) {
        err.println("protolyte: " + Printable.text(e.getMessage()));
        return 2;
    }
}
