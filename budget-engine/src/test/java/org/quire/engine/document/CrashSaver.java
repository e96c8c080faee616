package org.quire.engine.document;

import java.nio.file.Path;
import java.time.Instant;

/**
 * Child process of {@link CrashSafetyTest}: saves ever newer generations of a large document to one file, in
 * a loop, until it is killed; prints {@code saved N} after each save returns.
 *
 * <p>Arguments: the file, the number of inputs, the generation the file holds now.
 */
public final class CrashSaver {
    private CrashSaver() {
    }

    public static void main(String[] args) throws Exception {
        Path file = Path.of(args[0]);
        int inputs = Integer.parseInt(args[1]);
        long generation = Long.parseLong(args[2]);
        while (true) {
            generation++;
            BudgetDocument d = BudgetDocument.newDraft(Fixtures.sumBudget(inputs, generation), "crash test",
                    Instant.parse("2026-03-02T10:00:00Z"));
            DocumentStore.save(d, file);
            System.out.println("saved " + generation);
            System.out.flush();
        }
    }
}
