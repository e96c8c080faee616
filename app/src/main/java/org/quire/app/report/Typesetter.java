package org.quire.app.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.quire.app.report.MathText.Run;
import org.quire.app.report.MathText.Shift;
import org.quire.engine.model.Formula;
import org.quire.engine.units.Units;

/**
 * Sets the equations of a measurement model, and the names of quantities, as readable mathematics.
 *
 * <ul>
 * <li>A name's first part is its symbol and the parts after underscores its subscript: {@code l_s} is l with
 *     subscript s, {@code d_mean} is d with subscript "mean", {@code m_Rc_cal} is m with subscript "Rc,cal".</li>
 * <li>Greek names spelled out become the letter: {@code alpha} α, {@code theta} θ, {@code Delta} Δ. A name
 *     starting with {@code delta_} or {@code Delta_} is the small difference or change of what follows
 *     (JCGM 100:2008 H.1 writes δα and δθ), so {@code delta_theta} is δθ.</li>
 * <li>Variables and one-letter subscripts are italic; numbers, operators, function names and descriptive
 *     subscripts of several letters are upright (ISO 80000-2 and the SI Brochure, 9th ed. 5.1 and 5.3).</li>
 * <li>{@code *} is set as the middle dot ·, {@code -} as the minus sign −, {@code a/b} stays a solidus with the
 *     parentheses the meaning needs, {@code x^2} a superscript, {@code sqrt(x)} as √(x), {@code abs(x)} as |x|,
 *     {@code pi} as π and {@code 1.5e-3} as 1.5 × 10⁻³.</li>
 * </ul>
 * Equations are set from the compiled model's {@link Formula} tree, which knows which names are inputs,
 * quantities, parameters and functions: a function of the engine's library or of the model, such as
 * {@code water_density(t_w)}, is a word set upright as written, never a symbol with a subscript.
 *
 * <p>Stateless and thread-safe.
 */
public final class Typesetter {
    private static final Map<String, String> GREEK = Map.ofEntries(
            Map.entry("alpha", "α"), Map.entry("beta", "β"), Map.entry("gamma", "γ"), Map.entry("delta", "δ"),
            Map.entry("epsilon", "ε"), Map.entry("zeta", "ζ"), Map.entry("eta", "η"), Map.entry("theta", "θ"),
            Map.entry("iota", "ι"), Map.entry("kappa", "κ"), Map.entry("lambda", "λ"), Map.entry("mu", "μ"),
            Map.entry("nu", "ν"), Map.entry("xi", "ξ"), Map.entry("rho", "ρ"), Map.entry("sigma", "σ"),
            Map.entry("tau", "τ"), Map.entry("upsilon", "υ"), Map.entry("phi", "φ"), Map.entry("chi", "χ"),
            Map.entry("psi", "ψ"), Map.entry("omega", "ω"), Map.entry("Gamma", "Γ"), Map.entry("Delta", "Δ"),
            Map.entry("Theta", "Θ"), Map.entry("Lambda", "Λ"), Map.entry("Xi", "Ξ"), Map.entry("Pi", "Π"),
            Map.entry("Sigma", "Σ"), Map.entry("Phi", "Φ"), Map.entry("Psi", "Ψ"), Map.entry("Omega", "Ω"));

    private Typesetter() {
    }

    /** @return the Greek letter a spelled-out name stands for, or null */
    static String greek(String word) {
        return GREEK.get(word);
    }

    /** @return a quantity's name set as a symbol, e.g. {@code delta_theta} as δθ */
    public static MathText name(String name) {
        List<Run> out = new ArrayList<>();
        name(name, Shift.BASE, out);
        return MathText.of(out, name);
    }

    /**
     * @param line one line of a compiled model, {@code name = formula} or, for a function of the model's own,
     *     {@code f(a, b) = formula}
     * @return the line set as mathematics
     */
    public static MathText equation(Formula.Line line) {
        List<Run> out = new ArrayList<>();
        if (line.isFunction()) {
            out.add(new Run(line.name() + "(", false, Shift.BASE));
            for (int i = 0; i < line.parameters().size(); i++) {
                if (i > 0) {
                    out.add(new Run(", ", false, Shift.BASE));
                }
                name(line.parameters().get(i), Shift.BASE, out);
            }
            out.add(new Run(")", false, Shift.BASE));
        } else {
            name(line.name(), Shift.BASE, out);
        }
        out.add(new Run(" = ", false, Shift.BASE));
        set(line.right(), out, Shift.BASE, 0);
        return MathText.of(out);
    }

    /**
     * Sets words written by a person or a budget file (notes, sources, bases, findings) for reading: "+-" and
     * "+/-" as "±", a power written after a unit symbol ({@code m^3}, {@code kg/m^3}, {@code s^-1}) with
     * superscript digits. Nothing else is changed.
     *
     * @return the words, upright
     */
    public static MathText prose(String words) {
        String t = words.replace("+/-", "±").replace("+-", "±");
        java.util.regex.Matcher m = POWER.matcher(t);
        StringBuilder out = new StringBuilder();
        while (m.find()) {
            StringBuilder sup = new StringBuilder();
            for (char c : m.group(2).toCharArray()) {
                sup.append(c == '-' ? '⁻' : "⁰¹²³⁴⁵⁶⁷⁸⁹".charAt(c - '0'));
            }
            m.appendReplacement(out, java.util.regex.Matcher.quoteReplacement(m.group(1) + sup));
        }
        m.appendTail(out);
        return MathText.upright(out.toString());
    }

    /**
     * Sets a sentence of the program's own that holds formulas: the parts alternate between words (set as {@link
     * #prose(String)}) and formulas (set as {@link #label(String)}), starting with words, e.g. {@code words("Errors
     * ", "E = 100 (q_ind − q_ref) / q_ref", " in %")}.
     *
     * @return the sentence, its formulas typeset
     */
    public static MathText words(String... parts) {
        List<MathText> out = new ArrayList<>();
        for (int i = 0; i < parts.length; i++) {
            out.add(i % 2 == 0 ? prose(parts[i]) : label(parts[i]));
        }
        return MathText.concat(out.toArray(new MathText[0]));
    }

    /**
     * Sets words about a budget (a chart's caption, the budget's notes, descriptions, sources, warnings), where every
     * word with an underscore is a symbol written as the model language writes names: {@code u_i(y)} as u with
     * subscript i, {@code E_lo} as E with subscript lo, {@code rho_w} as ρ with subscript w; the rest as {@link
     * #prose(String)} sets it ("±", m³).
     *
     * @return the words with their symbols typeset
     */
    public static MathText caption(String words) {
        java.util.regex.Matcher m = SYMBOL_WORD.matcher(words);
        List<MathText> out = new ArrayList<>();
        int at = 0;
        while (m.find()) {
            out.add(prose(words.substring(at, m.start())));
            out.add(name(m.group()));
            at = m.end();
        }
        out.add(prose(words.substring(at)));
        return MathText.concat(out.toArray(new MathText[0]));
    }

    /** A word with an underscore in the program's own text. */
    private static final java.util.regex.Pattern SYMBOL_WORD = java.util.regex.Pattern.compile(
            "(?<![\\p{L}\\p{N}_'])\\p{L}[\\p{L}\\p{N}]*(?:_[\\p{L}\\p{N}]+)+(?![\\p{L}\\p{N}_])");


    /** A power after a letter: m^3, s^-1, m^(-3). */
    private static final java.util.regex.Pattern POWER = java.util.regex.Pattern.compile(
            "(\\p{L})\\^\\(?(-?\\d+)\\)?");

    /** @return a unit as written in a budget, in its display form (m³/h, kg·m⁻³), upright */
    public static MathText unit(String written) {
        return MathText.upright(Units.display(written));
    }

    /**
     * Sets a short label such as a table heading. {@code _x}, {@code _xy} (the letters and digits that follow) or
     * {@code _{x y}} is a subscript, {@code ^x} or
     * {@code ^{xy}} a superscript; single letters (Latin or Greek) are italic, words and other signs upright.
     */
    public static MathText label(String markup) {
        List<Run> out = new ArrayList<>();
        int i = 0;
        while (i < markup.length()) {
            char c = markup.charAt(i);
            if ((c == '_' || c == '^') && i + 1 < markup.length()) {
                Shift shift = c == '_' ? Shift.SUB : Shift.SUP;
                String group;
                if (markup.charAt(i + 1) == '{') {
                    int close = markup.indexOf('}', i + 2);
                    if (close < 0) {
                        close = markup.length();
                    }
                    group = markup.substring(i + 2, close);
                    i = Math.min(markup.length(), close + 1);
                } else if (shift == Shift.SUB) {
                    // an unbraced subscript is the word that follows: E_lo, ν_eff, x_i
                    int end = i + 1;
                    while (end < markup.length() && Character.isLetterOrDigit(markup.charAt(end))) {
                        end++;
                    }
                    end = Math.max(end, i + 2);
                    group = markup.substring(i + 1, end);
                    i = end;
                } else {
                    group = markup.substring(i + 1, i + 2);
                    i += 2;
                }
                words(group, shift, out);
            } else {
                int j = i;
                while (j < markup.length() && markup.charAt(j) != '_' && markup.charAt(j) != '^') {
                    j++;
                }
                if (j == i) {
                    j++;
                }
                words(markup.substring(i, j), Shift.BASE, out);
                i = j;
            }
        }
        return MathText.of(out);
    }

    /**
     * Sets a label that may hold units in parentheses, such as {@code flow (m3/h)} or {@code U_c (%)}: units (a
     * parenthesis after a space, without spaces inside) upright, since units are never italic (SI Brochure 9th ed.
     * 5.1), the rest as {@link #label(String)}.
     */
    public static MathText labelWithUnit(String markup) {
        java.util.regex.Matcher m = UNIT.matcher(markup);
        List<Run> out = new ArrayList<>();
        int at = 0;
        while (m.find()) {
            out.addAll(label(markup.substring(at, m.start())).runs());
            String unit = m.group().substring(2, m.group().length() - 1);
            out.add(new Run(" (" + Units.display(unit) + ")", false, Shift.BASE));
            at = m.end();
        }
        out.addAll(label(markup.substring(at)).runs());
        return MathText.of(out);
    }

    /** A unit in parentheses after a space, without spaces of its own: {@code " (m3/h)"}, {@code " (%)"}. */
    private static final java.util.regex.Pattern UNIT = java.util.regex.Pattern.compile(" \\([^()\\s]+\\)");

    private static void words(String s, Shift shift, List<Run> out) {
        int i = 0;
        while (i < s.length()) {
            int j = i;
            if (Character.isLetter(s.charAt(i))) {
                while (j < s.length() && Character.isLetter(s.charAt(j))) {
                    j++;
                }
                String w = s.substring(i, j);
                out.add(new Run(w, w.length() == 1, shift));
            } else {
                while (j < s.length() && !Character.isLetter(s.charAt(j))) {
                    j++;
                }
                out.add(new Run(s.substring(i, j), false, shift));
            }
            i = j;
        }
    }

    private static void name(String name, Shift shift, List<Run> out) {
        if (name.equals("pi")) {
            out.add(new Run("π", false, shift));
            return;
        }
        String[] parts = name.split("_", -1);
        List<String> segments = new ArrayList<>();
        for (String p : parts) {
            if (!p.isEmpty()) {
                segments.add(p);
            }
        }
        if (segments.isEmpty()) {
            out.add(new Run(name, true, shift));
            return;
        }
        int next = 1;
        String first = segments.get(0);
        if ((first.equals("delta") || first.equals("Delta")) && segments.size() > 1) {
            out.add(new Run(GREEK.get(first), true, shift));
            out.add(new Run(symbol(segments.get(1)), true, shift));
            next = 2;
        } else {
            out.add(new Run(symbol(first), true, shift));
        }
        if (next < segments.size()) {
            Shift sub = shift == Shift.BASE ? Shift.SUB : shift;
            for (int k = next; k < segments.size(); k++) {
                if (k > next) {
                    out.add(new Run(",", false, sub));
                }
                String seg = segments.get(k);
                String g = GREEK.get(seg);
                boolean italic = g != null || seg.codePointCount(0, seg.length()) == 1;
                out.add(new Run(g != null ? g : seg, italic, sub));
            }
        }
    }

    /**
     * @return the symbol of a name's first part: a spelled-out Greek letter as the letter, and a small change
     *     written {@code d} before one ({@code drho} as dρ, like {@code dm} or {@code dI}) with the letter too
     */
    private static String symbol(String segment) {
        String g = GREEK.get(segment);
        if (g == null && segment.length() > 2 && segment.charAt(0) == 'd' && GREEK.containsKey(segment.substring(1))) {
            return "d" + GREEK.get(segment.substring(1));
        }
        return g != null ? g : segment;
    }

    // ------------------------------------------------------------------------------------------------------
    // The compiled model's formula tree, set as mathematics. Precedence as the model language binds:
    // + - (1), * / (2), unary - (3), ^ (4, right-associative), atoms (5).

    private static int precedence(Formula f) {
        if (f instanceof Formula.Operation o) {
            return o.precedence();
        }
        if (f instanceof Formula.Number n && !n.unit().isEmpty()) {
            // a number with its unit is a product (1000 mg/g): bracketed as the right side of * or / and as the
            // base of a power, so that dm / (1000 mg/g) does not read as (dm / 1000) mg/g
            return 2;
        }
        return f instanceof Formula.Negation ? 3 : 5;
    }

    private static void wrapped(Formula f, List<Run> out, Shift shift, int context) {
        boolean paren = precedence(f) < context;
        if (paren) {
            out.add(new Run("(", false, shift));
        }
        set(f, out, shift, 0);
        if (paren) {
            out.add(new Run(")", false, shift));
        }
    }

    private static void set(Formula f, List<Run> out, Shift shift, int context) {
        if (f instanceof Formula.Number n) {
            number(n, out, shift, context);
        } else if (f instanceof Formula.Symbol sym) {
            name(sym.name(), shift, out);
        } else if (f instanceof Formula.Negation neg) {
            boolean paren = context > 3;
            if (paren) {
                out.add(new Run("(", false, shift));
            }
            out.add(new Run("−", false, shift));
            wrapped(neg.operand(), out, shift, 3);
            if (paren) {
                out.add(new Run(")", false, shift));
            }
        } else if (f instanceof Formula.Operation op) {
            boolean paren = op.precedence() < context;
            if (paren) {
                out.add(new Run("(", false, shift));
            }
            int p = op.precedence();
            if (op.operator() == '^') {
                wrapped(op.left(), out, shift, p + 1);
                // A raised exponent is grouped by its position, so it needs no parentheses of its own.
                set(op.right(), out, shift == Shift.BASE ? Shift.SUP : shift, 0);
            } else {
                wrapped(op.left(), out, shift, p);
                char c = op.operator();
                out.add(new Run(c == '+' ? " + " : c == '-' ? " − " : c == '*' ? " · " : " / ", false, shift));
                wrapped(op.right(), out, shift, p + 1);
            }
            if (paren) {
                out.add(new Run(")", false, shift));
            }
        } else {
            call((Formula.Call) f, out, shift);
        }
    }

    private static void number(Formula.Number n, List<Run> out, Shift shift, int context) {
        if (!n.unit().isEmpty()) {
            number(new Formula.Number(n.value(), n.written()), out, shift, 2);
            out.add(new Run("\u2009" + n.unit(), false, shift));
            return;
        }
        String text = n.written();
        int e = text.toLowerCase(Locale.ROOT).indexOf('e');
        if (e < 0) {
            out.add(new Run(text, false, shift));
            return;
        }
        String mantissa = text.substring(0, e);
        String exp = text.substring(e + 1);
        if (exp.startsWith("+")) {
            exp = exp.substring(1);
        }
        if (exp.startsWith("-")) {
            exp = "−" + exp.substring(1);
        }
        boolean paren = context > 2;
        if (paren) {
            out.add(new Run("(", false, shift));
        }
        out.add(new Run(mantissa + " × 10", false, shift));
        out.add(new Run(exp, false, shift == Shift.BASE ? Shift.SUP : shift));
        if (paren) {
            out.add(new Run(")", false, shift));
        }
    }

    private static void call(Formula.Call c, List<Run> out, Shift shift) {
        List<Formula> args = c.arguments();
        String name = c.function();
        if (c.kind() == Formula.FunctionKind.STANDARD && name.equals("abs") && args.size() == 1) {
            out.add(new Run("|", false, shift));
            set(args.get(0), out, shift, 0);
            out.add(new Run("|", false, shift));
            return;
        }
        if (c.kind() == Formula.FunctionKind.STANDARD) {
            out.add(new Run(name.equals("sqrt") ? "√(" : name.equals("log10") ? "lg(" : name + "(", false, shift));
        } else {
            // A function's name is a word, set upright as written (ISO 80000-2: function names are upright),
            // never read as a symbol with subscripts.
            out.add(new Run(name + "(", false, shift));
        }
        for (int i = 0; i < args.size(); i++) {
            if (i > 0) {
                out.add(new Run(", ", false, shift));
            }
            set(args.get(i), out, shift, 0);
        }
        out.add(new Run(")", false, shift));
    }
}
