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
            "  " + FitCommand.USAGE,
            "      fit a straight line to a calibration CSV (columns x, y, u_x, u_y): parameters, chi-squared",
            "      check, standardized residuals; x for a new indication, y at a given x",
            "  " + RangeCommand.USAGE,
            "      the budget at each of its flow points: y, u, U, relative U, the correlation of the point",
            "      results and, with maximum permissible errors in the file, the conformity decisions",
            "  " + ValidateCommand.USAGE,
            "      check Quire against the published worked examples",
            "  " + MonteCarloCommand.USAGE,
            "      the Monte Carlo method (JCGM 101) and its comparison with the GUM result",
            "  " + BenchCommand.USAGE,
            "      Monte Carlo throughput on the Tarrow Vale benchmark budget",
            "  quire open [--review] FILE",
            "      open a budget in the workbench (read-only with --review); no arguments opens the demo",
            "  " + ReportCommand.USAGE,
            "      the report of a budget as PDF or HTML (by the extension), and/or every table of it as one",
            "      CSV file each in the folder DIR; the header shows the document's laboratory, device,",
            "      author, revision, status and content hash; calibration lines, flow range and conformity",
            "      are added when the budget has them; --mc adds the Monte Carlo method (JCGM 101);",
            "      --against adds the changes from an earlier budget",
            "  " + ReviewCommand.USAGE,
            "      the assessor's automatic checklist; exit 1 when an item is not met. --decide records the",
            "      assessor's decision in the document's history (endorse: approved; send-back: draft) and",
            "      saves the file; endorsing is refused while an item not met or to confirm is unmarked",
            "  " + DiffCommand.USAGE,
            "      what changed from budget A to budget B, or from approved revision N of FILE to its",
            "      current content, and the effect on each U; exit 1 when they differ",
            "  " + BatchCommand.USAGE,
            "      evaluate a template for every row of a CSV file of parameter values",
            "  " + CalibrationCommand.USAGE,
            "      a meter's calibration across its range: build it from a method template, the rig's runs and a job",
            "      file; evaluate it (per run, per point, adjustment, as found and as left, conformity, CMC);",
            "      evaluate a fleet of meters' runs in one CSV file (a meter column) in parallel",
            "  " + TemplateCommand.USAGE,
            "      the template library: list it, make a budget from a template, publish to the team, check for a newer version",
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
                case "fit":
                    return FitCommand.run(args, out);
                case "range":
                    return RangeCommand.run(args, out);
                case "validate":
                    return ValidateCommand.run(args, out);
                case "montecarlo":
                    return MonteCarloCommand.run(args, out, err);
                case "bench":
                    return BenchCommand.run(args, out);
                case "report":
                    return ReportCommand.run(args, out);
                case "review":
                    return ReviewCommand.run(args, out);
                case "diff":
                    return DiffCommand.run(args, out);
                case "batch":
                    return BatchCommand.run(args, err);
                case "calibration":
                    return CalibrationCommand.run(args, out, err);
                case "template":
                    return TemplateCommand.run(args, out, err);
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
