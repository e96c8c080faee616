package org.quire.app.cli;

import java.io.ByteArrayOutputStream;
import java.io.FileDescriptor;
import java.io.FileOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.io.PrintStream;
import java.nio.charset.Charset;
import java.nio.charset.CharsetEncoder;
import java.nio.charset.StandardCharsets;
import java.text.Normalizer;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.quire.engine.gum.Figures;

/**
 * The command line's standard output and error in the terminal's character set. The command line writes figures,
 * units and names as the reports and the workbench do ({@code 2.89 × 10⁻⁵ mm}, {@code m³/h}, {@code ν_eff},
 * {@code ±}); where the terminal's character set cannot show them (a {@code C} or {@code POSIX} locale, which
 * Java reads as US-ASCII), each is written in a plain ASCII form that reads back as the same number or unit
 * ({@code 2.89e-5 mm}, {@code m^3/h}, {@code nu_eff}, {@code +/-}) instead of the {@code ?} the encoder would put
 * in its place. Text is converted a line at a time, so a number is never split.
 *
 * <p>Streams are thread-safe as {@link PrintStream} is.
 */
public final class Terminal {
    private static final Pattern POWER = Pattern.compile("([\u2212-]?[0-9][0-9.\u202f]*) \u00d7 10([\u207b\u2070\u00b9\u00b2\u00b3\u2074-\u2079]+)");
    private static final String SUPERSCRIPTS = "\u2070\u00b9\u00b2\u00b3\u2074\u2075\u2076\u2077\u2078\u2079";
    private static final Map<Character, String> PLAIN = Map.ofEntries(
            Map.entry('\u2212', "-"), Map.entry('\u2013', "-"), Map.entry('\u2014', "-"), Map.entry('\u2010', "-"),
            Map.entry('\u202f', ""), Map.entry('\u00a0', " "), Map.entry('\u2009', " "),
            Map.entry('\u00b1', "+/-"), Map.entry('\u00d7', "x"), Map.entry('\u00b7', "*"), Map.entry('\u22c5', "*"),
            Map.entry('\u03bd', "nu"), Map.entry('\u00b5', "u"), Map.entry('\u03bc', "u"), Map.entry('\u03b4', "delta"),
            Map.entry('\u0394', "Delta"), Map.entry('\u03b1', "alpha"), Map.entry('\u03b8', "theta"),
            Map.entry('\u03c1', "rho"), Map.entry('\u03c3', "sigma"), Map.entry('\u221e', "inf"),
            Map.entry('\u2264', "<="), Map.entry('\u2265', ">="), Map.entry('\u2260', "!="), Map.entry('\u2248', "~"),
            Map.entry('\u221a', "sqrt"), Map.entry('\u2026', "..."), Map.entry('\u2018', "'"), Map.entry('\u2019', "'"),
            Map.entry('\u201c', "'"), Map.entry('\u201d', "'"), Map.entry('\u2022', "*"), Map.entry('\u2192', "->"),
            Map.entry('\u2190', "<-"), Map.entry('\u2713', "ok"), Map.entry('\u2717', "x"), Map.entry('\u207b', "^-"),
            Map.entry('\u2080', "0"), Map.entry('\u2081', "1"), Map.entry('\u2082', "2"), Map.entry('\u2083', "3"),
            Map.entry('\u2084', "4"), Map.entry('\u2085', "5"), Map.entry('\u2086', "6"), Map.entry('\u2087', "7"),
            Map.entry('\u2088', "8"), Map.entry('\u2089', "9"));

    private Terminal() {
    }

    /** @return standard output, in ASCII forms where the terminal's character set needs them */
    public static PrintStream out() {
        return stream(System.out, FileDescriptor.out);
    }

    /** @return standard error, in ASCII forms where the terminal's character set needs them */
    public static PrintStream err() {
        return stream(System.err, FileDescriptor.err);
    }

    private static PrintStream stream(PrintStream system, FileDescriptor fd) {
        Charset cs = charset();
        if (canShow(cs)) {
            return system;
        }
        Plain plain = new Plain(new FileOutputStream(fd));
        OPEN.add(plain);
        return new PrintStream(plain, true, StandardCharsets.UTF_8);
    }

    /** The ASCII streams made, whose last partial line {@link #drain} passes on. */
    private static final java.util.List<Plain> OPEN = new java.util.concurrent.CopyOnWriteArrayList<>();

    /**
     * Passes on what the ASCII streams still hold (output that does not end with a line end): to be called before
     * the program exits.
     */
    public static void drain() {
        for (Plain p : OPEN) {
            try {
                p.drain();
            } catch (IOException e) {
                // the terminal has gone; nothing is left to tell
            }
        }
    }

    /** The character set the JVM writes standard output in (Java 17: the locale's, as {@code native.encoding}). */
    private static Charset charset() {
        for (String key : new String[] {"stdout.encoding", "sun.stdout.encoding", "native.encoding"}) {
            String name = System.getProperty(key);
            if (name != null && Charset.isSupported(name)) {
                return Charset.forName(name);
            }
        }
        return Charset.defaultCharset();
    }

    /** @return whether the character set can write the characters the command line uses */
    static boolean canShow(Charset cs) {
        if (!cs.canEncode()) {
            return false;
        }
        CharsetEncoder e = cs.newEncoder();
        return e.canEncode("\u00b1\u00d7\u2212\u207b\u00b3\u03bd\u00b5\u202f\u221e\u2264\u00b7\u2013");
    }

    /**
     * A line of text in plain ASCII forms: powers of ten as computer exponents ({@code 2.89 × 10⁻⁵} as
     * {@code 2.89e-5}, by {@link Figures#plain}), superscript powers of units as {@code ^3}, {@code ^-3}, the
     * names and signs of {@link #PLAIN}, and letters with accents without them; any other character outside
     * ASCII as {@code ?}.
     *
     * @param line text as the command line writes it
     * @return the same text in ASCII
     */
    public static String plain(String line) {
        Matcher m = POWER.matcher(line);
        StringBuilder s = new StringBuilder(line.length() + 16);
        int i = 0;
        while (i < line.length()) {
            if (m.find(i) && m.start() == i) {
                put(s, Figures.plain(m.group()), m.end() - m.start());
                i = m.end();
                continue;
            }
            char c = line.charAt(i);
            i++;
            if (c < 128) {
                s.append(c);
                continue;
            }
            int d = SUPERSCRIPTS.indexOf(c);
            if (d >= 0) {
                boolean afterPower = s.length() > 1 && s.charAt(s.length() - 1) == '-' && s.charAt(s.length() - 2) == '^'
                        || i > 1 && SUPERSCRIPTS.indexOf(line.charAt(i - 2)) >= 0;
                put(s, afterPower ? String.valueOf((char) ('0' + d)) : "^" + (char) ('0' + d), 1);
                continue;
            }
            if (c == '\u00b0') {
                put(s, "deg", 1);
                continue;
            }
            String p = PLAIN.get(c);
            if (p != null) {
                put(s, p, 1);
                continue;
            }
            String stripped = Normalizer.normalize(String.valueOf(c), Normalizer.Form.NFD).replaceAll("\\p{M}", "");
            s.append(stripped.length() == 1 && stripped.charAt(0) < 128 ? stripped : "?");
        }
        return s.toString();
    }

    /**
     * Appends the plain form of {@code shown} characters, keeping a right-aligned column aligned: a longer form
     * takes its extra width from the spaces before it where there are more than enough, a shorter one after two
     * or more spaces is padded to the same width.
     */
    private static void put(StringBuilder s, String plain, int shown) {
        int spaces = 0;
        while (spaces < s.length() && s.charAt(s.length() - 1 - spaces) == ' ') {
            spaces++;
        }
        int delta = plain.length() - shown;
        if (delta > 0 && spaces > delta) {
            s.setLength(s.length() - delta);
        } else if (delta < 0 && spaces >= 2) {
            s.append(" ".repeat(-delta));
        }
        s.append(plain);
    }

    /** An output stream that takes UTF-8 text and passes it on a line at a time in its {@link #plain} form. */
    static final class Plain extends OutputStream {
        private final OutputStream target;
        private final ByteArrayOutputStream line = new ByteArrayOutputStream();

        Plain(OutputStream target) {
            this.target = target;
        }

        @Override
        public synchronized void write(int b) throws IOException {
            line.write(b);
            if (b == '\n') {
                pass();
            }
        }

        @Override
        public synchronized void write(byte[] b, int off, int len) throws IOException {
            int start = off;
            for (int i = off; i < off + len; i++) {
                if (b[i] == '\n') {
                    line.write(b, start, i + 1 - start);
                    pass();
                    start = i + 1;
                }
            }
            line.write(b, start, off + len - start);
        }

        @Override
        public synchronized void flush() throws IOException {
            // a partial line is passed on at a flush only up to its last \r (a progress line rewritten in place,
            // shown one update late); the rest waits for the line's end, so that a figure printed in pieces (the
            // stream flushes after every print) is converted whole, as 5.8e-4 and not 5.8 x 10^-4
            byte[] bytes = line.toByteArray();
            int upTo = bytes.length;
            while (upTo > 0 && bytes[upTo - 1] != '\r') {
                upTo--;
            }
            if (upTo > 0) {
                target.write(plain(new String(bytes, 0, upTo, StandardCharsets.UTF_8)).getBytes(StandardCharsets.US_ASCII));
                line.reset();
                line.write(bytes, upTo, bytes.length - upTo);
            }
            target.flush();
        }

        /** Passes on everything held, up to the last whole character. */
        synchronized void drain() throws IOException {
            byte[] rest = line.toByteArray();
            int whole = completeCharacters(rest);
            line.reset();
            line.write(rest, whole, rest.length - whole);
            target.write(plain(new String(rest, 0, whole, StandardCharsets.UTF_8)).getBytes(StandardCharsets.US_ASCII));
            target.flush();
        }

        /** @return the length of the longest prefix of UTF-8 bytes that ends at a character's end */
        static int completeCharacters(byte[] bytes) {
            int lead = bytes.length;
            while (lead > 0 && (bytes[lead - 1] & 0xc0) == 0x80) {
                lead--;
            }
            if (lead == 0) {
                return 0;
            }
            int b = bytes[lead - 1] & 0xff;
            int size = b < 0x80 ? 1 : b >= 0xf0 ? 4 : b >= 0xe0 ? 3 : b >= 0xc0 ? 2 : 1;
            return bytes.length - (lead - 1) >= size ? bytes.length : lead - 1;
        }

        private void pass() throws IOException {
            target.write(plain(line.toString(StandardCharsets.UTF_8)).getBytes(StandardCharsets.US_ASCII));
            line.reset();
        }

        @Override
        public synchronized void close() throws IOException {
            drain();
            target.close();
        }
    }
}
