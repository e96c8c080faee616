package org.quire.app.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.quire.app.report.ReportModel.Block;
import org.quire.app.report.ReportModel.ChartBlock;
import org.quire.app.report.ReportModel.Paragraph;
import org.quire.app.report.ReportModel.TableBlock;

/**
 * A section a report includes beside the GUM budget: a calibration-line fit and conformity decision, a table
 * over a meter's flow range, a comparison with an earlier budget. Other parts of Quire build these; the report
 * renders whatever they hold: the blocks in their order when the section was made from blocks
 * ({@link #of(String, String, List)}), otherwise paragraphs, tables and charts, in that order.
 *
 * @param key a short file-safe name
 * @param heading the section's heading
 * @param paragraphs text paragraphs
 * @param tables the section's tables (each is also written as CSV)
 * @param charts the section's charts
 * @param blocks the section's blocks in reading order, or empty when the section is laid out as paragraphs,
 *     tables, charts
 *
 * <p>Immutable and thread-safe.
 */
public record ReportSection(String key, String heading, List<String> paragraphs, List<Table> tables,
        List<Chart> charts, List<Block> blocks) {

    /** A section laid out as its paragraphs, then its tables, then its charts. */
    public ReportSection(String key, String heading, List<String> paragraphs, List<Table> tables, List<Chart> charts) {
        this(key, heading, paragraphs, tables, charts, List.of());
    }

    public ReportSection {
        Objects.requireNonNull(key, "key");
        Objects.requireNonNull(heading, "heading");
        paragraphs = List.copyOf(paragraphs);
        tables = List.copyOf(tables);
        charts = List.copyOf(charts);
        blocks = blocks == null ? List.of() : List.copyOf(blocks);
    }

    /**
     * @param blocks the blocks in reading order (paragraphs, tables, charts, statements, notices)
     * @return a section shown in that order; its paragraphs, tables and charts are those among the blocks
     */
    public static ReportSection of(String key, String heading, List<Block> blocks) {
        List<String> p = new ArrayList<>();
        List<Table> t = new ArrayList<>();
        List<Chart> c = new ArrayList<>();
        for (Block b : blocks) {
            if (b instanceof Paragraph) {
                p.add(((Paragraph) b).text().plain());
            } else if (b instanceof TableBlock) {
                t.add(((TableBlock) b).table());
            } else if (b instanceof ChartBlock) {
                c.add(((ChartBlock) b).chart());
            }
        }
        if (blocks.isEmpty()) {
            throw new IllegalArgumentException("section '" + heading + "' needs at least one block");
        }
        return new ReportSection(key, heading, p, t, c, blocks);
    }

    /** @return the blocks as the report shows them */
    public List<Block> ordered() {
        if (!blocks.isEmpty()) {
            return blocks;
        }
        List<Block> out = new ArrayList<>();
        paragraphs.forEach(x -> out.add(new Paragraph(x)));
        tables.forEach(x -> out.add(new TableBlock(x)));
        charts.forEach(x -> out.add(new ChartBlock(x)));
        return out;
    }
}
