package org.quire.engine.io;

import jakarta.json.JsonArrayBuilder;
import jakarta.json.JsonObject;
import jakarta.json.JsonObjectBuilder;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.quire.engine.conformity.ConformityAssessment;
import org.quire.engine.conformity.DecisionRule;
import org.quire.engine.conformity.LiquidAccuracyClass;
import org.quire.engine.conformity.MeasuredError;
import org.quire.engine.conformity.MpeEnvelope;
import org.quire.engine.conformity.MpeEnvelopes;
import org.quire.engine.conformity.MpeLimits;
import org.quire.engine.conformity.MpeZone;
import org.quire.engine.conformity.PointDecision;
import org.quire.engine.conformity.ResultDistribution;
import org.quire.engine.conformity.TemperatureBand;
import org.quire.engine.conformity.WaterMeterClass;

/**
 * Reads and writes maximum-permissible-error envelopes, decision rules and measured errors, and writes
 * conformity decisions as JSON.
 *
 * <pre>
 * "mpe":  {"waterMeter": "2", "q3": 25, "r": 160, "maxTemperature": 30}          OIML R 49 class 1 or 2
 *       | {"liquidMeter": "1.0", "qMin": 10, "qMax": 100}                       OIML R 117 meter
 *       | {"liquidMeasuringSystem": "0.5", "qMin": 10, "qMax": 100}             OIML R 117 system
 *       | {"name": "...", "source": "...", "zones": [
 *            {"name": "low", "from": 1, "to": 5, "lower": 3, "upper": 3}, ...  or "bands":
 *            [{"fromCelsius": 0.1, "toCelsius": 30, "lower": 2, "upper": 2}, ...] ]}
 * "rule": {"kind": "simple-acceptance" | "guarded-acceptance" | "guarded-non-binary"
 *                 | "probability-of-conformity",
 *          "guardFactor": 1, "minimumProbability": 0.95, "distribution": "normal" | "scaled-t"}
 * </pre>
 * The flow unit comes from the enclosing object. Envelopes are always written as explicit zones. Stateless
 * and thread-safe.
 */
public final class ConformityJson {
    private static final Set<String> MPE_FIELDS = Set.of("waterMeter", "q3", "r", "maxTemperature", "liquidMeter",
            "liquidMeasuringSystem", "qMin", "qMax", "name", "source", "zones");
    private static final Set<String> ZONE_FIELDS = Set.of("name", "from", "to", "lower", "upper", "bands");
    private static final Set<String> BAND_FIELDS = Set.of("fromCelsius", "toCelsius", "lower", "upper");
    private static final Set<String> RULE_FIELDS = Set.of("kind", "guardFactor", "minimumProbability",
            "distribution");
    private static final Set<String> ERROR_FIELDS = Set.of("flow", "error", "u", "k", "dof", "temperature");
    private static final List<String> KINDS = List.of("simple-acceptance", "guarded-acceptance",
            "guarded-non-binary", "probability-of-conformity");

    private ConformityJson() {
    }

    /** Reads an envelope of maximum permissible errors whose flows are in {@code flowUnit}. */
    public static MpeEnvelope readEnvelope(JsonCursor m, String flowUnit) throws BudgetFormatException {
        m.onlyFields(MPE_FIELDS);
        try {
            if (m.has("waterMeter")) {
                String c = m.get("waterMeter").string().strip();
                WaterMeterClass wc = c.equals("1") ? WaterMeterClass.CLASS_1 : c.equals("2") ? WaterMeterClass.CLASS_2
                        : null;
                if (wc == null) {
                    throw new BudgetFormatException(m.path() + ".waterMeter", "water-meter class must be \"1\" or \"2\", "
                            + "not \"" + c + "\"");
                }
                return MpeEnvelopes.waterMeter(wc, m.get("q3").number(false), m.get("r").number(false),
                        m.has("maxTemperature") ? m.get("maxTemperature").number(false) : 30.0, flowUnit);
            }
            if (m.has("liquidMeter") || m.has("liquidMeasuringSystem")) {
                boolean system = m.has("liquidMeasuringSystem");
                JsonCursor c = m.get(system ? "liquidMeasuringSystem" : "liquidMeter");
                LiquidAccuracyClass lc;
                try {
                    lc = LiquidAccuracyClass.parse(c.string());
                } catch (IllegalArgumentException e) {
                    throw c.error(e.getMessage());
                }
                double lo = m.get("qMin").number(false);
                double hi = m.get("qMax").number(false);
                return system ? MpeEnvelopes.liquidMeasuringSystem(lc, lo, hi, flowUnit)
                        : MpeEnvelopes.liquidMeter(lc, lo, hi, flowUnit);
            }
            List<MpeZone> zones = new ArrayList<>();
            List<JsonCursor> zs = m.get("zones").elements();
            for (int i = 0; i < zs.size(); i++) {
                zones.add(readZone(zs.get(i)));
            }
            try {
                return MpeEnvelope.of(m.get("name").string(), m.get("source").string(), flowUnit, zones);
            } catch (IllegalArgumentException e) {
                throw new BudgetFormatException(m.path() + ".zones", e.getMessage());
            }
        } catch (IllegalArgumentException e) {
            throw m.error(e.getMessage());
        }
    }

    private static MpeZone readZone(JsonCursor z) throws BudgetFormatException {
        z.onlyFields(ZONE_FIELDS);
        try {
            String name = z.get("name").string();
            double from = z.get("from").number(false);
            double to = z.get("to").number(false);
            if (z.has("bands")) {
                if (z.has("lower") || z.has("upper")) {
                    throw z.error("give either 'lower' and 'upper', or 'bands', not both");
                }
                List<TemperatureBand> bands = new ArrayList<>();
                for (JsonCursor b : z.get("bands").elements()) {
                    b.onlyFields(BAND_FIELDS);
                    try {
                        bands.add(TemperatureBand.of(b.get("fromCelsius").number(false), b.get("toCelsius").number(false),
                                MpeLimits.of(b.get("lower").number(false), b.get("upper").number(false))));
                    } catch (IllegalArgumentException e) {
                        throw b.error(e.getMessage());
                    }
                }
                return MpeZone.of(name, from, to, bands);
            }
            return MpeZone.of(name, from, to, z.get("lower").number(false), z.get("upper").number(false));
        } catch (IllegalArgumentException e) {
            throw z.error(e.getMessage());
        }
    }

    /** Reads a decision rule. */
    public static DecisionRule readRule(JsonCursor r) throws BudgetFormatException {
        r.onlyFields(RULE_FIELDS);
        String kind = r.get("kind").string();
        DecisionRule rule;
        try {
            switch (kind) {
                case "simple-acceptance":
                    forbid(r, "guardFactor", "minimumProbability");
                    rule = DecisionRule.simpleAcceptance();
                    break;
                case "guarded-acceptance":
                case "guarded-non-binary":
                    forbid(r, "minimumProbability");
                    double g = r.has("guardFactor") ? r.get("guardFactor").number(false) : 1.0;
                    rule = kind.equals("guarded-acceptance") ? DecisionRule.guardedAcceptance(g)
                            : DecisionRule.guardedNonBinary(g);
                    break;
                case "probability-of-conformity":
                    forbid(r, "guardFactor");
                    rule = DecisionRule.probabilityOfConformity(r.get("minimumProbability").number(false));
                    break;
                default:
                    throw new BudgetFormatException(r.path() + ".kind", "unknown decision rule '" + kind
                            + "'; expected one of " + String.join(", ", KINDS));
            }
        } catch (IllegalArgumentException e) {
            throw r.error(e.getMessage());
        }
        if (r.has("distribution")) {
            String d = r.get("distribution").string();
            if (d.equals("normal")) {
                rule = rule.withDistribution(ResultDistribution.NORMAL);
            } else if (d.equals("scaled-t")) {
                rule = rule.withDistribution(ResultDistribution.SCALED_T);
            } else {
                throw new BudgetFormatException(r.path() + ".distribution", "distribution must be \"normal\" or "
                        + "\"scaled-t\", not \"" + d + "\"");
            }
        }
        return rule;
    }

    private static void forbid(JsonCursor r, String... names) throws BudgetFormatException {
        for (String n : names) {
            if (r.has(n)) {
                throw new BudgetFormatException(r.path() + "." + n, "'" + n + "' does not belong to a rule of kind '"
                        + r.get("kind").string() + "'");
            }
        }
    }

    /** Reads a list of measured errors: flow, error (%), u, k, optional dof and temperature. */
    public static List<MeasuredError> readErrors(JsonCursor array) throws BudgetFormatException {
        List<MeasuredError> out = new ArrayList<>();
        for (JsonCursor p : array.elements()) {
            p.onlyFields(ERROR_FIELDS);
            try {
                MeasuredError e = MeasuredError.of(p.get("flow").number(false), p.get("error").number(false),
                        p.get("u").number(false), p.get("k").number(false),
                        p.has("dof") ? p.get("dof").number(true) : Double.POSITIVE_INFINITY);
                if (p.has("temperature")) {
                    e = e.withTemperature(p.get("temperature").number(false));
                }
                out.add(e);
            } catch (IllegalArgumentException e) {
                throw p.error(e.getMessage());
            }
        }
        return out;
    }

    /** @return an envelope as explicit zones */
    public static JsonObject envelopeJson(MpeEnvelope e) {
        JsonArrayBuilder zones = JsonSupport.JSON.createArrayBuilder();
        for (MpeZone z : e.zones()) {
            JsonObjectBuilder zb = JsonSupport.JSON.createObjectBuilder().add("name", z.name()).add("from", z.flowFrom())
                    .add("to", z.flowTo());
            if (!z.dependsOnTemperature()) {
                MpeLimits l = z.limits();
                zb.add("lower", l.lowerPercent()).add("upper", l.upperPercent());
            } else {
                JsonArrayBuilder bands = JsonSupport.JSON.createArrayBuilder();
                for (TemperatureBand b : z.bands()) {
                    bands.add(JsonSupport.JSON.createObjectBuilder().add("fromCelsius", b.fromCelsius())
                            .add("toCelsius", b.toCelsius()).add("lower", b.limits().lowerPercent())
                            .add("upper", b.limits().upperPercent()));
                }
                zb.add("bands", bands);
            }
            zones.add(zb);
        }
        return JsonSupport.JSON.createObjectBuilder().add("name", e.name()).add("source", e.source()).add("zones", zones).build();
    }

    /** @return a decision rule as JSON */
    public static JsonObject ruleJson(DecisionRule r) {
        JsonObjectBuilder b = JsonSupport.JSON.createObjectBuilder();
        switch (r.kind()) {
            case SIMPLE_ACCEPTANCE:
                b.add("kind", "simple-acceptance");
                break;
            case GUARDED_ACCEPTANCE:
                b.add("kind", "guarded-acceptance").add("guardFactor", r.guardFactor());
                break;
            case GUARDED_NON_BINARY:
                b.add("kind", "guarded-non-binary").add("guardFactor", r.guardFactor());
                break;
            default:
                b.add("kind", "probability-of-conformity").add("minimumProbability", r.minimumProbability());
        }
        b.add("distribution", r.distribution() == ResultDistribution.NORMAL ? "normal" : "scaled-t");
        return b.build();
    }

    /** @return the decisions, the overall decision and the certificate statement */
    public static JsonObject assessmentJson(ConformityAssessment a) {
        JsonArrayBuilder pts = JsonSupport.JSON.createArrayBuilder();
        for (PointDecision d : a.decisions()) {
            JsonObjectBuilder b = JsonSupport.JSON.createObjectBuilder();
            b.add("flow", d.point().flow());
            b.add("zone", d.zone());
            b.add("error", d.point().errorPercent());
            b.add("standardUncertainty", d.point().standardUncertainty());
            b.add("expandedUncertainty", d.expandedUncertainty());
            b.add("lowerTolerance", d.lowerTolerance());
            b.add("upperTolerance", d.upperTolerance());
            b.add("guardBand", d.guardBand());
            BudgetJson.addNumber(b, "acceptanceLower", d.acceptanceLower());
            BudgetJson.addNumber(b, "acceptanceUpper", d.acceptanceUpper());
            b.add("probabilityOfConformity", d.probabilityOfConformity());
            b.add("decision", d.decision().label());
            BudgetJson.addNumber(b, "specificRisk", d.specificRisk());
            pts.add(b);
        }
        return JsonSupport.JSON.createObjectBuilder().add("mpe", a.envelope().name()).add("rule", a.rule().kind().title())
                .add("decisions", pts).add("overall", a.overall().label()).add("statement", a.statement()).build();
    }
}
