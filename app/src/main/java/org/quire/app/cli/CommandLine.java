package org.quire.app.cli;

import java.io.PrintStream;
import org.quire.engine.io.EngineVersion;

/**
 * The {@code quire} command line. Exit status: 0 success, 1 a check or comparison failed, 2 bad input or
 * usage. User errors print a message that says where and why, never a stack trace.
 */
public final class CommandLine {
    static final String HELP = String.join("\n",
            "Quire " + EngineVersion.get() + " - measurement-uncertainty budgets for flow metrology",
            "",
            "usage:",
            "  " + EvaluateCommand.USAGE,
            "      the GUM budget table and results of every output",
            "  " + ValidateCommand.USAGE,
            "      check Quire against the published worked examples",
            "  " + BatchCommand.USAGE,
            "      evaluate a template for every row of a CSV file of parameter values",
            "  quire version",
            "  quire help",
            "");

    private CommandLine() {
    }

    /** Runs one command; returns the exit status. */
    public static int run(String[] args, PrintStream out, PrintStream err) {
        if (args.length == 0) {
            err.print(HELP);
            return 2;
        }
        try {
            switch (args[0]) {
                case "evaluate":
                    return EvaluateCommand.run(args, out);
                case "validate":
                    return ValidateCommand.run(args, out);
                case "batch":
                    return BatchCommand.run(args, err);
                case "version":
                case "--version":
                    out.println("quire " + EngineVersion.get());
                    return 0;
                case "help":
                case "--help":
                case "-h":
                    out.print(HELP);
                    return 0;
                default:
                    throw new UsageException("unknown command '" + args[0] + "'\n" + HELP);
            }
        } catch (UsageException e) {
            err.println("quire: " + e.getMessage());
            return 2;
        } catch (Files.FileProblem e) {
            err.println(e.getMessage());
            return 2;
        } catch (java.io.IOException e) {
            err.println("quire: " + e.getMessage());
            return 2;
        } catch (Exception e) {
            err.println("quire: internal error: " + e);
            return 3;
        }
    }
}
