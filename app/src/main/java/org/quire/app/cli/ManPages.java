package org.quire.app.cli;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.quire.app.common.Cautions;
import org.quire.engine.io.EngineVersion;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Model.OptionSpec;
import picocli.CommandLine.Model.PositionalParamSpec;

/**
 * Manual pages in man(7) format, one per command and action ({@code quire.1}, {@code quire-evaluate.1},
 * {@code quire-template-new.1} ...), written from the same picocli model that prints {@code --help}, so the two
 * cannot disagree.
 */
final class ManPages {
    private ManPages() {
    }

    /** Writes the page of the root command and of every subcommand into {@code dir}; @return the files written */
    static List<Path> write(picocli.CommandLine root, Path dir) throws IOException, UsageException {
        if (!java.nio.file.Files.isDirectory(dir)) {
            throw new UsageException("--man needs an existing folder; " + dir + " is not one");
        }
        List<Path> written = new ArrayList<>();
        write(root, dir, written);
        return written;
    }

    private static void write(picocli.CommandLine c, Path dir, List<Path> written) throws IOException {
        CommandSpec spec = c.getCommandSpec();
        if (spec.usageMessage().hidden()) {
            return;
        }
        String name = spec.qualifiedName("-");
        Path file = dir.resolve(name + ".1");
        byte[] bytes = page(c).getBytes(StandardCharsets.UTF_8);
        org.quire.engine.document.DocumentStore.writeAtomically(file, o -> o.write(bytes));
        written.add(file);
        for (picocli.CommandLine sub : c.getSubcommands().values()) {
            if (sub.getParent() == c && sub.getCommandName().equals(sub.getCommandSpec().name())) {
                write(sub, dir, written);
            }
        }
    }

    /** @return the man(7) source of one command's page */
    static String page(picocli.CommandLine c) {
        CommandSpec spec = c.getCommandSpec();
        StringBuilder s = new StringBuilder();
        String name = spec.qualifiedName("-");
        s.append(".TH ").append(name.toUpperCase(Locale.ROOT)).append(" 1 \"\" \"quire ").append(EngineVersion.get())
                .append("\" \"Quire manual\"\n");
        s.append(".SH NAME\n").append(esc(name)).append(" \\- ").append(esc(firstSentence(spec))).append('\n');
        s.append(".SH SYNOPSIS\n.nf\n").append(esc(c.getHelp().synopsis(0).strip())).append("\n.fi\n");
        s.append(".SH DESCRIPTION\n");
        for (String d : spec.usageMessage().description()) {
            s.append(".PP\n").append(esc(d)).append('\n');
        }
        if (!spec.positionalParameters().isEmpty()) {
            s.append(".SH ARGUMENTS\n");
            for (PositionalParamSpec p : spec.positionalParameters()) {
                s.append(".TP\n.I ").append(esc(p.paramLabel())).append('\n')
                        .append(esc(String.join(" ", p.description()))).append('\n');
            }
        }
        if (!spec.options().isEmpty()) {
            s.append(".SH OPTIONS\n");
            for (OptionSpec o : spec.options()) {
                if (o.hidden()) {
                    continue;
                }
                s.append(".TP\n.B ").append(esc(String.join(", ", o.names())));
                if (o.arity().max() > 0) {
                    s.append(" \\fI").append(esc(o.paramLabel())).append("\\fR");
                }
                s.append('\n').append(esc(String.join(" ", o.description())
                        .replace("${DEFAULT-VALUE}", String.valueOf(o.defaultValue())))).append('\n');
            }
        }
        if (!c.getSubcommands().isEmpty()) {
            s.append(".SH COMMANDS\n");
            for (picocli.CommandLine sub : c.getSubcommands().values()) {
                if (sub.getCommandName().equals(sub.getCommandSpec().name())) {
                    s.append(".TP\n.B ").append(esc(sub.getCommandName())).append('\n')
                            .append(esc(firstSentence(sub.getCommandSpec()))).append(" See \\fB")
                            .append(esc(sub.getCommandSpec().qualifiedName("-"))).append("\\fR(1).\n");
                }
            }
        }
        String[] footer = spec.usageMessage().footer();
        if (footer.length > 0) {
            s.append(".SH EXAMPLES\n.nf\n");
            for (String f : footer) {
                s.append(esc(f.strip().isEmpty() ? "" : f)).append('\n');
            }
            s.append(".fi\n");
        }
        s.append(".SH EXIT STATUS\n").append(esc(CommandLine.EXIT_STATUS_TEXT)).append('\n');
        s.append(".SH CAUTIONS\n").append(esc(Cautions.TEXT)).append('\n');
        if (spec.parent() != null) {
            s.append(".SH SEE ALSO\n\\fBquire\\fR(1)\n");
        }
        return s.toString();
    }

    private static String firstSentence(CommandSpec spec) {
        String[] d = spec.usageMessage().description();
        if (d.length == 0) {
            return "";
        }
        String t = d[0];
        int dot = t.indexOf(". ");
        return (dot > 0 ? t.substring(0, dot + 1) : t).strip();
    }

    /** Escapes text for roff: backslashes, and a leading dot or quote that would read as a request. */
    static String esc(String text) {
        String t = text.replace("\\", "\\e").replace("-", "\\-");
        StringBuilder out = new StringBuilder();
        for (String line : t.split("\n", -1)) {
            if (out.length() > 0) {
                out.append('\n');
            }
            if (line.startsWith(".") || line.startsWith("'")) {
                out.append("\\&");
            }
            out.append(line);
        }
        return out.toString();
    }
}
