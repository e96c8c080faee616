package org.quire.app.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.quire.app.report.MathText.Run;
import org.quire.app.report.MathText.Shift;

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
 * Text that does not parse as an equation (it should not: the model compiled) is shown as written, upright.
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
        return MathText.of(out);
    }

    /**
     * @param equation one equation of a model as written, {@code name = expression} or {@code f(a, b) = expression}
     * @return the equation set as mathematics, or the text upright when it does not parse
     */
    public static MathText equation(String equation) {
        String text = stripComment(equation).strip();
        try {
            Parser p = new Parser(text);
            Node lhs = p.expression();
            p.expect('=');
            Node rhs = p.expression();
            p.end();
            List<Run> out = new ArrayList<>();
            lhs.set(out, Shift.BASE, 0);
            out.add(new Run(" = ", false, Shift.BASE));
            rhs.set(out, Shift.BASE, 0);
            return MathText.of(out);
        } catch (IllegalArgumentException e) {
            return MathText.upright(text.replaceAll("\\s+", " "));
        }
    }

    /**
     * Sets a short label such as a table heading. {@code _x} or {@code _{xy}} is a subscript, {@code ^x} or
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
            out.add(new Run(m.group(), false, Shift.BASE));
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

    private static String stripComment(String s) {
        int hash = s.indexOf('#');
        return hash < 0 ? s : s.substring(0, hash);
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

    private static String symbol(String segment) {
        String g = GREEK.get(segment);
        return g != null ? g : segment;
    }

    // ------------------------------------------------------------------------------------------------------
    // A small parser of the model language, enough to typeset it. Precedence: + - (1), * / (2), unary - (3),
    // ^ (4, right-associative), atoms (5).

    private abstract static class Node {
        abstract int precedence();

        abstract void set(List<Run> out, Shift shift, int context);

        void wrapped(List<Run> out, Shift shift, int context) {
            boolean paren = precedence() < context;
            if (paren) {
                out.add(new Run("(", false, shift));
            }
            set(out, shift, 0);
            if (paren) {
                out.add(new Run(")", false, shift));
            }
        }
    }

    private static final class Num extends Node {
        final String text;

        Num(String text) {
            this.text = text;
        }

        @Override int precedence() { return 5; }

        @Override
        void set(List<Run> out, Shift shift, int context) {
            String lower = text.toLowerCase(Locale.ROOT);
            int e = lower.indexOf('e');
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
            Shift up = shift == Shift.BASE ? Shift.SUP : shift;
            boolean paren = context > 2;
            if (paren) {
                out.add(new Run("(", false, shift));
            }
            out.add(new Run(mantissa + " × 10", false, shift));
            out.add(new Run(exp, false, up));
            if (paren) {
                out.add(new Run(")", false, shift));
            }
        }
    }

    private static final class Name extends Node {
        final String name;

        Name(String name) {
            this.name = name;
        }

        @Override int precedence() { return 5; }

        @Override
        void set(List<Run> out, Shift shift, int context) {
            Typesetter.name(name, shift, out);
        }
    }

    private static final class Call extends Node {
        final String name;
        final List<Node> args;

        Call(String name, List<Node> args) {
            this.name = name;
            this.args = args;
        }

        @Override int precedence() { return 5; }

        @Override
        void set(List<Run> out, Shift shift, int context) {
            if (name.equals("abs") && args.size() == 1) {
                out.add(new Run("|", false, shift));
                args.get(0).set(out, shift, 0);
                out.add(new Run("|", false, shift));
                return;
            }
            if (name.equals("sqrt") && args.size() == 1) {
                out.add(new Run("√(", false, shift));
            } else if (name.equals("exponential") || name.equals("ln") || name.equals("exp")
                    || name.equals("log10") || name.equals("min") || name.equals("max")
                    || name.matches("a?(sin|cos|tan)")) {
                out.add(new Run(name.equals("log10") ? "lg(" : name + "(", false, shift));
            } else {
                Typesetter.name(name, shift, out);
                out.add(new Run("(", false, shift));
            }
            for (int i = 0; i < args.size(); i++) {
                if (i > 0) {
                    out.add(new Run(", ", false, shift));
                }
                args.get(i).set(out, shift, 0);
            }
            out.add(new Run(")", false, shift));
        }
    }

    private static final class Unary extends Node {
        final Node operand;

        Unary(Node operand) {
            this.operand = operand;
        }

        @Override int precedence() { return 3; }

        @Override
        void set(List<Run> out, Shift shift, int context) {
            boolean paren = context > 3;
            if (paren) {
                out.add(new Run("(", false, shift));
            }
            out.add(new Run("−", false, shift));
            operand.wrapped(out, shift, 3);
            if (paren) {
                out.add(new Run(")", false, shift));
            }
        }
    }

    private static final class Binary extends Node {
        final char op;
        final Node left;
        final Node right;

        Binary(char op, Node left, Node right) {
            this.op = op;
            this.left = left;
            this.right = right;
        }

        @Override
        int precedence() {
            return op == '+' || op == '-' ? 1 : op == '*' || op == '/' ? 2 : 4;
        }

        @Override
        void set(List<Run> out, Shift shift, int context) {
            boolean paren = precedence() < context;
            if (paren) {
                out.add(new Run("(", false, shift));
            }
            int p = precedence();
            if (op == '^') {
                left.wrapped(out, shift, p + 1);
                // A raised exponent is grouped by its position, so it needs no parentheses of its own.
                Shift up = shift == Shift.BASE ? Shift.SUP : shift;
                right.set(out, up, 0);
            } else {
                left.wrapped(out, shift, p);
                String sign = op == '+' ? " + " : op == '-' ? " − " : op == '*' ? " · " : " / ";
                out.add(new Run(sign, false, shift));
                right.wrapped(out, shift, p + 1);
            }
            if (paren) {
                out.add(new Run(")", false, shift));
            }
        }
    }

    private static final class Parser {
        private final String s;
        private int pos;

        Parser(String s) {
            this.s = s;
        }

        private void skip() {
            while (pos < s.length() && Character.isWhitespace(s.charAt(pos))) {
                pos++;
            }
        }

        private char peek() {
            skip();
            if (pos >= s.length()) {
                return 0;
            }
            char c = s.charAt(pos);
            switch (c) {
                case '\u2212': return '-';
                case '\u00d7': case '\u00b7': case '\u22c5': return '*';
                case '\u00f7': return '/';
                default: return c;
            }
        }

        void expect(char c) {
            if (peek() != c) {
                throw new IllegalArgumentException("expected '" + c + "' at " + pos);
            }
            pos++;
        }

        void end() {
            if (peek() != 0) {
                throw new IllegalArgumentException("unexpected text at " + pos);
            }
        }

        Node expression() {
            Node n = term();
            while (peek() == '+' || peek() == '-') {
                char op = peek();
                pos++;
                n = new Binary(op, n, term());
            }
            return n;
        }

        private Node term() {
            Node n = unary();
            while (peek() == '*' || peek() == '/') {
                char op = peek();
                pos++;
                n = new Binary(op, n, unary());
            }
            return n;
        }

        private Node unary() {
            if (peek() == '-') {
                pos++;
                return new Unary(unary());
            }
            if (peek() == '+') {
                pos++;
                return unary();
            }
            return power();
        }

        private Node power() {
            Node base = atom();
            if (peek() == '^') {
                pos++;
                return new Binary('^', base, unary());
            }
            return base;
        }

        private Node atom() {
            char c = peek();
            if (c == '(') {
                pos++;
                Node inner = expression();
                expect(')');
                return inner;
            }
            if (Character.isDigit(c) || c == '.') {
                int start = pos;
                while (pos < s.length() && (Character.isDigit(s.charAt(pos)) || s.charAt(pos) == '.')) {
                    pos++;
                }
                if (pos < s.length() && (s.charAt(pos) == 'e' || s.charAt(pos) == 'E')) {
                    int save = pos;
                    pos++;
                    if (pos < s.length() && (s.charAt(pos) == '+' || s.charAt(pos) == '-')) {
                        pos++;
                    }
                    if (pos < s.length() && Character.isDigit(s.charAt(pos))) {
                        while (pos < s.length() && Character.isDigit(s.charAt(pos))) {
                            pos++;
                        }
                    } else {
                        pos = save;
                    }
                }
                return new Num(s.substring(start, pos));
            }
            if (Character.isLetter(c) || c == '_') {
                int start = pos;
                while (pos < s.length() && (Character.isLetterOrDigit(s.charAt(pos)) || s.charAt(pos) == '_')) {
                    pos++;
                }
                String name = s.substring(start, pos);
                if (peek() == '(') {
                    pos++;
                    List<Node> args = new ArrayList<>();
                    if (peek() != ')') {
                        args.add(expression());
                        while (peek() == ',') {
                            pos++;
                            args.add(expression());
                        }
                    }
                    expect(')');
                    return new Call(name, args);
                }
                return new Name(name);
            }
            throw new IllegalArgumentException("unexpected '" + c + "' at " + pos);
        }
    }
}
