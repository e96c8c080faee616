package org.quire.engine.io;

import jakarta.json.JsonArrayBuilder;
import jakarta.json.JsonObject;
import jakarta.json.JsonObjectBuilder;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.quire.engine.budget.FlowPoints;
import org.quire.engine.gum.FlowRangeResult;

/**
 * Reads and writes the {@code flowPoints} of a budget file, and writes the result of a flow-range evaluation.
 *
 * <pre>
 * "flowPoints": {
 *   "flowUnit": "m3/h",
 *   "output": "E",                               optional; default the first output
 *   "columns": ["q_ind", "u(d_rep)"],            an input's estimate, or u(input) its standard uncertainty
 *   "points": [ {"flow": 2.5, "values": [2.512, 0.04]}, ... ],
 *   "conformity": {"mpe": {...}, "rule": {...}, "temperature": 20.5}   optional; see {@link ConformityJson};
 *                                               temperature in °C, for limits that depend on it
 * }
 * </pre>
 * Stateless and thread-safe.
 */
public final class FlowPointsJson {
    private static final Set<String> FIELDS = Set.of("flowUnit", "output", "columns", "points", "conformity");
    private static final Set<String> POINT_FIELDS = Set.of("flow", "values");
    private static final Set<String> CONFORMITY_FIELDS = Set.of("mpe", "rule", "temperature");

    private FlowPointsJson() {
    }

    /** Reads a {@code flowPoints} object. */
    public static FlowPoints read(JsonCursor f) throws BudgetFormatException {
        f.onlyFields(FIELDS);
        String unit = f.get("flowUnit").string();
        List<String> columns = new ArrayList<>();
        for (JsonCursor c : f.get("columns").elements()) {
            columns.add(c.string());
        }
        List<FlowPoints.Row> rows = new ArrayList<>();
        for (JsonCursor p : f.get("points").elements()) {
            p.onlyFields(POINT_FIELDS);
            double flow = p.get("flow").number(false);
            List<JsonCursor> vs = p.get("values").elements();
            if (vs.size() != columns.size()) {
                throw new BudgetFormatException(p.path() + ".values", vs.size() + " values, but there are "
                        + columns.size() + " columns (" + String.join(", ", columns) + ")");
            }
            double[] values = new double[vs.size()];
            for (int i = 0; i < values.length; i++) {
                values[i] = vs.get(i).number(false);
            }
            rows.add(new FlowPoints.Row(flow, values));
        }
        FlowPoints fp;
        try {
            fp = FlowPoints.of(unit, columns, rows).withOutput(f.string("output", ""));
        } catch (IllegalArgumentException e) {
            throw f.error(e.getMessage());
        }
        if (f.has("conformity")) {
            JsonCursor c = f.get("conformity");
            c.onlyFields(CONFORMITY_FIELDS);
            fp = fp.withConformity(ConformityJson.readEnvelope(c.get("mpe"), unit), ConformityJson.readRule(c.get("rule")),
                    c.has("temperature") ? c.get("temperature").number(false) : Double.NaN);
        }
        return fp;
    }

    /** @return the flow points as JSON, in the layout {@link #read} reads */
    public static JsonObject toJson(FlowPoints fp) {
        JsonObjectBuilder o = JsonSupport.JSON.createObjectBuilder().add("flowUnit", fp.flowUnit());
        if (!fp.output().isEmpty()) {
            o.add("output", fp.output());
        }
        JsonArrayBuilder cols = JsonSupport.JSON.createArrayBuilder();
        fp.columns().forEach(cols::add);
        o.add("columns", cols);
        JsonArrayBuilder pts = JsonSupport.JSON.createArrayBuilder();
        for (FlowPoints.Row r : fp.rows()) {
            JsonArrayBuilder v = JsonSupport.JSON.createArrayBuilder();
            for (double d : r.values()) {
                v.add(d);
            }
            pts.add(JsonSupport.JSON.createObjectBuilder().add("flow", r.flow()).add("values", v));
        }
        o.add("points", pts);
        if (fp.envelope() != null) {
            JsonObjectBuilder c = JsonSupport.JSON.createObjectBuilder().add("mpe", ConformityJson.envelopeJson(fp.envelope()))
                    .add("rule", ConformityJson.ruleJson(fp.rule()));
            if (!Double.isNaN(fp.temperature())) {
                c.add("temperature", fp.temperature());
            }
            o.add("conformity", c);
        }
        return o.build();
    }

    /**
     * @return the flow-range result: {@code points} (flow, estimate, standardUncertainty, effectiveDof,
     *     coverageFactor, expandedUncertainty, relativeExpandedUncertainty), {@code covariance},
     *     {@code correlation} and, when limits were given, {@code conformity}
     */
    public static JsonObject resultJson(FlowRangeResult r) {
        JsonArrayBuilder pts = JsonSupport.JSON.createArrayBuilder();
        for (FlowRangeResult.Point p : r.points()) {
            JsonObjectBuilder b = JsonSupport.JSON.createObjectBuilder();
            b.add("flow", p.flow());
            b.add("estimate", p.estimate());
            b.add("standardUncertainty", p.standardUncertainty());
            BudgetJson.addNumber(b, "effectiveDof", p.result().effectiveDof());
            b.add("coverageFactor", p.result().coverageFactor());
            b.add("expandedUncertainty", p.expandedUncertainty());
            BudgetJson.addNumber(b, "relativeExpandedUncertainty", p.relativeExpandedUncertainty());
            pts.add(b);
        }
        JsonObjectBuilder o = JsonSupport.JSON.createObjectBuilder().add("output", r.output()).add("unit", r.unit())
                .add("flowUnit", r.flowUnit()).add("points", pts)
                .add("covariance", ResultJson.matrix(r.covariance()))
                .add("correlation", ResultJson.matrix(r.correlation()));
        if (r.conformity() != null) {
            o.add("conformity", ConformityJson.assessmentJson(r.conformity()));
        }
        return o.build();
    }
}
