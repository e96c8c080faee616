package org.quire.app.report;

import com.lowagie.text.Chunk;
import com.lowagie.text.Document;
import com.lowagie.text.DocumentException;
import com.lowagie.text.Element;
import com.lowagie.text.Font;
import com.lowagie.text.Image;
import com.lowagie.text.PageSize;
import com.lowagie.text.Paragraph;
import com.lowagie.text.Phrase;
import com.lowagie.text.Rectangle;
import com.lowagie.text.pdf.BaseFont;
import com.lowagie.text.pdf.PdfContentByte;
import com.lowagie.text.pdf.PdfPCell;
import com.lowagie.text.pdf.PdfPTable;
import com.lowagie.text.pdf.PdfPageEventHelper;
import com.lowagie.text.pdf.PdfTemplate;
import com.lowagie.text.pdf.PdfWriter;
import java.awt.Color;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.util.List;
import org.quire.app.report.ReportModel.Block;
import org.quire.app.report.ReportModel.ChartBlock;
import org.quire.app.report.ReportModel.Equations;
import org.quire.app.report.ReportModel.Notices;
import org.quire.app.report.ReportModel.Part;
import org.quire.app.report.ReportModel.Statement;
import org.quire.app.report.ReportModel.TableBlock;

/**
 * Renders a {@link ReportModel} as a PDF with OpenPDF: A4 pages, real text in embedded DejaVu Sans fonts
 * (TrueType, Identity-H encoding, subset), so that every figure can be selected, searched and copied; charts
 * as vector graphics; a footer on every page with the engine version, the content hash and "page n of N".
 *
 * <p>The fonts are read from the application's own resources (DejaVu Sans, whose licence beside them permits
 * redistribution), so the report looks the same on every machine.
 *
 * <p>Thread-safe: each call builds its own document; the parsed fonts are shared.
 */
public final class PdfReport {
    private static final String FONT_DIR = "/org/quire/app/report/fonts/";
    static final Color INK = new Color(0x1d2430);
    static final Color MUTED = new Color(0x5a6472);
    static final Color ACCENT = new Color(0x2f5d8a);
    static final Color RULE = new Color(0xc9cfd8);
    static final Color BAND = new Color(0xeef1f5);
    private static final Color WARN = new Color(0x7a4b00);
    private static final Color DRAFT_BAND = new Color(0xa0361c);
    static final float BODY = 9f;
    /** A table of at most this many rows is not split over two pages. */
    private static final int KEEP_TOGETHER_ROWS = 14;
    private static final float TABLE = 7.6f;

    final BaseFont regular;
    final BaseFont bold;
    final BaseFont italic;

    PdfReport() throws IOException {
        regular = Fonts.get("DejaVuSans.ttf");
        bold = Fonts.get("DejaVuSans-Bold.ttf");
        italic = Fonts.get("DejaVuSans-Oblique.ttf");
    }

    /**
     * The parsed fonts, loaded once: parsing a TrueType file takes longer than laying out a report. OpenPDF
     * keeps the glyphs each document uses in that document's writer, so one font object serves many documents.
     */
    private static final class Fonts {
        private static final java.util.Map<String, BaseFont> LOADED = new java.util.concurrent.ConcurrentHashMap<>();

        static BaseFont get(String file) throws IOException {
            BaseFont f = LOADED.get(file);
            if (f == null) {
                f = font(file);
                BaseFont earlier = LOADED.putIfAbsent(file, f);
                if (earlier != null) {
                    f = earlier;
                }
            }
            return f;
        }
    }

    private static BaseFont font(String file) throws IOException {
        try (InputStream in = PdfReport.class.getResourceAsStream(FONT_DIR + file)) {
            if (in == null) {
                throw new IOException("the font " + file + " is missing from the application's resources");
            }
            return BaseFont.createFont(file, BaseFont.IDENTITY_H, BaseFont.EMBEDDED, false, in.readAllBytes(), null);
        } catch (DocumentException e) {
            throw new IOException("cannot load the font " + file + ": " + e.getMessage(), e);
        }
    }

    /**
     * Writes the report as PDF to {@code out} (which is not closed).
     *
     * @throws IOException when the output cannot be written or the fonts cannot be read
     */
    public static void render(ReportModel m, OutputStream out) throws IOException {
        PdfReport r = new PdfReport();
        try {
            r.write(m, out);
        } catch (DocumentException e) {
            throw new IOException("cannot lay out the PDF report: " + e.getMessage(), e);
        } catch (UncheckedIOException e) {
            throw e.getCause();
        } catch (com.lowagie.text.ExceptionConverter e) {
            if (e.getException() instanceof IOException) {
                throw (IOException) e.getException();
            }
            throw new IOException("cannot write the PDF report: " + e.getMessage(), e);
        }
    }

    private void write(ReportModel m, OutputStream out) throws DocumentException {
        DocumentInfo d = m.document();
        Document doc = new Document(PageSize.A4, 50, 50, 48, 56);
        PdfWriter w = PdfWriter.getInstance(doc, new NonClosing(out));
        w.setPageEvent(new Footer(m));
        w.setStrictImageSequence(true);
        doc.addTitle(d.title());
        doc.addAuthor(d.author());
        doc.addSubject("Measurement-uncertainty budget");
        doc.addKeywords(d.hashAlgorithm() + " " + d.hash());
        doc.addCreator("Quire " + m.engineVersion());
        doc.open();

        Paragraph title = new Paragraph(d.title(), new Font(bold, 16f, Font.NORMAL, INK));
        title.setSpacingAfter(6f);
        doc.add(title);
        PdfPTable facts = new PdfPTable(new float[] {1.4f, 4.6f});
        facts.setWidthPercentage(100);
        fact(facts, "Laboratory", d.laboratory(), BODY);
        fact(facts, "Device under test", d.deviceUnderTest(), BODY);
        fact(facts, "Revision", d.revision(), BODY);
        fact(facts, "Status", d.status(), BODY);
        if (!d.templateExample().isEmpty()) {
            fact(facts, "Figures", d.templateExample(), BODY);
        }
        fact(facts, "Date", d.date().toString(), BODY);
        fact(facts, "Author", d.author(), BODY);
        fact(facts, "Content hash (" + d.hashAlgorithm() + ")", d.hash(), 7.4f);
        fact(facts, "Computed by", "Quire engine " + m.engineVersion(), BODY);
        doc.add(facts);

        int n = 0;
        for (Part p : m.parts()) {
            n++;
            Paragraph h = new Paragraph(math(MathText.concat(MathText.upright(n + ". "), p.heading()), 11.5f, ACCENT,
                    bold, bold));
            h.setSpacingBefore(12f);
            h.setSpacingAfter(4f);
            // A heading stays with what follows: when the heading and the start of its first block do not fit on
            // what is left of the page, both go to the next page.
            float need = 34f + (p.blocks().isEmpty() ? 0f : Math.min(doc.top() - doc.bottom() - 40f, height(p.blocks().get(0), doc)));
            if (w.getVerticalPosition(true) - doc.bottom() < need) {
                doc.newPage();
            }
            doc.add(h);
            for (Block b : p.blocks()) {
                block(doc, w, b);
            }
        }
        Paragraph cautions = new Paragraph();
        cautions.add(new Chunk("Cautions. ", new Font(bold, BODY - 0.5f, Font.NORMAL, INK)));
        cautions.add(new Chunk(m.cautions(), new Font(regular, BODY - 0.5f, Font.NORMAL, INK)));
        cautions.setLeading((BODY - 0.5f) * 1.4f);
        PdfPTable box = new PdfPTable(1);
        box.setWidthPercentage(100);
        box.setSpacingBefore(14f);
        PdfPCell c = new PdfPCell();
        c.addElement(cautions);
        c.setBorderColor(RULE);
        c.setPadding(7f);
        c.setPaddingTop(3f);
        c.setPaddingBottom(8f);
        box.addCell(c);
        box.setKeepTogether(true);
        doc.add(box);
        doc.close();
    }

    private void fact(PdfPTable t, String key, String value, float size) {
        PdfPCell k = new PdfPCell(new Phrase(key, new Font(regular, BODY - 0.5f, Font.NORMAL, MUTED)));
        PdfPCell v = new PdfPCell(new Phrase(value, new Font(regular, size, Font.NORMAL, INK)));
        for (PdfPCell c : List.of(k, v)) {
            c.setBorder(Rectangle.BOTTOM);
            c.setBorderColor(RULE);
            c.setBorderWidth(0.5f);
            c.setPaddingTop(2.5f);
            c.setPaddingBottom(4f);
            t.addCell(c);
        }
    }

    void block(Document doc, PdfWriter w, Block b) throws DocumentException {
        if (b instanceof ReportModel.Paragraph) {
            Paragraph p = new Paragraph(math(((ReportModel.Paragraph) b).text(), BODY, INK));
            p.setLeading(BODY * 1.35f);
            p.setSpacingAfter(4f);
            doc.add(p);
        } else if (b instanceof Equations) {
            doc.add(equations((Equations) b));
        } else if (b instanceof Statement) {
            PdfPTable t = new PdfPTable(1);
            t.setWidthPercentage(100);
            t.setSpacingBefore(2f);
            t.setSpacingAfter(8f);
            Phrase ph = math(((Statement) b).text(), 10.5f, INK);
            PdfPCell c = new PdfPCell(ph);
            c.setBorder(Rectangle.LEFT);
            c.setBorderWidthLeft(2.5f);
            c.setBorderColorLeft(ACCENT);
            c.setBackgroundColor(BAND);
            c.setPadding(6f);
            c.setPaddingBottom(8f);
            t.addCell(c);
            t.setKeepTogether(true);
            doc.add(t);
        } else if (b instanceof Notices) {
            for (MathText s : ((Notices) b).texts()) {
                Paragraph p = new Paragraph();
                p.add(math(MathText.concat(MathText.upright("• "), s), BODY - 0.5f, WARN));
                p.setLeading((BODY - 0.5f) * 1.35f);
                p.setIndentationLeft(10f);
                p.setFirstLineIndent(-8f);
                p.setSpacingAfter(2f);
                doc.add(p);
            }
        } else if (b instanceof TableBlock) {
            doc.add(table(((TableBlock) b).table()));
        } else if (b instanceof ChartBlock) {
            chart(doc, w, ((ChartBlock) b).chart());
        }
    }

    /**
     * The equations of a model as one block kept on one page (unless it is longer than a page), so that no
     * equation is left alone at the foot or head of a page.
     */
    private PdfPTable equations(Equations e) {
        PdfPTable t = new PdfPTable(1);
        t.setWidthPercentage(100);
        t.setKeepTogether(true);
        for (MathText line : e.lines()) {
            Paragraph p = new Paragraph(math(line, 10.5f, INK));
            p.setLeading(17f);
            PdfPCell c = new PdfPCell();
            c.addElement(p);
            c.setBorder(Rectangle.NO_BORDER);
            c.setPaddingLeft(22f);
            c.setPaddingTop(0f);
            c.setPaddingBottom(1f);
            t.addCell(c);
        }
        return t;
    }

    /** @return the height a block takes on the page, for keeping a heading with it (an estimate for text) */
    float height(Block b, Document doc) {
        float width = doc.right() - doc.left();
        PdfPTable t = null;
        if (b instanceof TableBlock) {
            try {
                t = table(((TableBlock) b).table());
            } catch (DocumentException e) {
                return 100f;
            }
        } else if (b instanceof Equations) {
            t = equations((Equations) b);
        } else if (b instanceof ChartBlock) {
            return 150f;
        } else if (b instanceof ReportModel.Paragraph) {
            float chars = ((ReportModel.Paragraph) b).text().plain().length();
            return (float) Math.ceil(chars / 110f) * BODY * 1.35f + 4f;
        }
        if (t == null) {
            return 40f;
        }
        t.setTotalWidth(width);
        t.setLockedWidth(true);
        // a table that may split over pages needs only its start on this page; one kept together needs all of it
        boolean whole = !(b instanceof TableBlock) || ((TableBlock) b).table().rows().size() <= KEEP_TOGETHER_ROWS;
        return whole ? t.getTotalHeight() : Math.min(150f, t.getTotalHeight());
    }

    private PdfPTable table(Table t) throws DocumentException {
        int n = t.columns().size();
        float[] widths = new float[n];
        for (int i = 0; i < n; i++) {
            widths[i] = t.columns().get(i).weight();
        }
        PdfPTable p = new PdfPTable(widths);
        p.setWidthPercentage(100);
        p.setSpacingBefore(3f);
        p.setSpacingAfter(8f);
        p.setHeaderRows(2);
        // a short table is not split over two pages
        p.setKeepTogether(t.rows().size() <= KEEP_TOGETHER_ROWS);
        PdfPCell cap = new PdfPCell(math(t.caption(), TABLE + 0.4f, MUTED, bold, bold));
        cap.setColspan(n);
        cap.setBorder(Rectangle.NO_BORDER);
        cap.setPaddingLeft(0f);
        cap.setPaddingBottom(4f);
        p.addCell(cap);
        for (Table.Column c : t.columns()) {
            PdfPCell h = new PdfPCell(math(c.heading(), TABLE, INK, bold, bold));
            h.setBackgroundColor(BAND);
            style(h, c.align());
            p.addCell(h);
        }
        for (List<Table.Cell> row : t.rows()) {
            for (int i = 0; i < n; i++) {
                PdfPCell c = new PdfPCell(math(row.get(i).text(), TABLE, INK));
                style(c, t.columns().get(i).align());
                p.addCell(c);
            }
        }
        if (t.rows().isEmpty()) {
            PdfPCell none = new PdfPCell(new Phrase("(none)", new Font(italic, TABLE, Font.NORMAL, MUTED)));
            none.setColspan(n);
            style(none, Table.Align.LEFT);
            p.addCell(none);
        }
        return p;
    }

    private static void style(PdfPCell c, Table.Align a) {
        c.setBorder(Rectangle.BOTTOM);
        c.setBorderColor(RULE);
        c.setBorderWidth(0.5f);
        c.setPaddingTop(2f);
        c.setPaddingBottom(4f);
        c.setPaddingLeft(3f);
        c.setPaddingRight(3f);
        c.setHorizontalAlignment(a == Table.Align.RIGHT ? Element.ALIGN_RIGHT : Element.ALIGN_LEFT);
    }

    Phrase math(MathText m, float size, Color colour) {
        return math(m, size, colour, regular, italic);
    }

    static Phrase math(MathText m, float size, Color colour, BaseFont upright, BaseFont slanted) {
        Phrase p = new Phrase(size * 1.45f, "", new Font(upright, size, Font.NORMAL, colour));
        for (MathText.Run r : m.runs()) {
            float s = r.shift() == MathText.Shift.BASE ? size : size * 0.72f;
            Chunk c = new Chunk(r.text(), new Font(r.italic() ? slanted : upright, s, Font.NORMAL, colour));
            if (r.shift() == MathText.Shift.SUB) {
                c.setTextRise(-0.22f * size);
            } else if (r.shift() == MathText.Shift.SUP) {
                c.setTextRise(0.38f * size);
            }
            p.add(c);
        }
        return p;
    }

    private void chart(Document doc, PdfWriter w, Chart chart) throws DocumentException {
        ChartLayout.Layout l = ChartLayout.of(chart);
        PdfTemplate t = w.getDirectContent().createTemplate(l.width(), l.height());
        float h = l.height();
        for (ChartLayout.Shape s : l.shapes()) {
            if (s instanceof ChartLayout.Rect) {
                ChartLayout.Rect r = (ChartLayout.Rect) s;
                t.setColorFill(new Color(r.rgb()));
                t.rectangle(r.x(), h - r.y() - r.h(), r.w(), r.h());
                t.fill();
            } else if (s instanceof ChartLayout.Line) {
                ChartLayout.Line ln = (ChartLayout.Line) s;
                t.saveState();
                t.setColorStroke(new Color(ln.rgb()));
                t.setLineWidth(ln.width());
                if (ln.dashed()) {
                    t.setLineDash(3f, 2f, 0f);
                }
                t.moveTo(ln.x1(), h - ln.y1());
                t.lineTo(ln.x2(), h - ln.y2());
                t.stroke();
                t.restoreState();
            } else {
                ChartLayout.Label lb = (ChartLayout.Label) s;
                float width = 0;
                for (MathText.Run r : lb.text().runs()) {
                    width += (r.italic() ? italic : regular).getWidthPoint(r.text(),
                            r.shift() == MathText.Shift.BASE ? lb.size() : lb.size() * 0.72f);
                }
                float x = lb.anchor() == ChartLayout.Anchor.START ? lb.x()
                        : lb.anchor() == ChartLayout.Anchor.MIDDLE ? lb.x() - width / 2 : lb.x() - width;
                t.beginText();
                t.setColorFill(new Color(lb.rgb()));
                t.setTextMatrix(x, h - lb.y());
                for (MathText.Run r : lb.text().runs()) {
                    float size = r.shift() == MathText.Shift.BASE ? lb.size() : lb.size() * 0.72f;
                    t.setFontAndSize(r.italic() ? italic : regular, size);
                    t.setTextRise(r.shift() == MathText.Shift.SUB ? -0.22f * lb.size()
                            : r.shift() == MathText.Shift.SUP ? 0.38f * lb.size() : 0f);
                    t.showText(r.text());
                }
                t.setTextRise(0f);
                t.endText();
            }
        }
        Image img = Image.getInstance(t);
        float avail = doc.right() - doc.left();
        if (img.getWidth() > avail) {
            img.scaleToFit(avail, img.getHeight() * avail / img.getWidth());
        }
        img.setSpacingBefore(4f);
        doc.add(img);
        Paragraph cap = new Paragraph(math(Typesetter.caption(chart.caption()), TABLE, MUTED));
        cap.setSpacingAfter(8f);
        doc.add(cap);
    }

    /** Writes "Quire version · hash · page n of N" at the foot of every page. */
    private final class Footer extends PdfPageEventHelper {
        private final ReportModel model;
        private PdfTemplate total;

        Footer(ReportModel model) {
            this.model = model;
        }

        @Override
        public void onOpenDocument(PdfWriter writer, Document document) {
            total = writer.getDirectContent().createTemplate(40f, 10f);
        }

        @Override
        public void onEndPage(PdfWriter writer, Document document) {
            PdfContentByte cb = writer.getDirectContent();
            DocumentInfo d = model.document();
            String left = "Quire " + model.engineVersion() + "  ·  " + d.hashAlgorithm() + " "
                    + d.hash().substring(0, Math.min(16, d.hash().length())) + "…  ·  " + d.title();
            float size = 6.8f;
            float maxLeft = document.right() - document.left() - 80f;
            while (regular.getWidthPoint(left, size) > maxLeft && left.length() > 20) {
                left = left.substring(0, left.length() - 2) + "…";
            }
            String page = "page " + writer.getPageNumber() + " of ";
            float y = document.bottom() - 24f;
            cb.saveState();
            cb.setColorStroke(RULE);
            cb.setLineWidth(0.5f);
            cb.moveTo(document.left(), y + 10f);
            cb.lineTo(document.right(), y + 10f);
            cb.stroke();
            cb.beginText();
            cb.setColorFill(MUTED);
            cb.setFontAndSize(regular, size);
            cb.setTextMatrix(document.left(), y);
            cb.showText(left);
            float pw = regular.getWidthPoint(page, size);
            cb.setTextMatrix(document.right() - pw - 14f, y);
            cb.showText(page);
            cb.endText();
            cb.addTemplate(total, document.right() - 14f, y);
            String mark = d.notApprovedMark();
            if (mark != null) {
                // Every page of content that is not an approved revision says so at its top, in a band that
                // no copy of a single page can lose.
                float top = document.getPageSize().getHeight() - 16f;
                cb.setColorFill(DRAFT_BAND);
                cb.rectangle(document.left(), top - 14f, document.right() - document.left(), 14f);
                cb.fill();
                cb.beginText();
                cb.setColorFill(Color.WHITE);
                cb.setFontAndSize(bold, 7.6f);
                String text = mark + "  ·  " + d.title();
                while (bold.getWidthPoint(text, 7.6f) > document.right() - document.left() - 12f && text.length() > 20) {
                    text = text.substring(0, text.length() - 2) + "…";
                }
                cb.setTextMatrix(document.left() + 6f, top - 10f);
                cb.showText(text);
                cb.endText();
            }
            cb.restoreState();
        }

        @Override
        public void onCloseDocument(PdfWriter writer, Document document) {
            total.beginText();
            total.setColorFill(MUTED);
            total.setFontAndSize(regular, 6.8f);
            total.setTextMatrix(0, 0);
            total.showText(String.valueOf(writer.getPageNumber() - 1));
            total.endText();
        }
    }

    /** Keeps the caller's stream open: the PDF writer closes its stream when the document closes. */
    static final class NonClosing extends java.io.FilterOutputStream {
        NonClosing(OutputStream out) {
            super(out);
        }

        @Override
        public void write(byte[] b, int off, int len) throws IOException {
            out.write(b, off, len);
        }

        @Override
        public void close() throws IOException {
            flush();
        }
    }
}
