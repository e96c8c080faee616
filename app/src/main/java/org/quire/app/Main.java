package org.quire.app;

import java.awt.AWTError;
import java.awt.HeadlessException;
import org.quire.app.cli.CommandLine;
import org.quire.app.cli.Terminal;
import org.quire.app.ui.Workbench;

/**
 * Entry point of the quire jar and of the installed {@code quire} launcher. Without arguments it opens the
 * workbench with the demo budget ({@code quire open}); a single {@code .json} path opens that budget; every other
 * command runs on the command line ({@link CommandLine}).
 */
public final class Main {
    private Main() {
    }

    public static void main(String[] args) {
        String[] words = args;
        if (args.length == 0 && !java.awt.GraphicsEnvironment.isHeadless()) {
            // the workbench with the demo budget: nothing to parse, so the command line is not built
            // (without a display, 'quire open' below says so)
            try {
                Workbench.start(null, false);
                return;
            } catch (AWTError | HeadlessException e) {
                System.err.println(noDisplay(e));
                System.exit(CommandLine.USER_ERROR);
            }
        }
        if (args.length == 0) {
            words = new String[] {"open"};
        } else if (args.length == 1 && args[0].endsWith(".json") && !args[0].startsWith("-")) {
            words = new String[] {"open", args[0]};
        }
        boolean[] opened = {false};
        int status = CommandLine.run(words, Terminal.out(), Terminal.err(), (file, review) -> {
            try {
                Workbench.start(file, review);
                opened[0] = true;
            } catch (AWTError | HeadlessException e) {
                System.err.println(noDisplay(e));
                System.exit(CommandLine.USER_ERROR);
            }
        });
        if (!opened[0]) {
            System.exit(status);
        }
    }

    private static String noDisplay(Throwable e) {
        return "quire open: the workbench cannot reach a display (" + e.getMessage()
                + "); the other commands work without one: see 'quire --help'";
    }
}
