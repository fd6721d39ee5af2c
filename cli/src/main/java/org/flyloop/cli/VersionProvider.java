package org.flyloop.cli;

import java.io.IOException;
import java.io.InputStream;
import java.util.Properties;
import picocli.CommandLine.IVersionProvider;

/** The version Maven wrote into {@code version.properties} at build time. */
final class VersionProvider implements IVersionProvider {

    @Override
    public String[] getVersion() throws IOException {
        Properties p = new Properties();
        try (InputStream in = VersionProvider.class.getResourceAsStream("version.properties")) {
            if (in != null) {
                p.load(in);
            }
        }
        return new String[] {"flyloop " + p.getProperty("version", "(unknown version)")};
    }
}
