package org.protolyte;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Properties;
import java.util.ArrayDeque;
import java.util.Deque;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.function.Consumer;

import org.protolyte.analysis.Analyzer;
import org.protolyte.analysis.FormulationAnalysis;
import org.protolyte.analysis.Robustness;
import org.protolyte.batch.BatchAnalysis;
import org.protolyte.batch.BatchAnalyzer;
import org.protolyte.batch.BatchRecord;
import org.protolyte.batch.BatchRecordReader;
import org.protolyte.chemistry.Davies;
import org.protolyte.chemistry.Equilibrium;
import org.protolyte.document.Digests;
import org.protolyte.document.DocumentException;
import org.protolyte.document.Formulation;
import org.protolyte.document.FormulationReader;
import org.protolyte.document.JsonReader;
import org.protolyte.document.Problem;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.document.SourceDocument;
import org.protolyte.recipe.Recipe;
import org.protolyte.recipe.RecipeResolver;
import org.protolyte.report.DocumentReport;
import org.protolyte.report.RunReport;
import org.protolyte.report.RunSummary;
import org.protolyte.rules.CheckKinds;
import org.protolyte.rules.Checker;
import org.protolyte.rules.RuleBook;
import org.protolyte.rules.Finding;
import org.protolyte.rules.Severity;
import org.protolyte.rules.Waivers;
import org.protolyte.substance.SubstanceLibrary;

/**
 * The one flow: read and validate → resolve → analyse every condition → check → report. Each input
 * is checked on its own; one bad file never stops the others.
 */
public final class Protolyte {

    /** The document type of a batch record. */
    public static final String BATCH_RECORD = "batch-record";

    /** Rule id of the findings that make a document invalid. */
    public static final String INVALID_DOCUMENT = "invalid-document";

    private final JsonReader json = new JsonReader();
    private final FormulationReader reader;
    private final RecipeResolver resolver;
    private final Analyzer analyzer = new Analyzer(new Equilibrium(Davies.INSTANCE));
    private final Checker checker;
    private final BatchRecordReader batchReader;
    private final BatchAnalyzer batchAnalyzer;
    private final Severity failOn;
    private final SubstanceLibrary library;
    private final SchemaCatalog schemas;

    private final Waivers waivers;
    private final Optional<Robustness.Settings> robustness;

    /** Judged by the shipped packs that apply to each document's intended use; errors fail; no waivers. */
    public Protolyte(SchemaCatalog schemas, SubstanceLibrary library) {
        this(schemas, library, Checker.byIntendedUse(RuleBook.shipped(schemas, CheckKinds.load())), Severity.ERROR);
    }

    public Protolyte(SchemaCatalog schemas, SubstanceLibrary library, Checker checker, Severity failOn) {
        this(schemas, library, checker, failOn, Waivers.none(java.time.LocalDate.now()));
    }

    public Protolyte(SchemaCatalog schemas, SubstanceLibrary library, Checker checker, Severity failOn,
                     Waivers waivers) {
        this(schemas, library, checker, failOn, waivers, Optional.empty());
    }

    private Protolyte(SchemaCatalog schemas, SubstanceLibrary library, Checker checker, Severity failOn,
                      Waivers waivers, Optional<Robustness.Settings> robustness) {
        this.robustness = robustness;
        this.reader = new FormulationReader(schemas);
        this.resolver = new RecipeResolver(library);
        this.checker = checker;
        this.failOn = failOn;
        this.library = library;
        this.waivers = waivers;
        this.schemas = schemas;
        this.batchReader = new BatchRecordReader(schemas);
        this.batchAnalyzer = new BatchAnalyzer(schemas, library, analyzer);
    }

    public static String version() {
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
     * A file to check; {@code foundInFolder} when a folder was named, so that non-documents are skipped. {@code root}
     * is the folder tree a batch record's master must stay in: the folder named, or the file's own folder.
     */
    public record Input(Path path, boolean foundInFolder, Path root) {
        public Input(Path path, boolean foundInFolder) {
            this(path, foundInFolder, parentOf(path));
        }

        private static Path parentOf(Path p) {
            Path parent = p.toAbsolutePath().getParent();
            return parent == null ? p.toAbsolutePath() : parent;
        }
    }

    public RunReport check(List<Path> files) {
        return checkInputs(files.stream().map(p -> new Input(p, false)).toList());
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
        record InFlight(String source, Future<Optional<DocumentReport>> report) {
        }
        try {
            // a window of documents in flight, handed on in input order: parallel, yet the report reads as a list
            Deque<InFlight> window = new ArrayDeque<>();
            int next = 0;
            while (next < inputs.size() || !window.isEmpty()) {
                while (next < inputs.size() && window.size() < 4 * threads) {
                    Input in = inputs.get(next++);
                    window.add(new InFlight(in.path().toString(), pool.submit(() -> in.foundInFolder()
                            && !isDocument(in.path()) ? Optional.<DocumentReport>empty()
                            : Optional.of(check(in.path(), in.root())))));
                }
                InFlight head = window.poll();
                Optional<DocumentReport> r = join(head.report());
                if (r.isEmpty()) {
                    summary.skip(head.source());
                } else {
                    summary.add(r.get());
                    each.accept(r.get());
                }
            }
            return summary;
        } finally {
            pool.shutdownNow();
        }
    }

    private static Optional<DocumentReport> join(Future<Optional<DocumentReport>> f) {
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
        return new Protolyte(schemas, library, checker, failOn, waivers, Optional.of(settings));
    }

    /** A new run's summary: the tool version, now, and the library files with their hashes. */
    public RunSummary newSummary() {
        return new RunSummary(version(), Instant.now(), library.files());
    }

    /** The whole run held in memory, for renderers that need every report at once (SARIF). */
    public RunReport checkInputs(List<Input> inputs) {
        List<DocumentReport> reports = new ArrayList<>();
        RunSummary summary = stream(inputs, newSummary(), reports::add);
        return new RunReport(summary.toolVersion(), summary.generatedAt(), summary.libraryFiles(), reports,
                summary.skipped());
    }

    /**
     * A file found in a folder is checked when its top-level "document" says formulation or batch-record; one that
     * cannot be read as JSON is checked too, so that it is reported invalid rather than passed over.
     */
    private boolean isDocument(Path p) {
        try {
            SourceDocument doc = json.read(p.toString(), Files.readAllBytes(p));
            String kind = doc.root().path("document").asString("");
            return "formulation".equals(kind) || BATCH_RECORD.equals(kind);
        } catch (DocumentException | IOException e) {
            return true;
        }
    }

    public DocumentReport check(Path file) {
        return check(file, new Input(file, false).root());
    }

    /** Checks one file; a batch record's master path must stay inside {@code root}. */
    public DocumentReport check(Path file, Path root) {
        String source = file.toString();
        byte[] content;
        try {
            if (!Files.isRegularFile(file)) {
                return invalid(source, Optional.empty(), Optional.empty(), List.of(new Problem("", Optional.empty(),
                        Files.exists(file) ? "not a regular file" : "file not found")));
            }
            content = Files.readAllBytes(file);
        } catch (IOException e) {
            return invalid(source, Optional.empty(), Optional.empty(), List.of(new Problem("", Optional.empty(),
                    "cannot read the file: " + e.getMessage())));
        }
        return check(source, content, Optional.of(file), Optional.of(root));
    }

    /** Checks bytes that have no folder: a batch record among them must embed its master. */
    public DocumentReport check(String source, byte[] content) {
        return check(source, content, Optional.empty(), Optional.empty());
    }

    private DocumentReport check(String source, byte[] content, Optional<Path> file, Optional<Path> root) {
        Optional<String> id = Optional.empty();
        String sha256 = Digests.sha256(content);
        try {
            SourceDocument doc = json.read(source, content);
            if (doc.root().path("id").isString()) {
                id = Optional.of(doc.root().path("id").asString());
            }
            if (BATCH_RECORD.equals(doc.root().path("document").asString(""))) {
                return batch(doc, sha256, file, root);
            }
            Formulation f;
            try {
                f = reader.read(doc);
            } catch (DocumentException e) {
                throw new DocumentException(withNameProblems(doc, e.problems()));
            }
            Recipe recipe = resolver.resolve(f);
            FormulationAnalysis analysis = analyzer.analyze(recipe);
            if (robustness.isPresent()) {
                analysis = analysis.withRobustness(new Robustness(new Equilibrium(Davies.INSTANCE))
                        .run(recipe, robustness.get(), done -> { }));
            }
            Checker.Verdict verdict;
            try {
                verdict = checker.check(analysis);
            } catch (DocumentException e) {
                throw new IllegalStateException("the rule packs cannot be combined: " + e.getMessage(), e);
            }
            boolean ownWaivers = verdict.packs().stream().anyMatch(p -> p.documentWaivers());
            List<Finding> findings = waivers.apply(f, sha256, ownWaivers, verdict.findings());
            return DocumentReport.of(analysis, sha256, verdict.withFindings(findings), failOn);
        } catch (DocumentException e) {
            return invalid(source, Optional.of(sha256), id, e.problems());
        } catch (RuntimeException e) {
            return DocumentReport.fault(source, Optional.of(sha256), "internal fault while checking this document ("
                    + e.getClass().getSimpleName() + ": " + e.getMessage() + "); please report it");
        }
    }

    /** A batch record: read with its master, compared, recomputed, judged by the batch rules. */
    private DocumentReport batch(SourceDocument doc, String sha256, Optional<Path> file, Optional<Path> root) {
        BatchRecord record = batchReader.read(doc, file, root);
        BatchAnalysis b = batchAnalyzer.analyze(record);
        Checker.Verdict verdict;
        try {
            verdict = checker.check(b);
        } catch (DocumentException e) {
            throw new IllegalStateException("the rule packs cannot be combined: " + e.getMessage(), e);
        }
        return DocumentReport.ofBatch(b, sha256, verdict, failOn);
    }

    /** Adds the substance names that do not resolve, so that one pass reports everything a reviewer must fix. */
    private List<Problem> withNameProblems(SourceDocument doc, List<Problem> problems) {
        List<Problem> all = new ArrayList<>(problems);
        for (Problem p : resolver.unresolvedNames(doc)) {
            if (all.stream().noneMatch(q -> q.pointer().equals(p.pointer()))) {
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
