package org.quire.app.cli;

import java.io.PrintStream;
import java.nio.file.Path;
import java.time.Clock;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.quire.app.review.ChecklistText;
import org.quire.app.review.Mark;
import org.quire.app.review.Review;
import org.quire.app.review.ReviewContext;
import org.quire.engine.document.Verdict;
import org.quire.engine.budget.Budget;
import org.quire.engine.document.BudgetDocument;
import org.quire.engine.document.DocumentStore;
import org.quire.engine.gum.GumEvaluator;
import org.quire.engine.gum.GumResult;
import org.quire.engine.model.CompiledModel;
import org.quire.engine.montecarlo.BudgetSimulation;
import org.quire.engine.montecarlo.ProgressListener;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Parameters;

/**
 * {@code quire review FILE [--mc [--trials N] [--seed S]] [--decide endorse|send-back --assessor NAME
 * [--reason TEXT] [--mark ITEM=agreed|finding|remark[:COMMENT]]... [--date YYYY-MM-DD]]}: the automatic checklist
 * of a budget document and, with {@code --decide}, the assessor's decision recorded in the document's history
 * and saved atomically. Exit 0; 1 when an item is not met (without a decision) or the checklist does not allow the
 * decision (unmarked items, findings, no reason); 2 when the engine's rules refuse it ({@link
 * org.quire.engine.document.ReviewDecisions}: an approved or withdrawn document, the author endorsing, content
 * already decided on).
 */
@Command(name = "review", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"The assessor's automatic checklist of a budget document; exit status 1 when an item is not "
                + "met.",
            "--decide records the assessor's decision in the document's history (endorse: approved; send-back: "
                + "draft) and saves the file atomically; endorsing is refused while an item not met or to confirm "
                + "is unmarked. A budget made from a template whose locked field was changed fails the item "
                + "template-locks (not met), so it cannot be endorsed before the assessor has marked it."},
        footerHeading = "%nExamples:%n",
        footer = {"  quire review budget.json",
            "  quire review budget.json --mc --trials 1e6",
            "  quire review budget.json --decide endorse --assessor \"R. Okafor\" --mark sources=agreed",
            "  quire review budget.json --decide send-back --assessor \"R. Okafor\" --reason \"Type A from 3 readings\""})
final class ReviewCommand implements Callable<Integer> {
    @ParentCommand
    QuireCommand quire;

    @Parameters(paramLabel = "FILE", description = "the budget document (JSON)")
    String file;

    @Option(names = "--mc", description = "run the Monte Carlo method (JCGM 101:2008) for the comparison item")
    boolean mc;

    @Mixin
    Options.Trials trials;

    @Option(names = "--decide", paramLabel = "endorse|send-back", description = "record the assessor's decision")
    String decide;

    @Option(names = "--assessor", paramLabel = "NAME", description = "the assessor's name (needed with --decide)")
    String assessor;

    @Option(names = "--reason", paramLabel = "TEXT", description = "the reason for the decision")
    String reason;

    @Option(names = "--mark", paramLabel = "ITEM=MARK[:COMMENT]",
            description = "mark a checklist item agreed, finding or remark, with an optional comment (repeatable)")
    List<String> marks = new ArrayList<>();

    @Option(names = "--date", paramLabel = "YYYY-MM-DD", converter = Options.IsoDate.class,
            description = "the date of the decision (default: today, UTC)")
    LocalDate date;

    @Override
    public Integer call() throws Exception {
        PrintStream out = quire.out;
        if (decide == null) {
            if (assessor != null || reason != null || !marks.isEmpty() || date != null) {
                throw new UsageException("--assessor, --reason, --mark and --date belong to a decision; give "
                        + "--decide endorse or --decide send-back");
            }
        }
        if (!mc && trials.given()) {
            throw new UsageException("--trials and --seed set the Monte Carlo run; give --mc too");
        }
        Verdict verdict = null;
        LocalDate date = LocalDate.now(Clock.systemUTC());
        if (decide != null) {
            String v = decide.toLowerCase(Locale.ROOT);
            if (v.equals("endorse")) {
                verdict = Verdict.ENDORSED;
            } else if (v.equals("send-back")) {
                verdict = Verdict.SENT_BACK;
            } else {
                throw new UsageException("--decide must be endorse or send-back, not '" + decide + "'");
            }
            if (assessor == null || assessor.isBlank()) {
                throw new UsageException("a decision needs the assessor's name: --assessor NAME");
            }
            if (this.date != null) {
                date = this.date;
            }
        }
        BudgetDocument doc = Files.loadDocument(file);
        Budget b = doc.budget();
        GumResult r;
        CompiledModel model;
        try {
            model = b.compile(quire.engine.library());
            r = GumEvaluator.evaluate(b, model, b.correlationMatrix(), b.settings());
        } catch (org.quire.engine.model.ModelException e) {
            throw Files.modelProblem(file, e);
        } catch (IllegalArgumentException e) {
            throw new Files.FileProblem(file, e.getMessage());
        }
        ReviewContext ctx = ReviewContext.none().withUnits(new org.quire.app.review.EngineUnitChecker(quire.engine.library()))
                .withTemplate(org.quire.engine.document.TemplateConformance.check(doc, TemplateCommand.Folders.preferred()))
                .withDocument(doc);
        if (mc) {
            ctx = ctx.withMonteCarlo(monteCarlo(trials, file, b, model, r));
        }
        Review review = Review.start(doc, r, ctx);
        for (String m : marks) {
            review = mark(review, m);
        }
        out.print(ChecklistText.format(b.title(), review.hashAlgorithm(), review.contentHash(), review.items()));
        if (verdict == null) {
            return review.anyNotMet() ? 1 : 0;
        }
        try {
            review = review.decide(verdict, assessor, date, reason == null ? "" : reason);
        } catch (IllegalStateException | IllegalArgumentException e) {
            out.println();
            out.println("decision refused: " + e.getMessage() + "; " + file + " is unchanged");
            return 1;
        }
        BudgetDocument saved;
        try {
            saved = review.recordIn(doc, Clock.systemUTC().instant());
        } catch (IllegalArgumentException e) {
            // the engine's rules (content reviewed, status, separation of duties, one decision per content): a
            // user error, exit 2
            throw new Files.FileProblem(file, "decision refused: " + e.getMessage() + "; the file is unchanged");
        }
        Path p = Files.path(file);
        DocumentStore.save(saved, p);
        out.println();
        out.println(review.decision().verdict().label() + " by " + review.decision().assessor() + " on "
                + review.decision().date() + "; revision " + saved.revision() + " is now " + saved.status().label()
                + " (content " + review.hashAlgorithm() + " " + review.contentHash() + ")");
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
    static org.quire.engine.montecarlo.MonteCarloOutcome monteCarlo(Options.Trials trials, String file, Budget b,
            CompiledModel model, GumResult gum) throws Exception {
        Budget run = b.withSettings(trials.apply(b.settings()));
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
