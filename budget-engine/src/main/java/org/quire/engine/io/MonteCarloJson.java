package org.quire.engine.io;

import jakarta.json.JsonArrayBuilder;
import jakarta.json.JsonObject;
import jakarta.json.JsonObjectBuilder;
import org.quire.engine.montecarlo.CoverageInterval;
import org.quire.engine.montecarlo.GumComparison;
import org.quire.engine.montecarlo.Histogram;
import org.quire.engine.montecarlo.MonteCarloOutcome;
import org.quire.engine.montecarlo.MonteCarloResult;

/**
 * A Monte Carlo outcome as JSON, as {@code quire montecarlo --format json} prints it and worked examples point
 * into; fields are described in {@code budget-engine/doc/budget-format.md}. Stateless and thread-safe.
 */
public final class MonteCarloJson {
    private MonteCarloJson() {
    }

    /**
     * @param withHistogram whether to include each output's histogram (bin edges and counts)
     * @return the outcome as JSON
     */
    public static JsonObject toJson(MonteCarloOutcome o, boolean withHistogram) {
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
            MonteCarloOutcome.Output s = o.output(k);
            GumComparison c = s.comparison();
            JsonObjectBuilder ob = JsonSupport.JSON.createObjectBuilder();
            ob.add("name", s.name());
            ob.add("unit", s.unit());
            ob.add("mean", s.estimate());
            if (s.hasStandardUncertainty()) {
                ob.add("standardUncertainty", s.standardUncertainty());
            } else {
                ob.addNull("standardUncertainty");
                ob.add("standardUncertaintyNote", s.standardUncertaintyNote().orElseThrow());
            }
            ob.add("validTrials", s.summary().validTrials());
            ob.add("excludedTrials", s.summary().excludedTrials());
            s.summary().exclusionNote().ifPresent(n -> ob.add("exclusionNote", n));
            ob.add("symmetricInterval", interval(s.symmetricInterval()));
            ob.add("shortestInterval", interval(s.shortestInterval()));
            ob.add("gumInterval", interval(s.gumInterval()));
            JsonObjectBuilder cb = JsonSupport.JSON.createObjectBuilder();
            BudgetJson.addNumber(cb, "tolerance", c.tolerance());
            cb.add("lowerDifference", c.lowerDifference())
                    .add("upperDifference", c.upperDifference())
                    .add("significantDigits", c.significantDigits())
                    .add("verdict", c.verdict().word())
                    .add("reason", c.reason());
            ob.add("comparison", cb);
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
                JsonArrayBuilder gum = JsonSupport.JSON.createArrayBuilder();
                for (double p : s.gumBinProbabilities()) {
                    gum.add(p);
                }
                ob.add("histogram", JsonSupport.JSON.createObjectBuilder().add("edges", edges).add("counts", counts)
                        .add("gumProbabilities", gum));
            }
            outs.add(ob);
        }
        b.add("outputs", outs);
        if (r.outputCount() > 1) {
            b.add("outputCorrelation", ResultJson.matrix(r.outputCorrelation()));
        }
        JsonArrayBuilder notes = JsonSupport.JSON.createArrayBuilder();
        o.notes().forEach(notes::add);
        b.add("notes", notes);
        return b.build();
    }

    private static JsonObject interval(CoverageInterval i) {
        return JsonSupport.JSON.createObjectBuilder().add("lower", i.lower()).add("upper", i.upper())
                .add("halfWidth", 0.5 * (i.upper() - i.lower())).build();
    }
}
