package org.quire.engine.model;

import java.util.ArrayList;
import java.util.List;

/**
 * Splits model text into tokens. Names are letters, digits and underscores, starting with a letter or an
 * underscore (any Unicode letter, so Greek names such as {@code ρ_w} are allowed). Numbers are decimal with an
 * optional exponent ({@code 1.5e-3}). A {@code #} starts a comment that runs to the end of the line. The
 * typographic signs {@code × · ÷ −} are read as {@code * * / -}. A unit in square brackets ({@code [g/kg]}) is
 * one token; the parser accepts it only right after a number.
 *
 * <p>A line break ends an equation unless it stands inside parentheses or right after an operator, so a long
 * equation may be continued on the next line after {@code +}, {@code *} and the like.
 */
final class Lexer {
    private final String text;
    private final List<ModelProblem> problems;
    private int pos;
    private int line = 1;
    private int lineStart;

    Lexer(String text, List<ModelProblem> problems) {
        this.text = text;
        this.problems = problems;
    }

    List<Token> tokens() {
        List<Token> out = new ArrayList<>();
        int depth = 0;
        while (true) {
            Token t = next();
            if (t.is(Token.Kind.LPAREN)) {
                depth++;
            } else if (t.is(Token.Kind.RPAREN)) {
                depth = Math.max(0, depth - 1);
            }
            if (t.is(Token.Kind.NEWLINE)) {
                if (depth > 0 && startsEquation(pos)) {
                    // a '(' left open: the line ends here, and the parser reports the missing ')' at its end,
                    // not at the next equation (which would also be swallowed)
                    depth = 0;
                } else if (depth > 0 || out.isEmpty() || continues(out.get(out.size() - 1))) {
                    continue;
                }
            }
            out.add(t);
            if (t.is(Token.Kind.END)) {
                return out;
            }
        }
    }

    /** An equation's start: a name, optionally a parameter list, then '=' (a line of its own). */
    private static final java.util.regex.Pattern EQUATION_START = java.util.regex.Pattern.compile(
            "[ \\t]*[\\p{L}_][\\p{L}\\p{N}_]*[ \\t]*(\\([^()\\n]*\\)[ \\t]*)?=.*");

    /** @return whether the line that starts at {@code from} starts an equation */
    private boolean startsEquation(int from) {
        while (from <= text.length()) {
            int end = text.indexOf('\n', from);
            String next = text.substring(from, end < 0 ? text.length() : end);
            String code = next.strip();
            if (!code.isEmpty() && !code.startsWith("#")) {
                return EQUATION_START.matcher(next).matches();
            }
            if (end < 0) {
                return false;
            }
            from = end + 1; // blank and comment lines are passed over: the '(' is reported on its own line
        }
        return false;
    }

    private static boolean continues(Token previous) {
        switch (previous.kind()) {
            case PLUS: case MINUS: case STAR: case SLASH: case CARET: case COMMA: case EQUALS: case NEWLINE:
                return true;
            default:
                return false;
        }
    }

    private SourcePosition at(int start, int len) {
        return new SourcePosition(line, start - lineStart + 1, len);
    }

    private Token next() {
        while (pos < text.length()) {
            char c = text.charAt(pos);
            if (c == '#') {
                while (pos < text.length() && text.charAt(pos) != '\n') {
                    pos++;
                }
            } else if (c == '\n') {
                Token t = new Token(Token.Kind.NEWLINE, "\n", 0, at(pos, 1));
                pos++;
                line++;
                lineStart = pos;
                return t;
            } else if (Character.isWhitespace(c)) {
                pos++;
            } else {
                break;
            }
        }
        if (pos >= text.length()) {
            return new Token(Token.Kind.END, "", 0, at(pos, 1));
        }
        int start = pos;
        char c = text.charAt(pos);
        if (Character.isDigit(c) || (c == '.' && pos + 1 < text.length() && Character.isDigit(text.charAt(pos + 1)))) {
            return number(start);
        }
        if (Character.isLetter(c) || c == '_') {
            while (pos < text.length() && (Character.isLetterOrDigit(text.charAt(pos)) || text.charAt(pos) == '_')) {
                pos++;
            }
            String name = text.substring(start, pos);
            return new Token(Token.Kind.NAME, name, 0, at(start, pos - start));
        }
        if (c == '[') {
            return unit(start);
        }
        pos++;
        Token.Kind kind;
        switch (c) {
            case '+': kind = Token.Kind.PLUS; break;
            case '-': case '\u2212': kind = Token.Kind.MINUS; break;
            case '*': case '\u00d7': case '\u00b7': case '\u22c5': kind = Token.Kind.STAR; break;
            case '/': case '\u00f7': kind = Token.Kind.SLASH; break;
            case '^': kind = Token.Kind.CARET; break;
            case '(': kind = Token.Kind.LPAREN; break;
            case ')': kind = Token.Kind.RPAREN; break;
            case ',': kind = Token.Kind.COMMA; break;
            case '=': kind = Token.Kind.EQUALS; break;
            default:
                problems.add(ModelProblem.error(at(start, 1), "unexpected character '" + c + "'"
                        + (c == ']' ? "; a unit is written in brackets right after a number, as in 1000 [g/kg]"
                                : "; use + - * / ^ ( ) and names")));
                return next();
        }
        return new Token(kind, String.valueOf(c), 0, at(start, 1));
    }

    /** A unit in brackets, {@code [g/kg]}, on one line; the token's text is what stands inside. */
    private Token unit(int start) {
        int end = pos + 1;
        while (end < text.length() && text.charAt(end) != ']' && text.charAt(end) != '\n'
                && text.charAt(end) != '[') {
            end++;
        }
        if (end >= text.length() || text.charAt(end) != ']') {
            problems.add(ModelProblem.error(at(start, end - start), "the unit '" + text.substring(start, end)
                    + "' has no closing ']'; write a number with its unit as 1000 [g/kg]"));
            pos = end;
            return next();
        }
        String inside = text.substring(start + 1, end).strip();
        pos = end + 1;
        if (inside.isEmpty()) {
            problems.add(ModelProblem.error(at(start, pos - start), "empty unit '[]'; write the unit in the brackets, "
                    + "as in 1000 [g/kg], or [1] for a pure number"));
            return next();
        }
        return new Token(Token.Kind.UNIT, inside, 0, at(start, pos - start));
    }

    private Token number(int start) {
        while (pos < text.length() && Character.isDigit(text.charAt(pos))) {
            pos++;
        }
        if (pos < text.length() && text.charAt(pos) == '.') {
            pos++;
            while (pos < text.length() && Character.isDigit(text.charAt(pos))) {
                pos++;
            }
        }
        if (pos < text.length() && (text.charAt(pos) == 'e' || text.charAt(pos) == 'E')) {
            int save = pos;
            pos++;
            if (pos < text.length() && (text.charAt(pos) == '+' || text.charAt(pos) == '-')) {
                pos++;
            }
            if (pos < text.length() && Character.isDigit(text.charAt(pos))) {
                while (pos < text.length() && Character.isDigit(text.charAt(pos))) {
                    pos++;
                }
            } else {
                problems.add(ModelProblem.error(at(start, pos - start),
                        "exponent of number '" + text.substring(start, pos) + "' has no digits"));
                pos = save;
            }
        }
        String s = text.substring(start, pos);
        double v = Double.parseDouble(s);
        if (Double.isInfinite(v)) {
            problems.add(ModelProblem.error(at(start, s.length()), "number " + s + " is too large"));
        }
        if (pos < text.length() && (Character.isLetter(text.charAt(pos)) || text.charAt(pos) == '_')) {
            int end = pos;
            while (end < text.length() && (Character.isLetterOrDigit(text.charAt(end)) || text.charAt(end) == '_')) {
                end++;
            }
            problems.add(ModelProblem.error(at(start, end - start), "'" + text.substring(start, end)
                    + "' is not a number or a name; write a multiplication explicitly, e.g. "
                    + s + " * " + text.substring(pos, end)));
            pos = end;
        }
        return new Token(Token.Kind.NUMBER, s, v, at(start, s.length()));
    }
}
