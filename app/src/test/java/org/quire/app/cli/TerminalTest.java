package org.quire.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.Test;

/** The command line's plain forms for a terminal that cannot show the figures' characters. */
class TerminalTest {

    @Test
    void asciiTerminalsGetPlainFormsThatReadBackAsTheSameNumbers() {
        assertEquals("u_c = 2.89e-5 m^3/h, nu_eff = inf, k = 2.00",
                Terminal.plain("u_c = 2.89 \u00d7 10\u207b\u2075 m\u00b3/h, \u03bd_eff = \u221e, k = 2.00"));
        assertEquals("rho = 998.2 kg m^-3 +/- 0.05 kg m^-3 at 20 degC",
                Terminal.plain("\u03c1 = 998.2 kg m\u207b\u00b3 \u00b1 0.05 kg m\u207b\u00b3 at 20 \u00b0C"));
        assertEquals("-1.2e12 uS/cm", Terminal.plain("\u22121.2 \u00d7 10\u00b9\u00b2 \u00b5S/cm"));
        assertEquals("Tarrow Vale, cafe", Terminal.plain("Tarrow Vale, caf\u00e9"));
        assertEquals("?", Terminal.plain("\u2603"));
    }

    @Test
    void rightAlignedColumnsStayAlignedInPlainForms() {
        String shown = "  l_s      2.50 \u00d7 10\u207b\u2075     18\n  d_mean       0.00100      \u221e";
        String[] lines = Terminal.plain(shown).split("\n");
        assertEquals("  l_s          2.50e-5     18", lines[0]);
        assertEquals("  d_mean       0.00100    inf", lines[1]);
        assertEquals(lines[0].length(), lines[1].length());
    }

    @Test
    void onlyCharacterSetsThatCanShowTheFiguresPassThemOn() {
        assertTrue(Terminal.canShow(StandardCharsets.UTF_8));
        assertFalse(Terminal.canShow(StandardCharsets.US_ASCII));
        assertFalse(Terminal.canShow(StandardCharsets.ISO_8859_1)); // no U+2212 minus
    }

    @Test
    void linesAreConvertedWholeAndAPartialLineAtAFlush() throws IOException {
        ByteArrayOutputStream sink = new ByteArrayOutputStream();
        Terminal.Plain plain = new Terminal.Plain(sink);
        byte[] text = "U = 5.8 \u00d7 10\u207b\u2074 m\u00b3\nprogress 50 %\r".getBytes(StandardCharsets.UTF_8);
        // written a byte at a time, so the power of ten and each multi-byte character arrive split
        for (byte b : text) {
            plain.write(b);
        }
        plain.flush();
        assertEquals("U = 5.8e-4 m^3\nprogress 50 %\r", sink.toString(StandardCharsets.US_ASCII));
        sink.reset();
        byte[] mu = "\u00b5".getBytes(StandardCharsets.UTF_8);
        plain.write(mu, 0, 1); // half a character, then the rest of a line without its end: held at a flush
        plain.flush();
        assertEquals("", sink.toString(StandardCharsets.US_ASCII));
        plain.write(mu, 1, 1);
        plain.write(' ');
        plain.flush();
        assertEquals("", sink.toString(StandardCharsets.US_ASCII), "no line end, no \\r: nothing passed yet");
        plain.drain();
        assertEquals("u ", sink.toString(StandardCharsets.US_ASCII), "drained before the program exits");
        // a figure printed in pieces, a flush after each (as the stream's automatic flush does), converts whole:
        // the same form as the whole line (5.8e-4, plain()'s rule)
        sink.reset();
        try (PrintStream p = new PrintStream(new Terminal.Plain(sink), true, StandardCharsets.UTF_8)) {
            p.printf("u = %s m%n", "5.8 \u00d7 10\u207b\u2074");
            p.print("progress 10 %, 0.3 s left");
            p.print("\rprogress 20 %, 0.2 s left");
            assertEquals("u = 5.8e-4 m" + System.lineSeparator() + "progress 10 %, 0.3 s left\r",
                    sink.toString(StandardCharsets.US_ASCII), "a progress update is passed at the next \\r, whole");
            p.print("}");
        }
        assertTrue(sink.toString(StandardCharsets.US_ASCII).endsWith("progress 20 %, 0.2 s left}"),
                "what is left is passed at close: " + sink.toString(StandardCharsets.US_ASCII));
        sink.reset();
        try (PrintStream p = new PrintStream(new Terminal.Plain(sink), true, StandardCharsets.UTF_8)) {
            sink.reset();
            p.println("\u03bd_eff = 12");
        }
        assertEquals("nu_eff = 12" + System.lineSeparator(), sink.toString(StandardCharsets.US_ASCII));
    }
}
