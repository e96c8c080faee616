package org.quire.app.report;

import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.time.LocalDate;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.quire.app.common.Engine;
import org.quire.engine.calibration.Adjustment;
import org.quire.engine.calibration.Calibration;
import org.quire.engine.calibration.CalibrationConstant;
import org.quire.engine.calibration.CalibrationEvaluator;
import org.quire.engine.calibration.CalibrationResult;
import org.quire.engine.calibration.CertificateDetails;
import org.quire.engine.calibration.CmcTable;
import org.quire.engine.calibration.ConformitySpec;
import org.quire.engine.calibration.FlowPoint;
import org.quire.engine.calibration.InputDeclaration;
import org.quire.engine.calibration.MpeFormula;
import org.quire.engine.calibration.Run;
import org.quire.engine.conformity.DecisionRule;
import org.quire.engine.document.DocumentJson;
import org.quire.engine.document.Template;

/**
 * The certificate tests' calibration (invented Tarrow Vale data): a meter under test compared with the reference
 * meter TVFL-MM-05 at three flow points of three runs each, adjusted by the weighted mean error, with a CMC of
 * 0.052 % and MPE = ±(0.5 % of the reading + 1 mm/s over a 100 mm bore) under simple acceptance. The expected
 * figures are computed independently by {@code app/src/test/scripts/certificate_expected.py}.
 */
final class CertificateFixture {
    static final double[][] Q_REF = {{10.012, 9.995, 10.004}, {25.010, 24.985, 25.003}, {60.02, 59.97, 60.01}};
    static final double[][] Q_IND = {{10.101, 10.080, 10.096}, {25.062, 25.041, 25.066}, {60.09, 60.05, 60.11}};
    static final String[] LABELS = {"P1", "P2", "P3"};
    static final double OLD_CONSTANT = 1.0245;

    private CertificateFixture() {
    }

    static Template method() throws Exception {
        try (InputStream in = CertificateFixture.class.getResourceAsStream("certificate-method.json")) {
            String text = new String(in.readAllBytes(), StandardCharsets.UTF_8);
            return Template.of(DocumentJson.read(text, Instant.parse("2026-11-30T09:00:00Z")));
        }
    }

    static Calibration calibration(LocalDate date, List<String> references, String author) throws Exception {
        Template m = method();
        List<FlowPoint> points = new java.util.ArrayList<>();
        int row = 2;
        for (int p = 0; p < Q_REF.length; p++) {
            List<Run> runs = new java.util.ArrayList<>();
            for (int j = 0; j < Q_REF[p].length; j++) {
                Map<String, Double> r = new LinkedHashMap<>();
                r.put("q_ref", Q_REF[p][j]);
                r.put("q_ind", Q_IND[p][j]);
                runs.add(Run.of(row++, r));
            }
            points.add(FlowPoint.of(LABELS[p], runs));
        }
        Map<String, InputDeclaration> decl = new LinkedHashMap<>();
        decl.put("q_ref", InputDeclaration.shared());
        decl.put("q_ind", InputDeclaration.independent());
        CertificateDetails details = new CertificateDetails(
                new CertificateDetails.Party("Tarrow Vale Flow Laboratory",
                        "4 Weir Lane\nTarrow Vale TV3 9QL (invented)", "TVAS calibration laboratory No. 0417 (invented)"),
                new CertificateDetails.Party("Hollin Water Services (invented)", "Pumping Station Road, Hollin (invented)",
                        ""),
                new CertificateDetails.Item("electromagnetic flow meter", "DN 100", "EM-7731-26"), date,
                List.of(new CertificateDetails.Condition("water temperature", "18.4 ± 0.3", "°C"),
                        new CertificateDetails.Condition("air temperature", "20.9 ± 0.6", "°C"),
                        new CertificateDetails.Condition("line pressure", "2.8", "bar")),
                references, author);
        return Calibration.of(m.origin(), "E", "q", CalibrationConstant.of("meter factor", "", OLD_CONSTANT), decl,
                points)
                .withTitle("Calibration of EM-7731-26 (invented)")
                .withDetails(details)
                .withAdjustment(Adjustment.weightedMeanError())
                .withCmc(CmcTable.of("m^3/h", List.of(new CmcTable.Range(1, 100, 0.052)),
                        "scope of accreditation of the Tarrow Vale Flow Laboratory (invented)"))
                .withConformity(ConformitySpec.of(MpeFormula.of(0.5, 1.0, "mm/s", 100, "mm"),
                        DecisionRule.simpleAcceptance(), 3));
    }

    static CalibrationResult evaluate(Calibration c) throws Exception {
        return CalibrationEvaluator.of(method(), Engine.standard().library()).evaluate(c);
    }

    static CalibrationResult worked() throws Exception {
        return evaluate(calibration(LocalDate.of(2026, 11, 12), List.of("TVFL-MM-05", "TVFL-PRT-12", "TVFL-TMR-01"),
                "R. Ashdown (invented)"));
    }
}
