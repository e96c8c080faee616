package org.quire.engine.line;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.quire.engine.csv.CalibrationCsv;
import org.quire.engine.csv.CsvException;

/** Calibration data sets through the one CSV reader: format rules and errors naming line and column. */
class CalibrationCsvTest {

    private static CsvException failure(String text) {
        return assertThrows(CsvException.class, () -> CalibrationCsv.parse(text, "t", "L/s", "Hz"));
    }

    @Test
    void readsColumnsInAnyOrderWithSemicolons() throws Exception {
        CalibrationData d = CalibrationCsv.parse("u_y; y; X\n0.2;10.5;1\n0.2;21.0;2\n0.3;31.4;3e0\n", "TV-PD-02",
                "L/s", "Hz");
        assertEquals(3, d.size());
        assertEquals(CalibrationPoint.of(3, 31.4, 0, 0.3), d.points().get(2));
        assertEquals("TV-PD-02", d.name());
        assertEquals("Hz", d.yUnit());
    }

    @Test
    void skipsCommentsAndBlankLinesAndAByteOrderMark() throws Exception {
        CalibrationData d = CalibrationCsv.parse("\uFEFF# Tarrow Vale rig B\n\nx,y,u_x,u_y\n1,2,0.1,0.1\n\n"
                + "2,4.5,0.1,0.1\n# end\n3,6,0.1,0.1\n", "t", "", "");
        assertEquals(3, d.size());
        assertEquals(4.5, d.points().get(1).y());
    }

    @Test
    void roundTripsThroughFormat() throws Exception {
        CalibrationData d = CalibrationCsv.parse("x,y,u_x,u_y\n1,2.5,0.001,1e-4\n2,4.25,0,0.5\n3.125,6,0,0.5\n",
                "rt", "", "");
        assertEquals(d.points(), CalibrationCsv.parse(CalibrationCsv.format(d), "rt", "", "").points());
    }

    @Test
    void decimalCommaInAFileWithDecimalPointsIsReportedWithLineAndColumn() {
        CsvException e = failure("x;y\n1;2.5\n2;4,5\n3;6\n");
        assertEquals(3, e.line());
        assertEquals(2, e.column());
        assertEquals("y", e.columnName());
        assertTrue(e.getMessage().startsWith("t, line 3, column 2 (y): \"4,5\" has a decimal comma"), e.getMessage());
    }

    @Test
    void provenDecimalCommaIsRead() throws Exception {
        CalibrationData d = CalibrationCsv.parse("x;y\n1;2,5\n2;4,5\n3;6,25\n", "t", "", "");
        assertEquals(6.25, d.points().get(2).y());
    }

    @Test
    void nonNumbersAndEmptyCellsAreReportedWithLineAndColumn() {
        CsvException e = failure("x,y,u_y\n1,2,0.1\n2,4,NaN\n");
        assertEquals("t, line 3, column 3 (u_y): \"NaN\" is not a number", e.getMessage());
        CsvException empty = failure("x,y\n1,2\n,4\n3,5\n");
        assertEquals(3, empty.line());
        assertEquals(1, empty.column());
        assertTrue(empty.reason().contains("empty"), empty.getMessage());
    }

    @Test
    void wrongFieldCountIsReported() {
        CsvException e = failure("x,y\n1,2\n2,4,7\n");
        assertEquals(3, e.line());
        assertTrue(e.reason().startsWith("the row has 3 cells, but the header has 2 (x, y)"), e.getMessage());
    }

    @Test
    void headerErrorsAreReported() {
        assertEquals("t, line 1, column 2 (flow): unknown column name 'flow'; expected x, y, u_x, u_y",
                failure("x,flow\n1,2\n").getMessage());
        CsvException twice = failure("# c\nx,y,X\n1,2,3\n");
        assertEquals(2, twice.line());
        assertEquals(3, twice.column());
        assertTrue(failure("x,u_y\n1,2\n").reason().startsWith("there is no column \"y\""));
        assertTrue(failure("# only a comment\n").reason().contains("no rows"));
    }

    @Test
    void wrongSeparatorIsSaidSo() {
        // a semicolon file read as one column shows as the single column "x;y"
        CsvException e = assertThrows(CsvException.class, () -> CalibrationCsv.of(
                org.quire.engine.csv.CsvReader.parse("t", "x;y\n1;2\n", org.quire.engine.csv.CsvOptions.defaults()
                        .withSeparator(org.quire.engine.csv.CsvOptions.Separator.COMMA)), "t", "", ""));
        assertTrue(e.reason().contains("separated by ';'"), e.getMessage());
    }

    @Test
    void invalidPointsAndTooFewPointsAreReported() {
        CsvException neg = failure("x,y,u_y\n1,2,0.1\n2,4,-0.1\n3,6,0.1\n");
        assertEquals("t, line 3: u(y) must not be negative, not -0.1", neg.getMessage());
        CsvException few = failure("x,y\n1,2\n2,4\n");
        assertTrue(few.getMessage().contains("a calibration line needs at least 3 points, got 2"), few.getMessage());
    }
}
