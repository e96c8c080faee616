package org.quire.app.report;

import java.util.List;
import java.util.Objects;
import org.quire.engine.calibration.CertificateDetails;

/**
 * A calibration certificate laid out for rendering: the issuing laboratory, the certificate number, the facts of
 * its first page (customer, item, dates, method), numbered parts of typeset blocks (results, plot, statement of
 * uncertainty, traceability, findings, authorisation) and the cautions, with the SHA-256 hash of its content.
 *
 * @param number the unique certificate number
 * @param laboratory the issuing laboratory
 * @param facts the facts of the first page, in order
 * @param parts the numbered parts
 * @param cautions the cautions every certificate states
 * @param hash the SHA-256 of the certificate's content (every fact and figure, the number excluded), lowercase hex
 *
 * <p>Immutable and thread-safe.
 */
public record Certificate(String number, CertificateDetails.Party laboratory, List<Fact> facts,
        List<ReportModel.Part> parts, String cautions, String hash) {

    /** One fact of the first page, e.g. "Customer" and the customer's name and address. */
    public record Fact(String key, String value) {
        public Fact {
            Objects.requireNonNull(key, "key");
            Objects.requireNonNull(value, "value");
        }
    }

    public Certificate {
        Objects.requireNonNull(number, "number");
        Objects.requireNonNull(laboratory, "laboratory");
        facts = List.copyOf(facts);
        parts = List.copyOf(parts);
        if (cautions == null || cautions.isBlank()) {
            throw new IllegalArgumentException("a certificate must state the cautions");
        }
        Objects.requireNonNull(hash, "hash");
    }

    /** @return the text of every fact and part, one item a line, as a text extractor reads it (for the hash) */
    static String canonicalText(List<Fact> facts, List<ReportModel.Part> parts) {
        StringBuilder s = new StringBuilder();
        for (Fact f : facts) {
            s.append(f.key()).append('\t').append(f.value()).append('\n');
        }
        for (ReportModel.Part p : parts) {
            s.append(p.heading().plain()).append('\n');
            for (ReportModel.Block b : p.blocks()) {
                if (b instanceof ReportModel.Paragraph x) {
                    s.append(x.text().plain()).append('\n');
                } else if (b instanceof ReportModel.Statement x) {
                    s.append(x.text().plain()).append('\n');
                } else if (b instanceof ReportModel.Notices x) {
                    x.items().forEach(i -> s.append(i).append('\n'));
                } else if (b instanceof ReportModel.TableBlock x) {
                    s.append(CsvTables.render(x.table()));
                } else if (b instanceof ReportModel.Equations x) {
                    x.lines().forEach(l -> s.append(l.plain()).append('\n'));
                } else if (b instanceof ReportModel.ChartBlock x) {
                    s.append(x.chart().caption()).append('\n');
                }
            }
        }
        return s.toString();
    }
}
