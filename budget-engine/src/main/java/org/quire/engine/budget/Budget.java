package org.quire.engine.budget;

import jakarta.json.JsonObject;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Objects;
import java.util.Set;
import org.quire.engine.line.CalibrationLine;
import org.quire.engine.model.CompiledModel;
import org.quire.engine.model.FunctionLibrary;
import org.quire.engine.model.ModelCompiler;
import org.quire.engine.model.ModelException;
import org.quire.engine.model.ModelUnits;

/**
 * An uncertainty budget: the measurement model, its input quantities and their correlations, the outputs to
 * report and the evaluation settings.
 *
 * <p>Immutable and thread-safe; every {@code with...} method returns a changed copy.
 */
public final class Budget {
    private final String title;
    private final String notes;
    private final String model;
    private final List<OutputQuantity> outputs;
    private final List<InputQuantity> inputs;
    private final List<Correlation> correlations;
    private final EvaluationSettings settings;
    private final JsonObject extensions;
    private final List<CalibrationLine> dataSets;
    private final FlowPoints flowPoints;

    private Budget(String title, String notes, String model, List<OutputQuantity> outputs,
            List<InputQuantity> inputs, List<Correlation> correlations, EvaluationSettings settings,
            JsonObject extensions, List<CalibrationLine> dataSets, FlowPoints flowPoints) {
        this.title = title;
        this.notes = notes;
        this.model = model;
        this.outputs = List.copyOf(outputs);
        this.inputs = List.copyOf(inputs);
        this.correlations = List.copyOf(correlations);
        this.settings = settings;
        this.extensions = extensions;
        this.dataSets = List.copyOf(dataSets);
        this.flowPoints = flowPoints;
    }

    /**
     * @param model the model text, one equation a line
     * @param outputs the outputs, each defined by an equation
     * @param inputs the input quantities; names must be unique
     * @throws IllegalArgumentException for a duplicate input name or output
     */
    public static Budget of(String model, List<OutputQuantity> outputs, List<InputQuantity> inputs) {
        Budget b = new Budget("", "", Objects.requireNonNull(model, "model"), outputs, inputs, List.of(),
                EvaluationSettings.defaults(), JsonObject.EMPTY_JSON_OBJECT, List.of(), null);
        b.checkNames();
        return b;
    }

    private void checkNames() {
        Set<String> seen = new HashSet<>();
        for (InputQuantity q : inputs) {
            if (!seen.add(q.name())) {
                throw new IllegalArgumentException("input '" + q.name() + "' is listed twice");
            }
        }
        Set<String> outs = new HashSet<>();
        for (OutputQuantity o : outputs) {
            if (!outs.add(o.name())) {
                throw new IllegalArgumentException("output '" + o.name() + "' is listed twice");
            }
            if (seen.contains(o.name())) {
                throw new IllegalArgumentException("'" + o.name() + "' is an input and cannot also be an output");
            }
        }
        checkCalibration();
    }

    /** Data set names are unique, fit inputs use this budget's data sets, flow-point columns name inputs. */
    private void checkCalibration() {
        Set<String> names = new HashSet<>();
        for (CalibrationLine d : dataSets) {
            if (!names.add(d.name())) {
                throw new IllegalArgumentException("data set '" + d.name() + "' is listed twice");
            }
        }
        for (InputQuantity q : inputs) {
            if (q.evaluation() instanceof FitParameter && !dataSets.contains(((FitParameter) q.evaluation()).line())) {
                throw new IllegalArgumentException("input '" + q.name() + "' is a parameter of data set '"
                        + ((FitParameter) q.evaluation()).dataSet() + "', which this budget does not hold");
            }
        }
        if (flowPoints != null) {
            flowPoints.checkAgainst(inputNames());
        }
    }

    public Budget withTitle(String v) { return copy(v == null ? "" : v, notes, model, outputs, inputs, correlations, settings, extensions, dataSets, flowPoints); }
    public Budget withNotes(String v) { return copy(title, v == null ? "" : v, model, outputs, inputs, correlations, settings, extensions, dataSets, flowPoints); }
    public Budget withModel(String v) { return copy(title, notes, Objects.requireNonNull(v, "model"), outputs, inputs, correlations, settings, extensions, dataSets, flowPoints); }
    public Budget withOutputs(List<OutputQuantity> v) { return copy(title, notes, model, v, inputs, correlations, settings, extensions, dataSets, flowPoints); }
    public Budget withInputs(List<InputQuantity> v) { return copy(title, notes, model, outputs, v, correlations, settings, extensions, dataSets, flowPoints); }
    public Budget withCorrelations(List<Correlation> v) { return copy(title, notes, model, outputs, inputs, v, settings, extensions, dataSets, flowPoints); }
    public Budget withSettings(EvaluationSettings v) { return copy(title, notes, model, outputs, inputs, correlations, Objects.requireNonNull(v), extensions, dataSets, flowPoints); }
    /** @param v fields of the budget file this version of Quire does not interpret, kept on save */
    public Budget withExtensions(JsonObject v) { return copy(title, notes, model, outputs, inputs, correlations, settings, v == null ? JsonObject.EMPTY_JSON_OBJECT : v, dataSets, flowPoints); }

    /**
     * @param v the calibration data sets, names unique; inputs that are parameters of a data set of the same
     *     name are refitted to the new one
     * @throws IllegalArgumentException for a duplicate name, a data set that cannot be fitted, or a fit input
     *     whose data set is no longer there
     */
    public Budget withDataSets(List<CalibrationLine> v) {
        if (v == null) {
            throw new IllegalArgumentException("the list of data sets is missing");
        }
        List<InputQuantity> refitted = new ArrayList<>();
        for (InputQuantity q : inputs) {
            if (q.evaluation() instanceof FitParameter) {
                FitParameter f = (FitParameter) q.evaluation();
                for (CalibrationLine d : v) {
                    if (d.name().equals(f.dataSet()) && !d.equals(f.line())) {
                        q = q.withEvaluation(FitParameter.of(d, f.parameter()));
                    }
                }
            }
            refitted.add(q);
        }
        return copy(title, notes, model, outputs, refitted, correlations, settings, extensions, v, flowPoints);
    }

    /** @param v the flow points for an evaluation across the flow range, or null for none */
    public Budget withFlowPoints(FlowPoints v) { return copy(title, notes, model, outputs, inputs, correlations, settings, extensions, dataSets, v); }

    /** @return a copy with one input replaced (matched by position of the input named {@code name}) */
    public Budget withInput(String name, InputQuantity replacement) {
        List<InputQuantity> list = new ArrayList<>(inputs);
        for (int i = 0; i < list.size(); i++) {
            if (list.get(i).name().equals(name)) {
                list.set(i, replacement);
                return withInputs(list);
            }
        }
        throw new IllegalArgumentException("no input named '" + name + "'");
    }

    private static Budget copy(String title, String notes, String model, List<OutputQuantity> outputs,
            List<InputQuantity> inputs, List<Correlation> correlations, EvaluationSettings settings,
            JsonObject extensions, List<CalibrationLine> dataSets, FlowPoints flowPoints) {
        Budget b = new Budget(title, notes, model, outputs, inputs, correlations, settings, extensions, dataSets,
                flowPoints);
        b.checkNames();
        return b;
    }

    public String title() { return title; }
    public String notes() { return notes; }
    public String model() { return model; }
    public List<OutputQuantity> outputs() { return outputs; }
    public List<InputQuantity> inputs() { return inputs; }
    public List<Correlation> correlations() { return correlations; }
    public EvaluationSettings settings() { return settings; }
    public JsonObject extensions() { return extensions; }
    /** @return the calibration data sets, each with its fitting method */
    public List<CalibrationLine> dataSets() { return dataSets; }
    /** @return the flow points for an evaluation across the flow range, or null */
    public FlowPoints flowPoints() { return flowPoints; }

    /** @return the data set of that name, or null */
    public CalibrationLine dataSet(String name) {
        for (CalibrationLine d : dataSets) {
            if (d.name().equals(name)) {
                return d;
            }
        }
        return null;
    }

    /** @return the input of that name, or null */
    public InputQuantity input(String name) {
        for (InputQuantity q : inputs) {
            if (q.name().equals(name)) {
                return q;
            }
        }
        return null;
    }

    /** @return the input names in order */
    public List<String> inputNames() {
        List<String> n = new ArrayList<>();
        for (InputQuantity q : inputs) {
            n.add(q.name());
        }
        return n;
    }

    /** @return the output names in order */
    public List<String> outputNames() {
        List<String> n = new ArrayList<>();
        for (OutputQuantity q : outputs) {
            n.add(q.name());
        }
        return n;
    }

    /**
     * @param library the functions the model may call
     * @return the compiled model, its dimensions checked against the units stated for the inputs and outputs
     *     (an input or output without unit is not checked; see {@link ModelCompiler#compile(String, List, List,
     *     FunctionLibrary, ModelUnits)})
     * @throws ModelException listing every problem with its place, unit and dimension errors included
     */
    public CompiledModel compile(FunctionLibrary library) throws ModelException {
        if (outputs.isEmpty()) {
            throw new ModelException(new org.quire.engine.model.ModelProblem(0, 0, 0,
                    org.quire.engine.model.ModelProblem.Severity.ERROR,
                    "the budget names no output: mark at least one quantity the model defines as an output"));
        }
        return ModelCompiler.compile(model, inputNames(), outputNames(), library, units());
    }

    /** @return the units stated for the inputs and outputs, and the outputs' display units */
    public ModelUnits units() {
        java.util.Map<String, String> in = new java.util.LinkedHashMap<>();
        for (InputQuantity q : inputs) {
            in.put(q.name(), q.unit());
        }
        java.util.Map<String, String> out = new java.util.LinkedHashMap<>();
        java.util.Map<String, String> display = new java.util.LinkedHashMap<>();
        for (OutputQuantity q : outputs) {
            out.put(q.name(), q.unit());
            display.put(q.name(), q.displayUnit());
        }
        return ModelUnits.of(in, out, display);
    }

    /** @return the checked correlation matrix of the inputs */
    public CorrelationMatrix correlationMatrix() {
        return CorrelationMatrix.of(inputs, correlations);
    }

    /** @return an empty JSON object, for callers that build extensions */
    public static JsonObject noExtensions() {
        return jakarta.json.JsonValue.EMPTY_JSON_OBJECT;
    }

    @Override
    public boolean equals(Object o) {
        if (!(o instanceof Budget)) {
            return false;
        }
        Budget b = (Budget) o;
        return title.equals(b.title) && notes.equals(b.notes) && model.equals(b.model) && outputs.equals(b.outputs)
                && inputs.equals(b.inputs) && correlations.equals(b.correlations) && settings.equals(b.settings)
                && extensions.equals(b.extensions) && dataSets.equals(b.dataSets)
                && Objects.equals(flowPoints, b.flowPoints);
    }

    @Override
    public int hashCode() {
        return Objects.hash(title, model, outputs, inputs, correlations, settings);
    }
}
