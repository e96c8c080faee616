package org.quire.app.cli;

import java.io.PrintStream;
import java.util.concurrent.Callable;
import org.quire.engine.io.EngineVersion;
import picocli.CommandLine.Command;
import picocli.CommandLine.IVersionProvider;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/** The root {@code quire} command: its subcommands, the version, and the streams every command writes to. */
@Command(name = "quire", mixinStandardHelpOptions = true, versionProvider = QuireCommand.Version.class,
        synopsisSubcommandLabel = "COMMAND",
        description = {"Measurement-uncertainty budgets for flow metrology (JCGM 100 GUM, JCGM 101 Monte Carlo).",
            "Without a command, or with a budget file, the workbench opens."},
        footerHeading = "%n",
        footer = {"Exit status: " + CommandLine.EXIT_STATUS_TEXT,
            "",
            "'quire help COMMAND' or 'quire COMMAND --help' shows a command's options and examples;",
            "'quire help model', 'quire help units' and 'quire help functions' the model language.",
            "",
            "Results support, and do not replace, the laboratory's accredited procedure and qualified review."})
final class QuireCommand implements Callable<Integer> {
    /**
     * The subcommands, in the order of the help. They are registered by {@link CommandLine#parser}: all of them for
     * help, completion and suggestions, only the one named for an ordinary run (picocli reads each command's
     * annotations when it is registered, which costs a noticeable part of a short command's start).
     */
    static final java.util.List<Class<?>> SUBCOMMANDS = java.util.List.of(EvaluateCommand.class,
            MonteCarloCommand.class, RangeCommand.class, FitCommand.class, CalibrationCommand.class,
            CertificateCommand.class, ReportCommand.class, ReviewCommand.class, DiffCommand.class,
            TemplateCommand.class, BatchCommand.class, ValidateCommand.class, ExamplesCommand.class,
            BenchCommand.class, OpenCommand.class, HelpCommand.class, CompletionCommand.class,
            QuireCommand.VersionCommand.class);

    final PrintStream out;
    final PrintStream err;
    final CommandLine.WorkbenchLauncher launcher;
    /** The engine configuration every subcommand evaluates with. */
    final org.quire.app.common.Engine engine;

    @Spec
    CommandSpec spec;

    QuireCommand(PrintStream out, PrintStream err, CommandLine.WorkbenchLauncher launcher,
            org.quire.app.common.Engine engine) {
        this.engine = java.util.Objects.requireNonNull(engine, "engine");
        this.out = out;
        this.err = err;
        this.launcher = launcher;
    }

    @Override
    public Integer call() {
        spec.commandLine().usage(spec.commandLine().getErr());
        return CommandLine.USER_ERROR;
    }

    /** The version line of {@code quire --version}. */
    static final class Version implements IVersionProvider {
        @Override
        public String[] getVersion() {
            return new String[] {"quire " + EngineVersion.get(), "Java " + System.getProperty("java.version")
                    + " (" + System.getProperty("java.vendor", "") + ")"};
        }
    }

    /** {@code quire version}: the same as {@code quire --version}. */
    @Command(name = "version", mixinStandardHelpOptions = true, description = "Print the version of Quire and Java.",
            footerHeading = "%nExamples:%n", footer = {"  quire version", "  quire --version"})
    static final class VersionCommand implements Callable<Integer> {
        @Spec
        CommandSpec spec;

        @Override
        public Integer call() {
            java.io.PrintWriter out = spec.commandLine().getOut();
            for (String line : new Version().getVersion()) {
                out.println(line);
            }
            out.flush();
            return CommandLine.OK;
        }
    }
}
