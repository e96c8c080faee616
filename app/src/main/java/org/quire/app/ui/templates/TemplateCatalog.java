package org.quire.app.ui.templates;

import java.io.IOException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.quire.engine.document.BudgetDocument;
import org.quire.engine.document.DocumentStore;
import org.quire.engine.document.Template;
import org.quire.engine.document.TemplateLibrary;
import org.quire.engine.document.TemplateOrigin;
import org.quire.engine.io.BudgetFormatException;

/**
 * What File &gt; New from template offers: the templates of the engine's {@link TemplateLibrary} (shipped,
 * personal and team folders), and the plain budgets in the same folders. A template (a file with a template
 * section) asks for its parameters and records its origin in the new document; a plain budget is copied as a
 * new draft and records no origin, since it has no template id or version a later version could be matched by.
 *
 * <p>The shipped folder is the one the engine finds in the application's own files
 * ({@link TemplateLibrary#shippedFolder()}), wherever the program runs.
 *
 * <p>No user-interface imports. Immutable and thread-safe; every listing reads the folders afresh.
 */
public final class TemplateCatalog {
    /**
     * One entry.
     *
     * @param file the file
     * @param folder where it was found
     * @param document the file's document
     * @param template the template, or null when the file is a plain budget
     */
    public record Entry(Path file, TemplateLibrary.Folder folder, BudgetDocument document, Template template) {
        /** @return whether new budgets from it ask for parameters and record their origin */
        public boolean isTemplate() {
            return template != null;
        }

        /** @return the title, for lists */
        public String title() {
            return document.title().isBlank() ? String.valueOf(file.getFileName()) : document.title();
        }

        @Override
        public String toString() {
            return title();
        }
    }

    /** The entries found, and the files that could not be read, each with the reason. */
    public record Listing(List<Entry> entries, List<String> problems) {
        public Listing {
            entries = List.copyOf(entries);
            problems = List.copyOf(problems);
        }
    }

    private final TemplateLibrary library;

    private TemplateCatalog(TemplateLibrary library) {
        this.library = library;
    }

    /**
     * @param shipped the shipped folder, or null to find it ({@link #shippedFolder()})
     * @param personal the personal folder, or null
     * @param team the team folder, or null
     */
    public static TemplateCatalog of(Path shipped, Path personal, Path team) {
        return new TemplateCatalog(TemplateLibrary.of(shipped != null ? shipped : shippedFolder(), personal, team));
    }

    public TemplateLibrary library() {
        return library;
    }

    /** @return the shipped templates, from the application's own files ({@link TemplateLibrary#shippedFolder()}) */
    public static Path shippedFolder() {
        return TemplateLibrary.shippedFolder();
    }

    /** @return templates and plain budgets, folder by folder (shipped, personal, team), by file name within one */
    public Listing list() throws IOException {
        TemplateLibrary.Listing templates = library.list();
        Set<Path> known = new HashSet<>();
        templates.templates().forEach(e -> known.add(e.file()));
        List<Entry> out = new ArrayList<>();
        List<String> problems = new ArrayList<>();
        for (TemplateLibrary.Folder f : TemplateLibrary.Folder.values()) {
            Path dir = library.folder(f);
            if (dir == null || !Files.isDirectory(dir)) {
                continue;
            }
            for (TemplateLibrary.Entry e : templates.templates()) {
                if (e.folder() == f) {
                    out.add(new Entry(e.file(), f, e.template().document(), e.template()));
                }
            }
            List<Path> files = new ArrayList<>();
            try (DirectoryStream<Path> s = Files.newDirectoryStream(dir, "*.json")) {
                s.forEach(files::add);
            }
            Collections.sort(files);
            for (Path p : files) {
                if (known.contains(p)) {
                    continue;
                }
                try {
                    BudgetDocument d = DocumentStore.open(p);
                    if (d.template() == null) {
                        out.add(new Entry(p, f, d, null));
                    }
                } catch (BudgetFormatException | IOException e) {
                    problems.add(p.getFileName() + ": " + e.getMessage());
                }
            }
        }
        return new Listing(out, problems);
    }

    /**
     * @param entry a template or plain budget
     * @param values the template's parameters (ignored for a plain budget)
     * @return a new draft (revision 1): for a template with the parameters applied and its origin recorded; for
     *     a plain budget a copy of it with its laboratory
     * @throws IllegalArgumentException naming every missing, unknown or out-of-range parameter
     */
    public static BudgetDocument create(Entry entry, Map<String, Double> values, String author, Instant now) {
        return create(entry, org.quire.engine.document.TemplateValues.of(values), author, now);
    }

    /**
     * @param values the template's parameters, readings included, and the new budget's laboratory and device
     *     (ignored for a plain budget)
     * @return a new draft (revision 1), by the engine's {@link TemplateLibrary#newFromTemplate(Template,
     *     org.quire.engine.document.TemplateValues, String, Instant)} for a template (the one path the command
     *     line's {@code template new} uses); for a plain budget a copy of it with its laboratory
     * @throws IllegalArgumentException naming every missing, unknown or out-of-range parameter
     */
    public static BudgetDocument create(Entry entry, org.quire.engine.document.TemplateValues values, String author,
            Instant now) {
        if (entry.isTemplate()) {
            return TemplateLibrary.newFromTemplate(entry.template(), values, author, now);
        }
        BudgetDocument d = BudgetDocument.newDraft(entry.document().budget(), author, now);
        return d.withDetails(entry.document().laboratory(), "", author, author, now);
    }

    /** @return the newest template of the document's origin when it is newer than the version the document follows */
    public Optional<Template> newerTemplate(BudgetDocument doc) throws IOException {
        TemplateOrigin o = doc.templateOrigin();
        if (o == null) {
            return Optional.empty();
        }
        return library.find(o.id()).map(TemplateLibrary.Entry::template).filter(t -> t.version() > o.version());
    }
}
