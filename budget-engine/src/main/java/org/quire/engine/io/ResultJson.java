package org.quire.engine.io;

import jakarta.json.JsonArrayBuilder;
import jakarta.json.JsonObject;
import jakarta.json.JsonObjectBuilder;
import java.util.Map;
import org.quire.engine.gum.Contribution;
import org.quire.engine.gum.CorrelationTerm;
import org.quire.engine.gum.GumResult;
import org.quire.engine.gum.OutputResult;
import org.quire.engine.gum.Rounding;

/**
 * The GUM result as JSON, the form {@code quire evaluate --format json} prints and worked examples point into.
 * Fields are described in {@code budget-engine/doc/budget-format.md}. Infinite degrees of freedom are written
 * as the string {@code "inf"}. Stateless and thread-safe.
 */
public final class ResultJson {
    /** The identifier of the result layout. */
    public static final String FORMAT = "quire-result";

    private ResultJson() {
    }

    /** @return the result as JSON */
    public static JsonObject toJson(String title, GumResult r) {
        JsonObjectBuilder o = JsonSupport.JSON.createObjectBuilder();
        o.add("format", FORMAT);
        o.add("formatVersion", 1);
        o.add("engineVersion", EngineVersion.get());
        o.add("title", title);
        o.add("settings", BudgetJson.settingsJson(r.settings()));
        JsonArrayBuilder outs = JsonSupport.JSON.createArrayBuilder();
        int digits = r.settings().significantDigits();
        for (OutputResult out : r.outputs()) {
            outs.add(output(out, digits));
        }
        o.add("outputs", outs);
        if (r.outputs().size() > 1) {
            o.add("outputCovariance", matrix(r.covariance()));
            o.add("outputCorrelation", matrix(r.correlation()));
        }
        JsonObjectBuilder q = JsonSupport.JSON.createObjectBuilder();
        for (Map.Entry<String, Double> e : r.quantities().entrySet()) {
            BudgetJson.addNumber(q, e.getKey(), e.getValue());
        }
        o.add("quantities", q);
        JsonArrayBuilder w = JsonSupport.JSON.createArrayBuilder();
        r.warnings().forEach(w::add);
        o.add("warnings", w);
        return o.build();
    }

    /** @return one output's result as in {@link #toJson}'s {@code outputs} list, rounded to {@code digits} */
    public static JsonObject outputJson(OutputResult out, int digits) {
        return output(out, digits);
    }

    private static JsonObject output(OutputResult out, int digits) {
        JsonObjectBuilder b = JsonSupport.JSON.createObjectBuilder();
        b.add("name", out.name());
        b.add("unit", out.unit());
        b.add("estimate", out.estimate());
        b.add("standardUncertainty", out.standardUncertainty());
        BudgetJson.addNumber(b, "effectiveDof", out.effectiveDof());
        BudgetJson.addNumber(b, "dofUsed", out.dofUsed());
        b.add("coverageFactor", out.coverageFactor());
        b.add("coverageProbability", out.coverageProbability());
        b.add("expandedUncertainty", out.expandedUncertainty());
        BudgetJson.addNumber(b, "relativeExpandedUncertainty", out.relativeExpandedUncertainty());
        b.add("correlationVariance", out.correlationVariance());
        b.add("higherOrderVariance", out.higherOrderVariance());
        b.add("higherOrderTerms", out.higherOrderTerms().text());
        b.add("rounded", JsonSupport.JSON.createObjectBuilder()
                .add("estimate", Rounding.estimate(out.estimate(), out.expandedUncertainty(), digits).toPlainString())
                .add("expandedUncertainty", Rounding.uncertainty(out.expandedUncertainty(), digits).toPlainString())
                .add("standardUncertainty", Rounding.uncertainty(out.standardUncertainty(), digits).toPlainString()));
        JsonArrayBuilder rows = JsonSupport.JSON.createArrayBuilder();
        for (Contribution c : out.contributions()) {
            JsonObjectBuilder rb = JsonSupport.JSON.createObjectBuilder();
            rb.add("input", c.input());
            rb.add("unit", c.unit());
            rb.add("type", c.type());
            rb.add("distribution", c.distribution());
            rb.add("estimate", c.estimate());
            rb.add("standardUncertainty", c.standardUncertainty());
            rb.add("sensitivity", c.sensitivity());
            rb.add("contribution", c.contribution());
            BudgetJson.addNumber(rb, "dof", c.dof());
            rb.add("share", c.share());
            rows.add(rb);
        }
        b.add("contributions", rows);
        JsonArrayBuilder terms = JsonSupport.JSON.createArrayBuilder();
        for (CorrelationTerm t : out.correlationTerms()) {
            terms.add(JsonSupport.JSON.createObjectBuilder().add("inputs", JsonSupport.JSON.createArrayBuilder().add(t.first()).add(t.second()))
                    .add("r", t.r()).add("variance", t.variance()));
        }
        b.add("correlationTerms", terms);
        JsonArrayBuilder w = JsonSupport.JSON.createArrayBuilder();
        out.warnings().forEach(w::add);
        b.add("warnings", w);
        return b.build();
    }

    /** @return the rows of {@code m} as JSON arrays, a non-finite entry as null */
    public static JsonArrayBuilder matrix(double[][] m) {
        JsonArrayBuilder a = JsonSupport.JSON.createArrayBuilder();
        for (double[] row : m) {
            JsonArrayBuilder r = JsonSupport.JSON.createArrayBuilder();
            for (double v : row) {
                if (Double.isFinite(v)) {
                    r.add(v);
                } else {
                    r.addNull();
                }
            }
            a.add(r);
        }
        return a;
    }
}
