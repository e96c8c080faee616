package org.quire.engine.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.FitParameter;

/**
 * The budget file's calibration additions (common practice: strict reading with errors that name the JSON path
 * and the point): {@code dataSets}, inputs of {@code "type": "fit"}, {@code flowPoints} with a conformity
 * section; round trip through write and read. The H.3 line (JCGM 100:2008 H.3, from memory) serves as data.
 */
class CalibrationFileFormatTest {

    private static final String POINTS = "[{\"x\": 21.521, \"y\": -0.171}, {\"x\": 22.012, \"y\": -0.169},"
            + " {\"x\": 22.512, \"y\": -0.166}, {\"x\": 23.003, \"y\": -0.159}, {\"x\": 23.507, \"y\": -0.164}]";

    private static String file(String dataSets, String extra) {
        return "{\"format\": \"quire-budget\", \"formatVersion\": 1, \"title\": \"t\","
                + " \"model\": [\"b = y1 + y2 * (t - 20)\"], \"outputs\": [\"b\"], \"inputs\": ["
                + "{\"name\": \"y1\", \"evaluation\": {\"type\": \"fit\", \"dataSet\": \"H3\", \"parameter\": \"intercept\"}},"
                + "{\"name\": \"y2\", \"evaluation\": {\"type\": \"fit\", \"dataSet\": \"H3\", \"parameter\": \"slope\"}},"
                + "{\"name\": \"t\", \"evaluation\": {\"type\": \"B\", \"distribution\": \"normal\", \"estimate\": 30,"
                + " \"standardUncertainty\": 0.1}}],"
                + " \"dataSets\": " + dataSets + extra + "}";
    }

    private static String dataSet(String method, String points) {
        return "[{\"name\": \"H3\", \"xUnit\": \"°C\", \"yUnit\": \"°C\", \"method\": \"" + method
                + "\", \"referenceX\": 20, \"points\": " + points + "}]";
    }

    private static BudgetFormatException refused(String text) {
        return assertThrows(BudgetFormatException.class, () -> BudgetJson.read(text));
    }

    @Test
    void fitInputsDataSetsAndFlowPointsSurviveWriteAndRead() throws Exception {
        String flow = ", \"flowPoints\": {\"flowUnit\": \"°C\", \"columns\": [\"t\", \"u(t)\"], \"points\": ["
                + "{\"flow\": 22, \"values\": [22, 0.1]}, {\"flow\": 26, \"values\": [26, 0.2]}],"
                + " \"conformity\": {\"mpe\": {\"liquidMeter\": \"1.0\", \"qMin\": 20, \"qMax\": 30},"
                + " \"rule\": {\"kind\": \"simple-acceptance\"}}}";
        Budget b = BudgetJson.read(file(dataSet("OLS", POINTS), flow));
        assertTrue(b.input("y2").evaluation() instanceof FitParameter);
        assertEquals("H3", ((FitParameter) b.input("y2").evaluation()).dataSet());
        assertEquals(2, b.flowPoints().rows().size());
        Budget again = BudgetJson.read(BudgetJson.write(b));
        assertEquals(b.dataSets(), again.dataSets());
        assertEquals(b.inputs(), again.inputs());
        assertEquals(b.flowPoints(), again.flowPoints());
        assertTrue(BudgetJson.write(b).contains("\"type\": \"fit\""));
    }

    @Test
    void aBadPointIsNamedByPathAndNumber() {
        String pts = POINTS.replace("{\"x\": 22.512, \"y\": -0.166}", "{\"x\": 22.512, \"y\": -0.166, \"u_y\": -1}");
        BudgetFormatException e = refused(file(dataSet("OLS", pts), ""));
        assertTrue(e.getMessage().startsWith("$.dataSets[0].points[2]: point 3:"), e.getMessage());
        e = refused(file(dataSet("OLS", pts.replace("-1", "\"abc\"")), ""));
        assertTrue(e.getMessage().startsWith("$.dataSets[0].points[2].u_y: expected a number"), e.getMessage());
    }

    @Test
    void tooFewPointsAndEqualXAreRefused() {
        BudgetFormatException e = refused(file(dataSet("OLS", "[{\"x\": 1, \"y\": 2}, {\"x\": 2, \"y\": 3}]"), ""));
        assertTrue(e.getMessage().contains("at least 3 points, got 2"), e.getMessage());
        e = refused(file(dataSet("OLS", "[{\"x\": 1, \"y\": 2}, {\"x\": 1, \"y\": 3}, {\"x\": 1, \"y\": 4}]"), ""));
        assertTrue(e.getMessage().contains("all 3 points have x = 1.0"), e.getMessage());
    }

    @Test
    void weightedFitsNeedPositiveUncertaintiesAtEveryPoint() {
        BudgetFormatException e = refused(file(dataSet("WLS", POINTS), ""));
        assertTrue(e.getMessage().startsWith("$.dataSets[0]: data set 'H3': point 1:"), e.getMessage());
        assertTrue(e.getMessage().contains("positive u(y)"), e.getMessage());
    }

    @Test
    void unknownDataSetsParametersAndConflictingCorrelationsAreRefused() {
        BudgetFormatException e = refused(file(dataSet("OLS", POINTS), "").replaceFirst("\"H3\", \"parameter\"",
                "\"H4\", \"parameter\""));
        assertTrue(e.getMessage().startsWith("$.inputs[0].evaluation.dataSet: there is no data set named 'H4'"),
                e.getMessage());
        e = refused(file(dataSet("OLS", POINTS), "").replace("\"slope\"", "\"gradient\""));
        assertTrue(e.getMessage().startsWith("$.inputs[1].evaluation.parameter:"), e.getMessage());
        String stated = ", \"correlations\": [{\"inputs\": [\"y1\", \"y2\"], \"r\": -0.5}]";
        Budget b = assertDoesNotThrowRead(file(dataSet("OLS", POINTS), stated));
        IllegalArgumentException x = assertThrows(IllegalArgumentException.class, b::correlationMatrix);
        assertTrue(x.getMessage().contains("fixed by the fit"), x.getMessage());
    }

    @Test
    void envelopesWithGapsOrOverlapsAreNamed() {
        String flow = ", \"flowPoints\": {\"flowUnit\": \"m3/h\", \"columns\": [\"t\"], \"points\": ["
                + "{\"flow\": 2, \"values\": [22]}, {\"flow\": 6, \"values\": [26]}],"
                + " \"conformity\": {\"mpe\": {\"name\": \"house\", \"source\": \"laboratory specification\", \"zones\": ["
                + "{\"name\": \"low\", \"from\": 1, \"to\": 5, \"lower\": 3, \"upper\": 3},"
                + "{\"name\": \"high\", \"from\": FROM, \"to\": 50, \"lower\": 1, \"upper\": 1}]},"
                + " \"rule\": {\"kind\": \"guarded-acceptance\"}}}";
        BudgetFormatException e = refused(file(dataSet("OLS", POINTS), flow.replace("FROM", "6")));
        assertTrue(e.getMessage().startsWith("$.flowPoints.conformity.mpe.zones:"), e.getMessage());
        assertTrue(e.getMessage().contains("gap"), e.getMessage());
        e = refused(file(dataSet("OLS", POINTS), flow.replace("FROM", "4")));
        assertTrue(e.getMessage().contains("overlap"), e.getMessage());
    }

    private static Budget assertDoesNotThrowRead(String text) {
        try {
            return BudgetJson.read(text);
        } catch (BudgetFormatException e) {
            throw new AssertionError(e.getMessage(), e);
        }
    }
}
