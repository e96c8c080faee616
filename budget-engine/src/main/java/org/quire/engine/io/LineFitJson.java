package org.quire.engine.io;

import jakarta.json.JsonArrayBuilder;
import jakarta.json.JsonObject;
import jakarta.json.JsonObjectBuilder;
import java.util.List;
import org.quire.engine.line.LineEstimate;
import org.quire.engine.line.LineFit;

/**
 * A fitted calibration line as JSON, the form the {@code line} computation of the worked examples returns:
 * {@code method}, {@code referenceX}, {@code n}, {@code intercept}, {@code slope}, {@code interceptUncertainty},
 * {@code slopeUncertainty}, {@code covariance}, {@code correlation}, {@code dof}, {@code uncertaintyDof}
 * ("inf" for stated uncertainties), {@code residualStandardDeviation} (null unless OLS), {@code chiSquared}
 * (null when not assessed), {@code chiSquaredQuantile}, {@code consistencyProbability}, {@code consistency},
 * {@code residuals}, {@code standardizedResiduals}, {@code notes}, and {@code predictions}: forward ones
 * {@code {"x", "y", "u"}} and inverse ones {@code {"y", "u_y", "x", "u", "dof"}} in the order asked.
 * Stateless and thread-safe.
 */
public final class LineFitJson {
    private LineFitJson() {
    }

    /**
     * @param fit the fitted line
     * @param forward x values to predict y at
     * @param inverse pairs {y0, u(y0)} to infer x from
     * @return the JSON
     */
    public static JsonObject toJson(LineFit fit, List<Double> forward, List<double[]> inverse) {
        JsonObjectBuilder o = JsonSupport.JSON.createObjectBuilder();
        o.add("dataSet", fit.data().name());
        o.add("method", fit.method().abbreviation());
        o.add("referenceX", fit.referenceX());
        o.add("n", fit.data().size());
        o.add("intercept", fit.intercept());
        o.add("slope", fit.slope());
        o.add("interceptUncertainty", fit.interceptUncertainty());
        o.add("slopeUncertainty", fit.slopeUncertainty());
        o.add("covariance", fit.covariance());
        o.add("correlation", fit.correlation());
        o.add("dof", fit.dof());
        BudgetJson.addNumber(o, "uncertaintyDof", fit.uncertaintyDof());
        BudgetJson.addNumber(o, "residualStandardDeviation", fit.residualStandardDeviation());
        BudgetJson.addNumber(o, "chiSquared", fit.chiSquared());
        o.add("chiSquaredQuantile", fit.chiSquaredQuantile());
        o.add("consistencyProbability", fit.consistencyProbability());
        o.add("consistency", fit.consistency().label());
        o.add("residuals", array(fit.residuals()));
        o.add("standardizedResiduals", array(fit.standardizedResiduals()));
        JsonArrayBuilder notes = JsonSupport.JSON.createArrayBuilder();
        fit.notes().forEach(notes::add);
        o.add("notes", notes);
        JsonArrayBuilder pred = JsonSupport.JSON.createArrayBuilder();
        for (double x : forward) {
            LineEstimate e = fit.valueAt(x);
            JsonObjectBuilder b = JsonSupport.JSON.createObjectBuilder().add("x", x).add("y", e.value())
                    .add("u", e.standardUncertainty());
            BudgetJson.addNumber(b, "dof", e.dof());
            pred.add(b);
        }
        for (double[] yu : inverse) {
            LineEstimate e = fit.inverse(yu[0], yu[1]);
            JsonObjectBuilder b = JsonSupport.JSON.createObjectBuilder().add("y", yu[0]).add("u_y", yu[1]).add("x", e.value())
                    .add("u", e.standardUncertainty());
            BudgetJson.addNumber(b, "dof", e.dof());
            pred.add(b);
        }
        o.add("predictions", pred);
        return o.build();
    }

    private static JsonArrayBuilder array(double[] v) {
        JsonArrayBuilder a = JsonSupport.JSON.createArrayBuilder();
        for (double d : v) {
            a.add(d);
        }
        return a;
    }
}
