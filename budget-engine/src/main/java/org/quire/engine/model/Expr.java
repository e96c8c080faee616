package org.quire.engine.model;

import java.util.List;

/** The syntax tree of an expression as written, before names are resolved. */
sealed interface Expr permits Expr.Num, Expr.Name, Expr.Unary, Expr.Binary, Expr.Call {

    SourcePosition at();

    /**
     * A number, with its digits as written and the unit written after it in brackets ({@code 1000 [g/kg]}), or
     * an empty unit for a pure number.
     */
    record Num(double value, String written, SourcePosition at, String unit, SourcePosition unitAt)
            implements Expr {
        Num(double value, String written, SourcePosition at) {
            this(value, written, at, "", at);
        }
    }

    /** A reference to an input, an equation's result, a function parameter or a constant. */
    record Name(String name, SourcePosition at) implements Expr { }

    /** Unary minus. */
    record Unary(Expr operand, SourcePosition at) implements Expr { }

    /** A binary operation: one of {@code + - * / ^}. */
    record Binary(char op, Expr left, Expr right, SourcePosition at) implements Expr { }

    /** A function call. */
    record Call(String name, List<Expr> args, SourcePosition at) implements Expr { }
}
