package org.quire.engine.document;

import jakarta.json.JsonObject;
import java.time.Instant;
import java.util.Objects;

/**
 * The last results computed for a document, kept so that a report or a reviewer can see them without
 * recomputing, with the engine version that computed them.
 *
 * @param engineVersion the engine version, e.g. {@code 0.1.0}
 * @param computed when, in UTC
 * @param gum the GUM result in the layout of {@link org.quire.engine.io.ResultJson}
 * @param monteCarlo the Monte Carlo result as its own JSON layout, or null when none was computed
 */
public record ResultSnapshot(String engineVersion, Instant computed, JsonObject gum, JsonObject monteCarlo) {
    /** Checks the snapshot. */
    public ResultSnapshot {
        if (engineVersion == null || engineVersion.isBlank()) {
            throw new IllegalArgumentException("a results snapshot must name the engine version that computed it");
        }
        Objects.requireNonNull(computed, "computed");
        Objects.requireNonNull(gum, "gum");
    }

    /**
     * @param gum the object {@link org.quire.engine.io.ResultJson#toJson} made
     * @param computed when it was computed
     * @return a snapshot recording the running engine's version
     */
    public static ResultSnapshot of(JsonObject gum, Instant computed) {
        return new ResultSnapshot(org.quire.engine.io.EngineVersion.get(), computed, gum, null);
    }
}
