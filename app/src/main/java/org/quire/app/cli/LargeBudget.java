package org.quire.app.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.InputQuantity;
import org.quire.engine.budget.OutputQuantity;
import org.quire.engine.budget.TypeB;

/**
 * A generated budget of many inputs for the document benchmark: invented Tarrow Vale flow-point corrections,
 * summed in groups of ten, with one non-linear output.
 */
final class LargeBudget {
    private LargeBudget() {
    }

    static Budget of(int inputs) {
        List<InputQuantity> in = new ArrayList<>();
        StringBuilder model = new StringBuilder();
        List<String> groups = new ArrayList<>();
        for (int i = 1; i <= inputs; i++) {
            String name = "d" + i;
            TypeB e = i % 3 == 0
                    ? TypeB.of("rectangular", Map.of("estimate", 0.0, "halfWidth", 1e-4 * (1 + i % 7)))
                    : TypeB.of("normal", Map.of("estimate", 1e-5 * (i % 5), "standardUncertainty", 2e-5 * (1 + i % 4)));
            in.add(InputQuantity.of(name, e).withUnit("1").withDescription("relative correction " + i + " (invented)")
                    .withSource("Tarrow Vale study " + i + " (invented)"));
        }
        for (int g = 0; g * 10 < inputs; g++) {
            StringBuilder line = new StringBuilder("g" + (g + 1) + " = ");
            for (int i = g * 10 + 1; i <= Math.min(inputs, g * 10 + 10); i++) {
                line.append(i == g * 10 + 1 ? "" : " + ").append("d").append(i);
            }
            model.append(line).append('\n');
            groups.add("g" + (g + 1));
        }
        model.append("E = 100 * (").append(String.join(" + ", groups)).append(")\n");
        model.append("F = 100 * (exp(").append(String.join(" - ", groups)).append(") - 1)");
        return Budget.of(model.toString(), List.of(new OutputQuantity("E", "%", "sum of the corrections"),
                new OutputQuantity("F", "%", "a non-linear combination")), in)
                .withTitle("Generated budget with " + inputs + " inputs (invented)");
    }
}
