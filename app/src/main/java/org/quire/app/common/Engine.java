package org.quire.app.common;

import java.util.Objects;
import org.quire.engine.flow.FlowFunctions;
import org.quire.engine.model.FunctionLibrary;

/**
 * The engine configuration one run of the application works with, handed to whatever evaluates: the command
 * line's root command and the workbench's frame each hold one and pass it on, so the GUM evaluation, the Monte
 * Carlo method, the dimension check of the review and the report all compile the model with the same function
 * set. There is no global instance.
 *
 * <p>Immutable and thread-safe.
 */
public final class Engine {
    private final FunctionLibrary library;

    private Engine(FunctionLibrary library) {
        this.library = Objects.requireNonNull(library, "library");
    }

    /** @return the configuration Quire ships: the standard functions and the flow-metrology functions */
    public static Engine standard() {
        return new Engine(FunctionLibrary.standard().with(FlowFunctions.all()));
    }

    /** @return a configuration with that function set */
    public static Engine of(FunctionLibrary library) {
        return new Engine(library);
    }

    /** @return the functions every model evaluated with this configuration may call */
    public FunctionLibrary library() {
        return library;
    }
}
