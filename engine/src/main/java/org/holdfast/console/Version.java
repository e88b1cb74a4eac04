package org.holdfast.console;

import java.io.IOException;
import java.io.InputStream;
import java.util.Properties;

import picocli.CommandLine.IVersionProvider;

/** The version, read from a resource that Maven fills in at build time. */
public final class Version implements IVersionProvider {

    /** The project version, such as "0.1.0-SNAPSHOT". */
    public static String number() {
        Properties p = new Properties();
        try (InputStream in = Version.class.getResourceAsStream("version.properties")) {
            if (in != null) {
                p.load(in);
            }
        } catch (IOException e) {
            return "unknown";
        }
        return p.getProperty("version", "unknown");
    }

    @Override
    public String[] getVersion() {
        return new String[] {
            "holdfast " + number(),
            "Java " + System.getProperty("java.version") + " (" + System.getProperty("java.vm.name") + ")"
        };
    }
}
