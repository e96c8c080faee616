package org.quire.engine.line;

import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;

/** Loads the calibration data sets kept beside the tests. */
final class LineTestData {
    private LineTestData() {
    }

    static CalibrationData load(String resource, String xUnit, String yUnit) {
        try (InputStream in = LineTestData.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new IllegalStateException("test resource " + resource + " is missing");
            }
            try (Reader r = new InputStreamReader(in, StandardCharsets.UTF_8)) {
                return CalibrationCsv.read(r, resource, xUnit, yUnit);
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
