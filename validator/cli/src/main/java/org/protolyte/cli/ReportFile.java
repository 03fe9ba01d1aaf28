package org.protolyte.cli;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.PosixFileAttributeView;
import java.nio.file.attribute.PosixFilePermission;
import java.util.Collection;
import java.util.Optional;
import java.util.Set;
import java.util.UUID;

import org.protolyte.report.Printable;

/**
 * A report written to a file: checked before the run (a regular file or nothing, never one of the run's inputs, in a
 * folder that exists and may be written), then written to a temporary file beside it and moved into place, so that
 * the target is either the old file or the whole new report. The temporary file is removed on failure and when the
 * process is terminated; a replaced file keeps its mode, a new one gets the process's umask.
 */
final class ReportFile {

    /** Writes the report and gives the run's exit code. */
    interface Body {
        int write(Writer out) throws IOException;
    }

    private final Path target;

    private ReportFile(Path target) {
        this.target = target;
    }

    /** The checked target; {@code inputs} are every file the run reads (named, found in folders, options). */
    static ReportFile of(Path output, Collection<Path> inputs) throws Setup.UsageException {
        String named = output.toString();
        if (named.isEmpty()) {
            throw new Setup.UsageException("-o needs a file name");
        }
        Path target = output;
        try {
            if (Files.exists(output)) {
                target = output.toRealPath();   // through a link: the file it leads to is replaced, the link stays
                if (!Files.isRegularFile(target)) {
                    throw new Setup.UsageException("cannot write the report to " + named + ": it exists and is not "
                            + "a regular file (" + (Files.isDirectory(target) ? "a folder" : "a device, pipe or socket")
                            + "); it is left as it is");
                }
                for (Path in : inputs) {
                    if (Files.exists(in) && Files.isSameFile(target, in)) {
                        throw new Setup.UsageException("cannot write the report to " + named + ": it is one of the "
                                + "inputs of this run (" + in + ")");
                    }
                }
                if (!Files.isWritable(target)) {
                    throw new Setup.UsageException("cannot write the report to " + named + ": it is read-only");
                }
            }
        } catch (IOException e) {
            throw new Setup.UsageException("cannot write the report to " + named + ": " + e.getMessage());
        }
        Path dir = folderOf(target);
        if (!Files.exists(dir)) {
            throw new Setup.UsageException("cannot write the report to " + named + ": its folder " + dir
                    + " does not exist");
        }
        if (!Files.isDirectory(dir)) {
            throw new Setup.UsageException("cannot write the report to " + named + ": " + dir + " is not a folder");
        }
        if (!Files.isWritable(dir)) {
            throw new Setup.UsageException("cannot write the report to " + named + ": its folder " + dir
                    + " cannot be written");
        }
        return new ReportFile(target);
    }

    private static Path folderOf(Path target) {
        Path parent = target.toAbsolutePath().getParent();
        return parent == null ? target.toAbsolutePath().getRoot() : parent;
    }

    /** Writes the report beside the target, then moves it into place; gives the body's exit code. */
    int write(Body body) throws IOException {
        Path tmp = folderOf(target).resolve("." + target.getFileName() + "." + UUID.randomUUID() + ".tmp");
        Optional<Set<PosixFilePermission>> mode = mode(target);
        Thread cleanup = new Thread(() -> deleteOnExit(tmp), "protolyte-cleanup");
        Runtime.getRuntime().addShutdownHook(cleanup);
        try {
            int exit;
            // no permissions given: the file is made with the process's umask, as any new file of a shell is
            try (Writer w = new BufferedWriter(new OutputStreamWriter(Files.newOutputStream(tmp,
                    StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE), StandardCharsets.UTF_8))) {
                exit = body.write(w);
            }
            if (mode.isPresent()) {
                Files.setPosixFilePermissions(tmp, mode.get());
            }
            move(tmp, target);
            return exit;
        } finally {
            Files.deleteIfExists(tmp);
            removeHook(cleanup);
        }
    }

    private static Optional<Set<PosixFilePermission>> mode(Path target) throws IOException {
        if (!Files.exists(target) || Files.getFileAttributeView(target, PosixFileAttributeView.class) == null) {
            return Optional.empty();
        }
        return Optional.of(Files.getPosixFilePermissions(target));
    }

    private static void removeHook(Thread hook) {
        try {
            Runtime.getRuntime().removeShutdownHook(hook);
        } catch (IllegalStateException shuttingDown) {
            // caught: the process is being terminated, so the hook is running now and removes the temporary file
            return;
        }
    }

    private static void deleteOnExit(Path tmp) {
        try {
            Files.deleteIfExists(tmp);
        } catch (IOException e) {
            System.err.println("protolyte: could not remove the temporary file "
                    + Printable.text(tmp + ": " + e.getMessage()));
        }
    }

    private static void move(Path tmp, Path target) throws IOException {
        try {
            Files.move(tmp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } catch (AtomicMoveNotSupportedException e) {
            // caught: a file system without atomic rename still gets the report, by a plain replacing move
            Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
        }
    }
}
