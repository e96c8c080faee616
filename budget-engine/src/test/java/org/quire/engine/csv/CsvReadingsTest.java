package org.quire.engine.csv;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Readings of a Type A evaluation from CSV files of loggers and spreadsheets, and from pasted cells. */
class CsvReadingsTest {
    private static double[] parse(String text) throws CsvException {
        return CsvReadings.parse("readings.csv", text, CsvOptions.defaults());
    }

    @Test
    void aNamedColumnAPlainColumnAndDecimalCommas() throws Exception {
        assertArrayEquals(new double[] {1002.31, 1002.52, 1002.18},
                parse("run,reading,operator\n1,1002.31,AP\n2,1002.52,AP\n\n3,1002.18,WH\n"), 0);
        assertArrayEquals(new double[] {5.007, 4.994}, parse("5.007\n4.994\n"), 0);
        assertArrayEquals(new double[] {20.41, 20.43}, parse("value;run\n20,41;1\n20,43;2\n"), 0);
        assertArrayEquals(new double[] {1.5, 2.5}, parse("\"value\"\t\"note\"\n1.5\ta\n2.5\tb\n"), 0);
    }

    @Test
    void pastedRowOrColumnOfCells() throws Exception {
        assertArrayEquals(new double[] {1.25, 1.5, 1.75}, parse("1.25\t1.5\t1.75"), 0);
        assertArrayEquals(new double[] {1.5, 2.25}, parse("1,5\n2,25\n"), 0);
    }

    @Test
    void aPastedBlockIsReadRowByRowWhileAFileOfSeveralColumnsNeedsItsReadingColumnNamed() throws Exception {
        CsvOptions semicolon = CsvOptions.defaults().withSeparator(CsvOptions.Separator.SEMICOLON);
        assertArrayEquals(new double[] {1002.1, 1002.5, 1002.2, 1002.6},
                CsvReadings.parseBlock("pasted text", "1002,1;1002,5\n1002,2;1002,6\n", semicolon), 0);
        assertArrayEquals(new double[] {1.5, 2.5, 3.5, 4.5}, CsvReadings.parseBlock("pasted text",
                "1.5\t\t2.5\n3.5\t4.5\t\n",
                CsvOptions.defaults().withSeparator(CsvOptions.Separator.TAB)), 0, "blank cells are skipped");
        assertArrayEquals(new double[] {20.41, 20.43}, CsvReadings.parseBlock("pasted text",
                "value;run\n20,41;1\n20,43;2\n", semicolon), 0, "a header names the column as in a file");
        // the same block as a file has two columns and neither is named: which one holds the readings is unknown
        assertThrows(CsvException.class, () -> CsvReadings.parse("readings.csv", "1002,1;1002,5\n1002,2;1002,6\n",
                semicolon));
        CsvException bad = assertThrows(CsvException.class, () -> CsvReadings.parseBlock("pasted text",
                "1.5\t2.5\n3.5\tx\n", CsvOptions.defaults().withSeparator(CsvOptions.Separator.TAB)));
        assertEquals(2, bad.line(), bad.getMessage());
    }

    @Test
    void ambiguousReadingsAreRefusedNotReadAsOne() {
        // issue 11: 1,002 / 1,004 / 1,003 became 1.0, 1.0, 1.0 from a file and 1.002 from a paste
        CsvException e = assertThrows(CsvException.class, () -> parse("1,002\n1,004\n1,003\n"));
        assertEquals(1, e.line());
        assertTrue(e.reason().contains("ambiguous"), e.getMessage());
        CsvException named = assertThrows(CsvException.class, () -> parse("reading\n1,002\n1,004\n"));
        assertEquals(2, named.line());
    }

    @Test
    void noGuessingAColumnAndNoSkippedCells() {
        CsvException e = assertThrows(CsvException.class, () -> parse("T tank;run\n20.41;1\n"));
        assertTrue(e.reason().contains("the columns are: T tank, run"), e.getMessage());
        CsvException blank = assertThrows(CsvException.class, () -> parse("run,reading\n1,2.5\n2,\n"));
        assertEquals(3, blank.line());
        assertEquals(2, blank.column());
        CsvException extra = assertThrows(CsvException.class, () -> parse("run,reading\n1,2.5\n2,2.6,9\n"));
        assertEquals(3, extra.line());
        assertTrue(assertThrows(CsvException.class, () -> parse("reading\n\n")).reason().contains("no data rows"));
    }
}
