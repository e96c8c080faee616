package org.quire.app.ui.inspector;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Pasting into the readings grid follows the same number rule as a CSV file import (issue 11). */
class ReadingsGridPasteTest {

    @Test
    void ambiguousDecimalCommaIsRefusedNotReadAs1point002() {
        // issue 11: pasted into the readings grid, 1,002 became 1.002 without a word
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> ReadingsGrid.parse("pasted text", "1,002\n1,004\n1,003\n"));
        assertTrue(e.getMessage().startsWith("pasted text, line 1, column 1: \"1,002\" is ambiguous"), e.getMessage());
    }

    @Test
    void aColumnOrARowFromASpreadsheet() {
        assertArrayEquals(new double[] {1.5, 2.25, 3.0}, ReadingsGrid.parse("pasted text", "1,5\n2,25\n3\n"), 0);
        assertArrayEquals(new double[] {1002.21, 1002.47}, ReadingsGrid.parse("pasted text", "1002.21\t1002.47\n"), 0);
        assertArrayEquals(new double[] {}, ReadingsGrid.parse("readings grid", "\n\n"), 0);
    }
}
