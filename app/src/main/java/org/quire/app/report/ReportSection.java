package org.quire.app.report;

import java.util.List;
import java.util.Objects;

/**
 * A section a report includes beside the GUM budget: a calibration-line fit and conformity decision, a table
 * over a meter's flow range, a comparison with an earlier budget. Other parts of Quire build these; the report
 * renders whatever they hold: paragraphs, tables and charts, in that order.
 *
 * @param key a short file-safe name
 * @param heading the section's heading
 * @param paragraphs text paragraphs
 * @param tables the section's tables (each is also written as CSV)
 * @param charts the section's charts
 *
 * <p>Immutable and thread-safe.
 */
public record ReportSection(String key, String heading, List<String> paragraphs, List<Table> tables,
        List<Chart> charts) {
    public ReportSection {
        Objects.requireNonNull(key, "key");
        Objects.requireNonNull(heading, "heading");
        paragraphs = List.copyOf(paragraphs);
        tables = List.copyOf(tables);
        charts = List.copyOf(charts);
    }
}
