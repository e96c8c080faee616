package org.quire.app.ui.document;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Executor;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.Consumer;
import org.quire.engine.budget.Budget;
import org.quire.engine.gum.GumEvaluator;
import org.quire.engine.gum.GumResult;
import org.quire.engine.gum.OutputResult;
import org.quire.engine.model.FunctionLibrary;
import org.quire.engine.model.ModelCompiler;
import org.quire.engine.model.ModelException;
import org.quire.engine.model.ModelProblem;

/**
 * Asks the engine again whenever the budget changes: checks the model (for live error marks), checks the
 * correlation matrix and runs the GUM evaluation, on one background thread, debounced so that a burst of typing
 * costs one evaluation. Only the answer for the latest request is delivered, through the {@code deliver}
 * executor (the event thread in the workbench).
 *
 * <p>No user-interface imports. Thread-safe.
 */
public final class Recalculator implements AutoCloseable {
    /** Quiet time after the last change before the engine is asked. */
    public static final long DEBOUNCE_MILLIS = 150;

    private final FunctionLibrary library;
    private final Executor deliver;
    private final Consumer<Recalculation> sink;
    private final ScheduledExecutorService worker;
    private final AtomicLong generation = new AtomicLong();
    private Future<?> pending;

    /**
     * @param library the functions models may call
     * @param deliver runs the delivery of an answer (e.g. {@code EventQueue::invokeLater})
     * @param sink receives each answer that is still current
     */
    public Recalculator(FunctionLibrary library, Executor deliver, Consumer<Recalculation> sink) {
        this.library = library;
        this.deliver = deliver;
        this.sink = sink;
        this.worker = Executors.newSingleThreadScheduledExecutor(r -> {
            Thread t = new Thread(r, "quire-recalculation");
            t.setDaemon(true);
            t.setPriority(Thread.NORM_PRIORITY - 1);
            return t;
        });
    }

    /** Asks for an evaluation of {@code budget} after the debounce time; earlier pending requests are dropped. */
    public synchronized void request(Budget budget) {
        schedule(budget, DEBOUNCE_MILLIS);
    }

    /** Asks for an evaluation at once (on opening a budget). */
    public synchronized void requestNow(Budget budget) {
        schedule(budget, 0);
    }

    private void schedule(Budget budget, long delay) {
        long g = generation.incrementAndGet();
        if (pending != null) {
            pending.cancel(false);
        }
        pending = worker.schedule(() -> {
            if (generation.get() != g) {
                return;
            }
            Recalculation r;
            try {
                r = evaluate(budget, library);
            } catch (RuntimeException | Error e) {
                r = failed(budget, e);
            }
            Recalculation answer = r;
            deliver.execute(() -> {
                if (generation.get() == g) {
                    sink.accept(answer);
                }
            });
        }, delay, TimeUnit.MILLISECONDS);
    }

    /** Evaluates one snapshot; the engine's messages become problems. Thread-safe. */
    public static Recalculation evaluate(Budget budget, FunctionLibrary library) {
        long t0 = System.nanoTime();
        List<Problem> problems = new ArrayList<>();
        List<ModelProblem> model = ModelCompiler.check(budget.model(), budget.inputNames(), budget.outputNames(),
                library);
        for (ModelProblem p : model) {
            problems.add(new Problem(severity(p), Problem.Area.MODEL, p.message(), p.line(), p.column(),
                    p.length()));
        }
        if (budget.outputs().isEmpty()) {
            problems.add(Problem.of(Problem.Severity.ERROR, Problem.Area.MODEL,
                    "the budget names no output: declare at least one quantity the model defines as an output"));
        }
        boolean correlationsOk = true;
        try {
            budget.correlationMatrix();
        } catch (IllegalArgumentException e) {
            correlationsOk = false;
            problems.add(Problem.of(Problem.Severity.ERROR, Problem.Area.CORRELATIONS, e.getMessage()));
        }
        GumResult result = null;
        boolean modelOk = model.stream().noneMatch(ModelProblem::isError) && !budget.outputs().isEmpty();
        if (modelOk && correlationsOk) {
            try {
                result = GumEvaluator.evaluate(budget, library);
                for (String w : result.warnings()) {
                    if (problems.stream().noneMatch(p -> w.endsWith(p.message()))) {
                        problems.add(Problem.of(Problem.Severity.WARNING, Problem.Area.RESULTS, w));
                    }
                }
                for (OutputResult o : result.outputs()) {
                    for (String w : o.warnings()) {
                        problems.add(Problem.of(Problem.Severity.WARNING, Problem.Area.RESULTS, o.name() + ": " + w));
                    }
                }
            } catch (ModelException e) {
                for (ModelProblem p : e.problems()) {
                    problems.add(new Problem(severity(p), Problem.Area.MODEL, p.message(), p.line(), p.column(),
                            p.length()));
                }
            } catch (IllegalArgumentException e) {
                problems.add(Problem.of(Problem.Severity.ERROR, Problem.Area.INPUTS, e.getMessage()));
            }
        }
        return new Recalculation(budget, result, problems, (System.nanoTime() - t0) / 1_000_000);
    }

    /**
     * The answer when the engine itself failed (a bug, not the user's input): shown as an error in the problems
     * list, so that the results never silently stay those of an older budget.
     */
    static Recalculation failed(Budget budget, Throwable e) {
        e.printStackTrace();
        return new Recalculation(budget, null, List.of(Problem.of(Problem.Severity.ERROR, Problem.Area.RESULTS,
                "the engine failed on this budget (" + e + "): this is a fault in Quire, not in the budget; please "
                        + "report it with the budget file")), 0);
    }

    private static Problem.Severity severity(ModelProblem p) {
        return p.isError() ? Problem.Severity.ERROR : Problem.Severity.WARNING;
    }

    @Override
    public void close() {
        worker.shutdownNow();
    }
}
