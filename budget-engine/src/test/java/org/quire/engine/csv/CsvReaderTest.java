package org.quire.engine.csv;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The one CSV reader: separators, the decimal-mark rule, cell counts and locations in messages. Expected values
 * are the numbers written in the test texts (RFC 4180 quoting; the decimal-mark rule is Quire's own, stated in
 * {@link CsvRow#number(int)}).
 */
class CsvReaderTest {
    private static CsvTable parse(String text) throws CsvException {
        return CsvReader.parse("runs.csv", text, CsvOptions.defaults());
    }

    @Test
    void commaSeparatedWithDecimalPoints() throws Exception {
        CsvTable t = parse("point,mass_full,time\n1,1002.5,60.01\n2,998.25,59.98\n");
        assertEquals(CsvOptions.Separator.COMMA, t.separator());
        assertEquals(CsvOptions.DecimalMark.POINT, t.decimalMark());
        assertEquals(List.of("point", "mass_full", "time"), t.header());
        assertEquals(2, t.rows().size());
        assertEquals(998.25, t.rows().get(1).number("mass_full"));
        assertEquals(3, t.rows().get(1).line());
    }

    @Test
    void semicolonFileWithProvenDecimalComma() throws Exception {
        // 0,0025 and 1,5 cannot be thousands groups: they prove the decimal comma, so 1,002 is 1.002 here
        CsvTable t = parse("reading;u\n1,002;0,0025\n1,5;0,0030\n");
        assertEquals(CsvOptions.Separator.SEMICOLON, t.separator());
        assertEquals(CsvOptions.DecimalMark.COMMA, t.decimalMark());
        assertEquals(1.002, t.rows().get(0).number(0));
        assertEquals(0.0025, t.rows().get(0).number("u"));
        assertEquals(1.5, t.rows().get(1).number(0));
    }

    @Test
    void tabFileDetected() throws Exception {
        CsvTable t = parse("a\tb\n1,25\t2\n");
        assertEquals(CsvOptions.Separator.TAB, t.separator());
        assertEquals(1.25, t.rows().get(0).number("a"));
    }

    @Test
    void ambiguousCommaRefusedWithLineAndColumn() {
        // issue 11: 1,002 / 1,004 / 1,003 must not become 1.0 or 1.002 silently
        CsvException e = assertThrows(CsvException.class,
                () -> parse("reading\n1,002\n1,004\n1,003\n").rows().get(0).number("reading"));
        assertEquals("runs.csv", e.sourceName());
        assertEquals(2, e.line());
        assertEquals(1, e.column());
        assertEquals("reading", e.columnName());
        assertTrue(e.getMessage().startsWith("runs.csv, line 2, column 1 (reading): \"1,002\" is ambiguous"),
                e.getMessage());
    }

    @Test
    void ambiguousCommaInSemicolonFileWithoutProof() {
        CsvException e = assertThrows(CsvException.class,
                () -> parse("n;mass_full\n1;1,002\n").rows().get(0).number(1));
        assertEquals(2, e.line());
        assertEquals(2, e.column());
        assertTrue(e.reason().contains("ambiguous"), e.getMessage());
    }

    @Test
    void statedDecimalCommaAcceptsAmbiguousLookingCells() throws Exception {
        CsvTable t = CsvReader.parse("x", "reading\n1,002\n", CsvOptions.defaults()
                .withDecimalMark(CsvOptions.DecimalMark.COMMA));
        assertEquals(1.002, t.rows().get(0).number(0));
    }

    @Test
    void decimalCommaInFileWithDecimalPointsRefused() {
        CsvException e = assertThrows(CsvException.class,
                () -> parse("a;b\n1.5;2\n3;1,25\n").rows().get(1).number(1));
        assertEquals(3, e.line());
        assertTrue(e.reason().contains("decimal comma") && e.reason().contains("\"1.5\" on line 2"), e.getMessage());
    }

    @Test
    void quotedDecimalCommaInCommaFileNeedsStatedMark() throws Exception {
        CsvException e = assertThrows(CsvException.class, () -> parse("a,b\n\"1,5\",2\n").rows().get(0).number(0));
        assertTrue(e.reason().contains("stated"), e.getMessage());
        CsvTable t = CsvReader.parse("x", "a,b\n\"1,5\",2\n",
                CsvOptions.defaults().withDecimalMark(CsvOptions.DecimalMark.COMMA));
        assertEquals(1.5, t.rows().get(0).number(0));
    }

    @Test
    void thousandsSeparatorsNeverGuessed() {
        for (String cell : List.of("1,002.5", "1.002.003", "1.002,5", "1 002")) {
            CsvException e = assertThrows(CsvException.class,
                    () -> parse("a;b\n\"" + cell + "\";1\n").rows().get(0).number(0), cell);
            assertTrue(e.reason().contains("thousands"), cell + ": " + e.getMessage());
        }
    }

    @Test
    void valuesADoubleCannotHoldRefused() {
        for (String cell : List.of("1e999999", "1e309", "-1e309", "1e-400", "NaN", "Infinity", "inf",
                "1234567890123456789012345678901234567890", "1e1000000")) {
            assertThrows(CsvException.class, () -> parse("a\n" + cell + "\n").rows().get(0).number(0), cell);
        }
    }

    @Test
    void extraAndMissingCellsAreErrorsWithTheLine() {
        CsvException extra = assertThrows(CsvException.class, () -> parse("a,b\n1,2\n3,4,5\n"));
        assertEquals(3, extra.line());
        assertTrue(extra.reason().contains("3 cells") && extra.reason().contains("2 (a, b)"), extra.getMessage());
        CsvException missing = assertThrows(CsvException.class, () -> parse("a,b\n1,2\n\n3\n"));
        assertEquals(4, missing.line());
    }

    @Test
    void wrongSeparatorSaidSo() {
        CsvOptions comma = CsvOptions.defaults().withSeparator(CsvOptions.Separator.COMMA);
        CsvException e = assertThrows(CsvException.class,
                () -> CsvReader.parse("runs.csv", "mass_full;time\n1;2\n", comma).requireColumns("mass_full", "time"));
        assertTrue(e.reason().contains("one column") && e.reason().contains("separated by ';'"), e.getMessage());
    }

    @Test
    void missingColumnListsTheColumns() {
        CsvException e = assertThrows(CsvException.class, () -> parse("a,b\n1,2\n").columnIndex("c"));
        assertTrue(e.reason().contains("the columns are: a, b"), e.getMessage());
    }

    @Test
    void lineNumbersCountCommentsBlankLinesAndQuotedLineBreaks() throws Exception {
        CsvTable t = parse("\uFEFF# rig log\nnote,v\n\n\"two\nlines\",1\n\"x\",2\r\n");
        assertEquals(4, t.rows().get(0).line());
        assertEquals(6, t.rows().get(1).line());
        assertEquals("two\nlines", t.rows().get(0).text("note"));
    }

    @Test
    void malformedQuotesAreLocated() {
        CsvException e = assertThrows(CsvException.class, () -> parse("a,b\n\"1\"x,2\n"));
        assertTrue(e.line() >= 2, e.getMessage());
    }

    @Test
    void emptyFileAndDuplicateHeader() {
        assertThrows(CsvException.class, () -> parse("\n# only a comment\n"));
        CsvException e = assertThrows(CsvException.class, () -> parse("a,a\n1,2\n"));
        assertEquals(2, e.column());
    }

    @Test
    void fileSizeLimit(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("big.csv");
        Files.writeString(f, "a\n1\n2\n", StandardCharsets.UTF_8);
        CsvException e = assertThrows(CsvException.class,
                () -> CsvReader.read(f, CsvOptions.defaults().withMaxBytes(4)));
        assertEquals("big.csv", e.sourceName());
        assertEquals(2.0, CsvReader.read(f, CsvOptions.defaults()).rows().get(1).number(0));
        Files.write(f, new byte[] {'a', '\n', (byte) 0xff, '\n'});
        assertThrows(CsvException.class, () -> CsvReader.read(f, CsvOptions.defaults()));
    }

    @Test
    void withoutHeaderEveryRowIsData() throws Exception {
        CsvTable t = CsvReader.parse("p", "1.5\n2.5\n", CsvOptions.defaults().withHeader(false));
        assertEquals(List.of(), t.header());
        assertEquals(2, t.rows().size());
        assertEquals(1, t.rows().get(0).line());
        assertEquals(2.5, t.rows().get(1).number(0));
    }
}
