package org.protolyte.cli;

import org.protolyte.Protolyte;

import picocli.CommandLine;

/** Version from the build. */
public final class VersionProvider implements CommandLine.IVersionProvider {
    @Override
    public String[] getVersion() {
        return new String[] {"Protolyte " + Protolyte.version()};
    }
}
