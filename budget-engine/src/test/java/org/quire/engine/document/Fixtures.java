package org.quire.engine.document;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.InputQuantity;
import org.quire.engine.budget.OutputQuantity;
import org.quire.engine.budget.TypeB;
import org.quire.engine.io.BudgetFormatException;

/** Test files (invented Tarrow Vale Flow Laboratory data) and generated documents. */
final class Fixtures {
    static final Instant T0 = Instant.parse("2026-03-02T10:00:00Z");

    private Fixtures() {
    }

    static String text(String resource) throws IOException {
        try (InputStream in = Fixtures.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new IOException("test resource " + resource + " is missing");
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
    }

    static BudgetDocument doc(String resource) throws IOException, BudgetFormatException {
        return DocumentJson.read(text(resource), T0);
    }

    static Template templateV1() throws Exception {
        return Template.of(doc("tvfl-gravimetric-water-v1.json"));
    }

    static Template templateV2() throws Exception {
        return Template.of(doc("tvfl-gravimetric-water-v2.json"));
    }

    /**
     * A budget of {@code n} inputs x_1..x_n, y = x_1 + ... + x_n, with estimates depending on {@code generation}
     * so that two generations differ in every input.
     */
    static Budget sumBudget(int n, long generation) {
        List<InputQuantity> in = new ArrayList<>();
        StringBuilder model = new StringBuilder("y = ");
        for (int i = 1; i <= n; i++) {
            in.add(InputQuantity.of("x_" + i, TypeB.of("normal", java.util.Map.of("estimate",
                    (double) generation + i / 1000.0, "standardUncertainty", 0.001 * (1 + i % 7))))
                    .withUnit("L").withSource("Tarrow Vale Flow Laboratory generated input " + i)
                    .withDescription("generated input number " + i + " of generation " + generation));
            model.append(i == 1 ? "" : " + ").append("x_").append(i);
        }
        return Budget.of(model.toString(), List.of(new OutputQuantity("y", "L", "sum")), in)
                .withTitle("Generated budget, generation " + generation)
                .withNotes("generation " + generation);
    }
}
