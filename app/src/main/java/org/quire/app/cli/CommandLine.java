package org.quire.app.cli;

import org.quire.app.common.Engine;

import java.io.PrintStream;
import java.io.PrintWriter;
import java.nio.file.Path;

/**
 * The {@code quire} command line, parsed by picocli. Every command answers {@code --help} with its own usage and
 * examples; {@code quire help COMMAND} gives the same, {@code quire help model|units|functions} the reference of
 * the model language, and {@code -V}/{@code --version} the version.
 *
 * <p>Exit status, one place for all commands: {@link #OK} 0 success, {@link #CHECK_FAILED} 1 a check or
 * comparison failed, {@link #USER_ERROR} 2 bad input or usage (the message says which file, field, line or
 * column and why, never a stack trace; also when rows of a batch or meters of a fleet were refused, whose
 * results for the others are still written), {@link #BUG} 3 an internal error (a bug in Quire).
 *
 * <p>The command classes only read their options and ask the engine; each call builds a new parser, so calls on
 * different threads do not share state.
 */
public final class CommandLine {
    /** The exit statuses in words, as the help and the manual page give them (compile-time constant). */
    public static final String EXIT_STATUS_TEXT = "0 success; 1 a check failed or budgets differ; 2 bad input or "
            + "usage, also rows of a batch or meters of a fleet refused (the message names the file and the field, "
            + "line or column); 3 an internal error (a bug).";

    /** Exit status of a successful command. */
    public static final int OK = 0;
    /** Exit status when a check failed or budgets differ. */
    public static final int CHECK_FAILED = 1;
    /** Exit status of a user error: bad input file, option or argument. */
    public static final int USER_ERROR = 2;
    /** Exit status of an internal error, which is a bug. */
    public static final int BUG = 3;

    /** Opens the workbench for {@code quire open}; the command line itself never touches Swing. */
    @FunctionalInterface
    public interface WorkbenchLauncher {
        /**
         * @param file the budget to open, or null for the demo budget
         * @param review whether the budget opens read-only for an assessor
         */
        void open(Path file, boolean review);
    }

    private static final WorkbenchLauncher NO_WORKBENCH = (file, review) -> {
        throw new IllegalStateException("no workbench launcher in this call");
    };

    /**
     * picocli registers its converters for the {@code java.sql} and {@code java.time} types by reflection when the
     * first parser is built, which loads the {@code java.sql} module and some 40 classes on every start. No option
     * of Quire has such a type without its own converter ({@link Options.IsoDate} reads every date), so they are
     * left out; a value set by the user (the same system property) is kept.
     */
    static final String CONVERTER_EXCLUDES = "java\\.sql\\..*,java\\.time\\..*";

    static {
        if (System.getProperty("picocli.converters.excludes") == null) {
            System.setProperty("picocli.converters.excludes", CONVERTER_EXCLUDES);
        }
    }

    private CommandLine() {
    }

    /** Runs one command with no workbench (as tests and scripts do); returns the exit status. */
    public static int run(String[] args, PrintStream out, PrintStream err) {
        return run(args, out, err, NO_WORKBENCH);
    }

    /** Runs one command; {@code quire open} hands over to {@code launcher}. @return the exit status */
    public static int run(String[] args, PrintStream out, PrintStream err, WorkbenchLauncher launcher) {
        return run(args, out, err, launcher, Engine.standard());
    }

    /**
     * Runs one command with that engine configuration: every evaluation, Monte Carlo run, review and report of the
     * command compiles the model with its function set. @return the exit status
     */
    public static int run(String[] args, PrintStream out, PrintStream err, WorkbenchLauncher launcher,
            Engine engine) {
        picocli.CommandLine cmd = parser(out, err, launcher, args.length > 0 ? args[0] : null, engine);
        int status;
        try {
            status = cmd.execute(args);
        } catch (StackOverflowError | OutOfMemoryError e) {
            // every input limit is checked with a message before this could happen; reaching here is a bug
            err.println("quire: internal error (a bug in Quire; please report it with the command and file): "
                    + (e instanceof StackOverflowError ? "stack overflow" : "out of memory: " + e.getMessage()));
            status = BUG;
        } finally {
            cmd.getOut().flush();
            cmd.getErr().flush();
            out.flush();
            err.flush();
        }
        return status;
    }

    /** @return the parser of the whole command line, for help, man pages and shell completion */
    static picocli.CommandLine parser(PrintStream out, PrintStream err, WorkbenchLauncher launcher) {
        return parser(out, err, launcher, null, Engine.standard());
    }

    /**
     * @param only the name of the one subcommand to register, or null for all; a name that is not an ordinary
     *     subcommand (help, completion, an option, a file, a misspelling) registers all, so that help and
     *     suggestions see the whole tree
     */
    private static picocli.CommandLine parser(PrintStream out, PrintStream err, WorkbenchLauncher launcher,
            String only, Engine engine) {
        QuireCommand root = new QuireCommand(out, err, launcher, engine);
        picocli.CommandLine cmd = new picocli.CommandLine(root);
        Class<?> single = null;
        if (only != null && !only.equals("help") && !only.equals("completion")) {
            for (Class<?> c : QuireCommand.SUBCOMMANDS) {
                if (c.getAnnotation(picocli.CommandLine.Command.class).name().equals(only)) {
                    single = c;
                }
            }
        }
        for (Class<?> c : QuireCommand.SUBCOMMANDS) {
            if (single == null || c == single) {
                cmd.addSubcommand(c);
            }
        }
        cmd.setOut(new PrintWriter(out, true));
        cmd.setErr(new PrintWriter(err, true));
        cmd.setCaseInsensitiveEnumValuesAllowed(true);
        cmd.setUsageHelpWidth(100);
        cmd.setUsageHelpLongOptionsMaxWidth(28);
        cmd.setParameterExceptionHandler(CommandLine::badUsage);
        cmd.setExecutionExceptionHandler((e, c, parsed) -> failure(e, c, err));
        cmd.setExitCodeExceptionMapper(e -> BUG);
        versionEverywhere(cmd);
        return cmd;
    }

    /** Gives every command and action the version of {@code quire --version}, for its own {@code -V}. */
    private static void versionEverywhere(picocli.CommandLine c) {
        for (picocli.CommandLine sub : c.getSubcommands().values()) {
            sub.getCommandSpec().versionProvider(new QuireCommand.Version());
            versionEverywhere(sub);
        }
    }

    private static int badUsage(picocli.CommandLine.ParameterException e, String[] args) {
        picocli.CommandLine c = e.getCommandLine();
        PrintWriter w = c.getErr();
        String message = String.valueOf(e.getMessage())
                .replaceFirst("^Invalid value for option '([^']+)': ", "$1 ")
                .replaceFirst("^Invalid value for positional parameter at index \\d+ \\(([^)]+)\\): ", "$1 ");
        w.println(c.getCommandSpec().qualifiedName() + ": " + message);
        picocli.CommandLine.UnmatchedArgumentException.printSuggestions(e, w);
        w.println("Try '" + c.getCommandSpec().qualifiedName() + " --help' for its usage and examples.");
        w.flush();
        return USER_ERROR;
    }

    /** Maps an exception a command threw to a message and the exit status. */
    private static int failure(Exception e, picocli.CommandLine c, PrintStream err) {
        c.getOut().flush();
        if (e instanceof UsageException) {
            err.println(c.getCommandSpec().qualifiedName() + ": " + e.getMessage());
            return USER_ERROR;
        }
        if (e instanceof Files.FileProblem) {
            err.println(e.getMessage());
            return USER_ERROR;
        }
        if (e instanceof java.io.IOException) {
            err.println("quire: " + e.getMessage());
            return USER_ERROR;
        }
        err.println("quire: internal error (a bug in Quire; please report it with the command and file): " + e);
        StackTraceElement[] where = e.getStackTrace();
        for (int i = 0; i < Math.min(6, where.length); i++) {
            err.println("    at " + where[i]);
        }
        return BUG;
    }
}
