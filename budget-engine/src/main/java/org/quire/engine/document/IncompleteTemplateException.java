package org.quire.engine.document;

import java.util.List;

/** A template that cannot be published to the team folder, with every reason. */
public final class IncompleteTemplateException extends Exception {
    private static final long serialVersionUID = 1L;
    private final List<String> problems;

    IncompleteTemplateException(List<String> problems) {
        super("the template is not complete: " + String.join("; ", problems));
        this.problems = List.copyOf(problems);
    }

    /** @return each problem as a sentence */
    public List<String> problems() {
        return problems;
    }
}
