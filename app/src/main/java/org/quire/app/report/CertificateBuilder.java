package org.quire.app.report;

import java.nio.charset.StandardCharsets;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import org.quire.app.common.Cautions;
import org.quire.app.report.ReportModel.Block;
import org.quire.app.report.ReportModel.ChartBlock;
import org.quire.app.report.ReportModel.Notices;
import org.quire.app.report.ReportModel.Paragraph;
import org.quire.app.report.ReportModel.Part;
import org.quire.app.report.ReportModel.TableBlock;
import org.quire.app.report.Table.Align;
import org.quire.app.report.Table.Cell;
import org.quire.app.report.Table.Column;
import org.quire.engine.calibration.AdjustmentResult;
import org.quire.engine.calibration.CalibrationResult;
import org.quire.engine.calibration.CertificateDetails;
import org.quire.engine.calibration.CertificateNumber;
import org.quire.engine.calibration.ConformityResult;
import org.quire.engine.calibration.PointConformity;
import org.quire.engine.calibration.PointResult;
import org.quire.engine.calibration.SeriesResult;
import org.quire.engine.document.SeparationOfDuties;
import org.quire.engine.gum.Figures;
import org.quire.engine.reference.ReferenceRegister;
import org.quire.engine.reference.ReferenceStandard;
import org.quire.engine.reference.TraceabilityFinding;
import org.quire.engine.units.Units;

/**
 * Builds the calibration certificate of an evaluated calibration: the laboratory, customer, item, dates and
 * method; the results at each point (reference and indicated flow, error as found and as left, the reported
 * expanded uncertainty with the point's own coverage factor and coverage probability), the conformity decision at
 * each point with the rule applied, the calibration constant before and after adjustment, a plot of the errors
 * against flow with their U and the maximum permissible errors, the statement of uncertainty, the traceability of
 * the references from the laboratory's register, the findings, the authorisation, and the cautions.
 *
 * <p>It refuses (never issues silently) when a reference was not valid on the calibration date (unless the
 * issue accepts such findings, which the certificate then states), when the approver is the author of the
 * calibration (separation of duties), or when a fact the certificate must state is missing.
 *
 * <p>References: ISO/IEC 17025:2017 7.8.2.1 (what every report states: title, laboratory, unique identification
 * on every page, customer, method, item, dates, results with units, the person authorising) and 7.8.4.1
 * (calibration certificates: measurement uncertainty, environmental conditions, traceability); EA-4/02 M:2022
 * clause 5 (statement of the expanded uncertainty with k and coverage probability); ILAC P14:2020 (the reported
 * uncertainty is not smaller than the CMC; clause from memory); JCGM 100:2008 7.2.6 (at most two significant
 * digits for U, the result rounded to the same place).
 *
 * <p>Stateless and thread-safe.
 */
public final class CertificateBuilder {

    private CertificateBuilder() {
    }

    /**
     * @param r the evaluated calibration
     * @param register the laboratory's reference register
     * @param issue the date of issue, the approver, and the choices of the person issuing
     * @return the certificate
     * @throws CertificateRefusedException listing every reason it cannot be issued
     */
    public static Certificate build(CalibrationResult r, ReferenceRegister register, CertificateIssue issue)
            throws CertificateRefusedException {
        CertificateDetails d = r.calibration().details();
        List<String> refused = new ArrayList<>();
        if (d.laboratory().name().isEmpty()) {
            refused.add("the calibration names no laboratory (details.laboratory.name)");
        }
        if (d.customer().name().isEmpty()) {
            refused.add("the calibration names no customer (details.customer.name)");
        }
        if (d.date() == null) {
            refused.add("the calibration states no date of calibration (details.date)");
        }
        if (d.item().serial().isEmpty()) {
            refused.add("the calibration states no serial number of the item (details.item.serial)");
        }
        if (d.referenceStandards().isEmpty()) {
            refused.add("the calibration names no reference standard (details.referenceStandards), so its "
                    + "traceability cannot be stated");
        }
        String duties = SeparationOfDuties.problem("the calibration", d.author(), issue.approver());
        if (duties != null) {
            refused.add(duties);
        }
        if (issue.role().isEmpty()) {
            refused.add("state the approver's role (for instance technical manager)");
        }
        if (!issue.number().isEmpty() && CertificateNumber.problem(issue.number()) != null) {
            refused.add(CertificateNumber.problem(issue.number()));
        }
        if (d.date() != null && issue.issued().isBefore(d.date())) {
            refused.add("the date of issue " + issue.issued() + " is before the date of calibration " + d.date());
        }
        List<TraceabilityFinding> findings = d.date() == null ? List.of()
                : register.check(d.referenceStandards(), d.date());
        boolean unknown = findings.stream().anyMatch(f -> f.kind() == TraceabilityFinding.Kind.UNKNOWN);
        if (!findings.isEmpty() && (!issue.acceptReferenceFindings() || unknown)) {
            for (TraceabilityFinding f : findings) {
                refused.add(f.message());
            }
            if (!unknown) {
                refused.add("recalibrate the reference or repeat the calibration; to issue all the same with the "
                        + "finding stated on the certificate, accept reference findings explicitly");
            }
        }
        if (!register.laboratory().equalsIgnoreCase(d.laboratory().name()) && !d.laboratory().name().isEmpty()) {
            refused.add("the reference register is that of '" + register.laboratory() + "', not of the calibrating "
                    + "laboratory '" + d.laboratory().name() + "'");
        }
        if (!refused.isEmpty()) {
            throw new CertificateRefusedException(refused);
        }

        String flowUnit = Units.display(r.flowUnit());
        List<Certificate.Fact> facts = new ArrayList<>();
        facts.add(new Certificate.Fact("Customer", join(d.customer().name(), d.customer().address())));
        facts.add(new Certificate.Fact("Item calibrated", join(d.item().type(), d.item().size(),
                "serial number " + d.item().serial())));
        facts.add(new Certificate.Fact("Date of calibration", d.date().toString()));
        facts.add(new Certificate.Fact("Date of issue", issue.issued().toString()));
        facts.add(new Certificate.Fact("Method", r.methodTitle() + "; template " + r.calibration().method().id()
                + ", version " + r.calibration().method().version() + ", SHA-256 "
                + r.calibration().method().contentHash()));
        facts.add(new Certificate.Fact("Performed by", d.author().isEmpty() ? "not stated" : d.author()));

        List<Part> parts = new ArrayList<>();
        parts.add(results(r, flowUnit));
        Part conformity = conformity(r, flowUnit);
        if (conformity != null) {
            parts.add(conformity);
        }
        if (r.adjustment() != null) {
            parts.add(adjustment(r.adjustment()));
        }
        parts.add(uncertainty(r));
        parts.add(environment(d));
        parts.add(traceability(register.resolveKnown(d.referenceStandards()), findings, d.date()));
        List<String> all = new ArrayList<>(r.findings());
        for (TraceabilityFinding f : findings) {
            all.add("Reference finding: " + f.message() + ".");
        }
        parts.add(new Part("Findings", all.isEmpty()
                ? List.of(new Paragraph("The evaluation raised no findings."))
                : List.of(Notices.of(all.stream().map(CertificateBuilder::sentence).toList()))));
        parts.add(new Part("Authorisation", List.of(new TableBlock(new Table("authorisation", "Authorisation",
                List.of(Column.of("", "item", Align.LEFT, 1.5f), Column.of("", "value", Align.LEFT, 4f)),
                List.of(List.of(Cell.text("authorised by"), Cell.text(issue.approver())),
                        List.of(Cell.text("role"), Cell.text(issue.role())),
                        List.of(Cell.text("date"), Cell.text(issue.issued().toString())),
                        List.of(Cell.text("calibration performed by"), Cell.text(d.author()))))),
                new Paragraph("This certificate may not be reproduced other than in full without the written "
                        + "approval of the issuing laboratory. The results relate only to the item calibrated, "
                        + "at the conditions stated."))));
        String hash = CanonicalSha256.sha256(Certificate.canonicalText(facts, parts).getBytes(StandardCharsets.UTF_8));
        String number = issue.number().isEmpty() ? CertificateNumber.derive(d.laboratory().name(), d.date(), hash)
                : issue.number();
        return new Certificate(number, d.laboratory(), facts, parts, Cautions.TEXT, hash);
    }

    /** @return the non-blank parts, each on one line, joined by commas (the certificate's and the report's facts) */
    static String join(String... parts) {
        List<String> out = new ArrayList<>();
        for (String p : parts) {
            if (p != null && !p.isBlank()) {
                out.add(p.strip().replace("\n", ", "));
            }
        }
        return String.join(", ", out);
    }

    /**
     * @return the results part: at each point the reference and indicated flow, the error and the reported U as
     *     found and as left, each U with its own k, and the coverage probability; the calibration report shows the
     *     same part, so that every figure of the certificate can be found there
     */
    static Part results(CalibrationResult r, String flowUnit) {
        SeriesResult found = r.asFound();
        SeriesResult left = r.asLeft();
        List<List<Cell>> rows = new ArrayList<>();
        for (int i = 0; i < found.points().size(); i++) {
            PointResult f = found.points().get(i);
            PointResult l = left == null ? f : left.points().get(i);
            double uF = f.reportedExpandedUncertainty();
            double uL = l.reportedExpandedUncertainty();
            double indicated = f.flow() * (1 + f.error() / 100);
            double p = l.result() != null ? l.result().coverageProbability()
                    : f.result() != null ? f.result().coverageProbability() : Double.NaN;
            rows.add(List.of(Cell.text(f.label()),
                    Cell.number(Figures.compact(f.flow(), 5), f.flow()),
                    Cell.number(Figures.compact(indicated, 5), indicated),
                    Cell.number(Figures.statedValue(f.error(), uF), f.error()),
                    Cell.number(Figures.stated(uF) + (f.raisedToCmc() ? " *" : ""), uF),
                    Cell.number(Figures.coverageFactor(f.coverageFactor()), f.coverageFactor()),
                    Cell.number(Figures.statedValue(l.error(), uL), l.error()),
                    Cell.number(Figures.stated(uL) + (l.raisedToCmc() ? " *" : ""), uL),
                    Cell.number(Figures.coverageFactor(l.coverageFactor()), l.coverageFactor()),
                    Cell.number(Double.isNaN(p) ? "–" : Figures.probability(p), 100 * p)));
        }
        List<Block> blocks = new ArrayList<>();
        blocks.add(new Paragraph(Typesetter.words("Errors of indication ", "E = 100 (q_{ind} − q_{ref}) / q_{ref}",
                " in % of the reading, as found before any adjustment and as left "
                + (left == null ? "(no adjustment was made, so as found)"
                : left.phase() == SeriesResult.Phase.AS_LEFT_PREDICTED
                        ? "(predicted from the as-found runs and the new calibration constant)"
                        : "(measured after the adjustment)")
                + ". Each ", "U", " is the expanded uncertainty of that point with its own coverage factor ", "k",
                " beside it.")));
        blocks.add(new TableBlock(new Table("certificate-results", "Results at each flow point", List.of(
                Column.of("Point", "point", Align.LEFT, 0.7f),
                Column.of("q_ref (" + flowUnit + ")", "reference_flow", Align.RIGHT, 1.05f),
                Column.of("q_ind (" + flowUnit + ")", "indicated_flow", Align.RIGHT, 1.05f),
                Column.of("E as found (%)", "error_as_found_percent", Align.RIGHT, 1f),
                Column.of("U as found (%)", "u_as_found_percent", Align.RIGHT, 1f),
                Column.of("k as found", "coverage_factor_as_found", Align.RIGHT, 0.7f),
                Column.of("E as left (%)", "error_as_left_percent", Align.RIGHT, 1f),
                Column.of("U as left (%)", "u_as_left_percent", Align.RIGHT, 1f),
                Column.of("k as left", "coverage_factor_as_left", Align.RIGHT, 0.7f),
                Column.of("p (%)", "coverage_probability_percent", Align.RIGHT, 0.7f)), rows)));
        boolean cmc = found.points().stream().anyMatch(PointResult::raisedToCmc)
                || (left != null && left.points().stream().anyMatch(PointResult::raisedToCmc));
        if (cmc) {
            blocks.add(new Paragraph("* The uncertainty evaluated for this point is smaller than the laboratory's "
                    + "calibration and measurement capability (CMC) at its flow; the CMC is stated instead."));
        }
        blocks.add(new ChartBlock(plot(r, flowUnit)));
        return new Part("Results", blocks);
    }

    private static Chart plot(CalibrationResult r, String flowUnit) {
        List<Chart.Series> series = new ArrayList<>();
        SeriesResult[] all = r.asLeft() == null ? new SeriesResult[] {r.asFound()}
                : new SeriesResult[] {r.asFound(), r.asLeft()};
        double[] q = null;
        for (int s = 0; s < all.length; s++) {
            List<PointResult> pts = all[s].points();
            double[] x = new double[pts.size()];
            double[] y = new double[pts.size()];
            double[] u = new double[pts.size()];
            for (int i = 0; i < x.length; i++) {
                x[i] = pts.get(i).flow();
                y[i] = pts.get(i).error();
                u[i] = pts.get(i).reportedExpandedUncertainty();
            }
            q = x;
            series.add(new Chart.Series("error " + all[s].phase().label() + " with its U", x, y, u,
                    Chart.Style.POINTS, s == 0 ? Chart.Tone.FIRST : Chart.Tone.SECOND));
        }
        ConformityResult c = r.asReturned().conformity();
        String caption = "Errors of indication against flow with their expanded uncertainties";
        if (c != null) {
            double[] up = new double[c.points().size()];
            double[] lo = new double[up.length];
            double[] x = new double[up.length];
            for (int i = 0; i < up.length; i++) {
                x[i] = r.asReturned().points().get(i).flow();
                up[i] = c.points().get(i).decision().upperTolerance();
                lo[i] = c.points().get(i).decision().lowerTolerance();
            }
            series.add(new Chart.Series("upper MPE", x, up, null, Chart.Style.DASHED, Chart.Tone.FOURTH));
            series.add(new Chart.Series("lower MPE", x, lo, null, Chart.Style.DASHED, Chart.Tone.FOURTH));
            caption += " and the maximum permissible errors (" + c.limitsName() + ") at the points";
        }
        boolean log = q != null && min(q) > 0 && max(q) / min(q) > 20;
        return new Chart.Plot(caption, "flow (" + flowUnit + ")" + (log ? ", logarithmic scale" : ""), "E (%)", log,
                series, List.of(0.0));
    }

    /** @return the statement of conformity at each point with the rule, or null without a specification */
    static Part conformity(CalibrationResult r, String flowUnit) {
        ConformityResult left = r.asReturned().conformity();
        if (left == null) {
            return null;
        }
        ConformityResult found = r.asFound().conformity();
        List<List<Cell>> rows = new ArrayList<>();
        for (int i = 0; i < left.points().size(); i++) {
            PointConformity l = left.points().get(i);
            PointConformity f = found == null ? null : found.points().get(i);
            rows.add(List.of(Cell.text(l.label()), Cell.number(mpe(l.decision().lowerTolerance(),
                    l.decision().upperTolerance()), l.mpe()),
                    Cell.text(f == null ? "–" : f.decision().decision().label()),
                    Cell.text(l.decision().decision().label())));
        }
        List<Block> blocks = new ArrayList<>();
        blocks.add(new TableBlock(new Table("certificate-conformity", "Statement of conformity at each point "
                + "against " + left.limitsName(), List.of(
                Column.of("Point", "point", Align.LEFT, 0.8f),
                Column.of("MPE (%)", "mpe_percent", Align.LEFT, 1.2f),
                Column.of("decision as found", "decision_as_found", Align.LEFT, 1.6f),
                Column.of("decision as left", "decision_as_left", Align.LEFT, 1.6f)), rows)));
        blocks.add(new Paragraph("Overall, as left: " + left.overall().label()
                + (found != null && r.asLeft() != null ? "; as found: " + found.overall().label() : "") + "."));
        blocks.add(new ReportModel.Statement(Typesetter.prose(left.statement())));
        if (!left.limitsSource().isBlank()) {
            blocks.add(new Paragraph("Limits: " + left.limitsSource()));
        }
        return new Part("Statement of conformity", blocks);
    }

    /** @return the limits of a point, e.g. ±0.78, or −0.5 … +0.8 when they differ */
    private static String mpe(double lower, double upper) {
        if (Math.abs(lower + upper) < 1e-12) {
            return "±" + Figures.compact(upper, 2);
        }
        return Figures.compact(lower, 2) + " … +" + Figures.compact(upper, 2);
    }

    private static String sentence(String s) {
        String t = s.strip();
        if (t.isEmpty()) {
            return t;
        }
        t = Character.toUpperCase(t.charAt(0)) + t.substring(1);
        return t.endsWith(".") ? t : t + ".";
    }

    /** @return the calibration constant before and after the adjustment */
    static Part adjustment(AdjustmentResult a) {
        String unit = a.constantUnit().isBlank() ? "" : " " + Units.display(a.constantUnit());
        List<List<Cell>> rows = new ArrayList<>();
        rows.add(List.of(Cell.text(a.constantName() + " as found"), Cell.number(Figures.estimate(a.oldConstant())
                + unit, a.oldConstant())));
        rows.add(List.of(Cell.text(a.constantName() + " as left (set in the meter)"),
                Cell.number(Figures.estimate(a.newConstant()) + unit, a.newConstant())));
        if (Double.isFinite(a.newConstantUncertainty())) {
            rows.add(List.of(Cell.text("standard uncertainty of the new " + a.constantName()),
                    Cell.number(Figures.sig(a.newConstantUncertainty(), 2) + unit, a.newConstantUncertainty())));
        }
        rows.add(List.of(Cell.text("ratio new / old"), Cell.number(Figures.compact(a.scale(), 9), a.scale())));
        List<Block> blocks = new ArrayList<>();
        blocks.add(new TableBlock(new Table("certificate-constant", "Calibration constant", List.of(
                Column.of("", "item", Align.LEFT, 3f), Column.of("Value", "value", Align.RIGHT, 2f)), rows)));
        blocks.add(new Paragraph("The meter was adjusted by " + a.kind().text() + ". Every "
                + "indication changes by the ratio of the constants."));
        a.notes().forEach(n -> blocks.add(new Paragraph(sentence(n))));
        return new Part("Adjustment", blocks);
    }

    /** @return the statement of uncertainty of the certificate, naming each point's k */
    static Part uncertainty(CalibrationResult r) {
        return uncertainty(r, "on this certificate");
    }

    /**
     * @param where where the figures stand, e.g. "on this certificate"
     * @return the statement of uncertainty, naming each point's k as found and as left
     */
    static Part uncertainty(CalibrationResult r, String where) {
        double p = Double.NaN;
        for (PointResult pt : r.asFound().points()) {
            if (pt.result() != null) {
                p = pt.result().coverageProbability();
            }
        }
        List<String> lists = new ArrayList<>();
        Set<String> all = new LinkedHashSet<>();
        for (SeriesResult s : r.asLeft() == null ? List.of(r.asFound()) : List.of(r.asFound(), r.asLeft())) {
            List<String> ks = new ArrayList<>();
            for (PointResult pt : s.points()) {
                ks.add(Figures.coverageFactor(pt.coverageFactor()));
            }
            all.addAll(ks);
            lists.add((r.asLeft() == null ? "" : s.phase().label() + " ") + String.join(", ", ks));
        }
        String pText = Double.isNaN(p) ? "about 95 %" : "about " + Figures.probability(p) + " %";
        String kText = all.size() == 1 ? "the coverage factor k = " + all.iterator().next()
                : "the coverage factor k stated beside it (k = " + String.join("; ", lists) + " at the points)";
        List<Block> blocks = new ArrayList<>();
        blocks.add(new Paragraph("Each expanded uncertainty U " + where + " is the combined standard uncertainty "
                + "of the result multiplied by " + kText + ". Each point's k follows from its effective degrees of "
                + "freedom (Welch–Satterthwaite), so that the interval from E − U to E + U is expected to contain the "
                + "error of the meter with a probability of " + pText + "; for a normal distribution of the result "
                + "that probability needs k = 2. The uncertainty was evaluated as EA-4/02 M:2022 and the GUM "
                + "(JCGM 100:2008) describe, and is stated to at most two significant digits, the errors to the "
                + "same decimal place. No uncertainty is stated below the laboratory's calibration and measurement "
                + "capability (CMC)."));
        blocks.add(new Paragraph("The uncertainty covers the reference standards, the conditions of the calibration "
                + "and the repeatability of the meter during it; it does not cover the meter's long-term stability or "
                + "its behaviour in the customer's installation."));
        return new Part("Statement of uncertainty", blocks);
    }

    private static Part environment(CertificateDetails d) {
        List<List<Cell>> rows = new ArrayList<>();
        for (CertificateDetails.Condition c : d.environment()) {
            rows.add(List.of(Cell.text(c.quantity()), Cell.text(c.value()), Cell.unit(c.unit())));
        }
        if (rows.isEmpty()) {
            return new Part("Environmental conditions", List.of(new Paragraph("The calibration records no "
                    + "environmental conditions.")));
        }
        return new Part("Environmental conditions", List.of(new TableBlock(new Table("certificate-environment",
                "Environmental conditions during the calibration", List.of(
                Column.of("Quantity", "quantity", Align.LEFT, 3f),
                Column.of("Value", "value", Align.RIGHT, 1.5f),
                Column.of("Unit", "unit", Align.LEFT, 1f)), rows))));
    }

    private static Part traceability(List<ReferenceStandard> refs, List<TraceabilityFinding> findings,
            LocalDate date) {
        List<List<Cell>> rows = new ArrayList<>();
        for (ReferenceStandard s : refs) {
            rows.add(List.of(Cell.text(s.id()), Cell.text(s.kind() + ": " + s.description()),
                    Cell.text(s.certificateNumber()), Cell.text(s.issuedBy()), Cell.text(s.calibrated().toString()),
                    Cell.text(s.due().toString())));
        }
        List<Block> blocks = new ArrayList<>();
        blocks.add(new Paragraph(findings.isEmpty()
                ? "The results are traceable to the International System of Units (SI) through the reference "
                        + "standards below, each calibrated by the laboratory named under the certificate given. On the "
                        + "date of calibration, " + date + ", each was within its calibration interval."
                : "The results are traceable to the International System of Units (SI) through the reference "
                        + "standards below, each calibrated by the laboratory named under the certificate given. NOT "
                        + "every reference was within its calibration interval on the date of calibration, " + date
                        + ": see the findings."));
        blocks.add(new TableBlock(new Table("certificate-references", "Reference standards used", List.of(
                Column.of("Id", "id", Align.LEFT, 1.4f),
                Column.of("Reference", "reference", Align.LEFT, 3.2f),
                Column.of("Certificate", "certificate", Align.LEFT, 1.3f),
                Column.of("Issued by", "issued_by", Align.LEFT, 2.4f),
                Column.of("Calibrated", "calibrated", Align.LEFT, 1.1f),
                Column.of("Due", "due", Align.LEFT, 1.1f)), rows)));
        return new Part("Traceability", blocks);
    }

    private static double min(double[] v) {
        double m = Double.POSITIVE_INFINITY;
        for (double d : v) {
            m = Math.min(m, d);
        }
        return m;
    }

    private static double max(double[] v) {
        double m = Double.NEGATIVE_INFINITY;
        for (double d : v) {
            m = Math.max(m, d);
        }
        return m;
    }
}
