package org.quire.engine.validate;

import org.quire.engine.io.JsonSupport;
import jakarta.json.JsonNumber;
import jakarta.json.JsonObject;
import jakarta.json.JsonString;
import jakarta.json.JsonValue;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.EvaluationSettings;
import org.quire.engine.budget.CoverageFactor;
import org.quire.engine.gum.GumEvaluator;
import org.quire.engine.io.BudgetFormatException;
import org.quire.engine.io.BudgetJson;
import org.quire.engine.io.JsonCursor;
import org.quire.engine.io.ResultJson;
import org.quire.engine.model.FunctionLibrary;

/**
 * Runs the worked examples: files that hold a budget (or none) and a list of checks, each a published figure
 * with its source and tolerance and the place in Quire's results to compare it with. The same files run in
 * the test suite and in {@code quire validate}. The layout is described in
 * {@code budget-engine/doc/budget-format.md} (section "Worked examples").
 *
 * <p>Immutable and thread-safe once built.
 */
public final class Validator {
    private static final java.util.Set<String> CHECK_FIELDS = java.util.Set.of("figure", "compute", "path",
            "expected", "tolerance", "relativeTolerance", "settings", "arguments", "source", "note");
    private final Map<String, Computation> computations;
    private final FunctionLibrary library;

    private Validator(Map<String, Computation> computations, FunctionLibrary library) {
        this.computations = computations;
        this.library = library;
    }

    /**
     * @return a validator with the GUM evaluation ("gum"), coverage factors ("coverage-factor"), calibration
     *     lines ("line"), conformity ("conformity") and flow ranges ("flow-range", see
     *     {@link CalibrationComputations})
     */
    public static Validator standard(FunctionLibrary library) {
        Map<String, Computation> m = new LinkedHashMap<>();
        m.put("gum", (budget, args, settings) -> {
            if (budget == null) {
                throw new IllegalArgumentException("the 'gum' computation needs a budget in the file");
            }
            Budget b = budget.withSettings(settings);
            return ResultJson.toJson(b.title(), GumEvaluator.evaluate(b, library));
        });
        m.put("montecarlo", (budget, args, settings) -> {
            if (budget == null) {
                throw new IllegalArgumentException("the 'montecarlo' computation needs a budget in the file");
            }
            Budget b = budget.withSettings(settings);
            org.quire.engine.model.CompiledModel model = b.compile(library);
            org.quire.engine.gum.GumResult gum = GumEvaluator.evaluate(b, model, b.correlationMatrix(), settings);
            org.quire.engine.montecarlo.MonteCarloOutcome o = org.quire.engine.montecarlo.BudgetSimulation.run(
                    b, model, gum, org.quire.engine.montecarlo.BudgetSimulation.settings(settings, gum),
                    org.quire.engine.montecarlo.ProgressListener.NONE);
            return org.quire.engine.io.MonteCarloJson.toJson(o, false);
        });
        m.put("coverage-factor", (budget, args, settings) -> {
            double p = args.getJsonNumber("p").doubleValue();
            JsonValue nuV = args.get("dof");
            double nu = nuV instanceof JsonString ? Double.POSITIVE_INFINITY : ((JsonNumber) nuV).doubleValue();
            return JsonSupport.JSON.createObjectBuilder().add("k", CoverageFactor.of(p, nu)).build();
        });
        m.put("line", (budget, args, settings) -> CalibrationComputations.line(budget, args));
        m.put("conformity", (budget, args, settings) -> CalibrationComputations.conformity(args));
        m.put("flow-range", (budget, args, settings) ->
                CalibrationComputations.flowRange(budget == null ? null : budget.withSettings(settings), library));
        m.put("calibration", CalibrationComputations.meterCalibration(library));
        return new Validator(m, library);
    }

    /** @return a copy that also knows the computation {@code name} */
    public Validator with(String name, Computation c) {
        Map<String, Computation> m = new LinkedHashMap<>(computations);
        m.put(name, c);
        return new Validator(m, library);
    }

    /** @return the function library budgets are compiled with */
    public FunctionLibrary library() {
        return library;
    }

    /** Runs every {@code .json} file in {@code dir}, in name order. */
    public List<CheckOutcome> runAll(Path dir) throws IOException {
        List<Path> files;
        try (Stream<Path> s = Files.list(dir)) {
            files = s.filter(p -> p.getFileName().toString().endsWith(".json")).sorted().collect(Collectors.toList());
        }
        List<CheckOutcome> out = new ArrayList<>();
        for (Path f : files) {
            out.addAll(run(f));
        }
        return out;
    }

    /** Runs the checks of one example file; a file that cannot be read gives one failed outcome saying why. */
    public List<CheckOutcome> run(Path file) {
        String name = file.getFileName().toString();
        try {
            JsonObject root = BudgetJson.parseObject(BudgetJson.readText(file));
            return run(name, root, file.toAbsolutePath().getParent());
        } catch (IOException | BudgetFormatException e) {
            return List.of(new CheckOutcome(name, "", "(file)", "", "", "", false, e.getMessage()));
        }
    }

    /** Runs the checks of one parsed example. */
    public List<CheckOutcome> run(String name, JsonObject root) {
        return run(name, root, null);
    }

    /**
     * Runs the checks of one parsed example whose files (for the {@code calibration} computation) are named
     * relative to {@code folder} (null: the working folder).
     */
    public List<CheckOutcome> run(String name, JsonObject root, Path folder) {
        JsonCursor c = JsonCursor.root(root);
        List<CheckOutcome> out = new ArrayList<>();
        Budget budget = null;
        String fileSource;
        List<JsonCursor> checks;
        try {
            fileSource = c.has("reference") ? c.get("reference").string("source", "") : "";
            checks = c.get("checks").elements();
            if (BudgetJson.FORMAT.equals(c.string("format", ""))) {
                budget = BudgetJson.read(c);
            }
        } catch (BudgetFormatException e) {
            return List.of(new CheckOutcome(name, "", "(file)", "", "", "", false, e.getMessage()));
        }
        Map<String, Object> cache = new HashMap<>();
        for (JsonCursor check : checks) {
            out.add(check(name, fileSource, budget, check, cache, folder));
        }
        return out;
    }

    private CheckOutcome check(String name, String fileSource, Budget budget, JsonCursor check,
            Map<String, Object> cache, Path folder) {
        String figure = "";
        String source = fileSource;
        String expectedText = "";
        String tolText = "";
        try {
            check.onlyFields(CHECK_FIELDS);
            figure = check.get("figure").string();
            source = check.string("source", fileSource);
            String kind = check.get("compute").string();
            Computation comp = computations.get(kind);
            if (comp == null) {
                throw check.error("unknown computation '" + kind + "'; known: " + String.join(", ", computations.keySet()));
            }
            EvaluationSettings settings = budget == null ? EvaluationSettings.defaults() : budget.settings();
            if (check.has("settings")) {
                settings = BudgetJson.readSettings(check.get("settings"), settings);
            }
            JsonObject args = check.has("arguments") ? check.get("arguments").object() : JsonObject.EMPTY_JSON_OBJECT;
            String key = kind + "|" + BudgetJson.settingsJson(settings) + "|" + args;
            Object result = cache.get(key);
            if (result == null) {
                try {
                    result = comp.compute(budget, args, settings, folder);
                } catch (Exception e) {
                    result = e;
                }
                cache.put(key, result);
            }
            JsonCursor expected = check.get("expected");
            expectedText = expected.value().toString();
            if (result instanceof Exception) {
                return new CheckOutcome(name, source, figure, expectedText, "", "", false,
                        "could not compute: " + ((Exception) result).getMessage());
            }
            JsonValue computed = lookup((JsonObject) result, check.get("path").string());
            if (expected.value().getValueType() == JsonValue.ValueType.STRING) {
                String want = expected.string();
                String got = computed instanceof JsonString ? ((JsonString) computed).getString() : String.valueOf(computed);
                return new CheckOutcome(name, source, figure, want, got, "exact", want.equals(got), "");
            }
            double want = expected.number(false);
            double got;
            if (computed instanceof JsonNumber) {
                got = ((JsonNumber) computed).doubleValue();
            } else if (computed instanceof JsonString && ((JsonString) computed).getString().equals("inf")) {
                got = Double.POSITIVE_INFINITY;
            } else {
                throw check.error("the value at '" + check.get("path").string() + "' is not a number: " + computed);
            }
            double tol;
            if (check.has("relativeTolerance")) {
                double rel = check.get("relativeTolerance").number(false);
                tol = Math.abs(want) * rel;
                tolText = fmt(rel * 100) + " %";
            } else {
                tol = check.get("tolerance").number(false);
                tolText = fmt(tol);
            }
            boolean ok = Math.abs(got - want) <= tol * (1 + 1e-9);
            return new CheckOutcome(name, source, figure, expectedText, fmt(got), tolText, ok, "");
        } catch (BudgetFormatException e) {
            return new CheckOutcome(name, source, figure, expectedText, "", tolText, false, e.getMessage());
        }
    }

    /**
     * Follows a dotted path into JSON. A segment names an object field, an array index, or, in an array of
     * objects, the element whose {@code name} or {@code input} field equals it ({@code outputs.l.contributions.d}).
     */
    static JsonValue lookup(JsonObject root, String path) throws BudgetFormatException {
        JsonValue v = root;
        StringBuilder walked = new StringBuilder("$");
        for (String seg : path.split("\\.")) {
            walked.append('.').append(seg);
            if (v.getValueType() == JsonValue.ValueType.OBJECT) {
                JsonValue next = v.asJsonObject().get(seg);
                if (next == null) {
                    throw new BudgetFormatException(walked.toString(), "the result has no field '" + seg
                            + "'; it has: " + String.join(", ", v.asJsonObject().keySet()));
                }
                v = next;
            } else if (v.getValueType() == JsonValue.ValueType.ARRAY) {
                JsonValue found = null;
                if (seg.matches("\\d+")) {
                    int i = Integer.parseInt(seg);
                    if (i < v.asJsonArray().size()) {
                        found = v.asJsonArray().get(i);
                    }
                } else {
                    for (JsonValue e : v.asJsonArray()) {
                        if (e.getValueType() == JsonValue.ValueType.OBJECT) {
                            JsonObject o = e.asJsonObject();
                            if (seg.equals(o.getString("name", null)) || seg.equals(o.getString("input", null))) {
                                found = e;
                                break;
                            }
                        }
                    }
                }
                if (found == null) {
                    throw new BudgetFormatException(walked.toString(), "the result has no element '" + seg + "'");
                }
                v = found;
            } else {
                throw new BudgetFormatException(walked.toString(), "cannot go into a " + v.getValueType());
            }
        }
        return v;
    }

    static String fmt(double v) {
        if (Double.isInfinite(v)) {
            return "inf";
        }
        return String.format(Locale.ROOT, "%.6g", v);
    }
}
