package org.quire.engine.io;

import java.io.IOException;
import java.io.InputStream;
import java.util.Properties;

/** The version of the engine, recorded with every result it computes. */
public final class EngineVersion {
    private static final String VERSION = load();

    private EngineVersion() {
    }

    private static String load() {
        try (InputStream in = EngineVersion.class.getResourceAsStream("engine.properties")) {
            if (in == null) {
                return "development";
            }
            Properties p = new Properties();
            p.load(in);
            return p.getProperty("version", "development");
        } catch (IOException e) {
            return "development";
        }
    }

    /** @return e.g. {@code 0.1.0} */
    public static String get() {
        return VERSION;
    }
}
