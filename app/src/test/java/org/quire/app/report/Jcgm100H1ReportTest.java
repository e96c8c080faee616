package org.quire.app.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.cos.COSName;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDResources;
import org.apache.pdfbox.pdmodel.font.PDFont;
import org.apache.pdfbox.rendering.PDFRenderer;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.quire.app.common.Cautions;
import org.quire.app.testing.Examples;

/**
 * The report of JCGM 100:2008 H.1 (end-gauge calibration): the figures printed in the PDF, HTML and CSV forms
 * against the published ones. Published values as in the project's check values (from memory, recomputed).
 */
class Jcgm100H1ReportTest {
    private static final String EXAMPLE = "jcgm100-h1-end-gauge.json";
    private static ReportModel model;
    private static byte[] pdf;
    private static String pdfText;
    private static String html;

    @BeforeAll
    static void render() throws Exception {
        model = Examples.report(EXAMPLE);
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        PdfReport.render(model, out);
        pdf = out.toByteArray();
        try (PDDocument d = Loader.loadPDF(pdf)) {
            pdfText = new PDFTextStripper().getText(d);
        }
        html = HtmlReport.render(model);
    }

    private static String flat(String s) {
        return s.replaceAll("\\s+", " ");
    }

    /** @return the figure after "name = (" in the stated result, e.g. the U of "l = (50.000838 ± 0.000092) mm" */
    private static BigDecimal[] statedResult(String text) {
        Matcher m = Pattern.compile("l = \\((\\d+\\.\\d+) ± (\\d+\\.\\d+)\\) mm, k = (\\d\\.\\d+), p = 99 %").matcher(flat(text));
        assertTrue(m.find(), "the result statement is in the text");
        return new BigDecimal[] {new BigDecimal(m.group(1)), new BigDecimal(m.group(2)), new BigDecimal(m.group(3))};
    }

    @Test
    void pdfStatesThePublishedResultRoundedAsJcgm100Clause726Asks() {
        BigDecimal[] r = statedResult(pdfText);
        // JCGM 100:2008 H.1: l = 50.000838 mm
        assertEquals(new BigDecimal("50.000838"), r[0]);
        // JCGM 100:2008 H.1: U_99 = 93 nm from 2.92 x 32 nm; Quire multiplies the unrounded u_c (31.66 nm), so up to
        // 1.5 nm apart (the rounding of u_c times k)
        assertEquals(93e-6, r[1].doubleValue(), 1.5e-6);
        assertEquals(6, r[1].scale(), "U is given to two significant digits (JCGM 100:2008 7.2.6): 0.0000xx mm");
        // JCGM 100:2008 H.1: k = t_99(16) = 2.92 (Table G.2)
        assertEquals(new BigDecimal("2.92"), r[2]);
    }

    @Test
    void pdfResultTableGivesPublishedCombinedUncertaintyAndDegreesOfFreedom() {
        String t = flat(pdfText);
        // JCGM 100:2008 H.1: u_c = 32 nm = 0.000032 mm
        assertTrue(t.contains("combined standard uncertainty uc 0.000032 mm"), t);
        // JCGM 100:2008 H.1: nu_eff = 16.7, truncated to 16
        assertTrue(t.contains("16.7 (16 used)"), t);
        // JCGM 100:2008 H.1: c(delta_theta) = -l_s alpha_s = -575 nm/°C = -5.75e-4 mm/°C
        assertTrue(t.contains("−5.75 × 10⁻⁴"), t);
    }

    @Test
    void pdfCarriesHeaderHashEngineVersionAndCautions() {
        String t = flat(pdfText);
        assertTrue(t.contains("Tarrow Vale Flow Laboratory"));
        assertTrue(t.contains(model.document().hash()), "the full SHA-256 is printed");
        assertTrue(t.contains("Quire engine " + org.quire.engine.io.EngineVersion.get()));
        assertTrue(t.contains(flat(Cautions.TEXT)), "the cautions are on the report");
    }

    @Test
    void pdfEmbedsEveryFont() throws Exception {
        List<String> fonts = new ArrayList<>();
        try (PDDocument d = Loader.loadPDF(pdf)) {
            for (PDPage p : d.getPages()) {
                PDResources res = p.getResources();
                for (COSName n : res.getFontNames()) {
                    PDFont f = res.getFont(n);
                    assertTrue(f.isEmbedded(), f.getName() + " is embedded");
                    fonts.add(f.getName());
                }
            }
        }
        assertTrue(fonts.stream().anyMatch(f -> f.contains("DejaVuSans")), "DejaVu Sans is used: " + fonts);
    }

    @Test
    void firstPageRendersWithInkOnIt() throws Exception {
        try (PDDocument d = Loader.loadPDF(pdf)) {
            BufferedImage img = new PDFRenderer(d).renderImageWithDPI(0, 40);
            int dark = 0;
            for (int y = 0; y < img.getHeight(); y++) {
                for (int x = 0; x < img.getWidth(); x++) {
                    int rgb = img.getRGB(x, y);
                    int lum = ((rgb >> 16) & 0xff) + ((rgb >> 8) & 0xff) + (rgb & 0xff);
                    if (lum < 3 * 160) {
                        dark++;
                    }
                }
            }
            double fraction = dark / (double) (img.getWidth() * img.getHeight());
            assertTrue(fraction > 0.01, "page 1 has text and rules on it, not a blank page: " + fraction);
            assertTrue(fraction < 0.5, "page 1 is not filled with ink: " + fraction);
        }
    }

    @Test
    void htmlGivesTheSameFiguresAsThePdf() {
        BigDecimal[] fromPdf = statedResult(pdfText);
        BigDecimal[] fromHtml = statedResult(html.replaceAll("<[^>]+>", ""));
        assertEquals(fromPdf[0], fromHtml[0]);
        assertEquals(fromPdf[1], fromHtml[1]);
        assertEquals(fromPdf[2], fromHtml[2]);
        // JCGM 100:2008 H.1: u_c = 32 nm
        assertTrue(html.contains(">0.000032<"));
        assertTrue(html.contains(HtmlReport.esc(Cautions.TEXT)));
        assertTrue(html.contains(model.document().hash()));
        assertTrue(html.contains("@media print"), "the HTML has a print stylesheet");
        assertTrue(!html.contains("<script") && !html.contains("src=\"http") && !html.contains("href=\"http"),
                "the HTML is self-contained");
    }

    @Test
    void csvBudgetTableGivesThePublishedContributions(@TempDir Path dir) throws Exception {
        List<Path> files = CsvTables.write(model, dir);
        assertTrue(files.contains(dir.resolve("budget-l.csv")));
        assertTrue(files.contains(dir.resolve("inputs.csv")));
        assertTrue(files.contains(dir.resolve("result-l.csv")));
        List<String> lines = Files.readAllLines(dir.resolve("budget-l.csv"), StandardCharsets.UTF_8);
        assertEquals("quantity,estimate,unit,standard_uncertainty,sensitivity,contribution,dof,share_percent", lines.get(0));
        // JCGM 100:2008 H.1, Table H.1: contributions 25, 5.8, 3.9, 6.7, 2.9 and 16.6 nm (tolerance half a unit of
        // the last printed digit)
        assertEquals(25e-6, contribution(lines, "l_s"), 0.5e-6);
        assertEquals(5.8e-6, contribution(lines, "d_mean"), 0.05e-6);
        assertEquals(3.9e-6, contribution(lines, "d_random"), 0.05e-6);
        assertEquals(6.7e-6, contribution(lines, "d_systematic"), 0.05e-6);
        assertEquals(2.9e-6, contribution(lines, "delta_alpha"), 0.05e-6);
        assertEquals(16.6e-6, contribution(lines, "delta_theta"), 0.05e-6);
        List<String> result = Files.readAllLines(dir.resolve("result-l.csv"), StandardCharsets.UTF_8);
        // JCGM 100:2008 H.1: k = 2.92, unrounded in the CSV
        String k = result.stream().filter(l -> l.startsWith("coverage factor,")).findFirst().orElseThrow();
        assertEquals(2.92, Double.parseDouble(k.split(",")[2]), 0.005);
    }

    private static double contribution(List<String> lines, String symbol) {
        for (String l : lines) {
            String[] c = l.split(",");
            if (c[0].equals(symbol)) {
                return Double.parseDouble(c[5]);
            }
        }
        throw new AssertionError("no row " + symbol + " in " + lines);
    }
}
