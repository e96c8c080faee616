package org.quire.engine.calibration;

import org.quire.engine.io.BudgetFormatException;
import org.quire.engine.io.BudgetJson;
import org.quire.engine.io.ConformityJson;
import org.quire.engine.io.JsonCursor;
import org.quire.engine.io.JsonSupport;
import jakarta.json.JsonArrayBuilder;
import jakarta.json.JsonObject;
import jakarta.json.JsonObjectBuilder;
import jakarta.json.JsonValue;
import java.io.IOException;
import java.nio.file.Path;
import java.time.LocalDate;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.quire.engine.conformity.DecisionRule;
import org.quire.engine.conformity.MpeEnvelope;
import org.quire.engine.document.TemplateOrigin;

/**
 * Reads and writes calibration files: {@code "format": "quire-calibration"}, {@code "formatVersion": 1}. The
 * format is described in {@code budget-engine/doc/calibration-format.md}; every field is checked, unknown
 * fields are refused with the nearest known name, and every error names the JSON path of the field.
 *
 * <p>A file may leave out the method, the runs and the outputs when it is a job file: the part of a
 * calibration prepared before the runs ({@link #readJob}); {@code quire calibration build} completes it with
 * the method and the rig's runs.
 *
 * <p>Version log: 1 (2026-12) first version.
 *
 * <p>Stateless and thread-safe.
 */
public final class CalibrationJson {
    /** The value of the {@code format} field. */
    public static final String FORMAT = "quire-calibration";
    /** The format version this version of Quire writes and reads. */
    public static final int FORMAT_VERSION = 1;

    private static final Set<String> FIELDS = Set.of("format", "formatVersion", "title", "laboratory", "customer",
            "item", "calibrationDate", "environment", "referenceStandards", "author", "method", "errorOutput",
            "flowOutput", "constant", "declarations", "repeatability", "asFound", "asLeft", "adjustment", "cmc",
            "conformity", "monteCarlo");
    private static final Set<String> PARTY_FIELDS = Set.of("name", "address", "accreditation");
    private static final Set<String> ITEM_FIELDS = Set.of("type", "size", "serial");
    private static final Set<String> CONDITION_FIELDS = Set.of("quantity", "value", "unit");
    private static final Set<String> METHOD_FIELDS = Set.of("id", "version", "contentHash", "file");
    private static final Set<String> CONSTANT_FIELDS = Set.of("name", "unit", "asFound");
    private static final Set<String> DECLARATION_FIELDS = Set.of("kind", "coefficient", "justification");
    private static final Set<String> POINT_FIELDS = Set.of("label", "runs", "statedRepeatability");
    private static final Set<String> RUN_FIELDS = Set.of("row", "readings");
    private static final Set<String> STATED_FIELDS = Set.of("standardDeviation", "dof", "source");
    private static final Set<String> ADJUSTMENT_FIELDS = Set.of("kind", "constant");
    private static final Set<String> CMC_FIELDS = Set.of("flowUnit", "source", "ranges");
    private static final Set<String> RANGE_FIELDS = Set.of("from", "to", "expandedUncertainty");
    private static final Set<String> CONFORMITY_FIELDS = Set.of("mpe", "flowUnit", "mpeFormula", "rule",
            "uncertaintyRatio", "temperature");
    private static final Set<String> FORMULA_FIELDS = Set.of("percentOfReading", "velocityTerm", "velocityUnit",
            "bore", "boreUnit");
    private static final Set<String> MC_FIELDS = Set.of("trials", "seed");

    private CalibrationJson() {
    }

    /**
     * A calibration read from a file, with the file name of its method template as the file gives it.
     *
     * @param calibration the calibration
     * @param methodFile the method template's file, relative to the calibration file; empty when not given
     */
    public record Loaded(Calibration calibration, String methodFile) {
    }

    /**
     * Opens the method template a calibration file names in {@code method.file}, relative to the calibration
     * file's folder.
     *
     * @throws BudgetFormatException at {@code $.method.file} when the file names none, cannot be read or is not
     *     a template
     */
    public static org.quire.engine.document.Template method(Path calibrationFile, Loaded loaded)
            throws BudgetFormatException {
        if (loaded.methodFile().isEmpty()) {
            throw new BudgetFormatException("$.method", "the file does not say where the method template is: add "
                    + "'file' (a path relative to the calibration file) or name the template on the command line");
        }
        Path dir = calibrationFile.toAbsolutePath().getParent();
        Path p = dir == null ? Path.of(loaded.methodFile()) : dir.resolve(loaded.methodFile());
        if (!java.nio.file.Files.exists(p)) {
            Path shipped = shippedMethod(loaded.calibration().method());
            if (shipped != null) {
                return openMethod(shipped, "$.method.file");
            }
        }
        return openMethod(p, "$.method.file");
    }

    /**
     * @param method the method a calibration names
     * @return the shipped template of that id and version (read from the installation, wherever the program
     *     runs), or null when none ships; its content hash is checked by the evaluation like any other file's
     */
    private static Path shippedMethod(org.quire.engine.document.TemplateOrigin method) {
        try {
            for (org.quire.engine.document.TemplateLibrary.Entry e
                    : org.quire.engine.document.TemplateLibrary.withShipped(null, null).list().templates()) {
                if (e.template().id().equals(method.id()) && e.template().version() == method.version()) {
                    return e.file();
                }
            }
        } catch (IOException e) {
            return null;
        }
        return null;
    }

    /**
     * @param file a template file
     * @param path the JSON path to name in errors, or empty to name the template file itself
     * @return the template
     */
    public static org.quire.engine.document.Template openMethod(Path file, String path) throws BudgetFormatException {
        org.quire.engine.document.BudgetDocument d;
        try {
            d = org.quire.engine.document.DocumentJson.read(file);
        } catch (java.nio.file.NoSuchFileException e) {
            throw new BudgetFormatException(path, "no such method template file: " + file);
        } catch (IOException e) {
            throw new BudgetFormatException(path, "cannot read the method template " + file + ": " + e.getMessage());
        } catch (BudgetFormatException e) {
            throw new BudgetFormatException(path, "the method template " + file + " cannot be read: " + e.getMessage());
        }
        try {
            return org.quire.engine.document.Template.of(d);
        } catch (IllegalArgumentException e) {
            throw new BudgetFormatException(path, file + ": " + e.getMessage());
        }
    }

    /** Reads a calibration file (at most {@link BudgetJson#MAX_BYTES}). */
    public static Loaded read(Path file) throws IOException, BudgetFormatException {
        return read(BudgetJson.readText(file));
    }

    /** Reads a calibration from its text. */
    public static Loaded read(String text) throws BudgetFormatException {
        return read(JsonCursor.root(BudgetJson.parseObject(text)));
    }

    /** Reads a calibration from a parsed object. */
    public static Loaded read(JsonCursor root) throws BudgetFormatException {
        root.onlyFields(FIELDS);
        String format = root.get("format").string();
        if (!format.equals(FORMAT)) {
            throw new BudgetFormatException(root.path() + ".format", "expected \"" + FORMAT + "\", found \"" + format
                    + "\"" + (format.equals(BudgetJson.FORMAT) ? " (this is a budget file, not a calibration)" : ""));
        }
        long v = root.get("formatVersion").integer();
        if (v != FORMAT_VERSION) {
            throw new BudgetFormatException(root.path() + ".formatVersion", v > FORMAT_VERSION
                    ? "the file is of format version " + v + ", newer than this version of Quire reads ("
                            + FORMAT_VERSION + "); use a newer Quire"
                    : "unknown format version " + v);
        }
        JsonCursor m = root.get("method");
        m.onlyFields(METHOD_FIELDS);
        TemplateOrigin origin;
        long version = m.get("version").integer();
        try {
            origin = new TemplateOrigin(m.get("id").string(), (int) version, m.get("contentHash").string());
        } catch (IllegalArgumentException e) {
            throw m.error(e.getMessage());
        }
        String file = m.string("file", "");
        List<FlowPoint> found = points(root.get("asFound"));
        List<FlowPoint> left = root.has("asLeft") ? points(root.get("asLeft")) : List.of();
        Calibration c;
        try {
            c = Calibration.of(origin, root.get("errorOutput").string(), root.get("flowOutput").string(),
                    constant(root.get("constant")), declarations(root.get("declarations")), found);
        } catch (IllegalArgumentException e) {
            throw root.error(e.getMessage());
        }
        c = c.withAsLeft(left);
        c = c.withTitle(root.string("title", "")).withDetails(details(root));
        if (root.has("repeatability")) {
            JsonCursor r = root.get("repeatability");
            RepeatabilityBasis b = RepeatabilityBasis.byWord(r.string());
            if (b == null) {
                throw r.error("expected \"mean-of-runs\" or \"single-run\", found \"" + r.string() + "\"");
            }
            c = c.withRepeatability(b);
        } else {
            throw new BudgetFormatException(root.path(), "the required field 'repeatability' is missing: say whether "
                    + "a point's result is the mean of its runs (\"mean-of-runs\") or stands for one run (\"single-run\")");
        }
        c = c.withAdjustment(root.has("adjustment") ? adjustment(root.get("adjustment")) : Adjustment.none());
        if (root.has("cmc")) {
            c = c.withCmc(cmc(root.get("cmc")));
        }
        if (root.has("conformity")) {
            c = c.withConformity(conformity(root.get("conformity")));
        }
        if (root.has("monteCarlo")) {
            JsonCursor mc = root.get("monteCarlo");
            mc.onlyFields(MC_FIELDS);
            try {
                c = c.withMonteCarlo(MonteCarloRequest.of(mc.get("trials").integer(), mc.get("seed").integer()));
            } catch (IllegalArgumentException e) {
                throw mc.error(e.getMessage());
            }
        }
        return new Loaded(c, file);
    }

    /**
     * Checks a job file: a calibration file without {@code method}, {@code asFound}, {@code asLeft} (and
     * optionally without {@code errorOutput} and {@code flowOutput}), as prepared before the runs.
     *
     * @return the object, to be completed and read with {@link #read(JsonCursor)}
     */
    public static JsonObject readJob(JsonCursor root) throws BudgetFormatException {
        root.onlyFields(FIELDS);
        for (String f : List.of("method", "asFound", "asLeft")) {
            if (root.has(f)) {
                throw new BudgetFormatException(root.path() + "." + f, "a job file does not hold '" + f + "': the "
                        + "method and the runs are added when the calibration is built");
            }
        }
        return root.object();
    }

    /**
     * Completes a job file with the method and the runs and reads the result as a calibration file: one path
     * for every calibration, whether built from a job or written by hand.
     *
     * @param job the job file's object ({@link #readJob})
     * @param method the method template's id, version and content hash
     * @param methodFile where the method template is, relative to the calibration file (may be empty)
     * @param asFound the as-found points
     * @param asLeft the measured as-left points (may be empty)
     * @param constant the as-found calibration constant from the runs file, NaN to keep the job's
     * @throws BudgetFormatException naming the JSON path of the job's field at fault
     */
    public static Loaded complete(JsonObject job, TemplateOrigin method, String methodFile, List<FlowPoint> asFound,
            List<FlowPoint> asLeft, double constant) throws BudgetFormatException {
        JsonObjectBuilder b = JsonSupport.JSON.createObjectBuilder(job);
        JsonObjectBuilder m = JsonSupport.JSON.createObjectBuilder().add("id", method.id())
                .add("version", method.version()).add("contentHash", method.contentHash());
        if (methodFile != null && !methodFile.isEmpty()) {
            m.add("file", methodFile);
        }
        b.add("method", m);
        b.add("asFound", pointsJson(asFound));
        if (!asLeft.isEmpty()) {
            b.add("asLeft", pointsJson(asLeft));
        }
        if (!Double.isNaN(constant)) {
            JsonObjectBuilder k = job.containsKey("constant") && job.get("constant") instanceof JsonObject
                    ? JsonSupport.JSON.createObjectBuilder(job.getJsonObject("constant"))
                    : JsonSupport.JSON.createObjectBuilder();
            b.add("constant", k.add("asFound", BudgetJson.decimal(constant)));
        }
        return read(JsonCursor.root(b.build()));
    }

    private static CertificateDetails details(JsonCursor root) throws BudgetFormatException {
        LocalDate date = null;
        if (root.has("calibrationDate")) {
            JsonCursor d = root.get("calibrationDate");
            try {
                date = LocalDate.parse(d.string());
            } catch (DateTimeParseException e) {
                throw d.error("expected a date written YYYY-MM-DD, found \"" + d.string() + "\"");
            }
        }
        List<CertificateDetails.Condition> env = new ArrayList<>();
        if (root.has("environment")) {
            for (JsonCursor e : root.get("environment").elements()) {
                e.onlyFields(CONDITION_FIELDS);
                try {
                    env.add(new CertificateDetails.Condition(e.get("quantity").string(), e.string("value", ""),
                            e.string("unit", "")));
                } catch (IllegalArgumentException x) {
                    throw e.error(x.getMessage());
                }
            }
        }
        List<String> refs = new ArrayList<>();
        if (root.has("referenceStandards")) {
            for (JsonCursor r : root.get("referenceStandards").elements()) {
                String s = r.string();
                if (s.isBlank()) {
                    throw r.error("a reference standard identifier must not be blank");
                }
                refs.add(s.strip());
            }
        }
        CertificateDetails.Item item = null;
        if (root.has("item")) {
            JsonCursor i = root.get("item");
            i.onlyFields(ITEM_FIELDS);
            item = new CertificateDetails.Item(i.string("type", ""), i.string("size", ""), i.string("serial", ""));
        }
        return new CertificateDetails(party(root, "laboratory"), party(root, "customer"), item, date, env, refs,
                root.string("author", ""));
    }

    private static CertificateDetails.Party party(JsonCursor root, String field) throws BudgetFormatException {
        if (!root.has(field)) {
            return null;
        }
        JsonCursor p = root.get(field);
        p.onlyFields(PARTY_FIELDS);
        return new CertificateDetails.Party(p.string("name", ""), p.string("address", ""), p.string("accreditation", ""));
    }

    private static CalibrationConstant constant(JsonCursor k) throws BudgetFormatException {
        k.onlyFields(CONSTANT_FIELDS);
        try {
            return CalibrationConstant.of(k.get("name").string(), k.string("unit", ""), k.get("asFound").number(false));
        } catch (IllegalArgumentException e) {
            throw k.error(e.getMessage());
        }
    }

    private static Map<String, InputDeclaration> declarations(JsonCursor d) throws BudgetFormatException {
        Map<String, InputDeclaration> out = new LinkedHashMap<>();
        for (String name : d.keys()) {
            JsonCursor e = d.get(name);
            try {
                if (e.value().getValueType() == JsonValue.ValueType.STRING) {
                    out.put(name, kind(e, e.string(), Double.NaN, ""));
                } else {
                    e.onlyFields(DECLARATION_FIELDS);
                    JsonCursor kc = e.get("kind");
                    double r = e.has("coefficient") ? e.get("coefficient").number(false) : Double.NaN;
                    if (e.has("coefficient") && !kc.string().equals("correlated")) {
                        throw new BudgetFormatException(e.path() + ".coefficient", "a coefficient belongs to a "
                                + "'correlated' declaration only");
                    }
                    out.put(name, kind(kc, kc.string(), r, e.string("justification", "")));
                }
            } catch (IllegalArgumentException x) {
                throw e.error(x.getMessage());
            }
        }
        return out;
    }

    private static InputDeclaration kind(JsonCursor at, String word, double r, String justification)
            throws BudgetFormatException {
        switch (word) {
            case "shared":
                return InputDeclaration.shared().withJustification(justification);
            case "independent":
                return InputDeclaration.independent().withJustification(justification);
            case "correlated":
                if (Double.isNaN(r)) {
                    throw at.error("a correlated input needs {\"kind\": \"correlated\", \"coefficient\": r, "
                            + "\"justification\": \"...\"}");
                }
                return InputDeclaration.correlated(r, justification);
            default:
                throw at.error("expected \"shared\", \"independent\" or \"correlated\", found \"" + word + "\"");
        }
    }

    private static List<FlowPoint> points(JsonCursor a) throws BudgetFormatException {
        List<FlowPoint> out = new ArrayList<>();
        for (JsonCursor p : a.elements()) {
            p.onlyFields(POINT_FIELDS);
            List<Run> runs = new ArrayList<>();
            for (JsonCursor r : p.get("runs").elements()) {
                r.onlyFields(RUN_FIELDS);
                Map<String, Double> readings = new LinkedHashMap<>();
                JsonCursor rd = r.get("readings");
                for (String k : rd.keys()) {
                    readings.put(k, rd.get(k).number(false));
                }
                long row = r.has("row") ? r.get("row").integer() : 0;
                try {
                    runs.add(Run.of((int) Math.min(Integer.MAX_VALUE, row), readings));
                } catch (IllegalArgumentException e) {
                    throw r.error(e.getMessage());
                }
            }
            try {
                FlowPoint fp = new FlowPoint(p.get("label").string(), runs, null);
                if (p.has("statedRepeatability")) {
                    JsonCursor s = p.get("statedRepeatability");
                    s.onlyFields(STATED_FIELDS);
                    try {
                        fp = fp.withStatedRepeatability(StatedRepeatability.of(s.get("standardDeviation").number(false),
                                s.get("dof").number(true), s.get("source").string()));
                    } catch (IllegalArgumentException e) {
                        throw s.error(e.getMessage());
                    }
                }
                out.add(fp);
            } catch (IllegalArgumentException e) {
                throw p.error(e.getMessage());
            }
        }
        if (out.isEmpty()) {
            throw a.error("at least one flow point is needed");
        }
        return out;
    }

    private static Adjustment adjustment(JsonCursor a) throws BudgetFormatException {
        a.onlyFields(ADJUSTMENT_FIELDS);
        JsonCursor k = a.get("kind");
        Adjustment.Kind kind = Adjustment.Kind.byWord(k.string());
        if (kind == null) {
            throw k.error("expected \"none\", \"weighted-mean-error\", \"fitted-slope\" or \"chosen-constant\", found \""
                    + k.string() + "\"");
        }
        if (kind == Adjustment.Kind.CHOSEN) {
            JsonCursor c = a.get("constant");
            try {
                return Adjustment.chosen(c.number(false));
            } catch (IllegalArgumentException e) {
                throw c.error(e.getMessage());
            }
        }
        if (a.has("constant")) {
            throw new BudgetFormatException(a.path() + ".constant", "a constant belongs to a \"chosen-constant\" "
                    + "adjustment only");
        }
        switch (kind) {
            case WEIGHTED_MEAN:
                return Adjustment.weightedMeanError();
            case FITTED_SLOPE:
                return Adjustment.fittedSlope();
            default:
                return Adjustment.none();
        }
    }

    private static CmcTable cmc(JsonCursor c) throws BudgetFormatException {
        c.onlyFields(CMC_FIELDS);
        List<CmcTable.Range> ranges = new ArrayList<>();
        for (JsonCursor r : c.get("ranges").elements()) {
            r.onlyFields(RANGE_FIELDS);
            try {
                ranges.add(new CmcTable.Range(r.get("from").number(false), r.get("to").number(false),
                        r.get("expandedUncertainty").number(false)));
            } catch (IllegalArgumentException e) {
                throw r.error(e.getMessage());
            }
        }
        String unit = c.get("flowUnit").string();
        try {
            org.quire.engine.units.Units.parse(unit);
        } catch (IllegalArgumentException e) {
            throw new BudgetFormatException(c.path() + ".flowUnit", "'" + unit + "' is not a unit: " + e.getMessage());
        }
        try {
            return CmcTable.of(unit, ranges, c.get("source").string());
        } catch (IllegalArgumentException e) {
            throw new BudgetFormatException(c.path() + ".ranges", e.getMessage());
        }
    }

    private static ConformitySpec conformity(JsonCursor c) throws BudgetFormatException {
        c.onlyFields(CONFORMITY_FIELDS);
        DecisionRule rule = ConformityJson.readRule(c.get("rule"));
        double ratio = c.get("uncertaintyRatio").number(false);
        if (c.has("mpe") == c.has("mpeFormula")) {
            throw c.error("give either 'mpe' (with 'flowUnit') or 'mpeFormula', exactly one of them");
        }
        ConformitySpec spec;
        try {
            if (c.has("mpe")) {
                String unit = c.get("flowUnit").string();
                MpeEnvelope e = ConformityJson.readEnvelope(c.get("mpe"), unit);
                spec = ConformitySpec.of(e, rule, ratio);
            } else {
                if (c.has("flowUnit")) {
                    throw new BudgetFormatException(c.path() + ".flowUnit", "an MPE formula takes the flow in the "
                            + "unit of the flow output; 'flowUnit' belongs to 'mpe'");
                }
                JsonCursor f = c.get("mpeFormula");
                f.onlyFields(FORMULA_FIELDS);
                MpeFormula formula;
                try {
                    formula = MpeFormula.of(f.get("percentOfReading").number(false), f.get("velocityTerm").number(false),
                            f.get("velocityUnit").string(), f.get("bore").number(false), f.get("boreUnit").string());
                } catch (IllegalArgumentException e) {
                    throw f.error(e.getMessage());
                }
                spec = ConformitySpec.of(formula, rule, ratio);
            }
            if (c.has("temperature")) {
                spec = spec.withTemperature(c.get("temperature").number(false));
            }
        } catch (IllegalArgumentException e) {
            throw c.error(e.getMessage());
        }
        return spec;
    }

    /** @return the calibration as a JSON object of format version 1 */
    public static JsonObject toJson(Calibration c, String methodFile) {
        JsonObjectBuilder b = JsonSupport.JSON.createObjectBuilder();
        b.add("format", FORMAT).add("formatVersion", FORMAT_VERSION);
        if (!c.title().isEmpty()) {
            b.add("title", c.title());
        }
        CertificateDetails d = c.details();
        b.add("laboratory", party(d.laboratory(), true));
        b.add("customer", party(d.customer(), false));
        b.add("item", JsonSupport.JSON.createObjectBuilder().add("type", d.item().type()).add("size", d.item().size())
                .add("serial", d.item().serial()));
        if (d.date() != null) {
            b.add("calibrationDate", d.date().toString());
        }
        JsonArrayBuilder env = JsonSupport.JSON.createArrayBuilder();
        for (CertificateDetails.Condition e : d.environment()) {
            env.add(JsonSupport.JSON.createObjectBuilder().add("quantity", e.quantity()).add("value", e.value())
                    .add("unit", e.unit()));
        }
        b.add("environment", env);
        JsonArrayBuilder refs = JsonSupport.JSON.createArrayBuilder();
        d.referenceStandards().forEach(refs::add);
        b.add("referenceStandards", refs);
        b.add("author", d.author());
        JsonObjectBuilder m = JsonSupport.JSON.createObjectBuilder().add("id", c.method().id())
                .add("version", c.method().version()).add("contentHash", c.method().contentHash());
        if (methodFile != null && !methodFile.isEmpty()) {
            m.add("file", methodFile);
        }
        b.add("method", m);
        b.add("errorOutput", c.errorOutput()).add("flowOutput", c.flowOutput());
        b.add("constant", JsonSupport.JSON.createObjectBuilder().add("name", c.constant().name())
                .add("unit", c.constant().unit()).add("asFound", BudgetJson.decimal(c.constant().asFound())));
        JsonObjectBuilder decl = JsonSupport.JSON.createObjectBuilder();
        for (Map.Entry<String, InputDeclaration> e : c.declarations().entrySet()) {
            InputDeclaration x = e.getValue();
            if (x.kind() != InputDeclaration.Kind.CORRELATED && x.justification().isEmpty()) {
                decl.add(e.getKey(), x.kind().word());
            } else {
                JsonObjectBuilder o = JsonSupport.JSON.createObjectBuilder().add("kind", x.kind().word());
                if (x.kind() == InputDeclaration.Kind.CORRELATED) {
                    o.add("coefficient", BudgetJson.decimal(x.coefficient()));
                }
                decl.add(e.getKey(), o.add("justification", x.justification()));
            }
        }
        b.add("declarations", decl);
        b.add("repeatability", c.repeatability().word());
        b.add("asFound", pointsJson(c.asFound()));
        if (!c.asLeft().isEmpty()) {
            b.add("asLeft", pointsJson(c.asLeft()));
        }
        JsonObjectBuilder adj = JsonSupport.JSON.createObjectBuilder().add("kind", c.adjustment().kind().word());
        if (c.adjustment().kind() == Adjustment.Kind.CHOSEN) {
            adj.add("constant", BudgetJson.decimal(c.adjustment().chosenConstant()));
        }
        b.add("adjustment", adj);
        if (c.cmc() != null) {
            JsonArrayBuilder ranges = JsonSupport.JSON.createArrayBuilder();
            for (CmcTable.Range r : c.cmc().ranges()) {
                ranges.add(JsonSupport.JSON.createObjectBuilder().add("from", BudgetJson.decimal(r.from()))
                        .add("to", BudgetJson.decimal(r.to()))
                        .add("expandedUncertainty", BudgetJson.decimal(r.expandedPercent())));
            }
            b.add("cmc", JsonSupport.JSON.createObjectBuilder().add("flowUnit", c.cmc().flowUnit())
                    .add("source", c.cmc().source()).add("ranges", ranges));
        }
        if (c.conformity() != null) {
            ConformitySpec s = c.conformity();
            JsonObjectBuilder o = JsonSupport.JSON.createObjectBuilder();
            if (s.envelope() != null) {
                o.add("mpe", ConformityJson.envelopeJson(s.envelope())).add("flowUnit", s.envelope().flowUnit());
            } else {
                MpeFormula f = s.formula();
                o.add("mpeFormula", JsonSupport.JSON.createObjectBuilder()
                        .add("percentOfReading", BudgetJson.decimal(f.percentOfReading()))
                        .add("velocityTerm", BudgetJson.decimal(f.velocityTerm())).add("velocityUnit", f.velocityUnit())
                        .add("bore", BudgetJson.decimal(f.bore())).add("boreUnit", f.boreUnit()));
            }
            o.add("rule", ConformityJson.ruleJson(s.rule()));
            o.add("uncertaintyRatio", BudgetJson.decimal(s.uncertaintyRatio()));
            if (!Double.isNaN(s.temperature())) {
                o.add("temperature", BudgetJson.decimal(s.temperature()));
            }
            b.add("conformity", o);
        }
        if (c.monteCarlo() != null) {
            b.add("monteCarlo", JsonSupport.JSON.createObjectBuilder().add("trials", c.monteCarlo().trials())
                    .add("seed", c.monteCarlo().seed()));
        }
        return b.build();
    }

    /** @return the calibration as pretty-printed text */
    public static String write(Calibration c, String methodFile) {
        return BudgetJson.pretty(toJson(c, methodFile));
    }

    private static JsonObjectBuilder party(CertificateDetails.Party p, boolean lab) {
        JsonObjectBuilder b = JsonSupport.JSON.createObjectBuilder().add("name", p.name()).add("address", p.address());
        if (lab || !p.accreditation().isEmpty()) {
            b.add("accreditation", p.accreditation());
        }
        return b;
    }

    private static JsonArrayBuilder pointsJson(List<FlowPoint> points) {
        JsonArrayBuilder a = JsonSupport.JSON.createArrayBuilder();
        for (FlowPoint p : points) {
            JsonObjectBuilder pb = JsonSupport.JSON.createObjectBuilder().add("label", p.label());
            if (p.statedRepeatability() != null) {
                StatedRepeatability s = p.statedRepeatability();
                JsonObjectBuilder sb = JsonSupport.JSON.createObjectBuilder()
                        .add("standardDeviation", BudgetJson.decimal(s.standardDeviation()));
                if (Double.isInfinite(s.dof())) {
                    sb.add("dof", "inf");
                } else {
                    sb.add("dof", BudgetJson.decimal(s.dof()));
                }
                pb.add("statedRepeatability", sb.add("source", s.source()));
            }
            JsonArrayBuilder runs = JsonSupport.JSON.createArrayBuilder();
            for (Run r : p.runs()) {
                JsonObjectBuilder rd = JsonSupport.JSON.createObjectBuilder();
                for (Map.Entry<String, Double> e : r.readings().entrySet()) {
                    rd.add(e.getKey(), BudgetJson.decimal(e.getValue()));
                }
                JsonObjectBuilder rb = JsonSupport.JSON.createObjectBuilder();
                if (r.sourceRow() > 0) {
                    rb.add("row", r.sourceRow());
                }
                runs.add(rb.add("readings", rd));
            }
            a.add(pb.add("runs", runs));
        }
        return a;
    }
}
