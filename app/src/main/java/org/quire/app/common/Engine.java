package org.quire.app.common;

import org.quire.engine.flow.FlowFunctions;
import org.quire.engine.model.FunctionLibrary;

/** The engine configuration the whole application shares: one function library, one place. */
public final class Engine {
    private static final FunctionLibrary LIBRARY = FunctionLibrary.standard().with(FlowFunctions.all());

    private Engine() {
    }

    /** @return the functions every model in the application may call */
    public static FunctionLibrary library() {
        return LIBRARY;
    }
}
