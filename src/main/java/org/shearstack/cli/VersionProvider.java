package org.shearstack.cli;

import java.io.IOException;
import java.io.InputStream;
import java.util.Properties;
import picocli.CommandLine;

/** Reads the version Maven wrote into version.properties at build time. */
public final class VersionProvider implements CommandLine.IVersionProvider {

    @Override
    public String[] getVersion() throws IOException {
        Properties p = new Properties();
        try (InputStream in = VersionProvider.class.getResourceAsStream("version.properties")) {
            if (in != null) {
                p.load(in);
            }
        }
        return new String[] {"shearstack " + p.getProperty("version", "(unknown version)"),
            "Java " + System.getProperty("java.version")};
    }
}
