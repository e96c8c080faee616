package org.quire.app.cli;

import java.io.PrintStream;

/** The {@code quire} command line. */
public final class CommandLine {
    private CommandLine() {
    }

    public static int run(String[] args, PrintStream out, PrintStream err) {
        out.println("quire");
        return 0;
    }
}
