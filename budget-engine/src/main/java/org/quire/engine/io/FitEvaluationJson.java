package org.quire.engine.io;

import jakarta.json.JsonObject;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.quire.engine.budget.FitParameter;
import org.quire.engine.budget.InvalidParameterException;
import org.quire.engine.line.CalibrationLine;

/**
 * The evaluation of an input that is a fitted parameter of one of the budget's data sets:
 * {@code {"type": "fit", "dataSet": "TV-EM-07 2026-11", "parameter": "slope"}} ({@code "intercept"} or
 * {@code "slope"}). Stateless and thread-safe.
 */
final class FitEvaluationJson {
    private static final Set<String> FIELDS = Set.of("type", "dataSet", "parameter");

    private FitEvaluationJson() {
    }

    static FitParameter read(JsonCursor e, List<CalibrationLine> dataSets) throws BudgetFormatException {
        e.onlyFields(FIELDS);
        String name = e.get("dataSet").string();
        CalibrationLine line = null;
        List<String> names = new ArrayList<>();
        for (CalibrationLine d : dataSets) {
            names.add(d.name());
            if (d.name().equals(name)) {
                line = d;
            }
        }
        if (line == null) {
            throw new BudgetFormatException(e.path() + ".dataSet", "there is no data set named '" + name + "'"
                    + (names.isEmpty() ? "; add it to the file's 'dataSets'"
                            : org.quire.engine.model.Suggest.hint(name, names) + " (data sets: " + String.join(", ", names) + ")"));
        }
        try {
            return FitParameter.of(line, FitParameter.Parameter.parse(e.get("parameter").string()));
        } catch (InvalidParameterException x) {
            throw new BudgetFormatException(e.path() + "." + x.parameter(), x.getMessage());
        } catch (IllegalArgumentException x) {
            throw new BudgetFormatException(e.path(), x.getMessage());
        }
    }

    static JsonObject toJson(FitParameter f) {
        return JsonSupport.JSON.createObjectBuilder().add("type", "fit").add("dataSet", f.dataSet())
                .add("parameter", f.parameter().label()).build();
    }
}
