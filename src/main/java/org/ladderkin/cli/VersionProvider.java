package org.ladderkin.cli;

import java.io.IOException;
import java.io.InputStream;
import java.util.Properties;
import picocli.CommandLine;

/** Reads the version Maven wrote into {@code version.properties} at build time. */
public final class VersionProvider implements CommandLine.IVersionProvider {

    /** The project version, or "unknown" when run from an unpackaged build. */
    public static String version() {
        try (InputStream in = VersionProvider.class.getResourceAsStream("/org/ladderkin/version.properties")) {
            if (in == null) {
                return "unknown";
            }
            Properties p = new Properties();
            p.load(in);
            return p.getProperty("version", "unknown");
        } catch (IOException e) {
            return "unknown";
        }
    }

    @Override
    public String[] getVersion() {
        return new String[] {"ladderkin " + version(), "Java " + System.getProperty("java.version")};
    }
}
