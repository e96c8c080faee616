package org.quire.app.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import org.quire.app.common.LanguageHelp;
import org.quire.engine.model.LanguageReference;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code quire help [COMMAND... | model | units | functions] [--man DIR]}: a command's help, the reference of the
 * model language generated from the engine's own tables ({@link LanguageReference}), or the manual pages of every
 * command written to a folder.
 */
@Command(name = "help", helpCommand = true, mixinStandardHelpOptions = true,
        description = {"Help on a command (the same as 'quire COMMAND --help'), or the reference of the model "
                + "language: 'model' (how a model is written), 'units' (every unit and prefix the unit checker "
                + "knows) or 'functions' (every function a model may call).",
            "With --man DIR: the manual page of every command, in man(7) format, written to DIR."},
        footerHeading = "%nExamples:%n",
        footer = {"  quire help evaluate", "  quire help template new", "  quire help functions",
            "  quire help --man man/  &&  man -l man/quire-evaluate.1"})
final class HelpCommand implements Callable<Integer> {
    /** The reference topics, in the order listed. */
    static final List<String> TOPICS = LanguageHelp.TOPICS;

    @Spec
    CommandSpec spec;

    @picocli.CommandLine.ParentCommand
    QuireCommand quire;

    @Parameters(paramLabel = "TOPIC", arity = "0..*",
            description = "a command (with its action, as in 'template new'), or model, units or functions")
    List<String> topic = new ArrayList<>();

    @Option(names = "--man", paramLabel = "DIR", description = "write the manual pages of every command to DIR")
    String man;

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        picocli.CommandLine root = spec.root().commandLine();
        if (man != null) {
            if (!topic.isEmpty()) {
                throw new UsageException("--man writes every command's page; give no TOPIC with it");
            }
            Path dir = Files.path(man);
            List<Path> pages = ManPages.write(root, dir);
            out.println("wrote " + pages.size() + " manual pages to " + dir);
            return CommandLine.OK;
        }
        if (topic.isEmpty()) {
            root.usage(out);
            return CommandLine.OK;
        }
        if (topic.size() == 1 && TOPICS.contains(topic.get(0))) {
            out.print(LanguageHelp.text(topic.get(0), quire.engine));
            out.flush();
            return CommandLine.OK;
        }
        picocli.CommandLine c = root;
        for (String word : topic) {
            picocli.CommandLine sub = c.getSubcommands().get(word);
            if (sub == null) {
                throw new UsageException("no command or topic '" + String.join(" ", topic) + "'; commands: "
                        + String.join(", ", root.getSubcommands().keySet()) + "; topics: " + String.join(", ", TOPICS));
            }
            c = sub;
        }
        c.usage(out);
        return CommandLine.OK;
    }
}
