package org.quire.engine.io;

import jakarta.json.spi.JsonProvider;

/**
 * The one JSON-P provider of the engine. {@code jakarta.json.JsonSupport.JSON.create...} looks the provider up through the
 * service loader on every call, which costs about a millisecond; a budget table of 500 inputs makes thousands of
 * such calls. Thread-safe: providers are.
 */
public final class JsonSupport {
    /** The provider every engine class creates its JSON builders, readers and writers with. */
    public static final JsonProvider JSON = JsonProvider.provider();

    private JsonSupport() {
    }
}
