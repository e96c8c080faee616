package org.quire.engine.line;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** The strict CSV reader of calibration data sets: format rules and errors naming line and column. */
class CalibrationCsvTest {

    private static CalibrationCsvException failure(String text) {
        return assertThrows(CalibrationCsvException.class, () -> CalibrationCsv.parse(text, "t", "L/s", "Hz"));
    }

    @Test
    void readsColumnsInAnyOrderWithSemicolons() {
        CalibrationData d = CalibrationCsv.parse("u_y; y; X\n0.2;10.5;1\n0.2;21.0;2\n0.3;31.4;3e0\n", "TV-PD-02",
                "L/s", "Hz");
        assertEquals(3, d.size());
        assertEquals(CalibrationPoint.of(3, 31.4, 0, 0.3), d.points().get(2));
        assertEquals("TV-PD-02", d.name());
        assertEquals("Hz", d.yUnit());
    }

    @Test
    void skipsCommentsAndBlankLinesAndAByteOrderMark() {
        CalibrationData d = CalibrationCsv.parse("\uFEFF# Tarrow Vale rig B\n\nx,y,u_x,u_y\n1,2,0.1,0.1\n\n"
                + "2,4.5,0.1,0.1\n# end\n3,6,0.1,0.1\n", "t", "", "");
        assertEquals(3, d.size());
        assertEquals(4.5, d.points().get(1).y());
    }

    @Test
    void roundTripsThroughFormat() {
        CalibrationData d = CalibrationCsv.parse("x,y,u_x,u_y\n1,2.5,0.001,1e-4\n2,4.25,0,0.5\n3.125,6,0,0.5\n",
                "rt", "", "");
        assertEquals(d.points(), CalibrationCsv.parse(CalibrationCsv.format(d), "rt", "", "").points());
    }

    @Test
    void decimalCommaIsReportedWithLineAndColumn() {
        CalibrationCsvException e = failure("x;y\n1;2\n2;4,5\n3;6\n");
        assertEquals(3, e.line());
        assertEquals(2, e.column());
        assertEquals("line 3, column 2 (y): '4,5' is not a number (use a decimal point, not a decimal comma)",
                e.getMessage());
    }

    @Test
    void nonNumbersAndEmptyCellsAreReportedWithLineAndColumn() {
        CalibrationCsvException e = failure("x,y,u_y\n1,2,0.1\n2,4,NaN\n");
        assertEquals("line 3, column 3 (u_y): 'NaN' is not a number", e.getMessage());
        CalibrationCsvException empty = failure("x,y\n1,2\n,4\n3,5\n");
        assertEquals("line 3, column 1 (x): is empty", empty.getMessage());
        assertEquals(1, empty.column());
    }

    @Test
    void wrongFieldCountIsReported() {
        CalibrationCsvException e = failure("x,y\n1,2\n2,4,7\n");
        assertEquals(3, e.line());
        assertEquals("line 3: 3 fields, but the header has 2", e.getMessage());
    }

    @Test
    void headerErrorsAreReported() {
        assertEquals("line 1, column 2: unknown column name 'flow'; expected x, y, u_x, u_y",
                failure("x,flow\n1,2\n").getMessage());
        assertEquals("line 2, column 3: column 'x' is named twice", failure("# c\nx,y,x\n1,2,3\n").getMessage());
        assertTrue(failure("x,u_y\n1,2\n").getMessage().startsWith("line 1: the header has no column 'y'"));
        assertTrue(failure("# only a comment\n").getMessage().contains("no header line"));
    }

    @Test
    void invalidPointsAndTooFewPointsAreReported() {
        CalibrationCsvException neg = failure("x,y,u_y\n1,2,0.1\n2,4,-0.1\n3,6,0.1\n");
        assertEquals("line 3: u(y) must not be negative, not -0.1", neg.getMessage());
        CalibrationCsvException few = failure("x,y\n1,2\n2,4\n");
        assertTrue(few.getMessage().endsWith("a calibration line needs at least 3 points, got 2"), few.getMessage());
    }
}
