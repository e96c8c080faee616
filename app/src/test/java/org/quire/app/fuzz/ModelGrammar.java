package org.quire.app.fuzz;

import java.util.SplittableRandom;

/**
 * Random model text from a small grammar over the inputs X1..Xn: sums, products, powers, signs, parentheses,
 * built-in and user functions, intermediate quantities; and the hostile shapes found by fuzzing: a cycle through
 * many quantities, a long chain, expressions nested very deep, user functions nested deep or calling another
 * twice at every level. Stateless.
 */
final class ModelGrammar {
    private static final String[] FUNCTIONS = {"sin", "cos", "exp", "log", "sqrt", "abs", "tan", "log10"};

    private ModelGrammar() {
    }

    /** Appends a model defining Y to {@code out}; @return the shape's name (for findings) */
    static String model(SplittableRandom rnd, int inputs, StringBuilder out) {
        int shape = rnd.nextInt(12);
        switch (shape) {
            case 0: {
                int n = 2 + rnd.nextInt(rnd.nextInt(10) == 0 ? 100_000 : 500);
                out.append("Y = A0\n");
                for (int i = 0; i < n - 1; i++) {
                    out.append("A").append(i).append(" = A").append(i + 1).append(" + 1\n");
                }
                out.append("A").append(n - 1).append(" = A0 + X1\n");
                return "cycle " + n;
            }
            case 1: {
                int n = 2 + rnd.nextInt(rnd.nextInt(10) == 0 ? 100_000 : 2_000);
                out.append("Y = A0\n");
                for (int i = 0; i < n - 1; i++) {
                    out.append("A").append(i).append(" = A").append(i + 1).append(" * 1.0001\n");
                }
                out.append("A").append(n - 1).append(" = X1 + 1\n");
                return "chain " + n;
            }
            case 2: {
                int n = 1 + rnd.nextInt(rnd.nextInt(4) == 0 ? 3_000 : 600);
                out.append("f0(x) = x + 1\n");
                for (int i = 1; i < n; i++) {
                    out.append("f").append(i).append("(x) = f").append(i - 1).append("(x) + 1\n");
                }
                out.append("Y = f").append(n - 1).append("(X1)\n");
                return "nested functions " + n;
            }
            case 3: {
                int n = 1 + rnd.nextInt(40);
                out.append("g0(x) = x + 1\n");
                for (int i = 1; i < n; i++) {
                    out.append("g").append(i).append("(x) = g").append(i - 1).append("(x) * g").append(i - 1)
                            .append("(x)\n");
                }
                out.append("Y = g").append(n - 1).append("(X1)\n");
                return "doubling functions " + n;
            }
            case 4: {
                int n = 1 + rnd.nextInt(rnd.nextInt(4) == 0 ? 20_000 : 400);
                String open = rnd.nextBoolean() ? "(" : rnd.nextBoolean() ? "-" : "sin(";
                String close = open.equals("-") ? "" : ")";
                out.append("Y = ").append(open.repeat(n)).append("X1").append(close.repeat(n)).append('\n');
                return "deep " + open + " " + n;
            }
            case 5: {
                int n = 1 + rnd.nextInt(rnd.nextInt(4) == 0 ? 50_000 : 400);
                out.append("Y = X1").append((rnd.nextBoolean() ? " + X1" : " * X1").repeat(n)).append('\n');
                return "long chain of terms " + n;
            }
            default: {
                int q = rnd.nextInt(4);
                for (int i = 0; i < q; i++) {
                    out.append("Q").append(i).append(" = ").append(expression(rnd, 4, inputs)).append('\n');
                }
                if (rnd.nextBoolean()) {
                    out.append("h(a, b) = ").append(expression(rnd, 3, 0).replace("X1", "a").replace("X0", "b"))
                            .append('\n');
                    out.append("Y = h(").append(expression(rnd, 2, inputs)).append(", X1)");
                } else {
                    out.append("Y = ").append(expression(rnd, 5, inputs));
                }
                for (int i = 0; i < q; i++) {
                    out.append(" + Q").append(i);
                }
                out.append('\n');
                if (rnd.nextInt(20) == 0) {
                    out.append("Q0 = Y\n");
                }
                return "random";
            }
        }
    }

    /** @return a random expression over X1..Xn (or "a"/"b" parameters when n is 0) */
    static String expression(SplittableRandom rnd, int depth, int inputs) {
        if (depth <= 0 || rnd.nextInt(4) == 0) {
            switch (rnd.nextInt(5)) {
                case 0:
                    return Double.toString(rnd.nextInt(4) == 0 ? 1e300 : rnd.nextDouble() * 10);
                case 1:
                    return "pi";
                default:
                    return "X" + (inputs == 0 ? rnd.nextInt(2) : 1 + rnd.nextInt(inputs));
            }
        }
        String a = expression(rnd, depth - 1, inputs);
        String b = expression(rnd, depth - 1, inputs);
        switch (rnd.nextInt(8)) {
            case 0:
                return a + " + " + b;
            case 1:
                return a + " - " + b;
            case 2:
                return a + " * " + b;
            case 3:
                return a + " / " + b;
            case 4:
                return "(" + a + ")^" + (rnd.nextBoolean() ? "2" : "(" + b + ")");
            case 5:
                return "-(" + a + ")";
            case 6:
                return rnd.nextBoolean() ? "min(" + a + ", " + b + ")" : "max(" + a + ", " + b + ", 1)";
            default:
                return FUNCTIONS[rnd.nextInt(FUNCTIONS.length)] + "(" + a + ")";
        }
    }
}
