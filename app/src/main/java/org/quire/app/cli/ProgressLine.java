package org.quire.app.cli;

import java.io.PrintStream;
import java.util.Locale;
import java.util.function.LongSupplier;
import org.quire.engine.montecarlo.ProgressListener;

/**
 * A progress line on stderr for long command-line work: {@code Monte Carlo  42 %  4.2e6 of 1e7 trials,
 * 3.1e6 trials/s, 2 s left}, rewritten in place at most four times a second. It is drawn only when stderr is a
 * terminal ({@link System#console()}) and {@code --quiet} was not given, so piped output and logs stay clean.
 *
 * <p>{@link #progress} may be called from several threads (batch rows finish on worker threads); it never asks
 * to cancel.
 */
final class ProgressLine implements ProgressListener {
    private static final long INTERVAL_NANOS = 250_000_000L;
    private final PrintStream err;
    private final String label;
    private final String unit;
    private final boolean shown;
    private final LongSupplier clock;
    private final long started;
    private long lastDrawn;
    private int width;

    ProgressLine(PrintStream err, String label, String unit, boolean shown, LongSupplier clock) {
        this.err = err;
        this.label = label;
        this.unit = unit;
        this.shown = shown;
        this.clock = clock;
        this.started = clock.getAsLong();
        this.lastDrawn = started;
    }

    /** @return a line drawn only on a terminal and without {@code --quiet} */
    static ProgressLine forTerminal(PrintStream err, String label, String unit, boolean quiet) {
        return new ProgressLine(err, label, unit, !quiet && System.console() != null, System::nanoTime);
    }

    @Override
    public synchronized void progress(long done, long planned) {
        if (!shown) {
            return;
        }
        long now = clock.getAsLong();
        if (now - lastDrawn < INTERVAL_NANOS && done < planned) {
            return;
        }
        lastDrawn = now;
        String text = text(done, planned, (now - started) / 1e9);
        err.print("\r" + text + " ".repeat(Math.max(0, width - text.length())));
        err.flush();
        width = text.length();
    }

    /** @return the line for {@code done} of {@code planned} after {@code seconds} */
    String text(long done, long planned, double seconds) {
        StringBuilder s = new StringBuilder(label);
        double fraction = planned > 0 ? Math.min(1.0, (double) done / planned) : 0;
        s.append(String.format(Locale.ROOT, " %3d %%  %s of %s %s", (int) (100 * fraction), count(done),
                count(planned), unit));
        if (seconds > 0 && done > 0) {
            double rate = done / seconds;
            s.append(", ").append(count(Math.round(rate))).append(' ').append(unit).append("/s");
            if (done < planned) {
                s.append(", ").append(duration((planned - done) / rate)).append(" left");
            }
        }
        return s.toString();
    }

    /** Clears the line so that the results start on a clean line. */
    synchronized void finish() {
        if (shown && width > 0) {
            err.print("\r" + " ".repeat(width) + "\r");
            err.flush();
            width = 0;
        }
    }

    @Override
    public boolean cancelRequested() {
        return false;
    }

    static String count(long n) {
        if (n < 100_000) {
            return Long.toString(n);
        }
        return String.format(Locale.ROOT, "%.3g", (double) n).replace("e+0", "e").replace("e+", "e");
    }

    static String duration(double seconds) {
        if (seconds < 60) {
            return String.format(Locale.ROOT, "%.0f s", Math.ceil(seconds));
        }
        long s = Math.round(seconds);
        if (s < 3600) {
            return String.format(Locale.ROOT, "%d min %02d s", s / 60, s % 60);
        }
        return String.format(Locale.ROOT, "%d h %02d min", s / 3600, (s % 3600) / 60);
    }
}
