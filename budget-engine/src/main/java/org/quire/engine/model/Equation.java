package org.quire.engine.model;

import java.util.List;

/**
 * One line of a model as parsed: {@code name = expression}, or a function of the model's own,
 * {@code name(p1, p2) = expression}.
 *
 * @param name the quantity or function defined
 * @param parameters the parameters of a function definition; empty for a quantity
 * @param isFunction whether this line defines a function (written with parentheses)
 * @param expression the right-hand side
 * @param at where the name stands
 * @param text the equation's text as written, for reports
 */
record Equation(String name, List<String> parameters, boolean isFunction, Expr expression, SourcePosition at,
        String text) {
}
