package org.quire.engine.io;

import jakarta.json.JsonArrayBuilder;
import jakarta.json.JsonObject;
import jakarta.json.JsonObjectBuilder;
import org.quire.engine.montecarlo.BudgetSimulation;
import org.quire.engine.montecarlo.CoverageInterval;
import org.quire.engine.montecarlo.GumComparison;
import org.quire.engine.montecarlo.Histogram;
import org.quire.engine.montecarlo.MonteCarloResult;
import org.quire.engine.montecarlo.OutputSummary;

/**
 * A Monte Carlo outcome as JSON, as {@code quire montecarlo --format json} prints it and worked examples point
 * into; fields are described in {@code budget-engine/doc/budget-format.md}. Stateless and thread-safe.
 */
public final class MonteCarloJson {
    private MonteCarloJson() {
    }

    /** @return the JSON word of a verdict: {@code confirmed} or {@code not-confirmed} */
    public static String verdict(GumComparison c) {
        return c.confirmed() ? "confirmed" : "not-confirmed";
    }

    /**
     * @param withHistogram whether to include each output's histogram (bin edges and counts)
     * @return the outcome as JSON
     */
    public static JsonObject toJson(BudgetSimulation.Outcome o, boolean withHistogram) {
        MonteCarloResult r = o.result();
        JsonObjectBuilder b = JsonSupport.JSON.createObjectBuilder();
        b.add("format", "quire-montecarlo");
        b.add("formatVersion", 1);
        b.add("engineVersion", EngineVersion.get());
        b.add("trials", r.trials());
        b.add("seed", r.seed());
        b.add("coverageProbability", r.coverageProbability());
        b.add("usesCopula", r.usesCopula());
        b.add("adaptiveRuns", r.adaptiveRuns());
        b.add("stabilized", r.stabilized());
        JsonArrayBuilder outs = JsonSupport.JSON.createArrayBuilder();
        for (int k = 0; k < r.outputCount(); k++) {
            OutputSummary s = r.output(k);
            GumComparison c = o.comparisons().get(k);
            JsonObjectBuilder ob = JsonSupport.JSON.createObjectBuilder();
            ob.add("name", o.outputNames().get(k));
            ob.add("mean", s.mean());
            ob.add("standardUncertainty", s.standardUncertainty());
            ob.add("validTrials", s.validTrials());
            ob.add("excludedTrials", s.excludedTrials());
            s.exclusionNote().ifPresent(n -> ob.add("exclusionNote", n));
            ob.add("symmetricInterval", interval(s.symmetricInterval()));
            ob.add("shortestInterval", interval(s.shortestInterval()));
            ob.add("comparison", JsonSupport.JSON.createObjectBuilder()
                    .add("tolerance", c.tolerance())
                    .add("lowerDifference", c.lowerDifference())
                    .add("upperDifference", c.upperDifference())
                    .add("significantDigits", c.significantDigits())
                    .add("verdict", verdict(c)));
            if (withHistogram) {
                Histogram h = s.histogram();
                JsonArrayBuilder edges = JsonSupport.JSON.createArrayBuilder();
                for (double e : h.edges()) {
                    edges.add(e);
                }
                JsonArrayBuilder counts = JsonSupport.JSON.createArrayBuilder();
                for (long n : h.counts()) {
                    counts.add(n);
                }
                ob.add("histogram", JsonSupport.JSON.createObjectBuilder().add("edges", edges).add("counts", counts));
            }
            outs.add(ob);
        }
        b.add("outputs", outs);
        if (r.outputCount() > 1) {
            b.add("outputCorrelation", ResultJson.matrix(r.outputCorrelation()));
        }
        JsonArrayBuilder notes = JsonSupport.JSON.createArrayBuilder();
        r.notes().forEach(notes::add);
        b.add("notes", notes);
        return b.build();
    }

    private static JsonObject interval(CoverageInterval i) {
        return JsonSupport.JSON.createObjectBuilder().add("lower", i.lower()).add("upper", i.upper())
                .add("halfWidth", 0.5 * (i.upper() - i.lower())).build();
    }
}
