package org.protolyte;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.Properties;
import java.util.Set;
import java.util.ArrayDeque;
import java.util.Deque;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.function.Consumer;
import java.util.stream.Collectors;

import org.protolyte.analysis.Analyzer;
import org.protolyte.analysis.FormulationAnalysis;
import org.protolyte.analysis.RecipeConflict;
import org.protolyte.analysis.Robustness;
import org.protolyte.batch.BatchAnalysis;
import org.protolyte.batch.BatchAnalyzer;
import org.protolyte.batch.BatchRecord;
import org.protolyte.batch.BatchRecordReader;
import org.protolyte.chemistry.IonInteraction;
import org.protolyte.chemistry.Equilibrium;
import org.protolyte.document.Digests;
import org.protolyte.document.DocumentException;
import org.protolyte.document.Formulation;
import org.protolyte.document.FormulationReader;
import org.protolyte.document.JsonReader;
import org.protolyte.document.Problem;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.document.SourceDocument;
import org.protolyte.document.Suggestions;
import org.protolyte.recipe.Recipe;
import org.protolyte.recipe.RecipeResolver;
import org.protolyte.report.DocumentReport;
import org.protolyte.report.RunReport;
import org.protolyte.report.RunSummary;
import org.protolyte.report.Skipped;
import org.protolyte.rules.CheckKinds;
import org.protolyte.rules.Checker;
import org.protolyte.rules.RuleBook;
import org.protolyte.rules.Finding;
import org.protolyte.rules.Severity;
import org.protolyte.rules.Waivers;
import org.protolyte.substance.SubstanceLibrary;

import tools.jackson.databind.JsonNode;

/**
 * The one flow: read and validate → resolve → analyse every condition → check → report. Each input
 * is checked on its own; one bad file never stops the others.
 *
 * <p>Longer than the project's ~400 lines because it is the one place that knows every document kind, folder walking
 * and the typed failures each step may raise, and turns each into a report; the steps themselves live in their
 * packages. It is to become the library's facade (issue: the plugin's API), where it will be cut down.
 */
public final class Protolyte {

    /** The document type of a batch record. */
    public static final String BATCH_RECORD = "batch-record";

    /** The kinds of document that are checked. */
    private static final List<String> KINDS = List.of("formulation", BATCH_RECORD);

    /** The companions a folder may hold beside its documents, as their "document" field names them. */
    private enum Companion {
        SUBSTANCE_LIBRARY("substance-library", "a substance library", "--substances"),
        RULE_PACK("rule-pack", "a rule pack", "--rules"),
        WAIVERS("waivers", "a waiver file", "--waivers");

        final String kind;
        final String what;
        final String option;

        Companion(String kind, String what, String option) {
            this.kind = kind;
            this.what = what;
            this.option = option;
        }

        static Optional<Companion> of(String kind) {
            return Arrays.stream(values()).filter(c -> c.kind.equals(kind)).findFirst();
        }

        static List<String> kinds() {
            return Arrays.stream(values()).map(c -> c.kind).toList();
        }
    }

    /** The file at a folder's root whose glob lines leave files out of the check. */
    public static final String IGNORE_FILE = ".protolyte-ignore";

    /** The largest document read; a larger file is refused before it is read. */
    public static final long MAX_DOCUMENT_BYTES = 16L * 1024 * 1024;

    /** Rule id of the findings that make a document invalid. */
    public static final String INVALID_DOCUMENT = "invalid-document";

    private final JsonReader json = new JsonReader();
    private final FormulationReader reader;
    private final RecipeResolver resolver;
    private final Analyzer analyzer = new Analyzer(new Equilibrium(IonInteraction.INSTANCE));
    private final Checker checker;
    private final BatchRecordReader batchReader;
    private final BatchAnalyzer batchAnalyzer;
    private final Severity failOn;
    private final SubstanceLibrary library;
    private final SchemaCatalog schemas;

    private final Waivers waivers;
    private final Optional<Robustness.Settings> robustness;
    private final boolean curves;

    /** Judged by the shipped packs that apply to each document's intended use; errors fail; no waivers. */
    public Protolyte(SchemaCatalog schemas, SubstanceLibrary library) {
        this(schemas, library, Checker.byIntendedUse(RuleBook.shipped(schemas, CheckKinds.load())), Severity.ERROR);
    }

    public Protolyte(SchemaCatalog schemas, SubstanceLibrary library, Checker checker, Severity failOn) {
        this(schemas, library, checker, failOn, Waivers.none(java.time.LocalDate.now()));
    }

    public Protolyte(SchemaCatalog schemas, SubstanceLibrary library, Checker checker, Severity failOn,
                     Waivers waivers) {
        this(schemas, library, checker, failOn, waivers, Optional.empty(), false);
    }

    private Protolyte(SchemaCatalog schemas, SubstanceLibrary library, Checker checker, Severity failOn,
                      Waivers waivers, Optional<Robustness.Settings> robustness, boolean curves) {
        this.robustness = robustness;
        this.curves = curves;
        this.reader = new FormulationReader(schemas);
        this.resolver = new RecipeResolver(library);
        this.checker = checker;
        this.failOn = failOn;
        this.library = library;
        this.waivers = waivers;
        this.schemas = schemas;
        this.batchReader = new BatchRecordReader(schemas);
        this.batchAnalyzer = new BatchAnalyzer(library, analyzer);
    }

    public static String version() {
        return VERSION;
    }

    /** Read once: a service asks for it on every check. */
    private static final String VERSION = readVersion();

    private static String readVersion() {
        try (InputStream in = Protolyte.class.getResourceAsStream("version.properties")) {
            Properties p = new Properties();
            if (in != null) {
                p.load(in);
            }
            return p.getProperty("version", "development");
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * One input of a run: a file named or found in a folder ({@code foundInFolder}: companions are then skipped),
     * bytes read already (standard input), or a path found in a folder that could not be read ({@code unreadable}
     * holds why). {@code root} is the folder tree a batch record's master must stay in: the folder named, or the
     * file's own folder.
     */
    public record Input(String source, Optional<Path> path, boolean foundInFolder, Path root,
                        Optional<byte[]> content, Optional<String> unreadable) {
        public Input(Path path, boolean foundInFolder, Path root) {
            this(path.toString(), Optional.of(path), foundInFolder, root, Optional.empty(), Optional.empty());
        }

        public Input(Path path, boolean foundInFolder) {
            this(path, foundInFolder, parentOf(path));
        }

        /** Bytes without a folder (standard input): a batch record among them must embed its master. */
        public static Input ofBytes(String source, byte[] content) {
            return new Input(source, Optional.empty(), false, Path.of("").toAbsolutePath(), Optional.of(content),
                    Optional.empty());
        }

        /** A path the folder walk could not read: reported invalid, with the reason, while the others go on. */
        public static Input unreadable(Path path, Path root, String reason) {
            return new Input(path.toString(), Optional.of(path), true, root, Optional.empty(), Optional.of(reason));
        }

        private static Path parentOf(Path p) {
            Path parent = p.toAbsolutePath().getParent();
            return parent == null ? p.toAbsolutePath() : parent;
        }
    }

    public RunReport check(List<Path> files) {
        return checkInputs(files.stream().map(p -> new Input(p, false)).toList());
    }

    /** What became of one input: its report, or the rule that passed it over. */
    private record Outcome(Optional<DocumentReport> report, Optional<Skipped> skipped) {
        static Outcome of(DocumentReport r) {
            return new Outcome(Optional.of(r), Optional.empty());
        }
    }

    /**
     * Checks one input at a time, handing each report to {@code each} and keeping only the summary: the way an
     * archive is re-checked within a small heap.
     */
    public RunSummary stream(List<Input> inputs, RunSummary summary, Consumer<DocumentReport> each) {
        int threads = Math.max(1, Math.min(Runtime.getRuntime().availableProcessors(), 8));
        ExecutorService pool = Executors.newFixedThreadPool(threads, r -> {
            Thread t = new Thread(r, "protolyte-check");
            t.setDaemon(true);
            return t;
        });
        try {
            return stream(inputs, summary, each, pool, 4 * threads);
        } finally {
            pool.shutdownNow();
        }
    }

    /**
     * The same on the caller's executor, with at most {@code window} documents in flight, handed on in input order:
     * parallel, yet the report reads as a list.
     */
    public RunSummary stream(List<Input> inputs, RunSummary summary, Consumer<DocumentReport> each,
                             java.util.concurrent.Executor executor, int window) {
        Deque<Future<Outcome>> inFlight = new ArrayDeque<>();
        int next = 0;
        while (next < inputs.size() || !inFlight.isEmpty()) {
            while (next < inputs.size() && inFlight.size() < Math.max(1, window)) {
                Input in = inputs.get(next++);
                inFlight.add(java.util.concurrent.CompletableFuture.supplyAsync(() -> check(in), executor));
            }
            Outcome o = join(inFlight.poll());
            o.skipped().ifPresent(summary::skip);
            o.report().ifPresent(r -> {
                summary.add(r);
                each.accept(r);
            });
        }
        return summary;
    }

    private static Outcome join(Future<Outcome> f) {
        try {
            return f.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted", e);
        } catch (ExecutionException e) {
            throw new IllegalStateException(e.getCause());
        }
    }

    /** Runs a robustness study on every formulation too, so that rules can judge the batch-to-batch risk. */
    public Protolyte withRobustness(Robustness.Settings settings) {
        return new Protolyte(schemas, library, checker, failOn, waivers, Optional.of(settings), curves);
    }

    /** Traces the points behind the report's plots for every formulation too (for HTML and --curves). */
    public Protolyte withCurves() {
        return new Protolyte(schemas, library, checker, failOn, waivers, robustness, true);
    }

    /** Where a site's check kinds and substance libraries came from (the class path, the module path, a folder). */
    public List<org.protolyte.plugin.Plugins.Origin> plugins() {
        return checker.kinds().plugins();
    }

    /** A new run's summary: the tool version, now, and the library files with their hashes. */
    public RunSummary newSummary() {
        return newSummary(Optional.empty());
    }

    /** A summary whose provenance names the run date given for the waivers, if one was. */
    public RunSummary newSummary(Optional<java.time.LocalDate> asOf) {
        return new RunSummary(version(), Instant.now(), library.files(), plugins(), asOf);
    }

    /** The whole run held in memory, for renderers that need every report at once (SARIF). */
    public RunReport checkInputs(List<Input> inputs) {
        List<DocumentReport> reports = new ArrayList<>();
        RunSummary summary = stream(inputs, newSummary(), reports::add);
        return new RunReport(summary.toolVersion(), summary.generatedAt(), summary.libraryFiles(), summary.plugins(), reports,
                summary.skipped());
    }

    /** Reads the input once (its size checked first), then checks it or passes it over as a companion. */
    private Outcome check(Input in) {
        if (in.unreadable().isPresent()) {
            return Outcome.of(invalid(in.source(), Optional.empty(), Optional.empty(), List.of(new Problem("",
                    Optional.empty(), "cannot be read: " + in.unreadable().get()))));
        }
        byte[] content;
        if (in.content().isPresent()) {
            content = in.content().get();
        } else {
            Path file = in.path().orElseThrow();
            Optional<String> problem = unreadable(file);
            if (problem.isPresent()) {
                return Outcome.of(invalid(in.source(), Optional.empty(), Optional.empty(), List.of(new Problem("",
                        Optional.empty(), problem.get()))));
            }
            try {
                content = readBounded(file);
            } catch (IOException e) {
                return Outcome.of(invalid(in.source(), Optional.empty(), Optional.empty(), List.of(new Problem("",
                        Optional.empty(), "cannot read the file: " + e.getMessage()))));
            }
        }
        return check(in.source(), content, in.path(), in.path().map(p -> in.root()), in.foundInFolder());
    }

    /** Why a path cannot be read as a document, before any byte of it is read. */
    private static Optional<String> unreadable(Path file) {
        if (!Files.exists(file)) {
            return Optional.of(Files.isSymbolicLink(file) ? "file not found: a link to a file that does not exist"
                    : "file not found");
        }
        if (Files.isDirectory(file)) {
            return Optional.of("is a folder, not a file");
        }
        if (!Files.isRegularFile(file)) {
            return Optional.of("not a regular file (a device, a pipe or a socket)");
        }
        try {
            long size = Files.size(file);
            if (size > MAX_DOCUMENT_BYTES) {
                return Optional.of(tooLarge(size));
            }
        } catch (IOException e) {
            return Optional.of("cannot read the file: " + e.getMessage());
        }
        return Optional.empty();
    }

    private static String tooLarge(long size) {
        return "file is larger than " + MAX_DOCUMENT_BYTES / (1024 * 1024) + " MiB (" + size + " bytes); it is not read";
    }

    /**
     * The bytes of a file or stream, never more than {@link #MAX_DOCUMENT_BYTES}: a file that grows after its size
     * was checked, or a stream without a size, is cut off there and refused.
     */
    public static byte[] readBounded(InputStream in) throws IOException {
        byte[] b = in.readNBytes((int) MAX_DOCUMENT_BYTES + 1);
        if (b.length > MAX_DOCUMENT_BYTES) {
            throw new IOException(tooLarge(b.length).replace(" (" + b.length + " bytes)", ""));
        }
        return b;
    }

    private static byte[] readBounded(Path file) throws IOException {
        try (InputStream in = Files.newInputStream(file)) {
            return readBounded(in);
        }
    }

    public DocumentReport check(Path file) {
        return check(new Input(file, false)).report().orElseThrow();
    }

    /** Checks one file named on its own; a batch record's master path must stay inside {@code root}. */
    public DocumentReport check(Path file, Path root) {
        return check(new Input(file, false, root)).report().orElseThrow();
    }

    /** Checks bytes read from a folder: a batch record's master is read from it and must stay inside it. */
    public DocumentReport check(String source, byte[] content, Path folder) {
        // the folder stands for the document's place: a master path is relative to it (BatchRecordReader)
        Input in = new Input(source, Optional.of(folder), false, folder, Optional.of(content), Optional.empty());
        return check(in).report().orElseThrow();
    }

    /** Checks bytes that have no folder: a batch record among them must embed its master. */
    public DocumentReport check(String source, byte[] content) {
        return check(Input.ofBytes(source, content)).report().orElseThrow();
    }

    private Outcome check(String source, byte[] content, Optional<Path> file, Optional<Path> root,
                          boolean foundInFolder) {
        Optional<String> id = Optional.empty();
        String sha256 = Digests.sha256(content);
        try {
            SourceDocument doc = json.read(source, content);
            if (doc.root().path("id").isString()) {
                id = Optional.of(doc.root().path("id").asString());
            }
            String kind = kind(doc, foundInFolder);
            Optional<Companion> companion = Companion.of(kind);
            if (companion.isPresent()) {
                return new Outcome(Optional.empty(), Optional.of(new Skipped(source, companion.get().what
                        + " (\"document\": \"" + kind + "\"), a companion of the documents")));
            }
            if (BATCH_RECORD.equals(kind)) {
                return Outcome.of(batch(doc, sha256, file, root));
            }
            return Outcome.of(formulation(doc, sha256));
        } catch (DocumentException e) {
            return Outcome.of(invalid(source, Optional.of(sha256), id, e.problems()));
        } catch (RuntimeException e) {
            return Outcome.of(DocumentReport.fault(source, Optional.of(sha256), "internal fault while checking this "
                    + "document (" + e.getClass().getSimpleName() + ": " + e.getMessage() + "); please report it"));
        }
    }

    /**
     * What the document says it is. A formulation or a batch record is checked; in a folder a known companion
     * (library, rule pack, waiver file) is passed over; anything else is refused, so that a typo never skips the
     * gate.
     */
    private static String kind(SourceDocument doc, boolean foundInFolder) {
        JsonNode d = doc.root().path("document");
        if (!doc.root().isObject()) {
            throw new DocumentException(doc.problem("", "not a Protolyte document: the top level is not an object"));
        }
        if (d.isMissingNode()) {
            throw new DocumentException(doc.problem("", "no \"document\" field: a document says what it is, "
                    + "\"document\": \"formulation\" or \"" + BATCH_RECORD + "\""
                    + (foundInFolder ? "; a file in a folder that is neither is refused unless it is a companion (\""
                    + String.join("\", \"", Companion.kinds()) + "\") or is excluded (" + IGNORE_FILE
                    + " at the folder's root, or --exclude)" : "")));
        }
        String kind = d.isString() ? d.asString() : d.toString();
        Optional<Companion> companion = Companion.of(kind);
        if (KINDS.contains(kind) || foundInFolder && companion.isPresent()) {
            return kind;
        }
        if (companion.isPresent()) {
            throw new DocumentException(doc.problem("/document", "this is " + companion.get().what
                    + ", not a formulation or a batch record: give it with " + companion.get().option));
        }
        List<String> known = new ArrayList<>(KINDS);
        known.addAll(Companion.kinds());
        String near = kind.length() > 64 ? "" : Suggestions.nearest(kind, known).map(n -> "; did you mean \"" + n
                + "\"?").orElse("");
        throw new DocumentException(doc.problem("/document", "\"document\": " + (d.isString() ? "\"" + kind + "\""
                : kind) + " is not a kind of document Protolyte knows (\"" + String.join("\", \"", known) + "\")"
                + near));
    }

    private DocumentReport formulation(SourceDocument doc, String sha256) {
        Formulation f;
        try {
            f = reader.read(doc);
        } catch (DocumentException e) {
            throw new DocumentException(withNameProblems(doc, e.problems()));
        }
        Recipe recipe = resolver.resolve(f);
        FormulationAnalysis analysis;
        try {
            analysis = analyzer.analyze(recipe);
        } catch (RecipeConflict e) {
            throw atAdjustment(f, e);
        }
        if (robustness.isPresent()) {
            analysis = analysis.withRobustness(new Robustness(new Equilibrium(IonInteraction.INSTANCE))
                    .run(recipe, robustness.get(), done -> { }));
        }
        if (curves) {
            analysis = analysis.withCurves(analyzer.curves(analysis));
        }
        Checker.Verdict verdict;
        try {
            verdict = checker.check(analysis);
        } catch (DocumentException e) {
            throw packsCannotBeCombined(e);
        }
        boolean ownWaivers = verdict.packs().stream().anyMatch(p -> p.documentWaivers());
        List<Finding> findings = waivers.apply(f, sha256, ownWaivers, verdict.findings());
        return DocumentReport.of(analysis, sha256, verdict.withFindings(findings), failOn);
    }

    /** A batch record: read with its master, compared, recomputed, judged by the batch rules. */
    private DocumentReport batch(SourceDocument doc, String sha256, Optional<Path> file, Optional<Path> root) {
        BatchRecord record = batchReader.read(doc, file, root);
        BatchAnalysis made = batchAnalyzer.analyze(record);
        BatchAnalysis b = curves ? new BatchAnalysis(made.record(), made.master(), made.scale(), made.additions(),
                made.observations(), made.candidates(), made.specifiedPh(),
                made.asMade().map(a -> a.withCurves(analyzer.curves(a))), made.caveats()) : made;
        Checker.Verdict verdict;
        try {
            verdict = checker.check(b);
        } catch (DocumentException e) {
            throw packsCannotBeCombined(e);
        }
        return DocumentReport.ofBatch(b, sha256, verdict, failOn);
    }

    /** A conflict the analysis names by component, as a problem at that component's adjustTo. */
    public static DocumentException atAdjustment(Formulation f, RecipeConflict e) {
        return new DocumentException(f.document().problem(e.component().line().pointer() + "/adjustTo", e.getMessage()));
    }

    /** Packs that cannot be combined are a problem of the input the run was given, not an internal fault. */
    private static DocumentException packsCannotBeCombined(DocumentException e) {
        return new DocumentException(e.problems().stream().map(p -> new Problem(p.pointer(), p.location(),
                "the rule packs cannot be combined: " + p.message())).toList());
    }

    /** Adds the substance names that do not resolve, so that one pass reports everything a reviewer must fix. */
    private List<Problem> withNameProblems(SourceDocument doc, List<Problem> problems) {
        List<Problem> all = new ArrayList<>(problems);
        Set<String> places = problems.stream().map(Problem::pointer).collect(Collectors.toSet());
        for (Problem p : resolver.unresolvedNames(doc)) {
            if (places.add(p.pointer())) {
                all.add(p);
            }
        }
        all.sort(java.util.Comparator.comparing((Problem p) -> p.location().map(l -> l.line()).orElse(0))
                .thenComparing(p -> p.location().map(l -> l.column()).orElse(0)));
        return all;
    }

    private static DocumentReport invalid(String source, Optional<String> sha256, Optional<String> id,
                                          List<Problem> problems) {
        List<Finding> findings = problems.stream().map(p -> new Finding(INVALID_DOCUMENT, Severity.ERROR,
                p.message(), Optional.of(p.pointer()), p.location())).toList();
        return DocumentReport.invalid(source, sha256, id, findings);
    }
}
