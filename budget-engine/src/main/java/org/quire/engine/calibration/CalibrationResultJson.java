package org.quire.engine.calibration;

import org.quire.engine.io.BudgetJson;
import org.quire.engine.io.EngineVersion;
import org.quire.engine.io.JsonSupport;
import org.quire.engine.io.LineFitJson;
import org.quire.engine.io.ResultJson;
import jakarta.json.JsonArrayBuilder;
import jakarta.json.JsonObject;
import jakarta.json.JsonObjectBuilder;
import java.util.List;
import java.util.Map;
import org.quire.engine.montecarlo.GumComparison;

/**
 * Writes the evaluation of a calibration as JSON: {@code asFound}, {@code adjustment}, {@code asLeft} (each
 * series with {@code points}, {@code covariance}, {@code correlation} and {@code conformity}) and
 * {@code findings}. A point lists its {@code runs} (row, error, flow, readings), {@code error}, {@code runStandardDeviation},
 * {@code repeatabilityUncertainty}, {@code repeatabilityDof}, {@code standardUncertainty}, {@code effectiveDof},
 * {@code coverageFactor}, {@code expandedUncertainty}, {@code cmc}, {@code reportedExpandedUncertainty},
 * {@code raisedToCmc}, {@code notes} and, when run, {@code monteCarlo}. Numbers that are not finite are written
 * as in the budget results ({@code BudgetJson.addNumber}; a matrix entry as null). Stateless and thread-safe.
 */
public final class CalibrationResultJson {
    private CalibrationResultJson() {
    }

    /** @return the result as JSON */
    public static JsonObject toJson(CalibrationResult r) {
        JsonObjectBuilder b = JsonSupport.JSON.createObjectBuilder();
        b.add("title", r.calibration().title());
        b.add("method", JsonSupport.JSON.createObjectBuilder().add("id", r.calibration().method().id())
                .add("version", r.calibration().method().version())
                .add("contentHash", r.calibration().method().contentHash()).add("title", r.methodTitle()));
        b.add("errorUnit", r.errorUnit()).add("flowUnit", r.flowUnit());
        b.add("repeatability", r.calibration().repeatability().word());
        b.add("asFound", series(r.asFound()));
        if (r.adjustment() != null) {
            b.add("adjustment", adjustment(r.adjustment()));
        }
        if (r.asLeft() != null) {
            b.add("asLeft", series(r.asLeft()));
        }
        b.add("findings", strings(r.findings()));
        b.add("engineVersion", EngineVersion.get());
        return b.build();
    }

    static void num(JsonObjectBuilder b, String k, double v) {
        BudgetJson.addNumber(b, k, v);
    }

    private static JsonArrayBuilder strings(List<String> l) {
        JsonArrayBuilder a = JsonSupport.JSON.createArrayBuilder();
        l.forEach(a::add);
        return a;
    }

    private static JsonObject series(SeriesResult s) {
        JsonObjectBuilder b = JsonSupport.JSON.createObjectBuilder().add("phase", s.phase().label());
        JsonArrayBuilder pts = JsonSupport.JSON.createArrayBuilder();
        for (PointResult p : s.points()) {
            pts.add(point(p));
        }
        b.add("points", pts);
        b.add("covariance", matrix(s.covariance()));
        b.add("correlation", matrix(s.correlation()));
        if (s.conformity() != null) {
            b.add("conformity", conformity(s.conformity()));
        }
        return b.build();
    }

    private static JsonObject point(PointResult p) {
        JsonObjectBuilder b = JsonSupport.JSON.createObjectBuilder().add("name", p.label());
        num(b, "flow", p.flow());
        JsonArrayBuilder runs = JsonSupport.JSON.createArrayBuilder();
        for (RunResult r : p.runs()) {
            JsonObjectBuilder rb = JsonSupport.JSON.createObjectBuilder().add("row", r.sourceRow());
            num(rb, "error", r.error());
            num(rb, "flow", r.flow());
            JsonObjectBuilder rd = JsonSupport.JSON.createObjectBuilder();
            for (Map.Entry<String, Double> e : r.readings().entrySet()) {
                rd.add(e.getKey(), e.getValue());
            }
            runs.add(rb.add("readings", rd));
        }
        b.add("runs", runs);
        b.add("runCount", p.runCount());
        num(b, "error", p.error());
        num(b, "runStandardDeviation", p.runStandardDeviation());
        num(b, "repeatabilityUncertainty", p.repeatabilityUncertainty());
        num(b, "repeatabilityDof", p.repeatabilityDof());
        b.add("statedRepeatability", p.statedRepeatability());
        num(b, "standardUncertainty", p.standardUncertainty());
        num(b, "effectiveDof", p.effectiveDof());
        num(b, "coverageFactor", p.coverageFactor());
        num(b, "expandedUncertainty", p.expandedUncertainty());
        num(b, "cmc", p.cmc());
        num(b, "reportedExpandedUncertainty", p.reportedExpandedUncertainty());
        b.add("raisedToCmc", p.raisedToCmc());
        b.add("notes", strings(p.notes()));
        if (p.result() != null) {
            b.add("budget", ResultJson.outputJson(p.result(), p.budget().settings().significantDigits()));
        }
        if (p.monteCarlo() != null) {
            GumComparison g = p.monteCarlo().output(0).comparison();
            JsonObjectBuilder mc = JsonSupport.JSON.createObjectBuilder();
            num(mc, "low", g.monteCarloInterval().lower());
            num(mc, "high", g.monteCarloInterval().upper());
            num(mc, "tolerance", g.tolerance());
            mc.add("verdict", g.verdict().word());
            mc.add("validated", g.validated());
            b.add("monteCarlo", mc);
        }
        return b.build();
    }

    private static JsonArrayBuilder matrix(double[][] m) {
        return ResultJson.matrix(m);
    }

    private static JsonObject conformity(ConformityResult c) {
        JsonArrayBuilder pts = JsonSupport.JSON.createArrayBuilder();
        for (PointConformity p : c.points()) {
            JsonObjectBuilder b = JsonSupport.JSON.createObjectBuilder().add("name", p.label());
            num(b, "flow", p.decision().point().flow());
            num(b, "error", p.decision().point().errorPercent());
            num(b, "expandedUncertainty", p.decision().expandedUncertainty());
            num(b, "lowerTolerance", p.decision().lowerTolerance());
            num(b, "upperTolerance", p.decision().upperTolerance());
            num(b, "mpe", p.mpe());
            num(b, "guardBand", p.decision().guardBand());
            num(b, "probabilityOfConformity", p.decision().probabilityOfConformity());
            b.add("decision", p.decision().decision().label());
            num(b, "uncertaintyRatio", p.uncertaintyRatio());
            b.add("ratioMet", p.ratioMet());
            b.add("finding", p.finding());
            pts.add(b);
        }
        return JsonSupport.JSON.createObjectBuilder().add("limits", c.limitsName()).add("source", c.limitsSource())
                .add("rule", c.rule().kind().title()).add("points", pts).add("overall", c.overall().label())
                .add("statement", c.statement()).build();
    }

    private static JsonObject adjustment(AdjustmentResult a) {
        JsonObjectBuilder b = JsonSupport.JSON.createObjectBuilder().add("kind", a.kind().word())
                .add("constantName", a.constantName()).add("constantUnit", a.constantUnit());
        num(b, "oldConstant", a.oldConstant());
        num(b, "newConstant", a.newConstant());
        num(b, "newConstantUncertainty", a.newConstantUncertainty());
        num(b, "scale", a.scale());
        num(b, "errorRemoved", a.errorRemoved());
        num(b, "errorRemovedUncertainty", a.errorRemovedUncertainty());
        JsonArrayBuilder w = JsonSupport.JSON.createArrayBuilder();
        a.weights().forEach(w::add);
        b.add("weights", w);
        if (a.fit() != null) {
            b.add("line", LineFitJson.toJson(a.fit(), List.of(), List.of()));
        }
        b.add("notes", strings(a.notes()));
        return b.build();
    }
}
