package org.protolyte;

import java.io.UncheckedIOException;
import java.io.IOException;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/** Small invented documents for the bad-input tests. */
public final class TestDocs {

    /** Two acetate lines, equimolar: a buffer near pH 4.7. */
    public static final String ACETATE = "{\"substance\": \"acetic acid\", \"amount\": \"50 mmol/L\"},\n"
            + "{\"substance\": \"sodium acetate anhydrous\", \"amount\": \"50 mmol/L\"}";

    private TestDocs() {
    }

    /** A formulation on a 1 L finalVolume basis; {@code extra} is appended after the components (",..."). */
    public static String formulation(String components, String extra) {
        return formulation("{\"finalVolume\": \"1 L\"}", components, extra);
    }

    public static String formulation(String basis, String components, String extra) {
        return "{\n"
                + "\"document\": \"formulation\",\n"
                + "\"formatVersion\": 1,\n"
                + "\"id\": \"TST-100\",\n"
                + "\"basis\": " + basis + ",\n"
                + "\"components\": [\n" + components + "\n]" + extra + "\n"
                + "}\n";
    }

    public static byte[] bytes(String s) {
        return s.getBytes(StandardCharsets.UTF_8);
    }

    /** A test resource under {@code documents/}. */
    public static Path resource(String name) {
        try {
            var url = TestDocs.class.getResource("/documents/" + name);
            if (url == null) {
                throw new IllegalStateException("missing test resource " + name);
            }
            return Path.of(url.toURI());
        } catch (URISyntaxException e) {
            throw new IllegalStateException(e);
        }
    }

    public static byte[] resourceBytes(String name) {
        try {
            return Files.readAllBytes(resource(name));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
