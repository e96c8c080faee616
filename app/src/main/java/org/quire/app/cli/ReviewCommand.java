package org.quire.app.cli;

import java.io.PrintStream;
import java.nio.file.Path;
import java.time.Clock;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.quire.app.Engine;
import org.quire.app.review.ChecklistText;
import org.quire.app.review.DecisionRecorder;
import org.quire.app.review.DocumentDecisionRecorder;
import org.quire.app.review.Mark;
import org.quire.app.review.Review;
import org.quire.app.review.ReviewContext;
import org.quire.app.review.Verdict;
import org.quire.engine.budget.Budget;
import org.quire.engine.document.BudgetDocument;
import org.quire.engine.document.DocumentStore;
import org.quire.engine.gum.GumEvaluator;
import org.quire.engine.gum.GumResult;
import org.quire.engine.model.CompiledModel;
import org.quire.engine.montecarlo.BudgetSimulation;
import org.quire.engine.montecarlo.ProgressListener;

/**
 * {@code quire review FILE [--mc [--trials N] [--seed S]] [--decide endorse|send-back --assessor NAME
 * [--reason TEXT] [--mark ITEM=agreed|finding|remark[:COMMENT]]... [--date YYYY-MM-DD]]}: the automatic checklist
 * of a budget document and, with {@code --decide}, the assessor's decision recorded in the document's history
 * and saved atomically. Exit 0, or 1 when an item is not met (without a decision) or the decision is refused.
 */
final class ReviewCommand {
    static final String USAGE = "quire review FILE [--mc [--trials N] [--seed S]] [--decide endorse|send-back "
            + "--assessor NAME [--reason TEXT] [--mark ITEM=agreed|finding|remark[:COMMENT]]... [--date YYYY-MM-DD]]";

    private ReviewCommand() {
    }

    static int run(String[] argv, PrintStream out) throws Exception {
        Args a = new Args(argv, 1, Set.of("decide", "assessor", "reason", "mark", "date", "trials", "seed"),
                Set.of("mc"));
        a.expectPositional(1, USAGE);
        if (!a.has("decide")) {
            for (String o : List.of("assessor", "reason", "mark", "date")) {
                if (a.has(o)) {
                    throw new UsageException("--" + o + " belongs to a decision; give --decide endorse or --decide "
                            + "send-back\nusage: " + USAGE);
                }
            }
        }
        if (!a.has("mc") && (a.has("trials") || a.has("seed"))) {
            throw new UsageException("--trials and --seed set the Monte Carlo run; give --mc too");
        }
        Verdict verdict = null;
        LocalDate date = LocalDate.now(Clock.systemUTC());
        if (a.has("decide")) {
            String v = a.get("decide", "").toLowerCase(Locale.ROOT);
            if (v.equals("endorse")) {
                verdict = Verdict.ENDORSED;
            } else if (v.equals("send-back")) {
                verdict = Verdict.SENT_BACK;
            } else {
                throw new UsageException("--decide must be endorse or send-back, not '" + a.get("decide", "") + "'");
            }
            if (a.get("assessor", "").isBlank()) {
                throw new UsageException("a decision needs the assessor's name: --assessor NAME");
            }
            date = a.date("date", date);
        }
        String file = a.positional().get(0);
        BudgetDocument doc = Files.loadDocument(file);
        Budget b = doc.budget();
        GumResult r;
        CompiledModel model;
        try {
            model = b.compile(Engine.library());
            r = GumEvaluator.evaluate(b, model, b.correlationMatrix(), b.settings());
        } catch (org.quire.engine.model.ModelException e) {
            throw Files.modelProblem(file, e);
        } catch (IllegalArgumentException e) {
            throw new Files.FileProblem(file, e.getMessage());
        }
        ReviewContext ctx = ReviewContext.none().withUnits(new org.quire.app.review.EngineUnitChecker());
        if (a.has("mc")) {
            ctx = ctx.withMonteCarlo(monteCarlo(a, file, b, model, r));
        }
        Review review = Review.start(doc, r, ctx);
        for (String m : a.all("mark")) {
            review = mark(review, m);
        }
        out.print(ChecklistText.format(b.title(), review.hashAlgorithm(), review.contentHash(), review.items()));
        if (verdict == null) {
            return review.anyNotMet() ? 1 : 0;
        }
        try {
            review = review.decide(verdict, a.get("assessor", ""), date, a.get("reason", ""));
        } catch (IllegalStateException | IllegalArgumentException e) {
            out.println();
            out.println("decision refused: " + e.getMessage() + "; " + file + " is unchanged");
            return 1;
        }
        DocumentDecisionRecorder recorder = new DocumentDecisionRecorder(doc, Clock.systemUTC());
        DecisionRecorder.Recorded rec;
        try {
            rec = recorder.record(review);
        } catch (IllegalArgumentException e) {
            out.println();
            out.println("decision refused: " + e.getMessage() + "; " + file + " is unchanged");
            return 1;
        }
        BudgetDocument saved = recorder.document();
        Path p = Files.path(file);
        DocumentStore.save(saved, p);
        out.println();
        out.println(rec.decision().verdict().label() + " by " + rec.decision().assessor() + " on "
                + rec.decision().date() + "; revision " + saved.revision() + " is now " + saved.status().label()
                + " (content " + rec.hashAlgorithm() + " " + rec.contentHash() + ")");
        out.println("saved " + file + " (previous version kept as " + DocumentStore.backupOf(p).getFileName() + ")"
                + (doc.migratedFrom() == 1 ? "; the file is now of format version 2" : ""));
        return 0;
    }

    /** Applies one {@code ITEM=mark[:comment]} option. */
    private static Review mark(Review review, String spec) throws UsageException {
        int eq = spec.indexOf('=');
        if (eq <= 0) {
            throw new UsageException("--mark needs ITEM=agreed, ITEM=finding or ITEM=remark (optionally :COMMENT), not '"
                    + spec + "'");
        }
        String item = spec.substring(0, eq).strip();
        String rest = spec.substring(eq + 1);
        int colon = rest.indexOf(':');
        String word = (colon < 0 ? rest : rest.substring(0, colon)).strip().toLowerCase(Locale.ROOT);
        String comment = colon < 0 ? "" : rest.substring(colon + 1);
        Mark mark = null;
        List<String> words = new ArrayList<>();
        for (Mark m : Mark.values()) {
            words.add(m.label());
            if (m.label().equals(word)) {
                mark = m;
            }
        }
        if (mark == null) {
            throw new UsageException("--mark " + spec + ": the mark must be one of " + String.join(", ", words)
                    + ", not '" + word + "'");
        }
        try {
            return review.withMark(item, mark, comment);
        } catch (IllegalArgumentException e) {
            throw new UsageException("--mark " + spec + ": " + e.getMessage());
        }
    }

    /** Runs the Monte Carlo method with the budget's settings and --trials / --seed. */
    static org.quire.engine.montecarlo.MonteCarloOutcome monteCarlo(Args a, String file, Budget b, CompiledModel model, GumResult gum)
            throws Exception {
        Budget run = b.withSettings(MonteCarloCommand.settings(a, b.settings()));
        try {
            return BudgetSimulation.run(run, model, gum, BudgetSimulation.settings(run.settings(), gum)
                    .withThreads(Runtime.getRuntime().availableProcessors()), ProgressListener.NONE);
        } catch (org.quire.engine.model.ModelException e) {
            throw Files.modelProblem(file, e);
        } catch (IllegalArgumentException e) {
            throw new Files.FileProblem(file, "Monte Carlo method: " + e.getMessage());
        }
    }
}
