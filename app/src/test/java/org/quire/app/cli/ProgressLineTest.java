package org.quire.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.Test;

/** The progress line of long command-line work: rate and time left on a terminal, nothing otherwise. */
class ProgressLineTest {
    private final long[] now = {0};

    private ProgressLine line(ByteArrayOutputStream buf, boolean shown) {
        return new ProgressLine(new PrintStream(buf, true, StandardCharsets.UTF_8), "Monte Carlo", "trials", shown,
                () -> now[0]);
    }

    @Test
    void theLineGivesTheRateAndTheTimeLeft() {
        ByteArrayOutputStream buf = new ByteArrayOutputStream();
        ProgressLine p = line(buf, true);
        now[0] = 2_000_000_000L;
        p.progress(4_000_000, 10_000_000);
        // 4e6 trials in 2 s: 2e6 trials/s; 6e6 left at that rate: 3 s (arithmetic)
        String s = buf.toString(StandardCharsets.UTF_8);
        assertEquals("\rMonte Carlo  40 %  4.00e6 of 1.00e7 trials, 2.00e6 trials/s, 3 s left", s);
        p.finish();
        assertTrue(buf.toString(StandardCharsets.UTF_8).endsWith("\r"), "the line is cleared at the end");
    }

    @Test
    void theLineIsDrawnAtMostFourTimesASecond() {
        ByteArrayOutputStream buf = new ByteArrayOutputStream();
        ProgressLine p = line(buf, true);
        now[0] = 300_000_000L;
        p.progress(10, 100);
        int once = buf.size();
        now[0] = 400_000_000L;
        p.progress(20, 100);
        assertEquals(once, buf.size(), "100 ms later nothing is drawn");
        now[0] = 700_000_000L;
        p.progress(30, 100);
        assertTrue(buf.size() > once);
    }

    @Test
    void nothingIsPrintedWhenPipedOrQuiet() {
        ByteArrayOutputStream buf = new ByteArrayOutputStream();
        ProgressLine p = line(buf, false);
        now[0] = 5_000_000_000L;
        p.progress(5, 10);
        p.finish();
        assertEquals(0, buf.size());
        // tests run with stderr piped into the build's log: no console, so the terminal line stays off
        assertEquals(0, measureQuietRun());
    }

    private int measureQuietRun() {
        ByteArrayOutputStream buf = new ByteArrayOutputStream();
        ProgressLine p = ProgressLine.forTerminal(new PrintStream(buf, true, StandardCharsets.UTF_8), "x", "rows",
                false);
        now[0] = 0;
        p.progress(1, 2);
        p.finish();
        return System.console() == null ? buf.size() : 0;
    }

    @Test
    void longRunsAreGivenInMinutesAndHours() {
        assertEquals("2 min 05 s", ProgressLine.duration(125));
        assertEquals("1 h 01 min", ProgressLine.duration(3660));
        assertEquals("1 s", ProgressLine.duration(0.2));
    }
}
