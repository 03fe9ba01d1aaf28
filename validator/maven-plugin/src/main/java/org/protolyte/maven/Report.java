package org.protolyte.maven;

import java.io.File;
import java.util.Arrays;
import java.util.Locale;
import java.util.Optional;

import org.protolyte.api.Format;

/**
 * One report file of a run: its format ({@code text}, {@code json}, {@code sarif} or {@code html}) and where it goes.
 * In a pom, {@code <report><format>json</format><file>...</file></report>}; as a property, {@code format:file}
 * (e.g. {@code -Dprotolyte.reports=json:target/report.json,sarif:target/report.sarif}).
 */
public final class Report {

    private String format = "text";
    private File file;

    public Report() {
    }

    Report(String format, File file) {
        this.format = format;
        this.file = file;
    }

    public void setFormat(String format) {
        this.format = format;
    }

    public void setFile(File file) {
        this.file = file;
    }

    /** {@code format:file}, for a report given as one text (a user property). */
    public void set(String formatAndFile) {
        int colon = formatAndFile.indexOf(':');
        this.format = colon < 0 ? "" : formatAndFile.substring(0, colon).strip();
        this.file = colon < 0 ? null : new File(formatAndFile.substring(colon + 1).strip());
    }

    String format() {
        return format;
    }

    File file() {
        return file;
    }

    /** The API's format, if the name is one. */
    Optional<Format> parsedFormat() {
        String f = format == null ? "" : format.strip().toUpperCase(Locale.ROOT);
        return Arrays.stream(Format.values()).filter(known -> known.name().equals(f)).findFirst();
    }

    @Override
    public String toString() {
        return format + ":" + file;
    }
}
