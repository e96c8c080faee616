package org.quire.engine.model;

import java.util.ArrayList;
import java.util.List;

/**
 * Parses model text into equations. Grammar (ordinary mathematical notation):
 *
 * <pre>
 * model     = { equation end-of-line }
 * equation  = name [ "(" name { "," name } ")" ] "=" sum
 * sum       = product { ("+" | "-") product }
 * product   = signed { ("*" | "/") signed }
 * signed    = ("-" | "+") signed | power
 * power     = atom [ "^" signed ]              (right-associative: 2^3^2 = 2^9; -x^2 = -(x^2))
 * atom      = number [ unit ] | name | name "(" sum { "," sum } ")" | "(" sum ")"
 * unit      = "[" unit expression "]"          (a number with its unit: 1000 [g/kg], 20 [°C])
 * </pre>
 *
 * Errors are collected with their line and column; after an error the parser resumes at the next line.
 *
 * <p>An expression may be nested at most {@link #MAX_DEPTH} levels deep (parentheses, unary signs, function
 * arguments, and the terms of a sum or product each count one level), so that no later stage runs out of
 * stack on a hostile or mistaken model; deeper expressions are an error at their line.
 */
final class Parser {
    /** The deepest expression accepted: levels of parentheses, signs and arguments, or terms in a chain. */
    static final int MAX_DEPTH = 250;

    private final List<Token> tokens;
    private final List<ModelProblem> problems;
    private final String[] lines;
    private int i;
    private int nesting;

    private Parser(String text, List<ModelProblem> problems) {
        this.problems = problems;
        this.tokens = new Lexer(text, problems).tokens();
        this.lines = text.split("\n", -1);
    }

    /** Parses {@code text}; problems found are added to {@code problems}. */
    static List<Equation> parse(String text, List<ModelProblem> problems) {
        return parse(text, problems, new java.util.HashSet<>());
    }

    /**
     * Parses {@code text}; problems found are added to {@code problems}, and the names of the equations that
     * could not be read (their line has an error) to {@code broken}, so that the compiler does not report their
     * uses elsewhere as unknown names: one mistake, one message.
     */
    static List<Equation> parse(String text, List<ModelProblem> problems, java.util.Set<String> broken) {
        Parser p = new Parser(text, problems);
        List<Equation> out = p.model(broken);
        return out;
    }

    private static final class Stop extends RuntimeException {
        private static final long serialVersionUID = 1L;

        Stop() {
            super(null, null, false, false);
        }
    }

    private Token peek() {
        return tokens.get(i);
    }

    private Token take() {
        Token t = tokens.get(i);
        if (!t.is(Token.Kind.END)) {
            i++;
        }
        return t;
    }

    private Stop fail(Token at, String message) {
        problems.add(ModelProblem.error(at.at(), message));
        return new Stop();
    }

    private List<Equation> model(java.util.Set<String> broken) {
        List<Equation> out = new ArrayList<>();
        while (!peek().is(Token.Kind.END)) {
            if (peek().is(Token.Kind.NEWLINE)) {
                take();
                continue;
            }
            int start = i;
            try {
                out.add(equation());
                Token t = peek();
                if (!t.is(Token.Kind.NEWLINE) && !t.is(Token.Kind.END)) {
                    throw fail(t, "expected an operator or the end of the line, found " + t.describe());
                }
            } catch (Stop s) {
                if (tokens.get(start).is(Token.Kind.NAME) && start + 1 < tokens.size()
                        && (tokens.get(start + 1).is(Token.Kind.EQUALS) || tokens.get(start + 1).is(Token.Kind.LPAREN))) {
                    broken.add(tokens.get(start).text());
                }
                while (!peek().is(Token.Kind.NEWLINE) && !peek().is(Token.Kind.END)) {
                    take();
                }
            }
        }
        return out;
    }

    private Equation equation() {
        Token name = take();
        if (!name.is(Token.Kind.NAME)) {
            throw fail(name, "expected the name of the quantity this equation defines, found " + name.describe());
        }
        List<String> params = new ArrayList<>();
        boolean isFunction = false;
        if (peek().is(Token.Kind.LPAREN)) {
            isFunction = true;
            take();
            do {
                Token p = take();
                if (!p.is(Token.Kind.NAME)) {
                    throw fail(p, "expected a parameter name in the definition of function '" + name.text()
                            + "', found " + p.describe());
                }
                if (params.contains(p.text())) {
                    throw fail(p, "parameter '" + p.text() + "' appears twice in function '" + name.text() + "'");
                }
                params.add(p.text());
            } while (accept(Token.Kind.COMMA));
            expect(Token.Kind.RPAREN, "')' after the parameters of function '" + name.text() + "'");
        }
        Token eq = peek();
        if (!eq.is(Token.Kind.EQUALS)) {
            throw fail(eq, "expected '=' after '" + name.text() + "', found " + eq.describe());
        }
        take();
        if (peek().is(Token.Kind.NEWLINE) || peek().is(Token.Kind.END)) {
            throw fail(peek(), "the right-hand side of '" + name.text() + " =' is empty");
        }
        Expr e = sum();
        if (depth(e) > MAX_DEPTH) {
            throw fail(name, ModelLimits.tooDeep(name.text(), MAX_DEPTH));
        }
        int ln = name.at().line();
        String text = ln >= 1 && ln <= lines.length ? lines[ln - 1].replaceAll("#.*$", "").trim() : name.text();
        return new Equation(name.text(), List.copyOf(params), isFunction, e, name.at(), text);
    }

    private boolean accept(Token.Kind k) {
        if (peek().is(k)) {
            take();
            return true;
        }
        return false;
    }

    private void expect(Token.Kind k, String what) {
        Token t = peek();
        if (!t.is(k)) {
            throw fail(t, "expected " + what + ", found " + t.describe());
        }
        take();
    }

    private Expr sum() {
        Expr left = product();
        while (peek().is(Token.Kind.PLUS) || peek().is(Token.Kind.MINUS)) {
            Token op = take();
            Expr right = product();
            left = new Expr.Binary(op.is(Token.Kind.PLUS) ? '+' : '-', left, right, op.at());
        }
        return left;
    }

    private Expr product() {
        Expr left = signed();
        while (peek().is(Token.Kind.STAR) || peek().is(Token.Kind.SLASH)) {
            Token op = take();
            Expr right = signed();
            left = new Expr.Binary(op.is(Token.Kind.STAR) ? '*' : '/', left, right, op.at());
        }
        return left;
    }

    private Expr signed() {
        if (nesting >= MAX_DEPTH) {
            throw fail(peek(), ModelLimits.tooDeep(null, MAX_DEPTH));
        }
        nesting++;
        try {
            return signedNested();
        } finally {
            nesting--;
        }
    }

    /**
     * @return the depth of the tree, found without recursion (a sum of n terms is n deep)
     */
    static int depth(Expr root) {
        java.util.ArrayDeque<Expr> stack = new java.util.ArrayDeque<>();
        java.util.ArrayDeque<Integer> depths = new java.util.ArrayDeque<>();
        stack.push(root);
        depths.push(1);
        int max = 0;
        while (!stack.isEmpty()) {
            Expr e = stack.pop();
            int d = depths.pop();
            max = Math.max(max, d);
            if (d > MAX_DEPTH) {
                return d;
            }
            if (e instanceof Expr.Unary u) {
                stack.push(u.operand());
                depths.push(d + 1);
            } else if (e instanceof Expr.Binary b) {
                stack.push(b.left());
                depths.push(d + 1);
                stack.push(b.right());
                depths.push(d + 1);
            } else if (e instanceof Expr.Call c) {
                for (Expr a : c.args()) {
                    stack.push(a);
                    depths.push(d + 1);
                }
            }
        }
        return max;
    }

    private Expr signedNested() {
        if (peek().is(Token.Kind.MINUS)) {
            Token op = take();
            return new Expr.Unary(signed(), op.at());
        }
        if (peek().is(Token.Kind.PLUS)) {
            take();
            return signed();
        }
        return power();
    }

    private Expr power() {
        Expr base = atom();
        if (peek().is(Token.Kind.UNIT)) {
            Token u = peek();
            throw fail(u, "a unit in brackets belongs right after a number, as in 1000 [g/kg]; '" + ExprPrinter.print(base)
                    + "' has its unit already (an input's or output's unit is stated with the input or output)");
        }
        if (peek().is(Token.Kind.CARET)) {
            Token op = take();
            Expr exponent = signed();
            return new Expr.Binary('^', base, exponent, op.at());
        }
        return base;
    }

    private Expr atom() {
        Token t = take();
        switch (t.kind()) {
            case NUMBER:
                if (peek().is(Token.Kind.UNIT)) {
                    Token u = take();
                    return new Expr.Num(t.number(), t.text(), t.at(), u.text(), u.at());
                }
                return new Expr.Num(t.number(), t.text(), t.at());
            case NAME:
                if (peek().is(Token.Kind.LPAREN)) {
                    take();
                    List<Expr> args = new ArrayList<>();
                    if (peek().is(Token.Kind.RPAREN)) {
                        throw fail(peek(), "function '" + t.text() + "' is called without arguments");
                    }
                    do {
                        args.add(sum());
                    } while (accept(Token.Kind.COMMA));
                    expect(Token.Kind.RPAREN, "')' to close the arguments of '" + t.text() + "'");
                    return new Expr.Call(t.text(), List.copyOf(args), t.at());
                }
                return new Expr.Name(t.text(), t.at());
            case LPAREN: {
                Expr e = sum();
                expect(Token.Kind.RPAREN, "')' to close the '(' at column " + t.at().column());
                return e;
            }
            case NEWLINE:
            case END:
                throw fail(t, "the expression ends too early: expected a number, a name or '('");
            default:
                throw fail(t, "expected a number, a name or '(', found " + t.describe());
        }
    }
}
