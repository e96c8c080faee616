package org.quire.engine.line;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import org.quire.engine.csv.CalibrationCsv;

/** Loads the calibration data sets kept beside the tests. */
final class LineTestData {
    private LineTestData() {
    }

    static CalibrationData load(String resource, String xUnit, String yUnit) {
        try (InputStream in = LineTestData.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new IllegalStateException("test resource " + resource + " is missing");
            }
            return CalibrationCsv.parse(new String(in.readAllBytes(), StandardCharsets.UTF_8), resource, xUnit, yUnit);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (org.quire.engine.csv.CsvException e) {
            throw new IllegalStateException("test resource " + resource + ": " + e.getMessage(), e);
        }
    }
}
