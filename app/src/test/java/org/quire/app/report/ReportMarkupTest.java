package org.quire.app.report;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.stream.Stream;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.quire.app.common.Engine;
import org.quire.app.testing.Examples;
import org.quire.engine.budget.Budget;
import org.quire.engine.document.BudgetDocument;
import org.quire.engine.document.DocumentJson;
import org.quire.engine.gum.GumEvaluator;
import org.quire.engine.gum.GumResult;

/**
 * The report of every shipped template and of the six-point flow range, as PDF text, HTML and CSV, holds no raw
 * markup (the complaints: {@code _{}, {@code ^3}, {@code +-}), marks a draft on every page, keeps the
 * inputs' notes (author guidance) out of the body, and shows each flow point's budget with its own statement.
 */
class ReportMarkupTest {
    static Stream<Path> files() throws Exception {
        Path templates = Examples.root().resolve("templates");
        List<Path> all;
        try (Stream<Path> s = Files.list(templates)) {
            all = s.filter(p -> p.toString().endsWith(".json")).sorted().collect(java.util.stream.Collectors.toList());
        }
        all.add(Examples.file("tarrow-vale-emf-six-point.json"));
        return all.stream();
    }

    private static ReportModel model(Path file) throws Exception {
        BudgetDocument doc = DocumentJson.read(file);
        Budget b = doc.budget();
        var m = b.compile(Engine.standard().library());
        GumResult r = GumEvaluator.evaluate(b, m, b.correlationMatrix(), b.settings());
        ReportInput in = ReportInput.of(b, r, DocumentInfo.of(doc, LocalDate.of(2026, 12, 2)), org.quire.app.common.Engine.standard().library());
        for (ReportSection s : CalibrationSections.of(b, Engine.standard().library())) {
            in = in.withSection(s);
        }
        return ReportBuilder.build(in);
    }

    @ParameterizedTest
    @MethodSource("files")
    void noRawMarkupAnywhere(Path file) throws Exception {
        ReportModel m = model(file);
        ByteArrayOutputStream pdf = new ByteArrayOutputStream();
        PdfReport.render(m, pdf);
        String text;
        int pages;
        try (PDDocument d = Loader.loadPDF(pdf.toByteArray())) {
            text = new PDFTextStripper().getText(d);
            pages = d.getNumberOfPages();
        }
        StringBuilder csv = new StringBuilder();
        for (Table t : m.tables()) {
            csv.append(CsvTables.render(t));
        }
        String html = HtmlReport.render(m);
        for (String bad : List.of("_{", "^3", "^2", "+-")) {
            assertFalse(text.contains(bad), file.getFileName() + ": '" + bad + "' in the PDF text");
            assertFalse(csv.toString().contains(bad), file.getFileName() + ": '" + bad + "' in the CSV tables");
            assertFalse(html.replaceAll("<[^>]+>", "").contains(bad), file.getFileName() + ": '" + bad + "' in the HTML");
        }
        // the shipped files are drafts, plain budgets or templates (whose band says their figures are examples):
        // every page says they are not approved
        int marks = text.split("not approved|NOT APPROVED|DRAFT", -1).length - 1;
        assertTrue(marks >= pages, file.getFileName() + ": " + marks + " draft marks on " + pages + " pages");
        // input notes are the author's guidance, not in the report's body
        assertFalse(text.contains("Enter estimate 0 and halfWidth"), file.getFileName().toString());
    }

    @org.junit.jupiter.api.Test
    void everyFlowPointHasItsLabelledBudgetAndItsOwnStatement() throws Exception {
        ReportModel m = model(Examples.file("tarrow-vale-emf-six-point.json"));
        long budgets = m.tables().stream().filter(t -> t.key().matches("flow-point-\\d+-budget")).count();
        assertTrue(budgets == 6, budgets + " point budgets");
        long statements = m.parts().stream().flatMap(p -> p.blocks().stream())
                .filter(b -> b instanceof ReportModel.Statement s && s.text().plain().startsWith("point ")).count();
        assertTrue(statements == 6, statements + " point statements");
    }
}
