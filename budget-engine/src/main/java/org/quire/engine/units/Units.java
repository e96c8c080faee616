package org.quire.engine.units;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

/**
 * The units Quire knows, the reader of unit expressions and the checks a model's dimension checker needs.
 *
 * <h2>Unit expressions</h2>
 * {@link #parse} reads, for example, {@code m^3/h}, {@code kg/m^3}, {@code kg m^-3}, {@code kg·m⁻³}, {@code m³/h},
 * {@code m3/h}, {@code L/min}, {@code US gal/min}, {@code µV}, {@code uV}, {@code °C}, {@code degC}, {@code /°C},
 * {@code 1/K}, {@code %}, {@code ppm}, {@code 1}, {@code W/(m·K)}, {@code Hz^(1/2)}:
 * <pre>
 * expression := ( product | "" ) [ "/" factor ]        a leading "/" means 1/...
 * product    := factor { ( "·" | "*" | "⋅" | space ) factor }
 * factor     := atom [ "^" exponent | superscripts | digits directly after a symbol (m3) ]
 * atom       := symbol | prefix symbol | "1" | "(" expression ")"
 * exponent   := [ "-" | "+" ] digits | "(" [ "-" ] digits [ "/" digits ] ")"
 * </pre>
 * Only one unit may follow a solidus (ISO 80000-1:2009 clause 7.1.3): {@code W/(m·K)}, not {@code W/m·K}.
 * SI prefixes p n µ (or u) m c d h k M G apply to the SI units and to L, t, bar; not to min, h, d, °C, °F, %,
 * ppm, in, ft, gal, psi, lb, lbf, atm.
 *
 * <h2>Exact factors</h2>
 * 1 in = 0.0254 m, 1 ft = 0.3048 m, 1 US gal = 231 in^3 = 3.785411784 L, 1 imp gal = 4.54609 L,
 * 1 bbl (US petroleum barrel) = 42 US gal, 1 lb = 0.45359237 kg, 1 lbf = 0.45359237 kg × 9.80665 m/s^2
 * = 4.4482216152605 N, 1 psi = 1 lbf/in^2, 1 bar = 10^5 Pa, 1 atm = 101325 Pa, 1 t = 1000 kg, 1 L = 10^-3 m^3,
 * t/°C = T/K - 273.15, t/°F = (T/K) × 9/5 - 459.67; % = 0.01, ppm = 10^-6. Factors of prefixed units are
 * computed in decimal and rounded once to double.
 *
 * <p>Stateless apart from a cache of parsed expressions; thread-safe.
 *
 * <p>References: NIST SP 811 (2008) Appendix B.8 and B.9 (conversion factors, exact ones in bold);
 * ISO 80000-1:2009 clauses 6.5 and 7 (unit symbols, prefixes, products and quotients);
 * BIPM SI Brochure, 9th edition (2019), Tables 4, 7 and 8 (derived units, prefixes, non-SI units accepted).
 */
public final class Units {

    private Units() {
    }

    private record Entry(String symbol, Dimension dimension, BigDecimal factor, double offset,
            boolean prefixable) {
    }

    private static final MathContext MC = MathContext.DECIMAL128;
    private static final Map<String, Entry> TABLE = new LinkedHashMap<>();
    private static final Map<String, Integer> PREFIXES = new LinkedHashMap<>();
    private static final Map<String, String> ALIASES = new LinkedHashMap<>();
    private static final List<String> CANDIDATES;
    private static final Map<String, Unit> CACHE = new ConcurrentHashMap<>();

    private static final Dimension L = Dimension.LENGTH;
    private static final Dimension M = Dimension.MASS;
    private static final Dimension T = Dimension.TIME;
    private static final Dimension I = Dimension.ELECTRIC_CURRENT;
    private static final Dimension TH = Dimension.TEMPERATURE;
    private static final Dimension ONE = Dimension.NONE;

    static {
        BigDecimal inch = new BigDecimal("0.0254");
        BigDecimal usGallon = inch.pow(3).multiply(BigDecimal.valueOf(231));
        BigDecimal lbf = new BigDecimal("0.45359237").multiply(new BigDecimal("9.80665"));
        Dimension force = M.multiply(L).divide(T.pow(2));
        Dimension pressure = force.divide(L.pow(2));
        Dimension energy = force.multiply(L);
        Dimension power = energy.divide(T);
        Dimension volt = power.divide(I);

        si("m", L);
        add("g", M, "0.001", true);
        si("s", T);
        si("A", I);
        si("K", TH);
        si("mol", Dimension.AMOUNT_OF_SUBSTANCE);
        si("cd", Dimension.LUMINOUS_INTENSITY);
        si("rad", ONE);
        si("sr", ONE);
        si("Hz", ONE.divide(T));
        si("N", force);
        si("Pa", pressure);
        si("J", energy);
        si("W", power);
        si("C", T.multiply(I));
        si("F", T.multiply(I).divide(volt));
        si("V", volt);
        si("Ω", volt.divide(I));
        si("ohm", volt.divide(I));
        si("S", I.divide(volt));
        si("T", M.divide(T.pow(2)).divide(I));
        si("Wb", energy.divide(I));
        add("L", L.pow(3), "0.001", true);
        add("l", L.pow(3), "0.001", true);
        add("t", M, "1000", true);
        add("bar", pressure, "100000", true);
        add("min", T, "60", false);
        add("h", T, "3600", false);
        add("d", T, "86400", false);
        TABLE.put("°C", new Entry("°C", TH, BigDecimal.ONE, 273.15, false));
        TABLE.put("degC", new Entry("degC", TH, BigDecimal.ONE, 273.15, false));
        BigDecimal fahrenheit = BigDecimal.valueOf(5).divide(BigDecimal.valueOf(9), MC);
        TABLE.put("°F", new Entry("°F", TH, fahrenheit, 459.67, false));
        TABLE.put("degF", new Entry("degF", TH, fahrenheit, 459.67, false));
        add("%", ONE, "0.01", false);
        add("ppm", ONE, "0.000001", false);
        TABLE.put("in", new Entry("in", L, inch, 0.0, false));
        add("ft", L, "0.3048", false);
        TABLE.put("US gal", new Entry("US gal", L.pow(3), usGallon, 0.0, false));
        add("imp gal", L.pow(3), "0.00454609", false);
        add("UK gal", L.pow(3), "0.00454609", false);
        TABLE.put("bbl", new Entry("bbl", L.pow(3), usGallon.multiply(BigDecimal.valueOf(42)), 0.0, false));
        add("lb", M, "0.45359237", false);
        TABLE.put("lbf", new Entry("lbf", force, lbf, 0.0, false));
        TABLE.put("psi", new Entry("psi", pressure, lbf.divide(inch.pow(2), MC), 0.0, false));
        add("atm", pressure, "101325", false);

        PREFIXES.put("p", -12);
        PREFIXES.put("n", -9);
        PREFIXES.put("µ", -6);
        PREFIXES.put("μ", -6);
        PREFIXES.put("u", -6);
        PREFIXES.put("m", -3);
        PREFIXES.put("c", -2);
        PREFIXES.put("d", -1);
        PREFIXES.put("h", 2);
        PREFIXES.put("k", 3);
        PREFIXES.put("M", 6);
        PREFIXES.put("G", 9);

        ALIASES.put("sec", "s");
        ALIASES.put("secs", "s");
        ALIASES.put("hr", "h");
        ALIASES.put("hrs", "h");
        ALIASES.put("hour", "h");
        ALIASES.put("lpm", "L/min");
        ALIASES.put("gpm", "US gal/min");
        ALIASES.put("cc", "mL");
        ALIASES.put("micron", "µm");
        ALIASES.put("litre", "L");
        ALIASES.put("liter", "L");
        ALIASES.put("ltr", "L");
        ALIASES.put("celsius", "°C");
        ALIASES.put("deg", "°C");
        ALIASES.put("degK", "K");
        ALIASES.put("°K", "K");
        ALIASES.put("kelvin", "K");
        ALIASES.put("psia", "psi");
        ALIASES.put("psig", "psi");
        ALIASES.put("tesla", "T");
        ALIASES.put("gauss", "T (1 G = 0.1 mT)");

        List<String> c = new ArrayList<>(TABLE.keySet());
        for (Entry e : TABLE.values()) {
            if (e.prefixable()) {
                for (String p : PREFIXES.keySet()) {
                    if (!p.equals("μ")) {
                        c.add(p + e.symbol());
                    }
                }
            }
        }
        CANDIDATES = Collections.unmodifiableList(c);
    }

    private static void si(String symbol, Dimension d) {
        TABLE.put(symbol, new Entry(symbol, d, BigDecimal.ONE, 0.0, true));
    }

    private static void add(String symbol, Dimension d, String factor, boolean prefixable) {
        TABLE.put(symbol, new Entry(symbol, d, new BigDecimal(factor), 0.0, prefixable));
    }

    // ---- public API ----------------------------------------------------------------------------------------

    /**
     * Reads a unit expression. The returned unit's symbol is the expression as written (trimmed).
     *
     * @throws UnitFormatException when the expression cannot be read; the message names the character
     *     position and what was expected, and suggests the nearest known unit for an unknown symbol
     */
    public static Unit parse(String expression) {
        if (expression == null) {
            throw new UnitFormatException("null", 0, "a unit", Messages.parse("", 0, Messages.blank()));
        }
        Unit cached = CACHE.get(expression);
        if (cached != null) {
            return cached;
        }
        Unit u = new Parser(expression).parseAll();
        if (CACHE.size() < 4096) {
            CACHE.put(expression, u);
        }
        return u;
    }

    /**
     * @return {@code null} when quantities in {@code left} and {@code right} may be added, subtracted or
     *     compared (same dimension), otherwise a sentence showing both sides, e.g. "cannot add or subtract
     *     quantities of different dimensions: left side m^3/h (m^3/s), right side kg/s"
     */
    public static String additionProblem(Unit left, Unit right) {
        return left.sameDimension(right) ? null : Messages.notAddable(left, right);
    }

    /** @throws UnitException with the message of {@link #additionProblem} when the dimensions differ */
    public static void requireAddable(Unit left, Unit right) {
        String problem = additionProblem(left, right);
        if (problem != null) {
            throw new UnitException(problem);
        }
    }

    /**
     * @param context what must be dimensionless, e.g. "the argument of exp"
     * @return {@code null} when {@code unit} is dimensionless, otherwise a sentence naming the context and unit
     */
    public static String dimensionlessProblem(String context, Unit unit) {
        return unit.isDimensionless() ? null : Messages.notDimensionless(context, unit);
    }

    /**
     * The form in which reports, certificates and screens show a unit as written in a budget: powers as
     * superscripts ({@code m^3/h} and {@code m3/h} as m³/h, {@code kg m^-3} as kg·m⁻³), products with the half-high
     * dot, {@code degC} as °C and {@code uV} as µV (SI Brochure, 9th ed., 5.4.3 and 5.4.6). The form shown reads back
     * as the same unit; a text that is not a unit expression (a blank, or free text in an old file) is returned
     * trimmed, as written.
     *
     * @param written the unit as written
     * @return its display form
     */
    public static String display(String written) {
        if (written == null) {
            return "";
        }
        String w = written.strip();
        if (w.isEmpty()) {
            return w;
        }
        Unit original;
        try {
            original = parse(w);
        } catch (UnitFormatException e) {
            return w;
        }
        StringBuilder out = new StringBuilder();
        int i = 0;
        while (i < w.length()) {
            char c = w.charAt(i);
            if (c == '^') {
                int j = i + 1;
                boolean paren = j < w.length() && w.charAt(j) == '(';
                int k = paren ? j + 1 : j;
                int start = k;
                if (k < w.length() && (w.charAt(k) == '-' || w.charAt(k) == '+')) {
                    k++;
                }
                while (k < w.length() && Character.isDigit(w.charAt(k))) {
                    k++;
                }
                boolean whole = k > start && Character.isDigit(w.charAt(k - 1)) && (!paren || (k < w.length() && w.charAt(k) == ')'));
                if (!whole) {
                    out.append(c);
                    i++;
                    continue;
                }
                out.append(superscript(w.substring(start, k)));
                i = paren ? k + 1 : k;
            } else if (Character.isDigit(c) && i > 0 && Character.isLetter(w.charAt(i - 1))) {
                int k = i;
                while (k < w.length() && Character.isDigit(w.charAt(k))) {
                    k++;
                }
                out.append(superscript(w.substring(i, k)));
                i = k;
            } else if (c == '*' || c == '\u22c5' || (c == ' ' && i > 0 && i + 1 < w.length()
                    && Character.isLetter(w.charAt(i - 1)) && Character.isLetter(w.charAt(i + 1)) && !w.startsWith("US ")
                    && !w.startsWith("imp "))) {
                out.append('·');
                i++;
            } else {
                out.append(c);
                i++;
            }
        }
        String shown = out.toString().replace("degC", "°C").replace("degF", "°F");
        if (shown.startsWith("u") && shown.length() > 1 && Character.isLetter(shown.charAt(1))) {
            String micro = "µ" + shown.substring(1);
            shown = readsAs(micro, original) ? micro : shown;
        }
        return readsAs(shown, original) ? shown : w;
    }

    private static boolean readsAs(String shown, Unit original) {
        try {
            Unit u = parse(shown);
            return u.dimension().equals(original.dimension()) && u.factor() == original.factor()
                    && u.offset() == original.offset();
        } catch (UnitFormatException e) {
            return false;
        }
    }

    private static String superscript(String exponent) {
        StringBuilder s = new StringBuilder();
        for (char c : exponent.toCharArray()) {
            s.append(c == '-' ? '⁻' : c == '+' ? '⁺' : "⁰¹²³⁴⁵⁶⁷⁸⁹".charAt(c - '0'));
        }
        return s.toString();
    }

    /** @return the known unit symbols without prefixes, in a fixed order, for help texts */
    public static List<String> symbols() {
        return List.copyOf(TABLE.keySet());
    }

    /** @return whether SI prefixes apply to this symbol of {@link #symbols()} (k for km, m for mL ...) */
    public static boolean prefixable(String symbol) {
        Entry e = TABLE.get(symbol);
        if (e == null) {
            throw new IllegalArgumentException("symbol: '" + symbol + "' is not a unit of the table");
        }
        return e.prefixable();
    }

    /** @return the other spellings the reader accepts, each with the unit it stands for, for help texts */
    public static Map<String, String> aliases() {
        return Collections.unmodifiableMap(ALIASES);
    }

    /** @return the SI prefixes accepted, with their powers of ten */
    public static Map<String, Integer> prefixes() {
        return Collections.unmodifiableMap(PREFIXES);
    }

    // ---- symbol resolution ---------------------------------------------------------------------------------

    private static Unit unitOf(Entry e, String symbol, int power10) {
        double factor = e.factor().scaleByPowerOfTen(power10).doubleValue();
        return Unit.ofAffine(symbol, e.dimension(), factor, e.offset());
    }

    /** @return the unit, or null with {@code problem[0]} set */
    private static Unit resolve(String symbol, String[] problem) {
        Entry e = TABLE.get(symbol);
        if (e != null) {
            return unitOf(e, symbol, 0);
        }
        if (symbol.equals("gal")) {
            problem[0] = Messages.ambiguousGallon();
            return null;
        }
        if (symbol.length() > 1) {
            String p = symbol.substring(0, 1);
            Entry rest = TABLE.get(symbol.substring(1));
            Integer power = PREFIXES.get(p);
            if (power != null && rest != null && !ALIASES.containsKey(symbol)) {
                if (rest.prefixable()) {
                    return unitOf(rest, symbol, power);
                }
                problem[0] = Messages.notPrefixable(p, rest.symbol());
                return null;
            }
        }
        problem[0] = Messages.unknownSymbol(symbol, suggest(symbol));
        return null;
    }

    /** @return the nearest known unit to an unknown symbol, quoted, or null when nothing is near */
    static String suggest(String symbol) {
        String alias = ALIASES.get(symbol);
        if (alias == null) {
            alias = ALIASES.get(symbol.toLowerCase(Locale.ROOT));
        }
        if (alias != null) {
            return Messages.quote(alias);
        }
        String best = null;
        int bestScore = Integer.MAX_VALUE;
        for (String c : CANDIDATES) {
            int score;
            if (c.equalsIgnoreCase(symbol)) {
                score = 0;
            } else {
                int d = distance(c.toLowerCase(Locale.ROOT), symbol.toLowerCase(Locale.ROOT));
                if (d > 2 || d >= Math.max(symbol.length(), c.length())) {
                    continue;
                }
                score = 10 * d + distance(c, symbol);
            }
            if (score < bestScore) {
                bestScore = score;
                best = c;
            }
        }
        return best == null ? null : Messages.quote(best);
    }

    /** Optimal string alignment distance (Levenshtein with transpositions). */
    private static int distance(String a, String b) {
        int[][] d = new int[a.length() + 1][b.length() + 1];
        for (int i = 0; i <= a.length(); i++) {
            d[i][0] = i;
        }
        for (int j = 0; j <= b.length(); j++) {
            d[0][j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            for (int j = 1; j <= b.length(); j++) {
                int cost = a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1;
                int v = Math.min(Math.min(d[i - 1][j] + 1, d[i][j - 1] + 1), d[i - 1][j - 1] + cost);
                if (i > 1 && j > 1 && a.charAt(i - 1) == b.charAt(j - 2) && a.charAt(i - 2) == b.charAt(j - 1)) {
                    v = Math.min(v, d[i - 2][j - 2] + 1);
                }
                d[i][j] = v;
            }
        }
        return d[a.length()][b.length()];
    }

    // ---- parser --------------------------------------------------------------------------------------------

    /** Recursive-descent reader of one expression; not thread-safe, used by one call of {@link #parse}. */
    private static final class Parser {
        private static final String SUPERSCRIPT_DIGITS = "⁰¹²³⁴⁵⁶⁷⁸⁹";
        private final String in;
        private int pos;

        Parser(String in) {
            this.in = in;
        }

        Unit parseAll() {
            skipSpaces();
            if (pos >= in.length()) {
                throw fail(0, "a unit", Messages.blank());
            }
            Unit u = expression();
            skipSpaces();
            if (pos < in.length()) {
                if (peek() == ')') {
                    throw fail(pos, "the end", "unmatched ')'");
                }
                throw fail(pos, "an operator or the end", Messages.expected("'·', '/', '^' or the end"));
            }
            return u.withSymbol(in.trim());
        }

        private Unit expression() {
            Unit result = peek() == '/' ? Unit.ONE : product();
            skipSpaces();
            if (peek() == '/') {
                pos++;
                skipSpaces();
                if (!startsAtom()) {
                    throw fail(pos, "a unit", Messages.expected("a unit after '/'"));
                }
                result = result.divide(factor());
                int save = pos;
                skipSpaces();
                if (peek() == '/') {
                    throw fail(pos, "the end", Messages.secondSolidus());
                }
                if (isMultiply(peek()) || (pos > save && startsAtom())) {
                    throw fail(pos, "the end", Messages.afterSolidus());
                }
                pos = save;
            }
            return result;
        }

        private Unit product() {
            Unit r = factor();
            while (true) {
                int save = pos;
                skipSpaces();
                char c = peek();
                if (isMultiply(c)) {
                    pos++;
                    skipSpaces();
                    if (!startsAtom()) {
                        throw fail(pos, "a unit", Messages.expected("a unit after '" + c + "'"));
                    }
                    r = r.multiply(factor());
                } else if (pos > save && startsAtom()) {
                    r = r.multiply(factor());
                } else {
                    pos = save;
                    return r;
                }
            }
        }

        private Unit factor() {
            int start = pos;
            char c = peek();
            Unit atom;
            boolean digitsAsExponent = false;
            if (c == '(') {
                pos++;
                skipSpaces();
                if (!startsAtom() && peek() != '/') {
                    throw fail(pos, "a unit", Messages.expected("a unit after '('"));
                }
                atom = expression();
                skipSpaces();
                if (peek() != ')') {
                    throw fail(pos, "')'", Messages.expected("')' to close the '(' at character " + (start + 1)));
                }
                pos++;
            } else if (isDigit(c)) {
                while (pos < in.length() && (isDigit(peek()) || peek() == '.')) {
                    pos++;
                }
                String number = in.substring(start, pos);
                if (!number.equals("1")) {
                    throw fail(start, "a unit", Messages.numberNotUnit(number));
                }
                atom = Unit.ONE;
            } else if (isSymbolStart(c)) {
                String symbol = symbol();
                String[] problem = new String[1];
                atom = resolve(symbol, problem);
                if (atom == null) {
                    throw fail(start, "a known unit", problem[0]);
                }
                digitsAsExponent = true;
            } else {
                throw fail(start, "a unit", Messages.expected("a unit"));
            }
            int expStart = pos;
            int[] exponent = exponent(digitsAsExponent);
            if (exponent == null) {
                return atom;
            }
            try {
                return atom.pow(exponent[0], exponent[1]);
            } catch (UnitException e) {
                throw fail(expStart, "a whole-number power", e.getMessage());
            }
        }

        /** @return {numerator, denominator} or null when no exponent follows */
        private int[] exponent(boolean digitsAsExponent) {
            char c = peek();
            if (c == '^') {
                pos++;
                if (peek() == '(') {
                    int open = pos;
                    pos++;
                    int num = signedInteger();
                    int den = 1;
                    if (peek() == '/') {
                        pos++;
                        den = unsignedInteger("a whole-number denominator");
                    }
                    if (peek() != ')') {
                        throw fail(pos, "')'", Messages.expected(
                                "')' to close the exponent opened at character " + (open + 1)));
                    }
                    pos++;
                    return new int[] {num, den};
                }
                return new int[] {signedInteger(), 1};
            }
            if (c == '⁻' || c == '⁺' || SUPERSCRIPT_DIGITS.indexOf(c) >= 0) {
                boolean negative = c == '⁻';
                if (c == '⁻' || c == '⁺') {
                    pos++;
                }
                int start = pos;
                long v = 0;
                while (pos < in.length() && SUPERSCRIPT_DIGITS.indexOf(peek()) >= 0) {
                    v = v * 10 + SUPERSCRIPT_DIGITS.indexOf(peek());
                    pos++;
                    checkSize(v, start);
                }
                if (pos == start) {
                    throw fail(pos, "an exponent", Messages.expected("a superscript digit"));
                }
                return new int[] {(int) (negative ? -v : v), 1};
            }
            if (digitsAsExponent && isDigit(c)) {
                return new int[] {unsignedInteger("an exponent"), 1};
            }
            return null;
        }

        private int signedInteger() {
            boolean negative = false;
            char c = peek();
            if (c == '-' || c == '−' || c == '+') {
                negative = c != '+';
                pos++;
            }
            int v = unsignedInteger("an exponent (a whole number such as 2 or -3) after '^'");
            return negative ? -v : v;
        }

        private int unsignedInteger(String what) {
            int start = pos;
            long v = 0;
            while (pos < in.length() && isDigit(peek())) {
                v = v * 10 + (peek() - '0');
                pos++;
                checkSize(v, start);
            }
            if (pos == start) {
                throw fail(pos, what, Messages.expected(what));
            }
            return (int) v;
        }

        private void checkSize(long v, int start) {
            if (v > 1000) {
                throw fail(start, "a small exponent", "an exponent larger than 1000 is not a unit exponent");
            }
        }

        private String symbol() {
            int start = pos;
            char c = peek();
            if (c == '%') {
                pos++;
                return "%";
            }
            if (c == '°') {
                pos++;
            }
            while (pos < in.length() && Character.isLetter(peek())) {
                pos++;
            }
            String word = in.substring(start, pos);
            if (word.equals("US") || word.equals("imp") || word.equals("UK")) {
                int save = pos;
                skipSpaces();
                if (in.startsWith("gal", pos)
                        && (pos + 3 >= in.length() || !Character.isLetter(in.charAt(pos + 3)))) {
                    pos += 3;
                    return word + " gal";
                }
                pos = save;
            }
            return word;
        }

        private boolean startsAtom() {
            char c = peek();
            return c == '(' || isDigit(c) || isSymbolStart(c);
        }

        private static boolean isSymbolStart(char c) {
            return Character.isLetter(c) || c == '°' || c == '%';
        }

        private static boolean isMultiply(char c) {
            return c == '·' || c == '*' || c == '⋅' || c == '×';
        }

        private static boolean isDigit(char c) {
            return c >= '0' && c <= '9';
        }

        private char peek() {
            return pos < in.length() ? in.charAt(pos) : '\0';
        }

        private void skipSpaces() {
            while (pos < in.length() && Character.isWhitespace(in.charAt(pos))) {
                pos++;
            }
        }

        private UnitFormatException fail(int position, String expected, String problem) {
            return new UnitFormatException(in, position, expected, Messages.parse(in, position, problem));
        }
    }
}
