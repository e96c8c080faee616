package org.quire.app.report;

import com.lowagie.text.Chunk;
import com.lowagie.text.Document;
import com.lowagie.text.DocumentException;
import com.lowagie.text.Font;
import com.lowagie.text.PageSize;
import com.lowagie.text.Paragraph;
import com.lowagie.text.Phrase;
import com.lowagie.text.Rectangle;
import com.lowagie.text.pdf.PdfContentByte;
import com.lowagie.text.pdf.PdfPCell;
import com.lowagie.text.pdf.PdfPTable;
import com.lowagie.text.pdf.PdfPageEventHelper;
import com.lowagie.text.pdf.PdfTemplate;
import com.lowagie.text.pdf.PdfWriter;
import java.io.IOException;
import java.io.OutputStream;
import java.util.List;
import org.quire.app.report.ReportModel.Block;
import org.quire.app.report.ReportModel.Part;

/**
 * Renders a {@link Certificate} as PDF: A4, real text in the embedded DejaVu fonts the reports use, the issuing
 * laboratory with its address and accreditation at the head of the first page, the certificate number on every
 * page (ISO/IEC 17025:2017 7.8.2.1 b: unique identification on each page), "page n of N" and the content hash in
 * every footer.
 *
 * <p>Thread-safe: each call builds its own document.
 */
public final class CertificatePdf {
    private CertificatePdf() {
    }

    /**
     * Writes the certificate as PDF to {@code out} (which is not closed).
     *
     * @throws IOException when the output cannot be written or the fonts cannot be read
     */
    public static void render(Certificate c, OutputStream out) throws IOException {
        PdfReport r = new PdfReport();
        try {
            write(r, c, out);
        } catch (DocumentException e) {
            throw new IOException("cannot lay out the certificate: " + e.getMessage(), e);
        } catch (com.lowagie.text.ExceptionConverter e) {
            if (e.getException() instanceof IOException) {
                throw (IOException) e.getException();
            }
            throw new IOException("cannot write the certificate: " + e.getMessage(), e);
        }
    }

    private static void write(PdfReport r, Certificate c, OutputStream out) throws DocumentException {
        Document doc = new Document(PageSize.A4, 50, 50, 56, 56);
        PdfWriter w = PdfWriter.getInstance(doc, new PdfReport.NonClosing(out));
        w.setPageEvent(new Footer(r, c));
        doc.addTitle("Calibration certificate " + c.number());
        doc.addAuthor(c.laboratory().name());
        doc.addSubject("Calibration certificate");
        doc.addKeywords("SHA-256 " + c.hash());
        doc.addCreator("Quire");
        doc.open();

        Paragraph lab = new Paragraph(c.laboratory().name(), new Font(r.bold, 14f, Font.NORMAL, PdfReport.INK));
        doc.add(lab);
        String address = c.laboratory().address().replace("\n", " · ");
        Paragraph addr = new Paragraph(address + (c.laboratory().accreditation().isEmpty() ? ""
                : "\nAccreditation: " + c.laboratory().accreditation()),
                new Font(r.regular, 8.5f, Font.NORMAL, PdfReport.MUTED));
        addr.setLeading(11f);
        addr.setSpacingAfter(10f);
        doc.add(addr);
        Paragraph title = new Paragraph();
        title.add(new Chunk("Calibration certificate  ", new Font(r.bold, 17f, Font.NORMAL, PdfReport.ACCENT)));
        title.add(new Chunk(c.number(), new Font(r.bold, 13f, Font.NORMAL, PdfReport.INK)));
        title.setSpacingAfter(6f);
        doc.add(title);

        PdfPTable facts = new PdfPTable(new float[] {1.4f, 4.6f});
        facts.setWidthPercentage(100);
        for (Certificate.Fact f : c.facts()) {
            fact(r, facts, f.key(), f.value(), f.key().equals("Method") ? 7.6f : PdfReport.BODY);
        }
        fact(r, facts, "Certificate content hash (SHA-256)", c.hash(), 7.4f);
        doc.add(facts);

        int n = 0;
        for (Part p : c.parts()) {
            n++;
            Paragraph h = new Paragraph(PdfReport.math(MathText.concat(MathText.upright(n + ". "), p.heading()), 11f,
                    PdfReport.ACCENT, r.bold, r.bold));
            h.setSpacingBefore(10f);
            h.setSpacingAfter(3f);
            float need = 34f + (p.blocks().isEmpty() ? 0f : Math.min(doc.top() - doc.bottom() - 40f, r.height(p.blocks().get(0), doc)));
            if (n == c.parts().size()) {
                // the last part (the authorisation) stays on one page with the cautions, never split from them
                float all = 34f + 80f;
                for (Block b : p.blocks()) {
                    all += r.height(b, doc);
                }
                need = Math.max(need, Math.min(doc.top() - doc.bottom() - 40f, all));
            }
            if (w.getVerticalPosition(true) - doc.bottom() < need) {
                doc.newPage();
            }
            doc.add(h);
            for (Block b : p.blocks()) {
                r.block(doc, w, b);
            }
        }
        Paragraph cautions = new Paragraph();
        cautions.add(new Chunk("Cautions. ", new Font(r.bold, PdfReport.BODY - 0.5f, Font.NORMAL, PdfReport.INK)));
        cautions.add(new Chunk(c.cautions(), new Font(r.regular, PdfReport.BODY - 0.5f, Font.NORMAL, PdfReport.INK)));
        cautions.setLeading((PdfReport.BODY - 0.5f) * 1.4f);
        PdfPTable box = new PdfPTable(1);
        box.setWidthPercentage(100);
        box.setSpacingBefore(12f);
        PdfPCell cell = new PdfPCell();
        cell.addElement(cautions);
        cell.setBorderColor(PdfReport.RULE);
        cell.setPadding(7f);
        cell.setPaddingTop(3f);
        cell.setPaddingBottom(8f);
        box.addCell(cell);
        box.setKeepTogether(true);
        doc.add(box);
        doc.close();
    }

    private static void fact(PdfReport r, PdfPTable t, String key, String value, float size) {
        PdfPCell k = new PdfPCell(new Phrase(key, new Font(r.regular, PdfReport.BODY - 0.5f, Font.NORMAL,
                PdfReport.MUTED)));
        PdfPCell v = new PdfPCell(new Phrase(value, new Font(r.regular, size, Font.NORMAL, PdfReport.INK)));
        for (PdfPCell c : List.of(k, v)) {
            c.setBorder(Rectangle.BOTTOM);
            c.setBorderColor(PdfReport.RULE);
            c.setBorderWidth(0.5f);
            c.setPaddingTop(2.5f);
            c.setPaddingBottom(4f);
            t.addCell(c);
        }
    }

    /** The certificate number at the head, "page n of N" and the content hash at the foot of every page. */
    private static final class Footer extends PdfPageEventHelper {
        private final PdfReport r;
        private final Certificate c;
        private PdfTemplate total;

        Footer(PdfReport r, Certificate c) {
            this.r = r;
            this.c = c;
        }

        @Override
        public void onOpenDocument(PdfWriter writer, Document document) {
            total = writer.getDirectContent().createTemplate(40f, 10f);
        }

        @Override
        public void onEndPage(PdfWriter writer, Document document) {
            PdfContentByte cb = writer.getDirectContent();
            float size = 6.8f;
            float top = document.getPageSize().getHeight() - 30f;
            cb.saveState();
            cb.beginText();
            cb.setColorFill(PdfReport.MUTED);
            cb.setFontAndSize(r.regular, size);
            String head = c.laboratory().name() + "  ·  Calibration certificate " + c.number();
            float hw = r.regular.getWidthPoint(head, size);
            cb.setTextMatrix(document.right() - hw, top);
            cb.showText(head);
            cb.endText();
            float y = document.bottom() - 24f;
            cb.setColorStroke(PdfReport.RULE);
            cb.setLineWidth(0.5f);
            cb.moveTo(document.left(), y + 10f);
            cb.lineTo(document.right(), y + 10f);
            cb.stroke();
            cb.beginText();
            cb.setFontAndSize(r.regular, size);
            cb.setTextMatrix(document.left(), y);
            cb.showText("Certificate " + c.number() + "  ·  content SHA-256 " + c.hash());
            String page = "page " + writer.getPageNumber() + " of ";
            float pw = r.regular.getWidthPoint(page, size);
            cb.setTextMatrix(document.right() - pw - 14f, y - 9f);
            cb.showText(page);
            cb.endText();
            cb.addTemplate(total, document.right() - 14f, y - 9f);
            cb.restoreState();
        }

        @Override
        public void onCloseDocument(PdfWriter writer, Document document) {
            total.beginText();
            total.setColorFill(PdfReport.MUTED);
            total.setFontAndSize(r.regular, 6.8f);
            total.setTextMatrix(0, 0);
            total.showText(String.valueOf(writer.getPageNumber() - 1));
            total.endText();
        }
    }
}
