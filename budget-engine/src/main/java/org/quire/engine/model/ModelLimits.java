package org.quire.engine.model;

import java.util.Locale;

/**
 * The limits on the work a model may cause, and their messages (one place). A model is user text: a chain of
 * thousands of quantities, functions nested a thousand deep, or a function that calls another twice at every
 * level (which doubles the compiled tree at each level) must end in a clear error, never in a stack overflow
 * or in memory running out.
 */
final class ModelLimits {
    /** The most nodes a compiled model may have, once every call of a model function is expanded. */
    static final int MAX_NODES = 500_000;
    /** The deepest compiled expression, calls of model functions expanded. */
    static final int MAX_NODE_DEPTH = 1_000;

    private ModelLimits() {
    }

    static String tooDeep(String name, int max) {
        return String.format(Locale.ROOT, "%s is nested more than %d levels deep (parentheses, signs, function "
                + "arguments, or terms of one sum or product); split it into intermediate quantities",
                name == null ? "the expression" : "the expression of '" + name + "'", max);
    }

    static String tooManyNodes(int max) {
        return String.format(Locale.ROOT, "the model has more than %d operations, counting every call of a model "
                + "function written out in full (a function that calls another twice, at many levels, doubles the "
                + "count at each level); define intermediate quantities instead of nesting functions, and keep "
                + "the model to the equations the measurement needs", max);
    }

    static String nodesTooDeep(int max) {
        return String.format(Locale.ROOT, "the model's functions call each other more than %d levels deep once "
                + "written out; define intermediate quantities instead of nesting functions", max);
    }
}
