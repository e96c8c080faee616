package org.quire.engine.document;

import org.quire.engine.io.JsonSupport;
import jakarta.json.spi.JsonProvider;
import jakarta.json.JsonObject;
import jakarta.json.JsonObjectBuilder;
import jakarta.json.JsonValue;
import java.io.IOException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.InputQuantity;
import org.quire.engine.io.BudgetFormatException;
import org.quire.engine.io.BudgetJson;

/**
 * The templates a user can start from, found in three folders searched in this order: the templates shipped
 * with Quire, the user's personal folder, and the team's shared folder (which may be read-only). Every
 * {@code *.json} file directly in a folder that is a budget file with a template section is a template.
 *
 * <p>Also: making a document from a template, comparing a document with a newer version of its template,
 * taking selected changes over, and publishing a template to the team folder.
 *
 * <p>Immutable and thread-safe; every listing reads the folders afresh.
 */
public final class TemplateLibrary {
    /** One JSON-P provider for the class: {@code JsonSupport.JSON.create...} looks the provider up on every call, which is slow. */
    private static final JsonProvider JSON = JsonSupport.JSON;
    /** Where a template was found. */
    public enum Folder { SHIPPED, PERSONAL, TEAM }

    /** A template found in the library. */
    public record Entry(Template template, Path file, Folder folder) {
    }

    /** The templates found, and the files that could not be read, each with the reason. */
    public record Listing(List<Entry> templates, List<String> problems) {
    }

    private final Map<Folder, Path> folders;

    private TemplateLibrary(Map<Folder, Path> folders) {
        this.folders = folders;
    }

    /** The resource folder, on the class path of the application, that holds the shipped templates. */
    public static final String SHIPPED_RESOURCE = "templates";

    /**
     * The shipped templates, read from the application's own files (the {@value #SHIPPED_RESOURCE} resource
     * folder packed into the jar, or the build's class folder), wherever the program runs; the working folder
     * plays no part. The command line and the workbench both find them here.
     *
     * @return the folder (inside the jar's file system when packed), or null when this build ships none
     */
    public static Path shippedFolder() {
        return org.quire.engine.io.ResourceFolders.find(SHIPPED_RESOURCE);
    }

    /**
     * @return the library of the shipped templates ({@link #shippedFolder()}) and the given personal and team
     *     folders
     */
    public static TemplateLibrary withShipped(Path personal, Path team) {
        return of(shippedFolder(), personal, team);
    }

    /**
     * @param shipped the shipped templates (the {@code templates} folder of the installation), or null
     * @param personal the user's folder, or null
     * @param team the team's folder, or null
     */
    public static TemplateLibrary of(Path shipped, Path personal, Path team) {
        Map<Folder, Path> m = new java.util.EnumMap<>(Folder.class);
        if (shipped != null) {
            m.put(Folder.SHIPPED, shipped);
        }
        if (personal != null) {
            m.put(Folder.PERSONAL, personal);
        }
        if (team != null) {
            m.put(Folder.TEAM, team);
        }
        return new TemplateLibrary(Collections.unmodifiableMap(m));
    }

    /** @return the folder, or null when none was given */
    public Path folder(Folder f) {
        return folders.get(f);
    }

    /** @return every template, folder by folder in the order shipped, personal, team, by file name within one */
    public Listing list() throws IOException {
        List<Entry> out = new ArrayList<>();
        List<String> problems = new ArrayList<>();
        for (Folder f : Folder.values()) {
            Path dir = folders.get(f);
            if (dir == null || !Files.isDirectory(dir)) {
                continue;
            }
            List<Path> files = new ArrayList<>();
            try (DirectoryStream<Path> s = Files.newDirectoryStream(dir, "*.json")) {
                s.forEach(files::add);
            }
            Collections.sort(files);
            for (Path p : files) {
                try {
                    BudgetDocument d = DocumentJson.read(p);
                    if (d.template() == null) {
                        problems.add(p + ": a budget, not a template (it has no template section)");
                    } else {
                        out.add(new Entry(Template.of(d), p, f));
                    }
                } catch (BudgetFormatException | IOException e) {
                    problems.add(p + ": " + e.getMessage());
                }
            }
        }
        return new Listing(out, problems);
    }

    /** @return the templates whose id, title or description contains {@code text}, ignoring case */
    public List<Entry> search(String text) throws IOException {
        String t = text.toLowerCase(Locale.ROOT);
        List<Entry> out = new ArrayList<>();
        for (Entry e : list().templates()) {
            Template x = e.template();
            if (x.id().contains(t) || x.title().toLowerCase(Locale.ROOT).contains(t)
                    || x.spec().description().toLowerCase(Locale.ROOT).contains(t)) {
                out.add(e);
            }
        }
        return out;
    }

    /** @return the highest version of the template {@code id}; of equal versions, the first in folder order */
    public Optional<Entry> find(String id) throws IOException {
        Entry best = null;
        for (Entry e : list().templates()) {
            if (e.template().id().equals(id) && (best == null || e.template().version() > best.template().version())) {
                best = e;
            }
        }
        return Optional.ofNullable(best);
    }

    /**
     * @return the template {@code id} of exactly {@code version}; of several such files, the first in folder
     *     order
     */
    public Optional<Entry> find(String id, int version) throws IOException {
        for (Entry e : list().templates()) {
            if (e.template().id().equals(id) && e.template().version() == version) {
                return Optional.of(e);
            }
        }
        return Optional.empty();
    }

    /** @return a new draft from {@code template}; see {@link Template#instantiate} */
    public static BudgetDocument newFromTemplate(Template template, Map<String, Double> parameterValues,
            String author, Instant now) {
        return template.instantiate(parameterValues, author, now);
    }

    /** @return a new draft from {@code template}; see {@link Template#instantiate(TemplateValues, String, Instant)} */
    public static BudgetDocument newFromTemplate(Template template, TemplateValues values, String author,
            Instant now) {
        return template.instantiate(values, author, now);
    }

    // ----- comparing with a newer template --------------------------------------------------------------------

    /**
     * The newer template's budget with the document's own parameter values: a parameter whose input the
     * document has takes the document's value (its readings, for a readings parameter); otherwise the default,
     * or the template's own value.
     */
    private static Budget reference(BudgetDocument doc, Template newer) {
        Budget b = newer.document().budget();
        for (TemplateParameter p : newer.spec().parameters()) {
            try {
                b = p.isReadings() ? p.applyReadings(b, p.readingsIn(doc.budget()))
                        : p.applyTo(b, p.valueIn(doc.budget()));
            } catch (IllegalArgumentException e) {
                if (p.hasDefault()) {
                    b = p.applyTo(b, p.defaultValue());
                }
            }
        }
        return b;
    }

    /**
     * Lists, field by field, how a document differs from a newer template. Fields set by the template's
     * parameters are compared after the document's own values are put into the newer template, so the
     * user's values are not reported as changes.
     *
     * @return the changes in order: model, outputs, settings, correlations, then input by input
     */
    public static List<TemplateChange> compare(BudgetDocument doc, Template newer) {
        Budget d = doc.budget();
        Budget t = reference(doc, newer);
        List<TemplateChange> out = new ArrayList<>();
        if (!d.model().equals(t.model())) {
            out.add(new TemplateChange(TemplateChange.Kind.MODEL_CHANGED, "model", d.model(), t.model()));
        }
        if (!d.outputs().equals(t.outputs())) {
            out.add(new TemplateChange(TemplateChange.Kind.OUTPUTS_CHANGED, "outputs", String.join(", ",
                    d.outputNames()), String.join(", ", t.outputNames())));
        }
        if (!d.settings().equals(t.settings())) {
            out.add(new TemplateChange(TemplateChange.Kind.SETTINGS_CHANGED, "settings",
                    CanonicalJson.write(BudgetJson.settingsJson(d.settings())),
                    CanonicalJson.write(BudgetJson.settingsJson(t.settings()))));
        }
        if (!d.correlations().equals(t.correlations())) {
            out.add(new TemplateChange(TemplateChange.Kind.CORRELATIONS_CHANGED, "correlations",
                    d.correlations().toString(), t.correlations().toString()));
        }
        for (InputQuantity ti : t.inputs()) {
            InputQuantity di = d.input(ti.name());
            if (di == null) {
                out.add(new TemplateChange(TemplateChange.Kind.INPUT_ADDED, ti.name(), "", describe(ti)));
                continue;
            }
            if (!di.evaluation().equals(ti.evaluation())) {
                boolean onlyEstimate = withoutEstimate(di).equals(withoutEstimate(ti));
                out.add(new TemplateChange(onlyEstimate ? TemplateChange.Kind.ESTIMATE_CHANGED
                        : TemplateChange.Kind.EVALUATION_CHANGED, ti.name(),
                        CanonicalJson.write(BudgetJson.evaluationJson(di.evaluation())),
                        CanonicalJson.write(BudgetJson.evaluationJson(ti.evaluation()))));
            }
            if (!di.source().equals(ti.source())) {
                out.add(new TemplateChange(TemplateChange.Kind.SOURCE_CHANGED, ti.name(), di.source(), ti.source()));
            }
            if (!di.unit().equals(ti.unit()) || !di.description().equals(ti.description())
                    || !di.notes().equals(ti.notes())) {
                out.add(new TemplateChange(TemplateChange.Kind.DETAILS_CHANGED, ti.name(), details(di), details(ti)));
            }
        }
        for (InputQuantity di : d.inputs()) {
            if (t.input(di.name()) == null) {
                out.add(new TemplateChange(TemplateChange.Kind.INPUT_REMOVED, di.name(), describe(di), ""));
            }
        }
        return out;
    }

    private static JsonObject withoutEstimate(InputQuantity q) {
        JsonObjectBuilder b = JSON.createObjectBuilder();
        for (Map.Entry<String, JsonValue> e : BudgetJson.evaluationJson(q.evaluation()).entrySet()) {
            if (!e.getKey().equals("estimate") && !e.getKey().equals("mean")) {
                b.add(e.getKey(), e.getValue());
            }
        }
        return b.build();
    }

    private static String describe(InputQuantity q) {
        return q.name() + " " + CanonicalJson.write(BudgetJson.evaluationJson(q.evaluation()));
    }

    private static String details(InputQuantity q) {
        return "unit '" + q.unit() + "', description '" + q.description() + "', notes '" + q.notes() + "'";
    }

    /**
     * Takes the selected changes over from the newer template. The document records the newer template as its
     * origin once no difference is left.
     *
     * @param selected changes from {@link #compare}, all or some
     * @return the changed document (a new draft revision when {@code doc} was approved)
     * @throws IllegalArgumentException when a selected change is not (or no longer) a difference
     */
    public static BudgetDocument adopt(BudgetDocument doc, Template newer, List<TemplateChange> selected,
            String who, Instant when) {
        List<TemplateChange> current = compare(doc, newer);
        Budget t = reference(doc, newer);
        Budget b = doc.budget();
        for (TemplateChange c : selected) {
            if (!current.contains(c)) {
                throw new IllegalArgumentException("the change " + c + " is not a difference between '" + doc.title()
                        + "' and template " + newer.id() + " version " + newer.version());
            }
            String n = c.subject();
            switch (c.kind()) {
                case MODEL_CHANGED: b = b.withModel(t.model()); break;
                case OUTPUTS_CHANGED: b = b.withOutputs(t.outputs()); break;
                case SETTINGS_CHANGED: b = b.withSettings(t.settings()); break;
                case CORRELATIONS_CHANGED: b = b.withCorrelations(t.correlations()); break;
                case INPUT_ADDED: b = b.withInputs(insert(b, t, n)); break;
                case INPUT_REMOVED: {
                    List<InputQuantity> l = new ArrayList<>(b.inputs());
                    l.removeIf(q -> q.name().equals(n));
                    b = b.withInputs(l);
                    break;
                }
                case ESTIMATE_CHANGED:
                case EVALUATION_CHANGED:
                    b = b.withInput(n, b.input(n).withEvaluation(t.input(n).evaluation()));
                    break;
                case SOURCE_CHANGED: b = b.withInput(n, b.input(n).withSource(t.input(n).source())); break;
                default: {
                    InputQuantity ti = t.input(n);
                    b = b.withInput(n, b.input(n).withUnit(ti.unit()).withDescription(ti.description())
                            .withNotes(ti.notes()));
                }
            }
        }
        BudgetDocument out = doc.withBudget(b, who, when);
        if (compare(out, newer).isEmpty()) {
            out = out.withTemplateOrigin(newer.origin(), who, when);
        }
        return out;
    }

    /** Inserts the template's input {@code name} after the nearest preceding input the budget also has. */
    private static List<InputQuantity> insert(Budget b, Budget t, String name) {
        List<InputQuantity> l = new ArrayList<>(b.inputs());
        Map<String, Integer> at = new HashMap<>();
        for (int i = 0; i < l.size(); i++) {
            at.put(l.get(i).name(), i);
        }
        int pos = 0;
        for (InputQuantity q : t.inputs()) {
            if (q.name().equals(name)) {
                break;
            }
            if (at.containsKey(q.name())) {
                pos = at.get(q.name()) + 1;
            }
        }
        l.add(pos, t.input(name));
        return l;
    }

    // ----- publishing -----------------------------------------------------------------------------------------

    /**
     * @return why {@code doc} cannot be published as a template by {@code author}: no template section, no
     *     title, no author, an input without a source, a template section that does not fit the budget
     */
    public static List<String> completenessProblems(BudgetDocument doc, String author) {
        List<String> p = new ArrayList<>();
        if (doc.template() == null) {
            p.add("the document has no template section (id, version, parameters)");
        } else {
            p.addAll(doc.template().problems(doc.budget()));
            p.addAll(doc.template().carriedValues(doc.budget()));
        }
        if (doc.title().isBlank()) {
            p.add("the template has no title");
        }
        if (author == null || author.isBlank()) {
            p.add("the author is not named");
        }
        for (InputQuantity q : doc.budget().inputs()) {
            if (q.source().isBlank()) {
                p.add("input '" + q.name() + "' has no source");
            }
        }
        return p;
    }

    /**
     * Saves a template into the team folder as {@code ID-vVERSION.json}, naming {@code author} as its author.
     *
     * @return the file written
     * @throws IncompleteTemplateException listing every reason the template is not complete
     * @throws DocumentSaveException when there is no team folder, it cannot be written, or that version of the
     *     template is already there (a published version is never overwritten: raise the version)
     */
    public Path publishToTeam(BudgetDocument doc, String author, Instant now)
            throws IOException, IncompleteTemplateException {
        List<String> problems = completenessProblems(doc, author);
        if (!problems.isEmpty()) {
            throw new IncompleteTemplateException(problems);
        }
        Path dir = folders.get(Folder.TEAM);
        String name = doc.template().id() + "-v" + doc.template().version() + ".json";
        if (dir == null) {
            throw new DocumentSaveException(Path.of(name), "no team folder is configured", null);
        }
        Path file = dir.resolve(name);
        if (Files.exists(file)) {
            throw new DocumentSaveException(file, "template " + doc.template().id() + " version "
                    + doc.template().version() + " is already published there; raise the version", null);
        }
        BudgetDocument named = doc.withDetails(doc.laboratory(), doc.deviceUnderTest(), author, author, now);
        DocumentStore.save(named, file);
        return file;
    }
}
