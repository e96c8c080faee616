package org.quire.app.cli;

import java.io.PrintStream;
import java.util.Set;
import org.quire.app.Engine;
import org.quire.app.report.CanonicalSha256;
import org.quire.app.review.ChecklistText;
import org.quire.app.review.Review;
import org.quire.app.review.ReviewContext;
import org.quire.engine.budget.Budget;
import org.quire.engine.gum.GumEvaluator;
import org.quire.engine.gum.GumResult;

/** {@code quire review FILE}: the automatic checklist; exit 0, or 1 when any item is not met. */
final class ReviewCommand {
    static final String USAGE = "quire review FILE";

    private ReviewCommand() {
    }

    static int run(String[] argv, PrintStream out) throws Exception {
        Args a = new Args(argv, 1, Set.of(), Set.of());
        a.expectPositional(1, USAGE);
        String file = a.positional().get(0);
        Budget b = Files.loadBudget(file);
        GumResult r;
        try {
            r = GumEvaluator.evaluate(b, Engine.library());
        } catch (org.quire.engine.model.ModelException e) {
            throw Files.modelProblem(file, e);
        } catch (IllegalArgumentException e) {
            throw new Files.FileProblem(file, e.getMessage());
        }
        Review review = Review.start(b, r, ReviewContext.none(), CanonicalSha256.INSTANCE);
        out.print(ChecklistText.format(b.title(), review.hashAlgorithm(), review.contentHash(), review.items()));
        return review.anyNotMet() ? 1 : 0;
    }
}
