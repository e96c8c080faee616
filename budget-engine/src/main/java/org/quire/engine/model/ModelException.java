package org.quire.engine.model;

import java.util.List;
import java.util.stream.Collectors;

/** Thrown when a model cannot be compiled or evaluated; carries every problem found, each with its place. */
public final class ModelException extends Exception {
    private static final long serialVersionUID = 1L;
    private final transient List<ModelProblem> problems;

    public ModelException(List<ModelProblem> problems) {
        super(problems.stream().map(ModelProblem::toString).collect(Collectors.joining("\n")));
        this.problems = List.copyOf(problems);
    }

    public ModelException(ModelProblem problem) {
        this(List.of(problem));
    }

    /** @return the problems, in the order of the text */
    public List<ModelProblem> problems() {
        return problems;
    }
}
