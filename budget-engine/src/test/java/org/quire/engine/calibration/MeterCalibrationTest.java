package org.quire.engine.calibration;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import jakarta.json.JsonArray;
import jakarta.json.JsonObject;
import jakarta.json.JsonValue;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.quire.engine.csv.CsvException;
import org.quire.engine.csv.CsvOptions;
import org.quire.engine.csv.CsvReader;
import org.quire.engine.document.Template;
import org.quire.engine.io.BudgetFormatException;
import org.quire.engine.io.BudgetJson;
import org.quire.engine.model.FunctionLibrary;

/**
 * A meter's calibration across its range: a calibration file written by hand from
 * {@code budget-engine/doc/calibration-format.md} evaluates to the figures of the independent recomputation
 * (worked-examples/scripts/tarrow_vale_dn80_calibration.py, whose values the worked example
 * worked-examples/tarrow-vale-dn80-calibration.json holds); and every kind of bad input is refused with a message
 * that names the field, row or column.
 */
class MeterCalibrationTest {
    static final Path ROOT = Files.isDirectory(Path.of("..", "templates")) ? Path.of("..") : Path.of(".");
    static final Path METHOD = ROOT.resolve("templates/tvfl-emf-gravimetric-calibration-run.json");
    static final Path EXAMPLE = ROOT.resolve("worked-examples/tarrow-vale-dn80-calibration.json");
    static final Path HAND = Path.of("src/test/resources/org/quire/engine/calibration/hand-written-dn80.json");
    static final FunctionLibrary LIBRARY = FunctionLibrary.standard().with(org.quire.engine.flow.FlowFunctions.all());

    static Template method() throws BudgetFormatException {
        return CalibrationJson.openMethod(METHOD, "");
    }

    static Calibration hand() throws IOException, BudgetFormatException {
        return CalibrationJson.read(ROOT.resolve("budget-engine").resolve(HAND).normalize().toFile().exists()
                ? ROOT.resolve("budget-engine").resolve(HAND) : HAND).calibration();
    }

    static CalibrationResult evaluate(Calibration c) throws Exception {
        return CalibrationEvaluator.of(method(), LIBRARY).evaluate(c);
    }

    /** The worked example's expected value of a check, with its tolerance. */
    record Expected(double value, double tolerance) {
    }

    static Map<String, Expected> expected(boolean predicted) throws Exception {
        JsonObject doc = BudgetJson.parseObject(Files.readString(EXAMPLE));
        Map<String, Expected> m = new LinkedHashMap<>();
        for (JsonValue v : doc.getJsonArray("checks")) {
            JsonObject c = v.asJsonObject();
            boolean p = c.getJsonObject("arguments").containsKey("asLeft");
            if (p != predicted || c.get("expected").getValueType() != JsonValue.ValueType.NUMBER) {
                continue;
            }
            double want = c.getJsonNumber("expected").doubleValue();
            double tol = c.containsKey("tolerance") ? c.getJsonNumber("tolerance").doubleValue()
                    : Math.abs(want) * c.getJsonNumber("relativeTolerance").doubleValue();
            m.put(c.getString("path"), new Expected(want, tol));
        }
        return m;
    }

    @Test
    void aFileWrittenByHandFromTheFormatDocumentGivesTheFiguresOfTheIndependentScript() throws Exception {
        // independent recomputation: worked-examples/scripts/tarrow_vale_dn80_calibration.py (numpy)
        CalibrationResult r = evaluate(hand());
        Map<String, Expected> found = expected(false);
        Map<String, Expected> left = expected(true);
        int compared = 0;
        for (int p = 0; p < 5; p++) {
            PointResult pt = r.asFound().points().get(p);
            String at = "asFound.points.P" + (p + 1) + ".";
            compared += near(found, at + "error", pt.error());
            compared += near(found, at + "runStandardDeviation", pt.runStandardDeviation());
            compared += near(found, at + "repeatabilityUncertainty", pt.repeatabilityUncertainty());
            compared += near(found, at + "standardUncertainty", pt.standardUncertainty());
            compared += near(found, at + "coverageFactor", pt.coverageFactor());
            compared += near(found, at + "expandedUncertainty", pt.expandedUncertainty());
            compared += near(found, at + "reportedExpandedUncertainty", pt.reportedExpandedUncertainty());
            PointResult lp = r.asLeft().points().get(p);
            String la = "asLeft.points.P" + (p + 1) + ".";
            compared += near(left, la + "error", lp.error());
            compared += near(left, la + "expandedUncertainty", lp.expandedUncertainty());
            compared += near(left, la + "reportedExpandedUncertainty", lp.reportedExpandedUncertainty());
        }
        double[][] cov = r.asFound().covariance();
        compared += near(found, "asFound.covariance.0.4", cov[0][4]);
        compared += near(found, "asFound.covariance.2.3", cov[2][3]);
        compared += near(found, "adjustment.errorRemoved", r.adjustment().errorRemoved());
        compared += near(found, "adjustment.errorRemovedUncertainty", r.adjustment().errorRemovedUncertainty());
        compared += near(found, "adjustment.newConstant", r.adjustment().newConstant());
        compared += near(found, "adjustment.newConstantUncertainty", r.adjustment().newConstantUncertainty());
        assertEquals(56, compared);
        assertEquals(SeriesResult.Phase.AS_LEFT_PREDICTED, r.asLeft().phase());
        assertEquals(1.2345, r.adjustment().oldConstant(), 0);
        // the source rows of the runs are those written in the file
        assertEquals(List.of(3, 4, 5), r.asFound().points().get(0).runs().stream().map(RunResult::sourceRow).toList());
    }

    private static int near(Map<String, Expected> m, String path, double got) {
        Expected e = m.get(path);
        assertTrue(e != null, "the worked example has no check " + path);
        assertEquals(e.value(), got, e.tolerance() * (1 + 1e-9), path);
        return 1;
    }

    @Test
    void theWeightedMeanAdjustmentLeavesAPredictedWeightedMeanErrorOfZero() throws Exception {
        // E' = 100 [(1 + E/100) s - 1] with s = 1 / (1 + E_w/100) and sum w = 1 gives sum w E' = 0 exactly
        // (algebra of the adjustment; the weights are 1/u^2 normalized, common practice)
        CalibrationResult r = evaluate(hand());
        double sw = 0;
        double swe = 0;
        for (int p = 0; p < 5; p++) {
            double w = r.adjustment().weights().get(p);
            double u = r.asFound().points().get(p).standardUncertainty();
            double w0 = r.adjustment().weights().get(0);
            double u0 = r.asFound().points().get(0).standardUncertainty();
            assertEquals(w0 * u0 * u0, w * u * u, 1e-15, "w proportional to 1/u^2");
            sw += w;
            swe += w * r.asLeft().points().get(p).error();
        }
        assertEquals(1.0, sw, 1e-12);
        assertEquals(0.0, swe, 1e-12);
        // old and new constant: C_new = C_old / (1 + E_w/100)
        assertEquals(r.adjustment().oldConstant() / (1 + r.adjustment().errorRemoved() / 100), r.adjustment().newConstant(),
                1e-15);
    }

    @Test
    void aPointWithOneRunNeedsAStatedRepeatabilityAndUsesItThen() throws Exception {
        Calibration c = hand();
        FlowPoint p1 = c.asFound().get(0);
        FlowPoint single = FlowPoint.of("P1", List.of(p1.runs().get(0)));
        Calibration one = c.withAsFound(List.of(single)).withAdjustment(Adjustment.none());
        CalibrationException e = assertThrows(CalibrationException.class, () -> evaluate(one));
        assertEquals("asFound[0]", e.location());
        assertTrue(e.getMessage().contains("has one run, so its repeatability is undefined"), e.getMessage());
        assertTrue(e.getMessage().contains("source row 3"), e.getMessage());
        // single-point verification with a stated (pooled) repeatability: u = s / sqrt(1) (JCGM 100:2008 4.2.4)
        Calibration stated = one.withAsFound(List.of(single.withStatedRepeatability(
                StatedRepeatability.of(0.012, 20, "rig GR-2 repeatability study (invented)"))));
        CalibrationResult r = evaluate(stated);
        PointResult pt = r.asFound().points().get(0);
        assertEquals(0.012, pt.repeatabilityUncertainty(), 1e-15);
        assertEquals(20, pt.repeatabilityDof(), 0);
        assertTrue(pt.statedRepeatability());
        assertTrue(r.findings().stream().anyMatch(f -> f.contains("because the point has one run")), r.findings().toString());
        assertEquals(1, r.asFound().conformity().points().size());
        // u_c^2 = u_B^2 + s^2: the repeatability adds in quadrature to the method's budget of the full point
        double uB2 = 0;
        for (org.quire.engine.gum.Contribution k : evaluate(hand()).asFound().points().get(0).result().contributions()) {
            if (!k.input().startsWith("R_")) {
                uB2 += k.contribution() * k.contribution();
            }
        }
        assertEquals(Math.sqrt(uB2 + 0.012 * 0.012), pt.standardUncertainty(), 2e-3 * pt.standardUncertainty());
    }

    @Test
    void anUndeclaredInputIsAnErrorListingEveryInputToDeclare() throws Exception {
        Calibration c = hand();
        Map<String, InputDeclaration> d = new LinkedHashMap<>(c.declarations());
        d.remove("dt_div");
        d.remove("rho_ref");
        CalibrationException e = assertThrows(CalibrationException.class, () -> evaluate(c.withDeclarations(d)));
        assertEquals("declarations", e.location());
        assertTrue(e.getMessage().endsWith("not declared: rho_ref, dt_div"), e.getMessage());
    }

    @Test
    void aRunWithAMissingReadingNamesTheRunAndItsSourceRow() throws Exception {
        Calibration c = hand();
        Run r = c.asFound().get(1).runs().get(2);
        Map<String, Double> x = new LinkedHashMap<>(r.readings());
        x.remove("t_c");
        List<Run> runs = new ArrayList<>(c.asFound().get(1).runs());
        runs.set(2, Run.of(r.sourceRow(), x));
        List<FlowPoint> pts = new ArrayList<>(c.asFound());
        pts.set(1, FlowPoint.of("P2", runs));
        CalibrationException e = assertThrows(CalibrationException.class, () -> evaluate(c.withAsFound(pts)));
        assertEquals("asFound[1].runs[2]", e.location());
        assertTrue(e.getMessage().contains("(source row 8): reading 't_c' is missing"), e.getMessage());
    }

    @Test
    void aBlankCellInTheRunsFileIsRefusedWithItsLineAndColumn() throws Exception {
        String text = "point,I_full,I_empty,t_c,t_tank,t_meter,p_meter,N_p\n"
                + "P1,609.11,12.18,360,18.44,18.51,248165,6008\n"
                + "P1,610.25,12.07,,18.43,18.52,251632,6021\n";
        CsvException e = assertThrows(CsvException.class, () -> RunsCsv.read(CsvReader.parse("runs.csv", text,
                CsvOptions.defaults()), method()));
        assertEquals(3, e.line());
        assertEquals(4, e.column());
        assertTrue(e.getMessage().contains("the reading 't_c' is missing"), e.getMessage());
    }

    @Test
    void aRunsFileReadWithTheWrongSeparatorSaysSo() throws Exception {
        String text = "point;I_full;I_empty;t_c;t_tank;t_meter;p_meter;N_p\n"
                + "P1;609.11;12.18;360;18.44;18.51;248165;6008\n";
        BudgetFormatException e = assertThrows(BudgetFormatException.class, () -> RunsCsv.read(CsvReader.parse(
                "runs.csv", text, CsvOptions.defaults().withSeparator(CsvOptions.Separator.COMMA)), method()));
        assertTrue(e.getMessage().contains("runs.csv"), e.getMessage());
        assertTrue(e.getMessage().contains("separator"), e.getMessage());
    }

    private static BudgetFormatException badFile(String from, String to) throws Exception {
        String text = Files.readString(ROOT.resolve("budget-engine").resolve(HAND).toFile().exists()
                ? ROOT.resolve("budget-engine").resolve(HAND) : HAND);
        assertTrue(text.contains(from), from);
        return assertThrows(BudgetFormatException.class, () -> CalibrationJson.read(text.replace(from, to)));
    }

    @Test
    void aCmcTableWithAGapIsAnErrorAtItsJsonPath() throws Exception {
        BudgetFormatException e = badFile("{\"from\": 10, \"to\": 50", "{\"from\": 12, \"to\": 50");
        assertEquals("$.cmc.ranges", e.path());
        assertTrue(e.getMessage().contains("range 1 ends at 10 m³/h but range 2 starts at 12 m³/h: the table has a gap"),
                e.getMessage());
    }

    @Test
    void anMpeFormulaWithWrongUnitsIsAnErrorAtItsJsonPath() throws Exception {
        BudgetFormatException e = badFile("\"velocityUnit\": \"mm/s\"", "\"velocityUnit\": \"mm\"");
        assertEquals("$.conformity.mpeFormula", e.path());
        assertTrue(e.getMessage().contains("velocityUnit: 'mm' is not a velocity"), e.getMessage());
        BudgetFormatException b = badFile("\"boreUnit\": \"mm\"", "\"boreUnit\": \"m^2\"");
        assertTrue(b.getMessage().contains("boreUnit: 'm^2' is not a length"), b.getMessage());
    }

    @Test
    void theMpeFormulaFollowsFromTheVelocityOverTheBore() {
        // MPE = a + 100 b / v with v = q / (pi D^2 / 4): at 36 m3/h through 80 mm, v = 0.01 / 0.0050265 m/s
        // = 1.98944 m/s (continuity, ISO 4006, from memory), so MPE = 0.2 + 100 * 0.0015 / 1.98944 = 0.275398 %
        MpeFormula f = MpeFormula.of(0.2, 1.5, "mm/s", 80, "mm");
        assertEquals(0.2 + 0.15 / (0.01 / (Math.PI * 0.08 * 0.08 / 4)), f.percentAt(36, "m^3/h"), 1e-12);
        assertEquals(0.275398, f.percentAt(36, "m^3/h"), 5e-7);
        assertThrows(IllegalArgumentException.class, () -> f.percentAt(36, "kg/h"));
    }

    @Test
    void aCalibrationFileReadsBackAsWritten() throws Exception {
        Calibration c = hand();
        CalibrationJson.Loaded again = CalibrationJson.read(CalibrationJson.write(c, "method.json"));
        assertEquals(c, again.calibration());
        assertEquals("method.json", again.methodFile());
        JsonArray refs = BudgetJson.parseObject(CalibrationJson.write(c, "")).getJsonArray("asFound");
        assertFalse(refs.isEmpty());
    }

    @Test
    void conformityAgainstAnOimlR117ClassDecidesEachPointWithItsReportedUncertainty() throws Exception {
        // OIML R 117-1, meter MPE of accuracy class 0.5: 0.3 % (line B; read in a secondary copy). Errors of the
        // points from the independent recomputation (worked example): 0.397, 0.326, 0.285, 0.232, 0.247 %.
        String text = Files.readString(ROOT.resolve("budget-engine").resolve(HAND).toFile().exists()
                ? ROOT.resolve("budget-engine").resolve(HAND) : HAND);
        String from = text.substring(text.indexOf("\"mpeFormula\""), text.indexOf("\"rule\""));
        Calibration c = CalibrationJson.read(text.replace(from, "\"mpe\": {\"liquidMeter\": \"0.5\", \"qMin\": 5, "
                + "\"qMax\": 120}, \"flowUnit\": \"m^3/h\", ")).calibration();
        CalibrationResult r = evaluate(c);
        List<String> want = List.of("does not conform", "does not conform", "conforms", "conforms", "conforms");
        Map<String, Expected> e = expected(false);
        for (int p = 0; p < 5; p++) {
            PointConformity pc = r.asFound().conformity().points().get(p);
            assertEquals(want.get(p), pc.decision().decision().label(), "point " + (p + 1));
            assertEquals(0.3, pc.mpe(), 1e-12);
            assertEquals(e.get("asFound.points.P" + (p + 1) + ".reportedExpandedUncertainty").value(),
                    pc.decision().expandedUncertainty(), 1e-6);
            // U <= MPE / 3 = 0.1 % at every point (common practice ratio)
            assertTrue(pc.ratioMet());
        }
        assertEquals("does not conform", r.asFound().conformity().overall().label());
        assertTrue(r.asFound().conformity().limitsSource().contains("OIML R 117"));
    }
}
