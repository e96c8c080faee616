package org.quire.engine.validate;

import org.quire.engine.io.JsonSupport;
import jakarta.json.JsonObject;
import jakarta.json.JsonValue;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.quire.engine.budget.Budget;
import org.quire.engine.conformity.ConformityAssessment;
import org.quire.engine.conformity.ConformityProbability;
import org.quire.engine.gum.FlowRange;
import org.quire.engine.io.BudgetFormatException;
import org.quire.engine.io.ConformityJson;
import org.quire.engine.io.DataSetJson;
import org.quire.engine.io.FlowPointsJson;
import org.quire.engine.io.JsonCursor;
import org.quire.engine.io.LineFitJson;
import org.quire.engine.line.CalibrationLine;
import org.quire.engine.line.LineFitter;
import org.quire.engine.line.LineMethod;
import org.quire.engine.model.FunctionLibrary;

/**
 * The worked-example computations for calibration lines, conformity and flow ranges:
 * <ul>
 * <li>{@code line}: arguments {@code dataSet} (a data set of the file's budget) or {@code data} (a data set
 *     object as in a budget file's {@code dataSets}); optional {@code method}, {@code referenceX} (a number or
 *     "mean"), {@code consistencyProbability}, {@code predict} (x values) and {@code inverse} (objects
 *     {@code {"y", "u"}}). Returns {@link LineFitJson}.</li>
 * <li>{@code conformity}: either {@code value}, {@code u}, {@code lower}, {@code upper} and optional
 *     {@code dof}, returning {@code probabilityOfConformity}; or {@code flowUnit}, {@code mpe}, {@code rule}
 *     and {@code errors}, returning the decisions ({@link ConformityJson#assessmentJson}).</li>
 * <li>{@code flow-range}: the budget at its {@code flowPoints} ({@link FlowPointsJson#resultJson}).</li>
 * <li>{@code calibration}: argument {@code file}, a calibration file relative to the example's folder, and
 *     optionally {@code asLeft: "predicted"} to drop its measured as-left runs; the calibration evaluated
 *     with its method template ({@link org.quire.engine.calibration.CalibrationResultJson}).</li>
 * </ul>
 * Stateless and thread-safe.
 */
final class CalibrationComputations {
    private static final Set<String> LINE_ARGS = Set.of("dataSet", "data", "method", "referenceX",
            "consistencyProbability", "predict", "inverse");
    private static final Set<String> INVERSE_FIELDS = Set.of("y", "u");
    private static final Set<String> CONFORMITY_ARGS = Set.of("value", "u", "lower", "upper", "dof", "flowUnit",
            "mpe", "rule", "errors");

    private CalibrationComputations() {
    }

    static JsonObject line(Budget budget, JsonObject arguments) throws BudgetFormatException {
        JsonCursor a = JsonCursor.root(arguments);
        a.onlyFields(LINE_ARGS);
        CalibrationLine line;
        if (a.has("data") == a.has("dataSet")) {
            throw a.error("the 'line' computation needs either 'dataSet' (a data set of the file) or 'data', not "
                    + (a.has("data") ? "both" : "neither"));
        }
        if (a.has("data")) {
            line = DataSetJson.read(a.get("data"));
        } else {
            String name = a.get("dataSet").string();
            line = budget == null ? null : budget.dataSet(name);
            if (line == null) {
                throw new BudgetFormatException(a.path() + ".dataSet", "the file has no data set named '" + name + "'");
            }
        }
        if (a.has("method")) {
            try {
                line = line.withMethod(LineMethod.parse(a.get("method").string()));
            } catch (IllegalArgumentException e) {
                throw new BudgetFormatException(a.path() + ".method", e.getMessage());
            }
        }
        if (a.has("referenceX")) {
            JsonCursor r = a.get("referenceX");
            if (r.value().getValueType() == JsonValue.ValueType.STRING) {
                if (!r.string().equals("mean")) {
                    throw r.error("referenceX must be a number or \"mean\"");
                }
                line = line.withReferenceAtMeanX();
            } else {
                line = line.withReferenceX(r.number(false));
            }
        }
        LineFitter fitter = LineFitter.of(line.method()).withReferenceX(line.referenceX());
        if (a.has("consistencyProbability")) {
            fitter = fitter.withConsistencyProbability(a.get("consistencyProbability").number(false));
        }
        List<Double> forward = new ArrayList<>();
        if (a.has("predict")) {
            for (JsonCursor x : a.get("predict").elements()) {
                forward.add(x.number(false));
            }
        }
        List<double[]> inverse = new ArrayList<>();
        if (a.has("inverse")) {
            for (JsonCursor i : a.get("inverse").elements()) {
                i.onlyFields(INVERSE_FIELDS);
                inverse.add(new double[] {i.get("y").number(false), i.get("u").number(false)});
            }
        }
        return LineFitJson.toJson(fitter.fit(line.data()), forward, inverse);
    }

    static JsonObject conformity(JsonObject arguments) throws BudgetFormatException {
        JsonCursor a = JsonCursor.root(arguments);
        a.onlyFields(CONFORMITY_ARGS);
        if (a.has("errors")) {
            String unit = a.string("flowUnit", "");
            ConformityAssessment c = ConformityAssessment.of(ConformityJson.readEnvelope(a.get("mpe"), unit),
                    ConformityJson.readRule(a.get("rule")), ConformityJson.readErrors(a.get("errors")));
            return ConformityJson.assessmentJson(c);
        }
        double y = a.get("value").number(false);
        double u = a.get("u").number(false);
        double lo = a.has("lower") ? a.get("lower").number(false) : Double.NEGATIVE_INFINITY;
        double hi = a.has("upper") ? a.get("upper").number(false) : Double.POSITIVE_INFINITY;
        double dof = a.has("dof") ? a.get("dof").number(true) : Double.POSITIVE_INFINITY;
        return JsonSupport.JSON.createObjectBuilder()
                .add("probabilityOfConformity", ConformityProbability.scaledT(y, u, dof, lo, hi)).build();
    }

    static JsonObject flowRange(Budget budget, FunctionLibrary library) throws Exception {
        if (budget == null) {
            throw new IllegalArgumentException("the 'flow-range' computation needs a budget with flow points in the file");
        }
        return FlowPointsJson.resultJson(FlowRange.evaluate(budget, library));
    }

    /** @return the {@code calibration} computation */
    static Computation meterCalibration(FunctionLibrary library) {
        return new Computation() {
            @Override
            public JsonObject compute(Budget budget, JsonObject arguments, org.quire.engine.budget.EvaluationSettings s) {
                throw new IllegalArgumentException("the 'calibration' computation needs the example's folder");
            }

            @Override
            public JsonObject compute(Budget budget, JsonObject arguments, org.quire.engine.budget.EvaluationSettings s,
                    java.nio.file.Path folder) throws Exception {
                JsonCursor a = JsonCursor.root(arguments);
                a.onlyFields(Set.of("file", "asLeft"));
                java.nio.file.Path dir = folder == null ? java.nio.file.Path.of("") : folder;
                java.nio.file.Path file = dir.resolve(a.get("file").string());
                org.quire.engine.calibration.CalibrationJson.Loaded loaded = org.quire.engine.calibration.CalibrationJson.read(file);
                org.quire.engine.calibration.Calibration c = loaded.calibration();
                if (a.has("asLeft")) {
                    if (!a.get("asLeft").string().equals("predicted")) {
                        throw a.get("asLeft").error("the only choice is \"predicted\"");
                    }
                    c = c.withAsLeft(List.of());
                }
                org.quire.engine.document.Template method = org.quire.engine.calibration.CalibrationJson.method(file, loaded);
                return org.quire.engine.calibration.CalibrationResultJson.toJson(
                        org.quire.engine.calibration.CalibrationEvaluator.of(method, library).evaluate(c));
            }
        };
    }
}
