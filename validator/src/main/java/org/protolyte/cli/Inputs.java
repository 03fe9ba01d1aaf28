package org.protolyte.cli;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.stream.Stream;

import org.protolyte.Protolyte;

/** What the command line names: files as given, folders as every *.json below them in order of relative path. */
final class Inputs {
    private Inputs() {
    }

    static List<Protolyte.Input> expand(List<Path> named) {
        List<Protolyte.Input> out = new ArrayList<>();
        for (Path p : named) {
            if (Files.isDirectory(p)) {
                try (Stream<Path> s = Files.walk(p)) {
                    s.filter(f -> Files.isRegularFile(f) && f.getFileName().toString().endsWith(".json"))
                            .sorted(Comparator.comparing(f -> p.relativize(f).toString()))
                            .forEach(f -> out.add(new Protolyte.Input(f, true, p)));
                } catch (IOException e) {
                    throw new UncheckedIOException(e);
                }
            } else {
                out.add(new Protolyte.Input(p, false));
            }
        }
        return out;
    }
}
