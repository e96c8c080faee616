package org.quire.app.cli;

import java.io.InputStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.stream.Stream;
import org.quire.engine.io.ResourceFolders;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;

/**
 * {@code quire examples DIR}: copies the worked examples shipped in the program (published examples with their
 * expected results, the Tarrow Vale demonstration budgets and data files) into a folder, to try the commands on.
 */
@Command(name = "examples", mixinStandardHelpOptions = true,
        description = {"Copy the worked examples shipped in the program into the folder DIR (made when missing): the "
                + "published examples with their sources and expected results (JCGM 100, JCGM 101, ISO/TS 28037, "
                + "JCGM 106), the budgets and data files of the fictional Tarrow Vale Flow Laboratory.",
            "Existing files are never overwritten."},
        footerHeading = "%nExamples:%n",
        footer = {"  quire examples tour && quire evaluate tour/jcgm100-h1-end-gauge.json"})
final class ExamplesCommand implements Callable<Integer> {
    /** The resource folder of the worked examples packed into the jar. */
    static final String RESOURCE = "worked-examples";

    @ParentCommand
    QuireCommand quire;

    @Parameters(paramLabel = "DIR", description = "the folder to copy them into")
    String dir;

    @Override
    public Integer call() throws Exception {
        Path target = Files.path(dir);
        if (java.nio.file.Files.exists(target) && !java.nio.file.Files.isDirectory(target)) {
            throw new UsageException("'" + dir + "' is a file, not a folder");
        }
        Path source = bundled();
        List<Path> files = new ArrayList<>();
        try (Stream<Path> s = java.nio.file.Files.walk(source)) {
            s.filter(java.nio.file.Files::isRegularFile).sorted().forEach(files::add);
        }
        for (Path f : files) {
            Path to = target.resolve(source.relativize(f).toString());
            if (java.nio.file.Files.exists(to)) {
                throw new UsageException(to + " exists already; nothing was copied (choose an empty folder)");
            }
        }
        for (Path f : files) {
            byte[] bytes;
            try (InputStream in = java.nio.file.Files.newInputStream(f)) {
                bytes = in.readAllBytes();
            }
            Path to = target.resolve(source.relativize(f).toString());
            java.nio.file.Files.createDirectories(to.getParent());
            org.quire.engine.document.DocumentStore.writeAtomically(to, o -> o.write(bytes));
        }
        quire.out.println("copied " + files.size() + " worked examples to " + target);
        return CommandLine.OK;
    }

    /** @return the bundled folder of worked examples, inside the jar's file system when packed */
    static Path bundled() throws UsageException {
        Path p = ResourceFolders.find(RESOURCE);
        if (p == null) {
            throw new UsageException("this build ships no worked examples");
        }
        return p;
    }
}
