package org.counterpoise.ui.cli;

import java.io.IOException;
import java.io.InputStream;
import java.util.Properties;
import picocli.CommandLine.IVersionProvider;

/** The program's version, kept in one place: the Maven project version, copied in at build time. */
public final class Version implements IVersionProvider {
    /** @return e.g. "0.1.0-SNAPSHOT", or "unknown" when run from classes not built by Maven */
    public static String number() {
        try (InputStream in = Version.class.getResourceAsStream("/org/counterpoise/version.properties")) {
            if (in == null) {
                return "unknown";
            }
            Properties p = new Properties();
            p.load(in);
            String v = p.getProperty("version", "unknown");
            return v.startsWith("$") ? "unknown" : v;
        } catch (IOException e) {
            return "unknown";
        }
    }

    @Override
    public String[] getVersion() {
        return new String[] {"Counterpoise " + number()};
    }
}
