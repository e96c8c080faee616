package org.quire.engine.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Readings of a Type A evaluation from CSV files of loggers and spreadsheets. */
class ReadingsCsvTest {

    @Test
    void aNamedColumnAPlainColumnAndDecimalCommas() throws Exception {
        assertArrayEquals(new double[] {1002.31, 1002.52, 1002.18},
                ReadingsCsv.parse("run,reading,operator\n1,1002.31,AP\n2,1002.52,AP\n\n3,1002.18,WH\n"), 0);
        assertArrayEquals(new double[] {5.007, 4.994}, ReadingsCsv.parse("5.007\n4.994\n"), 0);
        assertArrayEquals(new double[] {20.41, 20.43}, ReadingsCsv.parse("T tank / °C;run\n20,41;1\n20,43;2\n"), 0);
        assertArrayEquals(new double[] {1.5, 2.5}, ReadingsCsv.parse("\"value\"\t\"note\"\n1.5\ta\n2.5\tb\n"), 0);
    }

    @Test
    void aBadCellNamesItsLineAndColumn() {
        BudgetFormatException e = assertThrows(BudgetFormatException.class,
                () -> ReadingsCsv.parse("reading\n1.0\n2.0\nabc\n"));
        assertEquals("line 4, column 1", e.path());
        assertTrue(e.getMessage().contains("'abc' is not a number"), e.getMessage());
        assertTrue(assertThrows(BudgetFormatException.class, () -> ReadingsCsv.parse("reading\n\n"))
                .getMessage().contains("no readings"));
        assertEquals("line 3", assertThrows(BudgetFormatException.class,
                () -> ReadingsCsv.parse("a,reading\n1,2\n3\n")).path());
    }
}
