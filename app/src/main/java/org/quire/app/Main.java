package org.quire.app;

/** Entry point of the quire jar: the command line, or the workbench when started without a command. */
public final class Main {
    private Main() {
    }

    public static void main(String[] args) {
        System.exit(org.quire.app.cli.CommandLine.run(args, System.out, System.err));
    }
}
