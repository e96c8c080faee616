package org.quire.engine.io;

import jakarta.json.spi.JsonProvider;
import jakarta.json.JsonArrayBuilder;
import jakarta.json.JsonException;
import jakarta.json.JsonObject;
import jakarta.json.JsonObjectBuilder;
import jakarta.json.JsonReader;
import jakarta.json.JsonValue;
import jakarta.json.JsonWriter;
import jakarta.json.JsonWriterFactory;
import jakarta.json.stream.JsonGenerator;
import jakarta.json.stream.JsonLocation;
import jakarta.json.stream.JsonParsingException;
import java.io.IOException;
import java.io.StringReader;
import java.io.StringWriter;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.Correlation;
import org.quire.engine.budget.EvaluationSettings;
import org.quire.engine.budget.FitParameter;
import org.quire.engine.budget.FlowPoints;
import org.quire.engine.budget.Evaluation;
import org.quire.engine.budget.InputQuantity;
import org.quire.engine.budget.InvalidParameterException;
import org.quire.engine.budget.OutputQuantity;
import org.quire.engine.budget.TypeA;
import org.quire.engine.budget.TypeB;
import org.quire.engine.line.CalibrationLine;

/**
 * Reads and writes budget files: our own JSON layout, described in {@code budget-engine/doc/budget-format.md}.
 *
 * <p>Reading is strict and bounded: files over {@link #MAX_BYTES}, nesting deeper than {@link #MAX_DEPTH},
 * malformed JSON, wrong types, missing or unknown fields and bad values are refused with the JSON path of the
 * field (or the line and column of a syntax error). Top-level fields this version does not know are kept in
 * {@link Budget#extensions()} and written back on save.
 *
 * <p>Stateless and thread-safe.
 */
public final class BudgetJson {
    /** One JSON-P provider for the class: {@code JsonSupport.JSON.create...} looks the provider up on every call, which is slow. */
    private static final JsonProvider JSON = JsonSupport.JSON;
    /** The layout's identifier, the value of the {@code format} field. */
    public static final String FORMAT = "quire-budget";
    /**
     * The format version this engine writes. Version 2 adds the document fields ({@code document},
     * {@code dataSets}, {@code results}, {@code history}, {@code templateOrigin}, {@code template}), read by
     * {@code org.quire.engine.document.DocumentJson}; here they are kept, like any other field this class does
     * not interpret, in {@link Budget#extensions()}. Version 1 files are read as they are.
     */
    public static final int FORMAT_VERSION = 2;
    /** Largest budget file read, in bytes. */
    public static final long MAX_BYTES = 16L * 1024 * 1024;
    /** Deepest nesting of objects and arrays accepted. */
    public static final int MAX_DEPTH = 32;

    static final Set<String> TOP_FIELDS = Set.of("format", "formatVersion", "title", "notes", "model", "outputs",
            "inputs", "correlations", "settings", "dataSets", "flowPoints");
    private static final Set<String> INPUT_FIELDS = Set.of("name", "description", "unit", "source", "notes",
            "evaluation");
    private static final Set<String> TYPE_A_FIELDS = Set.of("type", "readings", "mean", "s", "n", "pooledS",
            "pooledDof");
    private static final Set<String> OUTPUT_FIELDS = Set.of("name", "unit", "description", "displayUnit");
    private static final Set<String> CORRELATION_FIELDS = Set.of("inputs", "r", "fromReadings", "justification");
    private static final Set<String> SETTINGS_FIELDS = Set.of("coverageProbability", "coverageFactor",
            "higherOrder", "dofRounding", "trials", "seed", "significantDigits", "adaptive");

    private BudgetJson() {
    }

    /** Reads a budget file. */
    public static Budget read(Path file) throws IOException, BudgetFormatException {
        return read(readText(file));
    }

    /**
     * Reads a text file of at most {@link #MAX_BYTES} as strict UTF-8.
     *
     * @throws BudgetFormatException when the file is too large or not UTF-8 text
     */
    public static String readText(Path file) throws IOException, BudgetFormatException {
        long size = Files.size(file);
        if (size > MAX_BYTES) {
            throw new BudgetFormatException("", "the file is " + size + " bytes, larger than the "
                    + MAX_BYTES + " bytes a budget file may have");
        }
        byte[] bytes = Files.readAllBytes(file);
        try {
            return StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT).decode(java.nio.ByteBuffer.wrap(bytes)).toString();
        } catch (CharacterCodingException e) {
            throw new BudgetFormatException("", "the file is not UTF-8 text");
        }
    }

    /** Parses JSON text into an object, with line and column for syntax errors. */
    public static JsonObject parseObject(String text) throws BudgetFormatException {
        if (text.length() > MAX_BYTES) {
            throw new BudgetFormatException("", "the text is larger than " + MAX_BYTES + " characters");
        }
        if (text.isBlank()) {
            throw new BudgetFormatException("", "the file is empty");
        }
        JsonLimits.check(text);
        JsonValue v;
        try (JsonReader r = JSON.createReader(new StringReader(text))) {
            v = r.readValue();
        } catch (JsonParsingException e) {
            JsonLocation l = e.getLocation();
            String where = l == null ? "" : "line " + l.getLineNumber() + ", column " + l.getColumnNumber();
            throw new BudgetFormatException(where, "malformed JSON: " + cleanMessage(e.getMessage()), e);
        } catch (JsonException e) {
            throw new BudgetFormatException("", "malformed or truncated JSON: " + cleanMessage(e.getMessage()), e);
        } catch (RuntimeException e) {
            // the parser's own limits (nesting, number length) are checked above with a path; anything else
            // the parser refuses is still a malformed file, not a bug
            throw new BudgetFormatException("", "malformed JSON: " + cleanMessage(e.getMessage()), e);
        }
        if (v.getValueType() != JsonValue.ValueType.OBJECT) {
            throw new BudgetFormatException("$", "a budget file holds one JSON object, not " + v.getValueType()
                    .toString().toLowerCase(java.util.Locale.ROOT));
        }
        if (JsonCursor.depth(v, MAX_DEPTH + 1) > MAX_DEPTH) {
            throw new BudgetFormatException("$", tooDeep());
        }
        return v.asJsonObject();
    }

    /** @return the message for JSON nested deeper than {@link #MAX_DEPTH} (the path is given with it) */
    static String tooDeep() {
        return "the JSON is nested more than " + MAX_DEPTH + " levels deep";
    }

    private static String cleanMessage(String m) {
        return m == null ? "unexpected end of input" : m.replaceAll("\\s+", " ");
    }

    /** Reads a budget from JSON text. */
    public static Budget read(String text) throws BudgetFormatException {
        return read(JsonCursor.root(parseObject(text)));
    }

    /** Reads a budget from a parsed object (its root is the budget). */
    public static Budget read(JsonCursor root) throws BudgetFormatException {
        String format = root.get("format").string();
        if (!format.equals(FORMAT)) {
            throw new BudgetFormatException(root.path() + ".format", "this is not a budget file: format is '"
                    + format + "', expected '" + FORMAT + "'");
        }
        long version = root.get("formatVersion").integer();
        if (version > FORMAT_VERSION) {
            throw new BudgetFormatException(root.path() + ".formatVersion", "the file has format version " + version
                    + ", written by a newer Quire; this version reads up to " + FORMAT_VERSION
                    + ". The file was not changed.");
        }
        if (version < 1) {
            throw new BudgetFormatException(root.path() + ".formatVersion", "format version must be 1 or more, not "
                    + version);
        }
        String model = readModel(root.get("model"));
        List<OutputQuantity> outputs = new ArrayList<>();
        for (JsonCursor o : root.get("outputs").elements()) {
            outputs.add(readOutput(o));
        }
        if (outputs.isEmpty()) {
            throw new BudgetFormatException(root.path() + ".outputs", "name at least one output");
        }
        List<CalibrationLine> dataSets = root.has("dataSets") ? DataSetJson.readAll(root.get("dataSets")) : List.of();
        List<InputQuantity> inputs = new ArrayList<>();
        java.util.Set<String> seen = new java.util.HashSet<>();
        for (JsonCursor in : root.get("inputs").elements()) {
            InputQuantity q = readInput(in, dataSets);
            if (seen.contains(q.name())) {
                throw new BudgetFormatException(in.path() + ".name", "input '" + q.name() + "' is listed twice");
            }
            seen.add(q.name());
            inputs.add(q);
        }
        List<Correlation> correlations = new ArrayList<>();
        if (root.has("correlations")) {
            for (JsonCursor c : root.get("correlations").elements()) {
                correlations.add(readCorrelation(c));
            }
        }
        EvaluationSettings settings = root.has("settings") ? readSettings(root.get("settings"))
                : EvaluationSettings.defaults();
        JsonObjectBuilder ext = JSON.createObjectBuilder();
        for (Map.Entry<String, JsonValue> e : root.object().entrySet()) {
            if (!TOP_FIELDS.contains(e.getKey())) {
                ext.add(e.getKey(), e.getValue());
            }
        }
        try {
            FlowPoints flow = root.has("flowPoints") ? FlowPointsJson.read(root.get("flowPoints")) : null;
            return Budget.of(model, outputs, List.of()).withDataSets(dataSets).withInputs(inputs).withFlowPoints(flow)
                    .withTitle(root.string("title", ""))
                    .withNotes(root.string("notes", "")).withCorrelations(correlations).withSettings(settings)
                    .withExtensions(ext.build());
        } catch (IllegalArgumentException e) {
            throw new BudgetFormatException(root.path(), e.getMessage());
        }
    }

    private static String readModel(JsonCursor m) throws BudgetFormatException {
        if (m.value().getValueType() == JsonValue.ValueType.ARRAY) {
            List<String> lines = new ArrayList<>();
            for (JsonCursor l : m.elements()) {
                lines.add(l.string());
            }
            return String.join("\n", lines);
        }
        return m.string();
    }

    private static OutputQuantity readOutput(JsonCursor o) throws BudgetFormatException {
        try {
            if (o.value().getValueType() == JsonValue.ValueType.STRING) {
                return OutputQuantity.of(o.string());
            }
            o.onlyFields(OUTPUT_FIELDS);
            return new OutputQuantity(o.get("name").string(), o.string("unit", ""), o.string("description", ""),
                    o.string("displayUnit", ""));
        } catch (IllegalArgumentException e) {
            throw o.error(e.getMessage());
        }
    }

    private static InputQuantity readInput(JsonCursor in, List<CalibrationLine> dataSets)
            throws BudgetFormatException {
        in.onlyFields(INPUT_FIELDS);
        String name = in.get("name").string();
        try {
            InputQuantity.checkName(name);
        } catch (IllegalArgumentException e) {
            throw new BudgetFormatException(in.path() + ".name", e.getMessage());
        }
        Evaluation ev = readEvaluation(in.get("evaluation"), dataSets);
        try {
            return InputQuantity.of(name, ev).withDescription(in.string("description", ""))
                    .withUnit(in.string("unit", "")).withSource(in.string("source", ""))
                    .withNotes(in.string("notes", ""));
        } catch (IllegalArgumentException e) {
            throw new BudgetFormatException(in.path() + ".evaluation", e.getMessage());
        }
    }

    /** Reads one evaluation object ({@code type} A or B). */
    public static Evaluation readEvaluation(JsonCursor e) throws BudgetFormatException {
        return readEvaluation(e, List.of());
    }

    /** Reads one evaluation object ({@code type} A, B, or fit: a parameter of one of {@code dataSets}). */
    public static Evaluation readEvaluation(JsonCursor e, List<CalibrationLine> dataSets)
            throws BudgetFormatException {
        String type = e.get("type").string();
        if (type.equals("fit")) {
            return FitEvaluationJson.read(e, dataSets);
        }
        if (type.equals("A")) {
            e.onlyFields(TYPE_A_FIELDS);
            TypeA a;
            try {
                if (e.has("readings")) {
                    if (e.has("mean") || e.has("s") || e.has("n")) {
                        throw e.error("give either 'readings' or 'mean', 's' and 'n', not both");
                    }
                    List<JsonCursor> rs = e.get("readings").elements();
                    double[] r = new double[rs.size()];
                    for (int i = 0; i < r.length; i++) {
                        r[i] = rs.get(i).number(false);
                    }
                    if (r.length == 0) {
                        throw new BudgetFormatException(e.path() + ".readings", "no readings are given");
                    }
                    a = TypeA.ofReadings(r);
                } else {
                    double mean = e.get("mean").number(false);
                    long n = e.get("n").integer();
                    if (n < 1 || n > Integer.MAX_VALUE) {
                        throw new BudgetFormatException(e.path() + ".n", "n must be a positive number of observations, not " + n);
                    }
                    if (e.has("s")) {
                        double s = e.get("s").number(false);
                        if (!(s > 0)) {
                            throw new BudgetFormatException(e.path() + ".s", "s must be positive, not " + s);
                        }
                        if (n < 2) {
                            throw new BudgetFormatException(e.path() + ".n", "s needs at least 2 observations, not " + n);
                        }
                        a = TypeA.ofSummary(mean, s, (int) n);
                    } else if (e.has("pooledS")) {
                        a = TypeA.ofMean(mean, (int) n);
                    } else {
                        throw e.error("a Type A evaluation needs 'readings', or 'mean', 's' and 'n', "
                                + "or 'mean', 'n' and 'pooledS'");
                    }
                }
                if (e.has("pooledS") || e.has("pooledDof")) {
                    double sp = e.get("pooledS").number(false);
                    double nu = e.get("pooledDof").number(true);
                    if (!(sp > 0)) {
                        throw new BudgetFormatException(e.path() + ".pooledS", "pooledS must be positive, not " + sp);
                    }
                    if (!(nu > 0)) {
                        throw new BudgetFormatException(e.path() + ".pooledDof", "pooledDof must be positive, not " + nu);
                    }
                    a = a.withPooled(sp, nu);
                }
                return a;
            } catch (InvalidParameterException x) {
                throw new BudgetFormatException(e.path() + "." + x.parameter(), x.getMessage());
            } catch (IllegalArgumentException x) {
                throw e.error(x.getMessage());
            }
        }
        if (type.equals("B")) {
            String dist = e.get("distribution").string();
            Map<String, Double> p = new LinkedHashMap<>();
            for (String k : e.keys()) {
                if (k.equals("type") || k.equals("distribution")) {
                    continue;
                }
                if (!TypeB.parameterNames().contains(k)) {
                    List<String> allowed = new ArrayList<>(TypeB.parameterNames());
                    allowed.add("type");
                    allowed.add("distribution");
                    e.onlyFields(allowed);
                }
                p.put(k, e.get(k).number(k.equals("dof")));
            }
            try {
                return TypeB.of(dist, p);
            } catch (InvalidParameterException x) {
                String field = x.parameter().isEmpty() ? "" : "." + x.parameter();
                throw new BudgetFormatException(e.path() + field, x.getMessage());
            } catch (IllegalArgumentException x) {
                throw e.error(x.getMessage());
            }
        }
        throw new BudgetFormatException(e.path() + ".type", "type must be \"A\", \"B\" or \"fit\", not \"" + type + "\"");
    }

    private static Correlation readCorrelation(JsonCursor c) throws BudgetFormatException {
        c.onlyFields(CORRELATION_FIELDS);
        List<JsonCursor> names = c.get("inputs").elements();
        if (names.size() != 2) {
            throw new BudgetFormatException(c.path() + ".inputs", "a correlation names exactly two inputs, not "
                    + names.size());
        }
        String a = names.get(0).string();
        String b = names.get(1).string();
        boolean fromReadings = c.has("fromReadings") && c.get("fromReadings").bool();
        try {
            Correlation corr;
            if (fromReadings) {
                if (c.has("r")) {
                    throw new BudgetFormatException(c.path() + ".r", "give either r or fromReadings, not both");
                }
                corr = Correlation.fromReadings(a, b);
            } else {
                corr = Correlation.of(a, b, c.get("r").number(false));
            }
            return corr.withJustification(c.string("justification", ""));
        } catch (IllegalArgumentException e) {
            throw c.error(e.getMessage());
        }
    }

    /** Reads an evaluation-settings object. */
    public static EvaluationSettings readSettings(JsonCursor s) throws BudgetFormatException {
        return readSettings(s, EvaluationSettings.defaults());
    }

    /** Reads an evaluation-settings object over a base, for partial overrides. */
    public static EvaluationSettings readSettings(JsonCursor s, EvaluationSettings base) throws BudgetFormatException {
        s.onlyFields(SETTINGS_FIELDS);
        EvaluationSettings r = base;
        String field = "";
        try {
            if (s.has("coverageProbability") && s.has("coverageFactor")) {
                throw new BudgetFormatException(s.path() + ".coverageFactor",
                        "give either coverageProbability or coverageFactor, not both");
            }
            field = "coverageProbability";
            if (s.has(field)) {
                r = r.withCoverageProbability(s.get(field).number(false));
            }
            field = "coverageFactor";
            if (s.has(field)) {
                r = r.withCoverageFactor(s.get(field).number(false));
            }
            field = "higherOrder";
            if (s.has(field)) {
                r = r.withHigherOrder(s.get(field).bool());
            }
            field = "dofRounding";
            if (s.has(field)) {
                String v = s.get(field).string();
                if (v.equals("truncate")) {
                    r = r.withDofRounding(EvaluationSettings.DofRounding.TRUNCATE);
                } else if (v.equals("exact")) {
                    r = r.withDofRounding(EvaluationSettings.DofRounding.EXACT);
                } else {
                    throw new BudgetFormatException(s.path() + "." + field,
                            "dofRounding must be \"truncate\" or \"exact\", not \"" + v + "\"");
                }
            }
            field = "trials";
            if (s.has(field)) {
                r = r.withTrials(s.get(field).integer());
            }
            field = "seed";
            if (s.has(field)) {
                r = r.withSeed(s.get(field).integer());
            }
            field = "significantDigits";
            if (s.has(field)) {
                r = r.withSignificantDigits((int) Math.max(Integer.MIN_VALUE, Math.min(Integer.MAX_VALUE, s.get(field).integer())));
            }
            field = "adaptive";
            if (s.has(field)) {
                r = r.withAdaptive(s.get(field).bool());
            }
        } catch (IllegalArgumentException e) {
            throw new BudgetFormatException(s.path() + "." + field, e.getMessage());
        }
        return r;
    }

    // ---------------------------------------------------------------------------------------------------------

    /** @return the budget as a JSON object in the current format version */
    public static JsonObject toJson(Budget b) {
        JsonObjectBuilder o = JSON.createObjectBuilder();
        o.add("format", FORMAT);
        o.add("formatVersion", FORMAT_VERSION);
        o.add("title", b.title());
        if (!b.notes().isEmpty()) {
            o.add("notes", b.notes());
        }
        JsonArrayBuilder model = JSON.createArrayBuilder();
        for (String line : b.model().split("\n", -1)) {
            model.add(line);
        }
        o.add("model", model);
        JsonArrayBuilder outs = JSON.createArrayBuilder();
        for (OutputQuantity q : b.outputs()) {
            JsonObjectBuilder ob = JSON.createObjectBuilder().add("name", q.name());
            if (!q.unit().isEmpty()) {
                ob.add("unit", q.unit());
            }
            if (!q.description().isEmpty()) {
                ob.add("description", q.description());
            }
            if (!q.displayUnit().isEmpty()) {
                ob.add("displayUnit", q.displayUnit());
            }
            outs.add(ob);
        }
        o.add("outputs", outs);
        JsonArrayBuilder ins = JSON.createArrayBuilder();
        for (InputQuantity q : b.inputs()) {
            JsonObjectBuilder ib = JSON.createObjectBuilder().add("name", q.name());
            addText(ib, "description", q.description());
            addText(ib, "unit", q.unit());
            addText(ib, "source", q.source());
            addText(ib, "notes", q.notes());
            ib.add("evaluation", evaluationJson(q.evaluation()));
            ins.add(ib);
        }
        o.add("inputs", ins);
        if (!b.correlations().isEmpty()) {
            JsonArrayBuilder cs = JSON.createArrayBuilder();
            for (Correlation c : b.correlations()) {
                JsonObjectBuilder cb = JSON.createObjectBuilder()
                        .add("inputs", JSON.createArrayBuilder().add(c.first()).add(c.second()));
                if (c.fromReadings()) {
                    cb.add("fromReadings", true);
                } else {
                    cb.add("r", decimal(c.r()));
                }
                addText(cb, "justification", c.justification());
                cs.add(cb);
            }
            o.add("correlations", cs);
        }
        if (!b.dataSets().isEmpty()) {
            o.add("dataSets", DataSetJson.toJson(b.dataSets()));
        }
        if (b.flowPoints() != null) {
            o.add("flowPoints", FlowPointsJson.toJson(b.flowPoints()));
        }
        o.add("settings", settingsJson(b.settings()));
        for (Map.Entry<String, JsonValue> e : b.extensions().entrySet()) {
            if (!TOP_FIELDS.contains(e.getKey())) {
                o.add(e.getKey(), e.getValue());
            }
        }
        return o.build();
    }

    private static void addText(JsonObjectBuilder b, String key, String value) {
        if (value != null && !value.isEmpty()) {
            b.add(key, value);
        }
    }

    /** @return an evaluation as JSON, with the parameters as entered */
    public static JsonObject evaluationJson(Evaluation e) {
        JsonObjectBuilder b = JSON.createObjectBuilder();
        if (e instanceof FitParameter) {
            return FitEvaluationJson.toJson((FitParameter) e);
        }
        if (e instanceof TypeA) {
            TypeA a = (TypeA) e;
            b.add("type", "A");
            double[] r = a.readings();
            if (r != null) {
                JsonArrayBuilder rb = JSON.createArrayBuilder();
                for (double v : r) {
                    rb.add(decimal(v));
                }
                b.add("readings", rb);
            } else {
                b.add("mean", decimal(a.estimate()));
                if (!Double.isNaN(a.standardDeviation())) {
                    b.add("s", decimal(a.standardDeviation()));
                }
                b.add("n", a.count());
            }
            if (a.isPooled()) {
                b.add("pooledS", decimal(a.pooledStandardDeviation()));
                addNumber(b, "pooledDof", a.dof());
            }
            return b.build();
        }
        TypeB t = (TypeB) e;
        b.add("type", "B");
        b.add("distribution", t.distributionName());
        for (Map.Entry<String, Double> p : t.parameters().entrySet()) {
            addNumber(b, p.getKey(), p.getValue());
        }
        return b.build();
    }

    /** Adds {@code v} to {@code b}: infinity as the string "inf", NaN as null, otherwise as {@link #decimal}. */
    public static void addNumber(JsonObjectBuilder b, String key, double v) {
        if (Double.isInfinite(v)) {
            b.add(key, "inf");
        } else if (Double.isNaN(v)) {
            b.addNull(key);
        } else {
            b.add(key, decimal(v));
        }
    }

    /**
     * The shortest decimal that reads back as exactly {@code v}: the exact binary value rounded (half-even) to
     * 1, 2, ... 17 significant digits, the first that converts back to {@code v}. Unlike
     * {@link Double#toString(double)}, whose digits changed between Java releases, the result depends on the
     * value alone, so files and content hashes do not change with the Java version.
     *
     * <p>References: IEEE 754-2019 clause 5.12.2 (17 significant digits always suffice for binary64);
     * D. W. Matula, "In-and-out conversions", Commun. ACM 11 (1968) 47-50.
     *
     * @param v a finite number
     * @return the decimal, trailing zeros removed; zero for both signed zeros
     */
    public static java.math.BigDecimal decimal(double v) {
        if (!Double.isFinite(v)) {
            throw new IllegalArgumentException("only finite numbers have a decimal form, not " + v);
        }
        if (v == 0) {
            return java.math.BigDecimal.ZERO;
        }
        java.math.BigDecimal exact = new java.math.BigDecimal(v);
        // A binary64 value can have hundreds of decimal digits. Cut it to 20 digits and, when digits were cut,
        // append a nonzero "sticky" digit: rounding that to 17 or fewer digits gives the same result as
        // rounding the exact value, and is much faster.
        java.math.BigDecimal cut = exact.round(new java.math.MathContext(20, java.math.RoundingMode.DOWN));
        if (cut.compareTo(exact) != 0) {
            java.math.BigInteger u = cut.unscaledValue().multiply(java.math.BigInteger.TEN)
                    .add(java.math.BigInteger.valueOf(cut.signum()));
            cut = new java.math.BigDecimal(u, cut.scale() + 1);
        }
        for (int p = 1; p < 17; p++) {
            java.math.BigDecimal r = cut.round(new java.math.MathContext(p, java.math.RoundingMode.HALF_EVEN));
            if (r.doubleValue() == v) {
                return plain(r);
            }
        }
        return plain(cut.round(new java.math.MathContext(17, java.math.RoundingMode.HALF_EVEN)));
    }

    /** Strips trailing zeros but writes whole numbers of up to 21 digits without an exponent (100, not 1E+2). */
    private static java.math.BigDecimal plain(java.math.BigDecimal r) {
        java.math.BigDecimal s = r.stripTrailingZeros();
        return s.scale() < 0 && s.precision() - s.scale() <= 21 ? s.setScale(0) : s;
    }

    /** @return the settings as JSON */
    public static JsonObject settingsJson(EvaluationSettings s) {
        JsonObjectBuilder b = JSON.createObjectBuilder();
        if (s.hasFixedCoverageFactor()) {
            b.add("coverageFactor", decimal(s.coverageFactor()));
        } else {
            b.add("coverageProbability", decimal(s.coverageProbability()));
        }
        b.add("higherOrder", s.higherOrder());
        b.add("dofRounding", s.dofRounding() == EvaluationSettings.DofRounding.TRUNCATE ? "truncate" : "exact");
        b.add("trials", s.trials());
        b.add("seed", s.seed());
        b.add("significantDigits", s.significantDigits());
        b.add("adaptive", s.adaptive());
        return b.build();
    }

    /** @return the budget as pretty-printed JSON text ending in a newline */
    public static String write(Budget b) {
        return pretty(toJson(b));
    }

    /** @return any JSON value as pretty-printed text ending in a newline */
    public static String pretty(JsonValue v) {
        JsonWriterFactory f = JSON.createWriterFactory(Map.of(JsonGenerator.PRETTY_PRINTING, true));
        StringWriter w = new StringWriter();
        try (JsonWriter jw = f.createWriter(w)) {
            jw.write(v);
        }
        return w.toString().strip() + "\n";
    }
}
