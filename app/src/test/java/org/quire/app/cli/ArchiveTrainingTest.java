package org.quire.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The build's archive training (the commands whose classes go into app/target/quire.jsa) keeps running: a
 * command of it that fails would leave the build without an archive, with only a warning.
 */
class ArchiveTrainingTest {
    @Test
    void everyCommandOfTheTrainingEndsWithStatusZero(@TempDir Path dir) throws Exception {
        List<List<String>> commands = ArchiveTraining.commands(dir);
        assertTrue(commands.stream().anyMatch(c -> c.get(0).equals("evaluate")), "evaluate is trained");
        assertTrue(commands.stream().anyMatch(c -> c.get(0).equals("montecarlo")), "montecarlo is trained");
        for (List<String> command : commands) {
            ByteArrayOutputStream out = new ByteArrayOutputStream();
            ByteArrayOutputStream err = new ByteArrayOutputStream();
            int status = CommandLine.run(command.toArray(new String[0]), new PrintStream(out, true, StandardCharsets.UTF_8),
                    new PrintStream(err, true, StandardCharsets.UTF_8));
            assertEquals(0, status, command + "\n" + err.toString(StandardCharsets.UTF_8));
        }
    }
}
