package org.quire.engine.model;

import java.util.List;
import java.util.Objects;

/**
 * An equation's right-hand side as the compiled model understands it: every name resolved to what it stands
 * for (an input quantity, a quantity another equation defines, a parameter of one of the model's own functions,
 * a constant) and every call to the kind of function it calls (a standard mathematical function, a function of
 * the engine's library such as {@code water_density}, or a function the model defines). Reports and screens
 * typeset models from this tree, so nothing outside the engine parses the model language a second time.
 *
 * <p>Implementations are immutable and thread-safe.
 */
public sealed interface Formula permits Formula.Number, Formula.Symbol, Formula.Negation, Formula.Operation,
        Formula.Call {

    /** What a name in a formula stands for. */
    enum Role {
        /** An input quantity of the budget. */
        INPUT,
        /** A quantity defined by another equation of the model (an intermediate or an output). */
        QUANTITY,
        /** A parameter of a function the model defines. */
        PARAMETER,
        /** A named mathematical constant ({@code pi}). */
        CONSTANT
    }

    /** What kind of function a call calls. */
    enum FunctionKind {
        /** A standard mathematical function: sqrt, exp, ln, log10, abs, the trigonometric functions, min, max. */
        STANDARD,
        /** A function of the engine's library (the flow-metrology functions, for instance). */
        LIBRARY,
        /** A function the model defines itself. */
        MODEL
    }

    /**
     * A number.
     *
     * @param value its value
     * @param written its digits as written in the model, e.g. {@code 1.5e-3}
     * @param unit the unit written after it in brackets, e.g. {@code g/kg}; empty for a pure number
     */
    record Number(double value, String written, String unit) implements Formula {
        public Number {
            Objects.requireNonNull(written, "written");
            unit = unit == null ? "" : unit;
        }

        /** A pure number. */
        public Number(double value, String written) {
            this(value, written, "");
        }
    }

    /**
     * A name.
     *
     * @param name the name as written
     * @param role what it stands for
     */
    record Symbol(String name, Role role) implements Formula {
        public Symbol {
            Objects.requireNonNull(name, "name");
            Objects.requireNonNull(role, "role");
        }
    }

    /** @param operand the negated formula (unary minus) */
    record Negation(Formula operand) implements Formula {
        public Negation {
            Objects.requireNonNull(operand, "operand");
        }
    }

    /**
     * A binary operation.
     *
     * @param operator one of {@code + - * / ^}
     * @param left the left operand
     * @param right the right operand
     */
    record Operation(char operator, Formula left, Formula right) implements Formula {
        public Operation {
            if ("+-*/^".indexOf(operator) < 0) {
                throw new IllegalArgumentException("operator must be one of + - * / ^, not '" + operator + "'");
            }
            Objects.requireNonNull(left, "left");
            Objects.requireNonNull(right, "right");
        }

        /** @return 1 for + and −, 2 for * and /, 4 for ^ (unary minus is 3), as the model language binds them */
        public int precedence() {
            return operator == '+' || operator == '-' ? 1 : operator == '*' || operator == '/' ? 2 : 4;
        }
    }

    /**
     * A function call.
     *
     * @param function the function's name
     * @param kind what kind of function it is
     * @param arguments the arguments in order
     */
    record Call(String function, FunctionKind kind, List<Formula> arguments) implements Formula {
        public Call {
            Objects.requireNonNull(function, "function");
            Objects.requireNonNull(kind, "kind");
            arguments = List.copyOf(arguments);
        }
    }

    /**
     * One equation of a compiled model.
     *
     * @param name the quantity or function defined
     * @param parameters the parameters of a function definition; empty for a quantity
     * @param isFunction whether the line defines a function of the model's own
     * @param isOutput whether the quantity defined is one of the model's outputs
     * @param right the right-hand side
     * @param text the line as written
     */
    record Line(String name, List<String> parameters, boolean isFunction, boolean isOutput, Formula right,
            String text) {
        public Line {
            Objects.requireNonNull(name, "name");
            parameters = List.copyOf(parameters);
            Objects.requireNonNull(right, "right");
            Objects.requireNonNull(text, "text");
        }
    }
}
