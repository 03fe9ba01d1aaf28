package org.protolyte.cli;

import java.io.PrintWriter;
import java.util.spi.ToolProvider;

/**
 * The command line as a {@link ToolProvider} named {@code protolyte}: it runs in the caller's JVM, without a JVM start
 * per call, and returns the command line's exit codes (0 pass, 1 fail, 2 invalid or usage, 3 indeterminate, 4 fault).
 * {@code ToolProvider.findFirst("protolyte")} finds it on the class path.
 */
public final class Tool implements ToolProvider {

    @Override
    public String name() {
        return "protolyte";
    }

    @Override
    public int run(PrintWriter out, PrintWriter err, String... args) {
        try {
            return Main.run(out, err, args);
        } finally {
            out.flush();
            err.flush();
        }
    }
}
