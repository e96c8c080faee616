package org.quire.app;

import java.awt.AWTError;
import java.awt.HeadlessException;
import java.nio.file.Path;
import org.quire.app.cli.CommandLine;
import org.quire.app.cli.Terminal;
import org.quire.app.ui.Workbench;

/**
 * Entry point of the quire jar and of the installed {@code quire} launcher. Without arguments it opens the
 * workbench with the demo budget ({@code quire open}); a single {@code .json} path opens that budget; every other
 * command runs on the command line ({@link CommandLine}).
 *
 * <p>This class names no Swing or AWT type: a command-line run loads no class of {@code java.desktop} (verifying
 * a method that catches {@code AWTError} loads that class and its module). The workbench is reached through
 * {@link Desktop}, loaded only when the workbench opens.
 */
public final class Main {
    private Main() {
    }

    public static void main(String[] args) {
        String[] words = args;
        if (args.length == 0 && Desktop.available()) {
            // the workbench with the demo budget: nothing to parse, so the command line is not built
            // (without a display, 'quire open' below says so)
            Desktop.open(null, false);
            return;
        }
        if (args.length == 0) {
            words = new String[] {"open"};
        } else if (args.length == 1 && args[0].endsWith(".json") && !args[0].startsWith("-")) {
            words = new String[] {"open", args[0]};
        }
        boolean[] opened = {false};
        int status = CommandLine.run(words, Terminal.out(), Terminal.err(),
                (file, review) -> opened[0] = Desktop.open(file, review));
        if (!opened[0]) {
            Terminal.drain(); // output that ends without a line end, on a terminal that needs ASCII forms
            System.exit(status);
        }
    }

    /** The workbench side of {@code quire open}: the only place of the entry point that touches AWT. */
    private static final class Desktop {
        private Desktop() {
        }

        /** @return whether a display may be reached (the JVM is not headless) */
        static boolean available() {
            return !java.awt.GraphicsEnvironment.isHeadless();
        }

        /** Starts the workbench; without a display it stops the program with exit status 2. @return true */
        static boolean open(Path file, boolean review) {
            try {
                Workbench.start(file, review);
                return true;
            } catch (AWTError | HeadlessException e) {
                System.err.println("quire open: the workbench cannot reach a display (" + e.getMessage()
                        + "); the other commands work without one: see 'quire --help'");
                System.exit(CommandLine.USER_ERROR);
                return false;
            }
        }
    }
}
