package org.quire.app.cli;

import java.awt.GraphicsEnvironment;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;

/** {@code quire open [--review] [FILE]}: a budget in the workbench; without FILE the Tarrow Vale demo budget. */
@Command(name = "open", mixinStandardHelpOptions = true,
        description = {"Open a budget in the workbench (read-only with --review, for an assessor). Without FILE the "
                + "demo budget of the fictional Tarrow Vale Flow Laboratory opens.",
            "The workbench needs a graphical display; without one this command stops with exit status 2."},
        footerHeading = "%nExamples:%n",
        footer = {"  quire open budget.json", "  quire open --review budget.json", "  quire open"})
final class OpenCommand implements Callable<Integer> {
    /** The message when there is no display to show the workbench on. */
    static final String NO_DISPLAY = "the workbench needs a graphical display and there is none (no DISPLAY, or "
            + "Java runs headless); the other commands work without one: see 'quire --help'";

    @ParentCommand
    QuireCommand quire;

    @Option(names = "--review", description = "open read-only, for an assessor's review")
    boolean review;

    @Parameters(paramLabel = "FILE", arity = "0..1", description = "the budget file (JSON)")
    String file;

    @Override
    public Integer call() throws UsageException {
        Path p = file == null ? null : Files.path(file);
        if (p != null && !java.nio.file.Files.isRegularFile(p)) {
            throw new UsageException(java.nio.file.Files.isDirectory(p) ? "'" + file + "' is a folder, not a budget file"
                    : "no such file: " + file);
        }
        if (GraphicsEnvironment.isHeadless()) {
            throw new UsageException(NO_DISPLAY);
        }
        quire.launcher.open(p, review);
        return CommandLine.OK;
    }
}
