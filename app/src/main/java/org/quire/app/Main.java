package org.quire.app;

import java.nio.file.Path;
import java.nio.file.Paths;
import org.quire.app.ui.Workbench;

/**
 * Entry point of the quire jar. Without arguments it opens the workbench with the demo budget;
 * {@code quire open [--review] FILE} or a single {@code .json} path opens that budget in the workbench;
 * every other command runs on the command line.
 */
public final class Main {
    private Main() {
    }

    public static void main(String[] args) {
        if (args.length == 0) {
            Workbench.start(null, false);
            return;
        }
        if (args[0].equals("open")) {
            boolean review = args.length == 3 && args[1].equals("--review");
            if (args.length != 2 && !review) {
                System.err.println("quire: usage: quire open [--review] FILE");
                System.exit(2);
            }
            Workbench.start(path(args[args.length - 1]), review);
            return;
        }
        if (args.length == 1 && args[0].endsWith(".json")) {
            Workbench.start(path(args[0]), false);
            return;
        }
        System.exit(org.quire.app.cli.CommandLine.run(args, System.out, System.err));
    }

    private static Path path(String name) {
        try {
            return Paths.get(name);
        } catch (java.nio.file.InvalidPathException e) {
            System.err.println("quire: '" + name + "' is not a valid file name");
            System.exit(2);
            return null;
        }
    }
}
