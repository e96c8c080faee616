package org.quire.engine.validate;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.quire.engine.model.FunctionLibrary;

/**
 * Runs every file in the repository's {@code worked-examples/} folder: each check compares a published figure
 * (its source is named in the file, e.g. JCGM 100:2008 H.1) with Quire's, within the tolerance the printed
 * digits justify. The same files run in {@code quire validate}.
 */
class WorkedExamplesTest {

    static Path folder() {
        Path p = Path.of("..", "worked-examples");
        if (!Files.isDirectory(p)) {
            p = Path.of("worked-examples");
        }
        return p;
    }

    static Stream<Path> examples() throws IOException {
        try (Stream<Path> s = Files.list(folder())) {
            List<Path> l = s.filter(f -> f.toString().endsWith(".json")).sorted().collect(Collectors.toList());
            return l.stream();
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("examples")
    void everyPublishedFigureIsReproduced(Path file) {
        List<CheckOutcome> outcomes = Validator.standard(TestLibrary.get()).run(file);
        assertFalse(outcomes.isEmpty(), "no checks in " + file);
        for (CheckOutcome o : outcomes) {
            assertTrue(o.passed(), () -> o.example() + " " + o.figure() + ": expected " + o.expected() + ", computed "
                    + o.computed() + " (tolerance " + o.tolerance() + ") " + o.message());
        }
    }

    /** The function library the examples are run with. */
    static final class TestLibrary {
        static FunctionLibrary get() {
            return FunctionLibrary.standard().with(org.quire.engine.flow.FlowFunctions.all());
        }
    }
}
