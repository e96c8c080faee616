package org.quire.engine.model;

import java.util.stream.Collectors;

/** Writes an expression back as text with the fewest parentheses that keep its meaning. */
final class ExprPrinter {
    private ExprPrinter() {
    }

    static String print(Expr e) {
        return print(e, 0);
    }

    private static int precedence(Expr e) {
        if (e instanceof Expr.Binary) {
            char op = ((Expr.Binary) e).op();
            return op == '+' || op == '-' ? 1 : op == '*' || op == '/' ? 2 : 4;
        }
        if (e instanceof Expr.Unary) {
            return 3;
        }
        return 5;
    }

    private static String print(Expr e, int context) {
        String s;
        if (e instanceof Expr.Num) {
            Expr.Num n = (Expr.Num) e;
            s = number(n.value()) + (n.unit().isEmpty() ? "" : " [" + n.unit() + "]");
        } else if (e instanceof Expr.Name) {
            s = ((Expr.Name) e).name();
        } else if (e instanceof Expr.Call) {
            Expr.Call c = (Expr.Call) e;
            s = c.name() + "(" + c.args().stream().map(a -> print(a, 0)).collect(Collectors.joining(", ")) + ")";
        } else if (e instanceof Expr.Unary) {
            s = "-" + print(((Expr.Unary) e).operand(), 3);
        } else {
            Expr.Binary b = (Expr.Binary) e;
            int p = precedence(b);
            if (b.op() == '^') {
                s = print(b.left(), p + 1) + "^" + print(b.right(), p);
            } else {
                s = print(b.left(), p) + " " + b.op() + " " + print(b.right(), p + 1);
            }
        }
        return precedence(e) < context ? "(" + s + ")" : s;
    }

    static String number(double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e15) {
            return Long.toString((long) v);
        }
        return Double.toString(v);
    }
}
