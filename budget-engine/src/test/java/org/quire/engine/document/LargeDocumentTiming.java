package org.quire.engine.document;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.Locale;
import org.quire.engine.gum.GumEvaluator;
import org.quire.engine.gum.GumResult;
import org.quire.engine.io.ResultJson;
import org.quire.engine.model.FunctionLibrary;

/**
 * Measures opening, evaluating (GUM) and saving a generated document with many inputs; a measurement to run
 * by hand, not a test: {@code java -cp TEST_CLASSPATH org.quire.engine.document.LargeDocumentTiming [INPUTS]
 * [REPEATS]}. Prints the median of the repeats after as many warm-up rounds: open (read and check the
 * file), evaluate (GUM), results (the result snapshot as JSON), save (safe save with backup).
 */
public final class LargeDocumentTiming {
    private LargeDocumentTiming() {
    }

    public static void main(String[] args) throws Exception {
        int inputs = args.length > 0 ? Integer.parseInt(args[0]) : 500;
        int repeats = args.length > 1 ? Integer.parseInt(args[1]) : 5;
        Path dir = Files.createTempDirectory("quire-timing");
        Path file = dir.resolve("generated.json");
        DocumentStore.save(BudgetDocument.newDraft(Fixtures.sumBudget(inputs, 1), "timing", Instant.now()), file);
        System.out.printf(Locale.ROOT, "%d inputs, file of %d bytes%n", inputs, Files.size(file));
        FunctionLibrary lib = FunctionLibrary.standard();
        long[][] t = new long[4][2 * repeats];
        for (int r = 0; r < 2 * repeats; r++) {
            long t0 = System.nanoTime();
            BudgetDocument d = DocumentStore.open(file);
            long t1 = System.nanoTime();
            GumResult res = GumEvaluator.evaluate(d.budget(), lib);
            long te = System.nanoTime();
            d = d.withResults(ResultSnapshot.of(ResultJson.toJson(d.title(), res), Instant.now()));
            long t2 = System.nanoTime();
            t[3][r] = t2 - te;
            DocumentStore.save(d, file);
            long t3 = System.nanoTime();
            t[0][r] = t1 - t0;
            t[1][r] = te - t1;
            t[2][r] = t3 - t2;
        }
        String[] names = {"open", "evaluate", "save", "results"};
        for (int k = 0; k < 4; k++) {
            long[] m = java.util.Arrays.copyOfRange(t[k], repeats, 2 * repeats);
            java.util.Arrays.sort(m);
            System.out.printf(Locale.ROOT, "%-9s first %.0f ms, median after warm-up %.1f ms%n", names[k],
                    t[k][0] / 1e6, m[repeats / 2] / 1e6);
        }
        System.out.printf(Locale.ROOT, "saved file of %d bytes%n", Files.size(file));
    }
}
