package org.quire.app.cli;

import java.io.PrintStream;
import java.nio.file.Path;
import java.time.Instant;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.quire.engine.document.BudgetDocument;
import org.quire.engine.document.DocumentStore;
import org.quire.engine.document.IncompleteTemplateException;
import org.quire.engine.document.Template;
import org.quire.engine.document.TemplateChange;
import org.quire.engine.document.TemplateLibrary;
import org.quire.engine.document.TemplateParameter;

/**
 * {@code quire template list|new|publish|check}: the team's template library on the command line. The library
 * is searched in the shipped {@code templates/} folder (when the working folder has one), a personal folder
 * and a team folder.
 */
final class TemplateCommand {
    static final String USAGE = "quire template list | new TEMPLATE -o OUT.json [--set NAME=VALUE]... [--author NAME]"
            + " | publish FILE --author NAME | check FILE   (library folders: [--personal DIR] [--team DIR])";

    private TemplateCommand() {
    }

    static int run(String[] argv, PrintStream out, PrintStream err) throws Exception {
        Args a = new Args(argv, 1, Set.of("output", "set", "author", "personal", "team"), Set.of());
        if (a.positional().isEmpty()) {
            throw new UsageException("say what to do with templates\nusage: " + USAGE);
        }
        String verb = a.positional().get(0);
        TemplateLibrary library = library(a);
        switch (verb) {
            case "list":
                a.expectPositional(1, USAGE);
                return list(library, out);
            case "new":
                a.expectPositional(2, USAGE);
                return create(a, library, out);
            case "publish":
                a.expectPositional(2, USAGE);
                return publish(a, library, out);
            case "check":
                a.expectPositional(2, USAGE);
                return check(a, library, out);
            default:
                throw new UsageException("unknown template action '" + verb + "'\nusage: " + USAGE);
        }
    }

    private static TemplateLibrary library(Args a) throws UsageException {
        Path shipped = Path.of("templates");
        return TemplateLibrary.of(java.nio.file.Files.isDirectory(shipped) ? shipped : null,
                a.has("personal") ? folder(a.get("personal", "")) : null, a.has("team") ? folder(a.get("team", "")) : null);
    }

    private static Path folder(String name) throws UsageException {
        Path p = Files.path(name);
        if (!java.nio.file.Files.isDirectory(p)) {
            throw new UsageException("no such folder: " + name);
        }
        return p;
    }

    private static int list(TemplateLibrary library, PrintStream out) throws Exception {
        TemplateLibrary.Listing l = library.list();
        for (TemplateLibrary.Entry e : l.templates()) {
            Template t = e.template();
            out.printf("%-32s v%-3d %-9s %s  (%s)%n", t.id(), t.version(), e.folder().name().toLowerCase(java.util.Locale.ROOT),
                    t.title(), e.file().getFileName());
            for (TemplateParameter p : t.spec().parameters()) {
                out.printf("    parameter %-14s %s%s%n", p.name(), p.description(), p.unit().isEmpty() ? "" : " [" + p.unit() + "]");
            }
        }
        for (String p : l.problems()) {
            out.println("not a template: " + p);
        }
        out.println(l.templates().size() + " templates");
        return 0;
    }

    private static Template template(String name, TemplateLibrary library) throws Exception {
        Path p = Files.path(name);
        if (!java.nio.file.Files.isRegularFile(p)) {
            Optional<TemplateLibrary.Entry> e = library.find(name);
            if (e.isPresent()) {
                return e.get().template();
            }
        }
        BudgetDocument d = Files.loadDocument(name);
        if (d.template() == null) {
            throw new Files.FileProblem(name, "this budget has no template section (id, version, parameters)");
        }
        return Template.of(d);
    }

    private static int create(Args a, TemplateLibrary library, PrintStream out) throws Exception {
        if (!a.has("output")) {
            throw new UsageException("give the new budget's file with -o OUT.json");
        }
        Template t = template(a.positional().get(1), library);
        Map<String, Double> values = new LinkedHashMap<>();
        for (String s : a.all("set")) {
            int eq = s.indexOf('=');
            if (eq <= 0) {
                throw new UsageException("--set needs NAME=VALUE, not '" + s + "'");
            }
            try {
                values.put(s.substring(0, eq).trim(), Double.parseDouble(s.substring(eq + 1).trim()));
            } catch (NumberFormatException e) {
                throw new UsageException("--set " + s.substring(0, eq) + " needs a number, not '" + s.substring(eq + 1) + "'");
            }
        }
        BudgetDocument d;
        try {
            d = TemplateLibrary.newFromTemplate(t, values, a.get("author", ""), Instant.now());
        } catch (IllegalArgumentException e) {
            throw new UsageException(e.getMessage());
        }
        Path target = Files.path(a.get("output", ""));
        if (java.nio.file.Files.exists(target)) {
            throw new UsageException(target + " exists already; choose another name");
        }
        DocumentStore.save(d, target);
        out.println("wrote " + target + " from template " + t.id() + " version " + t.version());
        return 0;
    }

    private static int publish(Args a, TemplateLibrary library, PrintStream out) throws Exception {
        if (!a.has("team")) {
            throw new UsageException("give the team folder with --team DIR");
        }
        BudgetDocument d = Files.loadDocument(a.positional().get(1));
        try {
            Path f = library.publishToTeam(d, a.get("author", ""), Instant.now());
            out.println("published " + f);
            return 0;
        } catch (IncompleteTemplateException e) {
            throw new Files.FileProblem(a.positional().get(1), e.getMessage());
        }
    }

    private static int check(Args a, TemplateLibrary library, PrintStream out) throws Exception {
        String name = a.positional().get(1);
        BudgetDocument d = Files.loadDocument(name);
        if (d.templateOrigin() == null) {
            out.println(name + " was not made from a template");
            return 0;
        }
        Optional<TemplateLibrary.Entry> newest = library.find(d.templateOrigin().id());
        if (newest.isEmpty()) {
            out.println("template " + d.templateOrigin().id() + " is not in the library");
            return 0;
        }
        Template t = newest.get().template();
        if (t.version() <= d.templateOrigin().version()) {
            out.println(name + " follows the newest version (" + t.version() + ") of template " + t.id());
            return 0;
        }
        List<TemplateChange> changes = TemplateLibrary.compare(d, t);
        out.println("template " + t.id() + " has version " + t.version() + "; " + name + " follows version "
                + d.templateOrigin().version() + ". What changed:");
        for (TemplateChange c : changes) {
            out.println("  " + c);
        }
        return changes.isEmpty() ? 0 : 1;
    }
}
