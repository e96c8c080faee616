package org.quire.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/** Every command and action answers --help with its own usage and examples, as command-line tools do. */
class CommandHelpTest {
    @TempDir
    Path tmp;

    record Run(int status, String out, String err) { }

    static Run run(String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int status = CommandLine.run(args, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8), (file, review) -> {
                    throw new AssertionError("the workbench must not open for " + String.join(" ", args));
                });
        return new Run(status, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    /** @return every command path: "evaluate", "template new", ... (from the parser, so none is forgotten) */
    static Stream<String> commands() {
        List<String> all = new ArrayList<>();
        collect(CommandLine.parser(System.out, System.err, (f, r) -> { }), "", all);
        return all.stream();
    }

    private static void collect(picocli.CommandLine c, String prefix, List<String> all) {
        for (var e : c.getSubcommands().entrySet()) {
            String path = (prefix + " " + e.getKey()).strip();
            all.add(path);
            collect(e.getValue(), path, all);
        }
    }

    @Test
    void theCommandsOfTheIssueAreAllThere() {
        List<String> names = commands().toList();
        for (String c : List.of("evaluate", "montecarlo", "fit", "range", "report", "review", "diff", "batch",
                "template", "template list", "template new", "template publish", "template check", "validate",
                "bench", "open", "help", "version", "completion", "examples")) {
            assertTrue(names.contains(c), c + " in " + names);
        }
    }

    @ParameterizedTest
    @MethodSource("commands")
    void everyCommandAnswersHelpWithItsOwnUsageAndExamples(String command) {
        List<String> words = new ArrayList<>(List.of(command.split(" ")));
        words.add("--help");
        Run r = run(words.toArray(String[]::new));
        assertEquals(0, r.status(), r.err());
        assertTrue(r.out().startsWith("Usage: quire " + command + " "), r.out());
        assertTrue(r.out().contains("Examples:\n  quire " + command.split(" ")[0]), r.out());
        assertEquals("", r.err());
        Run h = run(("help " + command).split(" "));
        assertEquals(0, h.status(), h.err());
        assertEquals(r.out(), h.out(), "'quire help " + command + "' is the same as '--help'");
        Run shortForm = run((command + " -h").split(" "));
        assertEquals(r.out(), shortForm.out());
    }

    @Test
    void openHelpDoesNotOpenAFileNamedHelp() {
        Run r = run("open", "--help");
        assertEquals(0, r.status(), r.err());
        assertTrue(r.out().startsWith("Usage: quire open"), r.out());
    }

    @Test
    void versionAnswersToBothSpellings() {
        Run a = run("--version");
        Run b = run("-V");
        Run c = run("version");
        assertEquals(0, a.status());
        assertTrue(a.out().matches("(?s)quire \\d+\\.\\d+\\.\\d+.*"), a.out());
        assertEquals(a.out(), b.out());
        assertEquals(a.out(), c.out());
        assertEquals(a.out(), run("evaluate", "-V").out());
    }

    @Test
    void unknownCommandsAndOptionsAreUserErrorsWithASuggestion() {
        Run r = run("evalute", "x.json");
        assertEquals(2, r.status());
        assertTrue(r.err().contains("evaluate"), "suggests the nearest command: " + r.err());
        Run o = run("montecarlo", "x.json", "--trails", "10");
        assertEquals(2, o.status());
        assertTrue(o.err().contains("--trials") && o.err().contains("quire montecarlo --help"), o.err());
        Run none = run();
        assertEquals(2, none.status());
        assertTrue(none.err().startsWith("Usage: quire"), none.err());
    }

    @Test
    void sharedOptionsHaveOneNameEverywhere() {
        // common practice: one spelling of an option across all commands of a tool
        for (String c : List.of("montecarlo", "batch", "report", "review")) {
            String help = run(c, "--help").out();
            assertTrue(help.contains("--trials=N") && help.contains("--seed=S"), c + ": " + help);
        }
        for (String c : List.of("report", "batch", "template new")) {
            assertTrue(run((c + " --help").split(" ")).out().contains("-o, --output="), c);
        }
        for (String c : List.of("evaluate", "montecarlo")) {
            assertTrue(run(c, "--help").out().contains("--coverage=P"), c);
        }
        for (String c : List.of("evaluate", "montecarlo", "range")) {
            assertTrue(run(c, "--help").out().contains("--format=FORMAT"), c);
        }
    }

    @Test
    void manPagesAreWrittenForEveryCommand() throws Exception {
        Run r = run("help", "--man", tmp.toString());
        assertEquals(0, r.status(), r.err());
        long pages;
        try (Stream<Path> s = Files.list(tmp)) {
            pages = s.count();
        }
        assertEquals(commands().count() + 1, pages, r.out());
        String page = Files.readString(tmp.resolve("quire-template-new.1"));
        assertTrue(page.startsWith(".TH QUIRE-TEMPLATE-NEW 1 "), page);
        assertTrue(page.contains(".SH SYNOPSIS") && page.contains(".SH OPTIONS") && page.contains(".SH EXAMPLES")
                && page.contains(".SH EXIT STATUS") && page.contains("\\-\\-set"), page);
        assertTrue(page.contains("do not replace"), "the cautions are on every page");
        assertTrue(Files.readString(tmp.resolve("quire.1")).contains(".SH COMMANDS"));
    }

    @Test
    void shellCompletionKnowsEveryCommandAndOption() {
        Run r = run("completion");
        assertEquals(0, r.status(), r.err());
        assertTrue(r.out().contains("complete -F"), "a bash completion script");
        for (String word : List.of("evaluate", "montecarlo", "template", "--trials", "--higher-order")) {
            assertTrue(r.out().contains(word), word);
        }
    }

    @Test
    void theModelReferenceComesWithTheCautions() {
        for (String topic : HelpCommand.TOPICS) {
            Run r = run("help", topic);
            assertEquals(0, r.status(), r.err());
            assertTrue(r.out().contains("do not replace, the laboratory's accredited procedure"), topic);
        }
        Run f = run("help", "functions");
        // the flow functions of the engine's library, each with its own description
        assertTrue(f.out().contains("water_density(t[, p])"), f.out());
        assertTrue(f.out().contains("sqrt(x)"), f.out());
        Run bad = run("help", "colours");
        assertEquals(2, bad.status());
        assertTrue(bad.err().contains("no command or topic 'colours'"), bad.err());
    }

    @Test
    void theWorkbenchIsRefusedWithoutADisplayAsAUserError() throws Exception {
        // issue: a start without a display printed a stack trace and exited 0. Run a separate JVM with no
        // display at all (DISPLAY removed, headless), the way a user on a server would start it.
        String javaExe = java.nio.file.Path.of(System.getProperty("java.home"), "bin", "java").toString();
        ProcessBuilder pb = new ProcessBuilder(javaExe, "-Djava.awt.headless=true", "-cp",
                System.getProperty("java.class.path"), "org.quire.app.Main", "open");
        pb.environment().remove("DISPLAY");
        pb.environment().remove("WAYLAND_DISPLAY");
        pb.redirectOutput(ProcessBuilder.Redirect.DISCARD);
        Process p = pb.start();
        String err = new String(p.getErrorStream().readAllBytes(), java.nio.charset.StandardCharsets.UTF_8);
        assertTrue(p.waitFor(60, java.util.concurrent.TimeUnit.SECONDS), "the JVM did not end");
        assertEquals(2, p.exitValue(), err);
        assertTrue(err.contains("needs a graphical display"), err);
        assertFalse(err.contains("Exception"), err);
        assertFalse(err.contains("\tat "), err);
    }
}
