package org.quire.app.cli;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Path;
import java.util.List;
import org.quire.engine.validate.CheckOutcome;
import org.quire.engine.validate.Validator;
import java.util.concurrent.Callable;
import org.quire.engine.document.TemplateLibrary;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParentCommand;

/**
 * {@code quire validate [--dir DIR]}: runs every worked example, prints one line per check and ends with
 * {@code N passed, N failed}; exits 1 when any check fails.
 */
@Command(name = "validate", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Check Quire against the published worked examples (JCGM 100, JCGM 101, ISO/TS 28037, "
                + "JCGM 106 ...) and the shipped templates: one line per check, ending with 'N passed, N failed'.",
            "Without --dir it runs the worked-examples folder of the working folder, or else the copy in the "
                + "program. Exit status 1 when a check fails."},
        footerHeading = "%nExamples:%n",
        footer = {"  quire validate", "  quire validate --dir my-lab-examples"})
final class ValidateCommand implements Callable<Integer> {
    @ParentCommand
    QuireCommand quire;

    @Option(names = "--dir", paramLabel = "DIR", description = "a folder of worked-example files to run instead")
    String dir;

    @Override
    public Integer call() throws Exception {
        PrintStream out = quire.out;
        Validator v = Validator.standard(quire.engine.library());
        List<CheckOutcome> outcomes;
        if (dir != null) {
            Path folder = Files.path(dir);
            if (!java.nio.file.Files.isDirectory(folder)) {
                throw new UsageException("no such folder: " + dir);
            }
            outcomes = v.runAll(folder);
        } else {
            Path local = Path.of("worked-examples");
            outcomes = new java.util.ArrayList<>(v.runAll(java.nio.file.Files.isDirectory(local) ? local
                    : ExamplesCommand.bundled()));
            Path shipped = TemplateLibrary.shippedFolder();
            if (shipped != null) {
                outcomes.addAll(templates(shipped, quire.engine.library()));
            }
        }
        return print(outcomes, out);
    }

    /**
     * Every shipped template must evaluate without errors and without warnings (model, unit and result
     * warnings); one outcome per template.
     */
    static List<CheckOutcome> templates(Path dir, org.quire.engine.model.FunctionLibrary library) throws IOException {
        List<Path> files;
        try (java.util.stream.Stream<Path> st = java.nio.file.Files.list(dir)) {
            files = st.filter(p -> p.getFileName().toString().endsWith(".json")).sorted()
                    .collect(java.util.stream.Collectors.toList());
        }
        List<CheckOutcome> out = new java.util.ArrayList<>();
        for (Path f : files) {
            String name = f.getFileName().toString();
            List<String> problems = new java.util.ArrayList<>();
            try {
                org.quire.engine.budget.Budget b = org.quire.engine.io.BudgetJson.read(f);
                org.quire.engine.gum.GumResult r = org.quire.engine.gum.GumEvaluator.evaluate(b, library);
                problems.addAll(r.warnings());
                r.outputs().forEach(o -> problems.addAll(o.warnings()));
            } catch (org.quire.engine.io.BudgetFormatException | org.quire.engine.model.ModelException
                    | IllegalArgumentException e) {
                problems.add(e.getMessage());
            }
            out.add(new CheckOutcome(name, "shipped template", "evaluates without errors or warnings", "none",
                    problems.isEmpty() ? "none" : String.join("; ", problems), "exact", problems.isEmpty(), ""));
        }
        return out;
    }

    static int print(List<CheckOutcome> outcomes, PrintStream out) {
        int passed = 0;
        int failed = 0;
        for (CheckOutcome o : outcomes) {
            if (o.passed()) {
                passed++;
            } else {
                failed++;
            }
            out.printf("%-4s %-28s %-26s %-30s expected %-14s computed %-14s tolerance %s%s%n",
                    o.passed() ? "ok" : "FAIL", o.example(), o.source(), o.figure(), o.expected(), o.computed(),
                    o.tolerance(), o.message().isEmpty() ? "" : "  (" + o.message() + ")");
        }
        out.println(passed + " passed, " + failed + " failed");
        return failed == 0 && passed > 0 ? 0 : 1;
    }
}
