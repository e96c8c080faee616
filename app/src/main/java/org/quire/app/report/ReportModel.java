package org.quire.app.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * A report laid out as parts, each a heading and blocks (paragraphs, equations, tables, charts, result
 * statements, notices), between a header of document facts and the closing cautions. Renderers draw it as HTML,
 * PDF or CSV; the workbench may show it too.
 *
 * @param document the header facts
 * @param engineVersion the version of the engine that computed the figures
 * @param parts the report's parts in order
 * @param cautions the cautions every report ends with
 *
 * <p>Immutable and thread-safe.
 */
public record ReportModel(DocumentInfo document, String engineVersion, List<Part> parts, String cautions) {

    public ReportModel {
        Objects.requireNonNull(document, "document");
        Objects.requireNonNull(engineVersion, "engineVersion");
        parts = List.copyOf(parts);
        if (cautions == null || cautions.isBlank()) {
            throw new IllegalArgumentException("a report must state the cautions");
        }
    }

    /** A numbered part of the report; its heading may hold typeset names ("Uncertainty budget of E<sub>lo</sub>"). */
    public record Part(MathText heading, List<Block> blocks) {
        public Part {
            Objects.requireNonNull(heading, "heading");
            blocks = List.copyOf(blocks);
        }

        public Part(String heading, List<Block> blocks) {
            this(MathText.upright(heading), blocks);
        }
    }

    /** One block of a part. */
    public sealed interface Block permits Paragraph, Equations, TableBlock, ChartBlock, Statement, Notices {
    }

    /** @param text one paragraph, with names typeset where it names quantities */
    public record Paragraph(MathText text) implements Block {
        public Paragraph { Objects.requireNonNull(text, "text"); }

        /** @param text one paragraph of words, shown as {@link Typesetter#prose(String)} sets it */
        public Paragraph(String text) {
            this(Typesetter.prose(text));
        }
    }

    /** @param lines equations, one a line */
    public record Equations(List<MathText> lines) implements Block {
        public Equations { lines = List.copyOf(lines); }
    }

    /** @param table a table */
    public record TableBlock(Table table) implements Block {
        public TableBlock { Objects.requireNonNull(table, "table"); }
    }

    /** @param chart a chart */
    public record ChartBlock(Chart chart) implements Block {
        public ChartBlock { Objects.requireNonNull(chart, "chart"); }
    }

    /** @param text a result stated in full, set apart */
    public record Statement(MathText text) implements Block {
        public Statement { Objects.requireNonNull(text, "text"); }
    }

    /** @param texts warnings or findings, one sentence each, with names typeset where they name quantities */
    public record Notices(List<MathText> texts) implements Block {
        public Notices { texts = List.copyOf(texts); }

        /** @return sentences of words, each set as {@link Typesetter#prose(String)} sets it */
        public static Notices of(List<String> items) {
            return new Notices(items.stream().map(Typesetter::prose).toList());
        }

        /** @return the sentences as plain text */
        public List<String> items() {
            return texts.stream().map(MathText::plain).toList();
        }
    }

    /** @return every table of the report, in order */
    public List<Table> tables() {
        List<Table> t = new ArrayList<>();
        for (Part p : parts) {
            for (Block b : p.blocks()) {
                if (b instanceof TableBlock) {
                    t.add(((TableBlock) b).table());
                }
            }
        }
        return t;
    }
}
