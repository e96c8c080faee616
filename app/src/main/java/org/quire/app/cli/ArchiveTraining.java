package org.quire.app.cli;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;

/**
 * The commands the build runs once, in one JVM started with {@code -XX:DumpLoadedClassList}, to list the classes
 * of Quire's class-data-sharing archive ({@code app/target/quire.jsa}; DEVELOPERS.md, "Start-up"). They are the
 * short runs of the command line a user types most: {@code evaluate} as text and JSON, {@code montecarlo} of a
 * worked example and of the gravimetric template, {@code batch} and {@code fit}. Every file they read is one the
 * jar ships, copied into a scratch folder that is removed afterwards, so the run needs nothing of the checkout.
 *
 * <p>Where there is a display, the same JVM then starts the workbench with the demo budget and waits for its first
 * paint and for the results painted after it ({@link WorkbenchStart}), so that the archive also holds the classes of
 * the workbench's start (measured:
 * content painted some 300 ms sooner); a workbench that cannot start, or does not paint within
 * {@link WorkbenchStart#LIMIT_SECONDS} s, only ends that part of the training.
 *
 * <p>The output of the commands is discarded; the exit status is 0 when every command ended with 0, 1 otherwise
 * (the build then keeps going without an archive: the archive only makes the start faster).
 */
public final class ArchiveTraining {
    /** The shipped template the Monte Carlo run of the user's path reads (README, the benchmark script). */
    static final String TEMPLATE = "templates/gravimetric-emf-flow-point.json";

    private ArchiveTraining() {
    }

    /** @param args none */
    public static void main(String[] args) throws IOException {
        Path dir = java.nio.file.Files.createTempDirectory("quire-archive-training");
        int failed = 0;
        try {
            for (List<String> command : commands(dir)) {
                failed += run(command) == CommandLine.OK ? 0 : 1;
            }
        } finally {
            removeAll(dir);
        }
        if (failed == 0 && !Boolean.getBoolean("java.awt.headless") && System.getenv("DISPLAY") != null) {
            WorkbenchStart.train();
        }
        System.exit(failed == 0 ? 0 : 1);
    }

    /** @return the commands of the training run, reading and writing only below {@code dir} */
    static List<List<String>> commands(Path dir) throws IOException {
        Path tour = dir.resolve("tour");
        Path template = dir.resolve("gravimetric-emf-flow-point.json");
        try (InputStream in = ArchiveTraining.class.getClassLoader().getResourceAsStream(TEMPLATE)) {
            if (in == null) {
                throw new IOException("the jar ships no " + TEMPLATE);
            }
            java.nio.file.Files.copy(in, template);
        }
        String t = tour.toString();
        return List.of(
                List.of("examples", t),
                List.of("evaluate", t + "/jcgm100-h1-end-gauge.json"),
                List.of("evaluate", t + "/jcgm100-h2-resistance-reactance.json", "--format", "json"),
                List.of("montecarlo", t + "/jcgm101-9.3-mass-calibration.json", "--trials", "20000", "--seed", "1"),
                List.of("montecarlo", template.toString(), "--trials", "20000"),
                List.of("batch", "tvfl-volumetric-proving-tank", t + "/tarrow-vale-tank-fleet.csv", "-o",
                        dir.resolve("results.csv").toString()),
                List.of("fit", t + "/iso-ts-28037-clause6-wls.csv", "--method", "WLS"));
    }

    private static int run(List<String> command) {
        PrintStream none = new PrintStream(OutputStream.nullOutputStream(), false, StandardCharsets.UTF_8);
        int status = CommandLine.run(command.toArray(new String[0]), none, none);
        if (status != CommandLine.OK) {
            System.err.println("quire archive training: 'quire " + String.join(" ", command) + "' ended with "
                    + status);
        }
        return status;
    }

    private static void removeAll(Path dir) throws IOException {
        try (java.util.stream.Stream<Path> s = java.nio.file.Files.walk(dir)) {
            for (Path p : s.sorted(java.util.Comparator.reverseOrder()).toList()) {
                java.nio.file.Files.delete(p);
            }
        }
    }

    /** The workbench part of the training, in a class of its own so that the commands load no AWT class. */
    static final class WorkbenchStart {
        /** The wait after the first paint for the results to come in and be painted. */
        static final long RESULTS_MILLIS = 1500;
        /** The longest wait for the workbench's first paint. */
        static final int LIMIT_SECONDS = 30;

        private WorkbenchStart() {
        }

        /** Starts the workbench with the demo budget and returns once its window has been painted, or on failure. */
        static void train() {
            try {
                org.quire.app.ui.Workbench.start(null, false);
                long until = System.nanoTime() + java.util.concurrent.TimeUnit.SECONDS.toNanos(LIMIT_SECONDS);
                while (System.nanoTime() < until) {
                    boolean[] painted = {false};
                    java.awt.EventQueue.invokeAndWait(() -> {
                        for (java.awt.Frame f : java.awt.Frame.getFrames()) {
                            if (f.isShowing() && f instanceof javax.swing.JFrame j) {
                                javax.swing.JRootPane root = j.getRootPane();
                                root.paintImmediately(0, 0, root.getWidth(), root.getHeight());
                                painted[0] = true;
                            }
                        }
                    });
                    if (painted[0]) {
                        // then the budget's results, charts and checklist, which come from the background a
                        // moment later, are painted too: their classes are what a start loads next
                        Thread.sleep(RESULTS_MILLIS);
                        java.awt.EventQueue.invokeAndWait(() -> {
                            for (java.awt.Frame f : java.awt.Frame.getFrames()) {
                                if (f.isShowing() && f instanceof javax.swing.JFrame j) {
                                    j.getRootPane().paintImmediately(j.getRootPane().getBounds());
                                }
                            }
                        });
                        return;
                    }
                    Thread.sleep(100);
                }
                System.err.println("quire archive training: the workbench did not paint within " + LIMIT_SECONDS
                        + " s; the archive holds the commands' classes only");
            } catch (Exception | Error e) { // no display library, no display: the commands' archive stands
                System.err.println("quire archive training: the workbench could not start (" + e
                        + "); the archive holds the commands' classes only");
            }
        }
    }
}
