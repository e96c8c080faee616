package org.quire.app.cli;

import java.io.PrintStream;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.quire.app.ui.common.WorkbenchPrefs;
import org.quire.engine.document.BudgetDocument;
import org.quire.engine.document.DocumentStore;
import org.quire.engine.document.IncompleteTemplateException;
import org.quire.engine.document.Template;
import org.quire.engine.document.TemplateChange;
import org.quire.engine.document.TemplateLibrary;
import org.quire.engine.document.TemplateParameter;
import org.quire.engine.document.TemplateConformance;
import org.quire.engine.document.TemplateValues;
import org.quire.engine.csv.CsvException;
import org.quire.engine.csv.CsvOptions;
import org.quire.engine.csv.CsvReadings;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;

/**
 * {@code quire template list|new|publish|check}: the template library on the command line. The library is the
 * engine's {@link TemplateLibrary}: the shipped templates from the program's own files (wherever it runs), the
 * personal folder and the team folder, each from {@code --personal}/{@code --team} or else from the workbench's
 * preferences.
 */
@Command(name = "template", mixinStandardHelpOptions = true, synopsisSubcommandLabel = "ACTION",
        description = "The template library: shipped templates, the personal folder and the team folder.",
        subcommands = {TemplateCommand.ListAction.class, TemplateCommand.NewAction.class,
            TemplateCommand.PublishAction.class, TemplateCommand.CheckAction.class},
        footerHeading = "%nExamples:%n",
        footer = {"  quire template list",
            "  quire template new tvfl-gravimetric-emf-point -o new.json --set t_tank=20.4 ...",
            "  quire template publish my-template.json --team /srv/lab/templates --author \"A. Lindqvist\"",
            "  quire template check budget.json"})
final class TemplateCommand implements Callable<Integer> {
    @ParentCommand
    QuireCommand quire;

    @Override
    public Integer call() throws UsageException {
        throw new UsageException("say what to do with templates: list, new, publish or check (see 'quire template --help')");
    }

    /** {@code --personal DIR --team DIR}: the library's folders; the workbench's preferences when not given. */
    static final class Folders {
        @Option(names = "--personal", paramLabel = "DIR",
                description = "the personal template folder (default: the workbench's preference)")
        String personal;

        @Option(names = "--team", paramLabel = "DIR",
                description = "the team's shared template folder (default: the workbench's preference)")
        String team;

        /** @return the library of the shipped templates and the folders of the workbench's preferences */
        static TemplateLibrary preferred() throws UsageException {
            return new Folders().library();
        }

        TemplateLibrary library() throws UsageException {
            WorkbenchPrefs prefs = WorkbenchPrefs.user();
            return TemplateLibrary.withShipped(folder(personal, "--personal", prefs.personalTemplates()),
                    folder(team, "--team", prefs.teamTemplates()));
        }

        private static Path folder(String given, String option, Path preferred) throws UsageException {
            if (given == null) {
                return preferred != null && java.nio.file.Files.isDirectory(preferred) ? preferred : null;
            }
            Path p = Files.path(given);
            if (!java.nio.file.Files.isDirectory(p)) {
                throw new UsageException(option + ": no such folder: " + given);
            }
            return p;
        }
    }

    /**
     * @return the template of a file, or else of the library entry with this id
     */
    static Template template(String name, TemplateLibrary library) throws Exception {
        Path p = Files.path(name);
        if (!java.nio.file.Files.exists(p)) {
            Optional<TemplateLibrary.Entry> e = library.find(name);
            if (e.isPresent()) {
                return e.get().template();
            }
            if (!name.endsWith(".json")) {
                throw new UsageException("no such file and no template of this id in the library: " + name
                        + " (see 'quire template list')");
            }
        }
        BudgetDocument d = Files.loadDocument(name);
        if (d.template() == null) {
            throw new Files.FileProblem(name, "this budget has no template section (id, version, parameters)");
        }
        try {
            return Template.of(d);
        } catch (IllegalArgumentException e) {
            throw new Files.FileProblem(name, e.getMessage());
        }
    }

    @Command(name = "list", mixinStandardHelpOptions = true,
            description = "Every template of the library with its version, folder, title, file and parameters.",
            footerHeading = "%nExamples:%n",
            footer = {"  quire template list", "  quire template list --team /srv/lab/templates"})
    static final class ListAction implements Callable<Integer> {
        @ParentCommand
        TemplateCommand parent;

        @Mixin
        Folders folders;

        @Override
        public Integer call() throws Exception {
            PrintStream out = parent.quire.out;
            TemplateLibrary.Listing l = folders.library().list();
            for (TemplateLibrary.Entry e : l.templates()) {
                Template t = e.template();
                out.printf("%-32s v%-3d %-9s %s  (%s)%n", t.id(), t.version(),
                        e.folder().name().toLowerCase(java.util.Locale.ROOT), t.title(), e.file().getFileName());
                for (TemplateParameter p : t.spec().parameters()) {
                    out.printf("    parameter %-14s %s%s%s%s%n", p.name(), p.description(),
                            p.unit().isEmpty() ? "" : " [" + p.unit() + "]", p.isReadings() ? " (readings: --readings "
                            + p.name() + "=FILE.csv)" : "", p.hasDefault() ? "" : " (required)");
                }
            }
            for (String p : l.problems()) {
                out.println("not a template: " + p);
            }
            out.println(l.templates().size() + " templates");
            return CommandLine.OK;
        }
    }

    @Command(name = "new", mixinStandardHelpOptions = true,
            description = {"A new budget from a template: every parameter without a default must be given, a number "
                    + "with --set, the readings of a Type A input with --readings, so that no value of the "
                    + "template's example is carried into the new budget; what the template does not ask for is "
                    + "locked as a value of its method. The template's laboratory and device are not carried over: "
                    + "give the new budget's with --laboratory and --device.",
                "'quire template list' shows each template's parameters."},
            footerHeading = "%nExamples:%n",
            footer = {"  quire template new tvfl-gravimetric-emf-point -o meter-17.json --set I_net=398.75 "
                    + "--readings N_ind=counts.csv --set ...",
                "  quire template new my-template.json -o new.json --set q=12.5 --author \"A. Lindqvist\" "
                    + "--laboratory \"Tarrow Vale Flow Laboratory\""})
    static final class NewAction implements Callable<Integer> {
        @ParentCommand
        TemplateCommand parent;

        @Parameters(paramLabel = "TEMPLATE", description = "a template's id in the library, or a template file")
        String name;

        @Option(names = {"-o", "--output"}, paramLabel = "OUT.json", required = true,
                description = "the new budget's file (must not exist)")
        String output;

        @Option(names = "--set", paramLabel = "NAME=VALUE", description = "a parameter's value (repeatable)")
        List<String> set = new ArrayList<>();

        @Option(names = "--readings", paramLabel = "NAME=FILE.csv",
                description = "the readings of a readings parameter from a CSV file: a column named reading, "
                        + "readings, value or x, or a file of one column or one row (repeatable)")
        List<String> readings = new ArrayList<>();

        @Option(names = "--author", paramLabel = "NAME", defaultValue = "", description = "the new budget's author")
        String author;

        @Option(names = "--laboratory", paramLabel = "NAME", defaultValue = "",
                description = "the laboratory making the measurement (default: none; the template's is not carried over)")
        String laboratory;

        @Option(names = "--device", paramLabel = "TEXT", defaultValue = "",
                description = "the device under test (default: none)")
        String device;

        @Mixin
        Folders folders;

        @Override
        public Integer call() throws Exception {
            Template t = template(name, folders.library());
            Map<String, Double> values = new LinkedHashMap<>();
            for (String s : set) {
                int eq = s.indexOf('=');
                if (eq <= 0) {
                    throw new UsageException("--set needs NAME=VALUE, not '" + s + "'");
                }
                String key = s.substring(0, eq).trim();
                try {
                    values.put(key, new Options.FiniteNumber().convert(s.substring(eq + 1)));
                } catch (picocli.CommandLine.TypeConversionException e) {
                    throw new UsageException("--set " + key + " " + e.getMessage());
                }
            }
            TemplateValues given = TemplateValues.of(values).withLaboratory(laboratory).withDeviceUnderTest(device);
            for (String r : readings) {
                int eq = r.indexOf('=');
                if (eq <= 0) {
                    throw new UsageException("--readings needs NAME=FILE.csv, not '" + r + "'");
                }
                String key = r.substring(0, eq).trim();
                String file = r.substring(eq + 1).trim();
                try {
                    given = given.withReadings(key, CsvReadings.read(Files.path(file), CsvOptions.defaults()));
                } catch (CsvException e) {
                    throw new Files.FileProblem(e);
                } catch (java.io.IOException e) {
                    throw new UsageException("--readings " + key + ": cannot read " + file + ": " + e.getMessage());
                }
            }
            BudgetDocument d;
            try {
                d = TemplateLibrary.newFromTemplate(t, given, author, Instant.now());
            } catch (IllegalArgumentException e) {
                throw new UsageException(e.getMessage());
            }
            Path target = Files.path(output);
            if (java.nio.file.Files.exists(target)) {
                throw new UsageException(target + " exists already; choose another name");
            }
            DocumentStore.save(d, target);
            parent.quire.out.println("wrote " + target + " from template " + t.id() + " version " + t.version());
            return CommandLine.OK;
        }
    }

    @Command(name = "publish", mixinStandardHelpOptions = true,
            description = "Publish a template to the team folder; a template already there needs a higher version.",
            footerHeading = "%nExamples:%n",
            footer = {"  quire template publish my-template.json --team /srv/lab/templates --author \"A. Lindqvist\""})
    static final class PublishAction implements Callable<Integer> {
        @ParentCommand
        TemplateCommand parent;

        @Parameters(paramLabel = "FILE", description = "the template file")
        String file;

        @Option(names = "--author", paramLabel = "NAME", defaultValue = "", description = "who publishes it")
        String author;

        @Mixin
        Folders folders;

        @Override
        public Integer call() throws Exception {
            TemplateLibrary library = folders.library();
            if (library.folder(TemplateLibrary.Folder.TEAM) == null) {
                throw new UsageException("give the team folder with --team DIR (or set it in the workbench's preferences)");
            }
            BudgetDocument d = Files.loadDocument(file);
            try {
                Path f = library.publishToTeam(d, author, Instant.now());
                parent.quire.out.println("published " + f);
                return CommandLine.OK;
            } catch (IncompleteTemplateException e) {
                throw new Files.FileProblem(file, e.getMessage());
            }
        }
    }

    @Command(name = "check", mixinStandardHelpOptions = true,
            description = {"Whether a budget keeps every field its template locks, and whether the template it was "
                    + "made from has a newer version in the library, and what changed. Exit status 2 when a locked "
                    + "field was changed (each named with the template's and the budget's value); 1 when the "
                    + "template changed or the version the budget was made from is not in the library."},
            footerHeading = "%nExamples:%n", footer = {"  quire template check meter-17.json"})
    static final class CheckAction implements Callable<Integer> {
        @ParentCommand
        TemplateCommand parent;

        @Parameters(paramLabel = "FILE", description = "a budget made from a template")
        String name;

        @Mixin
        Folders folders;

        @Override
        public Integer call() throws Exception {
            PrintStream out = parent.quire.out;
            TemplateLibrary library = folders.library();
            BudgetDocument d = Files.loadDocument(name);
            if (d.templateOrigin() == null) {
                out.println(name + " was not made from a template");
                return CommandLine.OK;
            }
            TemplateConformance.Finding f = TemplateConformance.check(d, library);
            if (f.state() == TemplateConformance.State.DEVIATES) {
                throw new Files.FileProblem(name, "does not follow template " + d.templateOrigin().id() + " version "
                        + d.templateOrigin().version() + ": " + String.join("; ", f.messages()));
            }
            Optional<TemplateLibrary.Entry> newest = library.find(d.templateOrigin().id());
            if (newest.isEmpty()) {
                out.println("template " + d.templateOrigin().id() + " is not in the library");
                return CommandLine.OK;
            }
            Template t = newest.get().template();
            if (f.state() == TemplateConformance.State.TEMPLATE_NOT_FOUND) {
                out.println(f.messages().get(0));
            }
            if (t.version() <= d.templateOrigin().version()) {
                out.println(name + " follows the newest version (" + t.version() + ") of template " + t.id()
                        + (f.state() == TemplateConformance.State.FOLLOWS ? " and keeps every locked field" : ""));
                return f.state() == TemplateConformance.State.FOLLOWS ? CommandLine.OK : CommandLine.CHECK_FAILED;
            }
            List<TemplateChange> changes = TemplateLibrary.compare(d, t);
            out.println("template " + t.id() + " has version " + t.version() + "; " + name + " follows version "
                    + d.templateOrigin().version() + ". What changed:");
            for (TemplateChange c : changes) {
                out.println("  " + c);
            }
            return changes.isEmpty() ? CommandLine.OK : CommandLine.CHECK_FAILED;
        }
    }
}
