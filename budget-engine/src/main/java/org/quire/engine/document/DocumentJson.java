package org.quire.engine.document;

import org.quire.engine.io.JsonSupport;
import jakarta.json.spi.JsonProvider;
import jakarta.json.JsonArrayBuilder;
import jakarta.json.JsonObject;
import jakarta.json.JsonObjectBuilder;
import jakarta.json.JsonValue;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.quire.engine.budget.Budget;
import org.quire.engine.io.BudgetFormatException;
import org.quire.engine.io.BudgetJson;
import org.quire.engine.io.JsonCursor;
import org.quire.engine.io.ResultJson;

/**
 * Reads and writes budget documents: budget files of format version 2, and version 1 files, which are
 * migrated on reading (they become revision 1, draft, created and modified at the file's modification time;
 * {@link BudgetDocument#migratedFrom()} says so) and written as version 2 on the next save. A file of a newer
 * version is refused with a message and left as it is.
 *
 * <p>Version 2 keeps every field of version 1 and adds, at the top level:
 * <ul>
 * <li>{@code document}: {@code laboratory}, {@code deviceUnderTest}, {@code author} (text), {@code created},
 *     {@code modified} (UTC times such as {@code 2026-03-14T09:30:00Z}), {@code revision} (whole number from 1),
 *     {@code status} ({@code draft}, {@code in-review}, {@code approved}, {@code withdrawn}). Optional; a file
 *     without it reads like a migrated one.</li>
 * <li>{@code results}: {@code engineVersion}, {@code computed} (time), {@code gum} (the result object of
 *     {@code quire evaluate --format json}) and optionally {@code monteCarlo} (an object).</li>
 * <li>{@code history}: a list of {@code revision}, {@code status}, {@code by}, {@code at}, {@code comment}, and
 *     for an approval {@code contentHash} and {@code content} (the approved canonical content). An entry that
 *     records a review decision has {@code decision}: {@code endorsed} (on an approval) or {@code sent-back} (on
 *     a move to draft, with the {@code contentHash} of the content sent back and no {@code content}).</li>
 * <li>{@code templateOrigin}: {@code id}, {@code version}, {@code contentHash} of the template used, and
 *     optionally {@code locked}, the template's locked fields as recorded when the document was made.</li>
 * <li>{@code template}: present when the file is a template: {@code id}, {@code version}, {@code description},
 *     {@code parameters} (each {@code name}, {@code description}, {@code unit}, {@code input}, {@code field},
 *     {@code default}, {@code minimum}, {@code maximum}), {@code locked} (list of field names) and
 *     {@code guidance} (text per input name). The {@code format} stays {@code quire-budget}.</li>
 * </ul>
 * Reading is as strict and bounded as {@link BudgetJson}: every error names the JSON path of the field. Other
 * unknown top-level fields are kept and written back.
 *
 * <p>Stateless and thread-safe.
 */
public final class DocumentJson {
    /** One JSON-P provider for the class: {@code JsonSupport.JSON.create...} looks the provider up on every call, which is slow. */
    private static final JsonProvider JSON = JsonSupport.JSON;
    /** The top-level fields version 2 adds. */
    public static final Set<String> DOCUMENT_FIELDS = Set.of("document", "results", "history",
            "templateOrigin", "template");
    private static final Set<String> META_FIELDS = Set.of("laboratory", "deviceUnderTest", "author", "created",
            "modified", "revision", "status");
    private static final Set<String> RESULT_FIELDS = Set.of("engineVersion", "computed", "gum", "monteCarlo");
    private static final Set<String> HISTORY_FIELDS = Set.of("revision", "status", "by", "at", "comment",
            "contentHash", "content", "decision");
    private static final Set<String> ORIGIN_FIELDS = Set.of("id", "version", "contentHash", "locked");
    private static final Set<String> TEMPLATE_FIELDS = Set.of("id", "version", "description", "parameters",
            "locked", "guidance");
    private static final Set<String> PARAMETER_FIELDS = Set.of("name", "description", "unit", "input", "field",
            "default", "minimum", "maximum");

    private DocumentJson() {
    }

    /**
     * Reads a document file; a version 1 file gets its modification time as created and modified time.
     *
     * @throws BudgetFormatException with the JSON path of the first problem
     */
    public static BudgetDocument read(Path file) throws IOException, BudgetFormatException {
        String text = BudgetJson.readText(file);
        return read(text, Files.getLastModifiedTime(file).toInstant());
    }

    /**
     * @param text the file's text
     * @param fallbackTime created and modified time for a file that does not record them
     */
    public static BudgetDocument read(String text, Instant fallbackTime) throws BudgetFormatException {
        return read(JsonCursor.root(BudgetJson.parseObject(text)), fallbackTime);
    }

    /** Reads a document from a parsed object. */
    public static BudgetDocument read(JsonCursor root, Instant fallbackTime) throws BudgetFormatException {
        Budget b = BudgetJson.read(root);
        long version = root.get("formatVersion").integer();
        JsonObject ext = b.extensions();
        if (version == 1) {
            for (String k : ext.keySet()) {
                if (DOCUMENT_FIELDS.contains(k)) {
                    throw new BudgetFormatException(root.path() + "." + k, "a version 1 file cannot be migrated "
                            + "while it has a field '" + k + "': version 2 gives that name a meaning; rename it");
                }
            }
            return new BudgetDocument(b, "", "", "", fallbackTime, fallbackTime, 1, DocumentStatus.DRAFT,
                    null, List.of(), null, null, 1);
        }
        JsonObjectBuilder rest = JSON.createObjectBuilder();
        for (Map.Entry<String, JsonValue> e : ext.entrySet()) {
            if (!DOCUMENT_FIELDS.contains(e.getKey())) {
                rest.add(e.getKey(), e.getValue());
            }
        }
        b = b.withExtensions(rest.build());
        String lab = "";
        String dut = "";
        String author = "";
        Instant created = fallbackTime;
        Instant modified = fallbackTime;
        int revision = 1;
        DocumentStatus status = DocumentStatus.DRAFT;
        if (root.has("document")) {
            JsonCursor d = root.get("document");
            d.onlyFields(META_FIELDS);
            lab = d.string("laboratory", "");
            dut = d.string("deviceUnderTest", "");
            author = d.string("author", "");
            created = time(d.get("created"));
            modified = time(d.get("modified"));
            revision = positiveInt(d.get("revision"));
            status = status(d.get("status"));
            if (modified.isBefore(created)) {
                throw new BudgetFormatException(d.path() + ".modified", "modified time " + modified
                        + " lies before the created time " + created);
            }
        }
        ResultSnapshot results = root.has("results") ? readResults(root.get("results")) : null;
        List<RevisionEntry> history = new ArrayList<>();
        if (root.has("history")) {
            int last = 0;
            for (JsonCursor h : root.get("history").elements()) {
                RevisionEntry e = readEntry(h);
                if (e.revision() < last) {
                    throw new BudgetFormatException(h.path() + ".revision", "history entries must be in order of "
                            + "revision; " + e.revision() + " follows " + last);
                }
                if (e.revision() > revision) {
                    throw new BudgetFormatException(h.path() + ".revision", "history entry for revision "
                            + e.revision() + " lies beyond the document's revision " + revision);
                }
                last = e.revision();
                history.add(e);
            }
        }
        TemplateOrigin origin = root.has("templateOrigin") ? readOrigin(root.get("templateOrigin")) : null;
        TemplateSpec template = root.has("template") ? readTemplate(root.get("template"), b) : null;
        try {
            return new BudgetDocument(b, lab, dut, author, created, modified, revision, status, results,
                    history, origin, template, 0);
        } catch (IllegalArgumentException e) {
            throw new BudgetFormatException(root.path(), e.getMessage());
        }
    }

    private static Instant time(JsonCursor c) throws BudgetFormatException {
        String s = c.string();
        try {
            if (!s.endsWith("Z")) {
                throw new DateTimeParseException("", s, 0);
            }
            return Instant.parse(s);
        } catch (DateTimeParseException e) {
            throw c.error("expected a UTC time such as 2026-03-14T09:30:00Z, found '" + s + "'");
        }
    }

    private static int positiveInt(JsonCursor c) throws BudgetFormatException {
        long v = c.integer();
        if (v < 1 || v > Integer.MAX_VALUE) {
            throw c.error("expected a whole number from 1 to " + Integer.MAX_VALUE + ", found " + v);
        }
        return (int) v;
    }

    private static DocumentStatus status(JsonCursor c) throws BudgetFormatException {
        try {
            return DocumentStatus.ofLabel(c.string());
        } catch (IllegalArgumentException e) {
            throw c.error(e.getMessage());
        }
    }

    private static ResultSnapshot readResults(JsonCursor r) throws BudgetFormatException {
        r.onlyFields(RESULT_FIELDS);
        String engine = r.get("engineVersion").string();
        if (engine.isBlank()) {
            throw new BudgetFormatException(r.path() + ".engineVersion", "the engine version must not be empty");
        }
        Instant computed = time(r.get("computed"));
        JsonCursor gum = r.get("gum");
        JsonObject g = gum.object();
        String format = gum.get("format").string();
        if (!format.equals(ResultJson.FORMAT)) {
            throw new BudgetFormatException(gum.path() + ".format", "expected a result of format '"
                    + ResultJson.FORMAT + "', found '" + format + "'");
        }
        JsonObject mc = r.has("monteCarlo") ? r.get("monteCarlo").object() : null;
        return new ResultSnapshot(engine, computed, g, mc);
    }

    private static RevisionEntry readEntry(JsonCursor h) throws BudgetFormatException {
        h.onlyFields(HISTORY_FIELDS);
        int rev = positiveInt(h.get("revision"));
        DocumentStatus st = status(h.get("status"));
        String by = h.get("by").string();
        if (by.isBlank()) {
            throw new BudgetFormatException(h.path() + ".by", "a history entry must name who made the change");
        }
        Instant at = time(h.get("at"));
        String comment = h.string("comment", "");
        String hash = h.string("contentHash", "");
        JsonObject content = h.has("content") ? h.get("content").object() : null;
        Verdict decision = null;
        if (h.has("decision")) {
            JsonCursor d = h.get("decision");
            try {
                decision = Verdict.ofKey(d.string());
            } catch (IllegalArgumentException e) {
                throw new BudgetFormatException(d.path(), e.getMessage());
            }
        }
        String field;
        if (st == DocumentStatus.APPROVED) {
            field = !hash.matches("[0-9a-f]{64}") ? ".contentHash" : content == null ? "" : decision != null
                    && decision != Verdict.ENDORSED ? ".decision" : ".content";
        } else if (decision == Verdict.SENT_BACK && st == DocumentStatus.DRAFT) {
            field = !hash.matches("[0-9a-f]{64}") ? ".contentHash" : ".content";
        } else if (decision != null) {
            field = ".decision";
        } else {
            field = !hash.isEmpty() ? ".contentHash" : ".content";
        }
        try {
            return new RevisionEntry(rev, st, by, at, comment, hash, content, decision);
        } catch (IllegalArgumentException e) {
            throw new BudgetFormatException(h.path() + field, e.getMessage());
        }
    }

    private static TemplateOrigin readOrigin(JsonCursor o) throws BudgetFormatException {
        o.onlyFields(ORIGIN_FIELDS);
        List<String> locked = new ArrayList<>();
        if (o.has("locked")) {
            for (JsonCursor l : o.get("locked").elements()) {
                locked.add(l.string());
            }
        }
        try {
            return new TemplateOrigin(o.get("id").string(), positiveInt(o.get("version")),
                    o.get("contentHash").string(), locked);
        } catch (IllegalArgumentException e) {
            throw o.error(e.getMessage());
        }
    }

    private static TemplateSpec readTemplate(JsonCursor t, Budget b) throws BudgetFormatException {
        t.onlyFields(TEMPLATE_FIELDS);
        TemplateSpec spec;
        try {
            spec = TemplateSpec.of(t.get("id").string(), positiveInt(t.get("version")));
        } catch (IllegalArgumentException e) {
            throw new BudgetFormatException(t.path() + ".id", e.getMessage());
        }
        spec = spec.withDescription(t.string("description", ""));
        List<TemplateParameter> params = new ArrayList<>();
        if (t.has("parameters")) {
            for (JsonCursor p : t.get("parameters").elements()) {
                p.onlyFields(PARAMETER_FIELDS);
                try {
                    params.add(new TemplateParameter(p.get("name").string(), p.string("description", ""),
                            p.string("unit", ""), p.get("input").string(), p.get("field").string(),
                            p.has("default") ? p.get("default").number(false) : Double.NaN,
                            p.has("minimum") ? p.get("minimum").number(false) : Double.NEGATIVE_INFINITY,
                            p.has("maximum") ? p.get("maximum").number(false) : Double.POSITIVE_INFINITY));
                } catch (IllegalArgumentException e) {
                    throw p.error(e.getMessage());
                }
            }
        }
        List<String> locked = new ArrayList<>();
        if (t.has("locked")) {
            for (JsonCursor l : t.get("locked").elements()) {
                locked.add(l.string());
            }
        }
        Map<String, String> guidance = new LinkedHashMap<>();
        if (t.has("guidance")) {
            JsonCursor g = t.get("guidance");
            for (String k : g.keys()) {
                guidance.put(k, g.get(k).string());
            }
        }
        try {
            spec = spec.withParameters(params).withLocked(locked).withGuidance(guidance);
        } catch (IllegalArgumentException e) {
            throw new BudgetFormatException(t.path() + ".parameters", e.getMessage());
        }
        List<String> problems = spec.problems(b);
        if (!problems.isEmpty()) {
            throw t.error("the template does not fit its budget: " + String.join("; ", problems));
        }
        return spec;
    }

    // ---------------------------------------------------------------------------------------------------------

    /** @return the document as a JSON object of format version 2 */
    public static JsonObject toJson(BudgetDocument d) {
        JsonObject base = BudgetJson.toJson(d.budget().withExtensions(JsonValue.EMPTY_JSON_OBJECT));
        JsonObjectBuilder o = JSON.createObjectBuilder(base);
        o.add("document", JSON.createObjectBuilder()
                .add("laboratory", d.laboratory())
                .add("deviceUnderTest", d.deviceUnderTest())
                .add("author", d.author())
                .add("created", d.created().toString())
                .add("modified", d.modified().toString())
                .add("revision", d.revision())
                .add("status", d.status().label()));
        if (d.templateOrigin() != null) {
            TemplateOrigin t = d.templateOrigin();
            JsonObjectBuilder ob = JSON.createObjectBuilder().add("id", t.id()).add("version", t.version())
                    .add("contentHash", t.contentHash());
            if (!t.locked().isEmpty()) {
                JsonArrayBuilder l = JSON.createArrayBuilder();
                t.locked().forEach(l::add);
                ob.add("locked", l);
            }
            o.add("templateOrigin", ob);
        }
        if (d.template() != null) {
            o.add("template", templateJson(d.template()));
        }
        if (d.results() != null) {
            ResultSnapshot r = d.results();
            JsonObjectBuilder rb = JSON.createObjectBuilder().add("engineVersion", r.engineVersion())
                    .add("computed", r.computed().toString()).add("gum", r.gum());
            if (r.monteCarlo() != null) {
                rb.add("monteCarlo", r.monteCarlo());
            }
            o.add("results", rb);
        }
        if (!d.history().isEmpty()) {
            JsonArrayBuilder h = JSON.createArrayBuilder();
            for (RevisionEntry e : d.history()) {
                JsonObjectBuilder eb = JSON.createObjectBuilder().add("revision", e.revision())
                        .add("status", e.status().label()).add("by", e.by()).add("at", e.at().toString());
                if (!e.comment().isEmpty()) {
                    eb.add("comment", e.comment());
                }
                if (e.content() != null) {
                    eb.add("contentHash", e.contentHash()).add("content", e.content());
                } else if (!e.contentHash().isEmpty()) {
                    eb.add("contentHash", e.contentHash());
                }
                if (e.decision() != null) {
                    eb.add("decision", e.decision().key());
                }
                h.add(eb);
            }
            o.add("history", h);
        }
        for (Map.Entry<String, JsonValue> e : d.budget().extensions().entrySet()) {
            if (!DOCUMENT_FIELDS.contains(e.getKey()) && !base.containsKey(e.getKey())) {
                o.add(e.getKey(), e.getValue());
            }
        }
        return o.build();
    }

    private static JsonObject templateJson(TemplateSpec t) {
        JsonObjectBuilder b = JSON.createObjectBuilder().add("id", t.id()).add("version", t.version());
        if (!t.description().isEmpty()) {
            b.add("description", t.description());
        }
        JsonArrayBuilder ps = JSON.createArrayBuilder();
        for (TemplateParameter p : t.parameters()) {
            JsonObjectBuilder pb = JSON.createObjectBuilder().add("name", p.name());
            if (!p.description().isEmpty()) {
                pb.add("description", p.description());
            }
            if (!p.unit().isEmpty()) {
                pb.add("unit", p.unit());
            }
            pb.add("input", p.input()).add("field", p.field());
            if (p.hasDefault()) {
                pb.add("default", BudgetJson.decimal(p.defaultValue()));
            }
            if (Double.isFinite(p.minimum())) {
                pb.add("minimum", BudgetJson.decimal(p.minimum()));
            }
            if (Double.isFinite(p.maximum())) {
                pb.add("maximum", BudgetJson.decimal(p.maximum()));
            }
            ps.add(pb);
        }
        b.add("parameters", ps);
        JsonArrayBuilder l = JSON.createArrayBuilder();
        t.locked().forEach(l::add);
        b.add("locked", l);
        JsonObjectBuilder g = JSON.createObjectBuilder();
        t.guidance().forEach(g::add);
        b.add("guidance", g);
        return b.build();
    }

    /** @return the document as pretty-printed JSON text ending in a newline */
    public static String write(BudgetDocument d) {
        return BudgetJson.pretty(toJson(d));
    }

    /** The content a hash covers; see {@link BudgetDocument#contentJson()}. */
    static JsonObject content(BudgetDocument d) {
        JsonObject full = toJson(d);
        JsonObjectBuilder o = JSON.createObjectBuilder();
        for (Map.Entry<String, JsonValue> e : full.entrySet()) {
            switch (e.getKey()) {
                case "formatVersion":
                case "results":
                case "history":
                    break;
                case "document": {
                    JsonObjectBuilder m = JSON.createObjectBuilder();
                    for (Map.Entry<String, JsonValue> f : e.getValue().asJsonObject().entrySet()) {
                        if (!Set.of("modified", "revision", "status").contains(f.getKey())) {
                            m.add(f.getKey(), f.getValue());
                        }
                    }
                    o.add("document", m);
                    break;
                }
                default:
                    o.add(e.getKey(), e.getValue());
            }
        }
        return o.build();
    }

    /** Reads back an approved revision from the content its history entry recorded. */
    static BudgetDocument fromContent(RevisionEntry e) {
        JsonObjectBuilder o = JSON.createObjectBuilder(e.content());
        o.add("formatVersion", BudgetJson.FORMAT_VERSION);
        JsonObjectBuilder m = JSON.createObjectBuilder(e.content().getJsonObject("document"));
        m.add("modified", e.at().toString()).add("revision", e.revision()).add("status", "approved");
        o.add("document", m);
        try {
            BudgetDocument d = read(JsonCursor.root(o.build()), e.at());
            return new BudgetDocument(d.budget(), d.laboratory(), d.deviceUnderTest(), d.author(), d.created(),
                    e.at(), e.revision(), DocumentStatus.APPROVED, null, List.of(e),
                    d.templateOrigin(), d.template(), 0);
        } catch (BudgetFormatException x) {
            throw new IllegalStateException("the approved content of revision " + e.revision()
                    + " cannot be read back: " + x.getMessage(), x);
        }
    }
}
