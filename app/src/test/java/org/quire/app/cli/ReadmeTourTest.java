package org.quire.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.File;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The README's command-line tour runs as written: every line of it, in order, as its own program (a new JVM
 * with the program's class path, as the installed launcher starts it) in an empty folder that is not the
 * checkout, exiting with the status the line's comment states (0 unless it says "exit N").
 */
class ReadmeTourTest {
    private static final Pattern EXIT = Pattern.compile("exit (\\d)");

    @TempDir
    Path folder;

    /** One line of the tour: the words after {@code quire}, and the exit status it documents. */
    record Line(String text, List<String> words, int status) { }

    static List<Line> tour(String readme) {
        int start = readme.indexOf("A tour that runs as written");
        assertTrue(start >= 0, "the README has its tour");
        List<Line> lines = new ArrayList<>();
        boolean inBlock = false;
        for (String l : readme.substring(start).split("\n")) {
            if (l.startsWith("    quire ")) {
                inBlock = true;
                String command = l.strip();
                String comment = "";
                int hash = command.indexOf("  #");
                if (hash >= 0) {
                    comment = command.substring(hash);
                    command = command.substring(0, hash).strip();
                }
                Matcher m = EXIT.matcher(comment);
                List<String> words = words(command);
                lines.add(new Line(command, words.subList(1, words.size()), m.find() ? Integer.parseInt(m.group(1)) : 0));
            } else if (inBlock && !l.isBlank()) {
                break;
            }
        }
        return lines;
    }

    /** Splits a command line into words as a POSIX shell does for plain words and double quotes. */
    static List<String> words(String line) {
        List<String> out = new ArrayList<>();
        StringBuilder w = new StringBuilder();
        boolean quoted = false;
        boolean any = false;
        for (char c : line.toCharArray()) {
            if (c == '"') {
                quoted = !quoted;
                any = true;
            } else if (c == ' ' && !quoted) {
                if (any) {
                    out.add(w.toString());
                }
                w.setLength(0);
                any = false;
            } else {
                w.append(c);
                any = true;
            }
        }
        if (any) {
            out.add(w.toString());
        }
        return out;
    }

    @Test
    void everyLineOfTheTourRunsAsWrittenOutsideTheCheckout() throws Exception {
        Path root = CommandLineTest.root().toAbsolutePath().normalize();
        assertFalse(folder.toAbsolutePath().startsWith(root), "the tour runs outside the checkout");
        List<Line> tour = tour(Files.readString(root.resolve("README.md")));
        assertTrue(tour.size() >= 12, "the tour has its lines: " + tour);
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        for (Line line : tour) {
            List<String> cmd = new ArrayList<>(List.of(java, "-Djava.awt.headless=true", "-cp",
                    System.getProperty("java.class.path"), "org.quire.app.Main"));
            cmd.addAll(line.words());
            Path out = folder.resolve(".out.txt");
            Path err = folder.resolve(".err.txt");
            Process p = new ProcessBuilder(cmd).directory(folder.toFile())
                    .redirectOutput(out.toFile()).redirectError(err.toFile()).start();
            assertTrue(p.waitFor(300, TimeUnit.SECONDS), "finishes within 5 minutes: " + line.text());
            String stderr = Files.readString(err, StandardCharsets.UTF_8);
            String stdout = Files.readString(out, StandardCharsets.UTF_8);
            assertEquals(line.status(), p.exitValue(), line.text() + "\n" + stderr + stdout);
            assertFalse(stderr.contains("Exception"), line.text() + ": " + stderr);
        }
        // what the tour said it made
        assertTrue(Files.size(folder.resolve("report.pdf")) > 1000);
        assertTrue(Files.readString(folder.resolve("results.csv")).lines().count() == 5, "4 meters and a header");
        assertTrue(new File(folder.toFile(), "tank.json").isFile());
    }
}
