package org.quire.engine.document;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.CorrelationMatrix;
import org.quire.engine.budget.FitParameter;
import org.quire.engine.budget.InputQuantity;
import org.quire.engine.gum.GumEvaluator;
import org.quire.engine.gum.GumResult;
import org.quire.engine.model.CompiledModel;
import org.quire.engine.model.FunctionLibrary;
import org.quire.engine.model.ModelException;

/**
 * A template made ready for many sets of values (a batch of meters, one row each): what does not depend on the
 * values is done once — the check that no example value is carried over ({@link TemplateSpec#carriedValues}),
 * the compilation of the model and, when no input is correlated, the correlation matrix — and each set of values
 * only sets the parameters' inputs ({@link Template#budgetFor(TemplateValues)}, by the same rule and with the
 * same refusals) and evaluates.
 *
 * <p>Immutable and thread-safe: the rows of a batch may be evaluated on several threads at once.
 */
public final class PreparedTemplate {
    private final Template template;
    private final List<String> carried;
    private final CompiledModel model;
    /** The correlation matrix of every budget made from the template, or null when it depends on the values. */
    private final CorrelationMatrix correlation;

    private PreparedTemplate(Template template, List<String> carried, CompiledModel model,
            CorrelationMatrix correlation) {
        this.template = template;
        this.carried = List.copyOf(carried);
        this.model = model;
        this.correlation = correlation;
    }

    /**
     * @param template the template
     * @param library the functions its model may call
     * @return the template prepared
     * @throws ModelException when the template's model does not compile
     */
    public static PreparedTemplate of(Template template, FunctionLibrary library) throws ModelException {
        Objects.requireNonNull(template, "template");
        Budget b = template.document().budget();
        CompiledModel model = b.compile(library);
        // with no correlation given and no fitted line (whose parameters are correlated by the fit), the matrix
        // is the identity whatever the values are
        boolean fixed = b.correlations().isEmpty();
        for (InputQuantity q : b.inputs()) {
            fixed &= !(q.evaluation() instanceof FitParameter);
        }
        CorrelationMatrix r = null;
        if (fixed) {
            try {
                r = b.correlationMatrix();
            } catch (IllegalArgumentException e) {
                // refused again, with the same message, for every set of values (evaluate)
            }
        }
        return new PreparedTemplate(template, template.carriedProblems(), model, r);
    }

    public Template template() { return template; }

    /** @return the compiled model of every budget made from the template */
    public CompiledModel model() { return model; }

    /**
     * @return what {@link Template#budgetFor(TemplateValues)} returns for these values
     * @throws IllegalArgumentException as {@link Template#budgetFor(TemplateValues)}
     */
    public Budget budgetFor(TemplateValues values) {
        return template.substitute(template.document().budget(), values, new ArrayList<>(carried));
    }

    /** @return the checked correlation matrix of {@code b}, a budget made by {@link #budgetFor} */
    public CorrelationMatrix correlationMatrix(Budget b) {
        return correlation != null ? correlation : b.correlationMatrix();
    }

    /**
     * The GUM evaluation of a budget made by {@link #budgetFor}: {@link GumEvaluator#evaluate(Budget,
     * FunctionLibrary)}, with the model compiled once.
     *
     * @throws ModelException when a value leaves a function's domain at the estimates
     * @throws IllegalArgumentException for a correlation that cannot be used (its message names the inputs)
     */
    public GumResult evaluate(Budget b) throws ModelException {
        return GumEvaluator.evaluate(b, model, correlationMatrix(b), b.settings());
    }
}
