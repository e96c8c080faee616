package org.quire.app.ui.montecarlo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.quire.app.Engine;
import org.quire.engine.budget.Budget;
import org.quire.engine.gum.GumEvaluator;
import org.quire.engine.gum.GumResult;
import org.quire.engine.io.BudgetJson;

/** The workbench's Monte Carlo seam is filled by the engine, found as a service, and cancels. */
class EngineMonteCarloRunnerTest {

    static Budget example(String name) throws Exception {
        Path p = Path.of(System.getProperty("quire.projectRoot", ".."), "worked-examples", name);
        return BudgetJson.read(p);
    }

    @Test
    void theEngineRunnerIsInstalled() {
        assertTrue(MonteCarloRunners.installed().orElseThrow() instanceof EngineMonteCarloRunner);
    }

    @Test
    void additiveModelGivesThePublishedUncertaintyAndVerdict() throws Exception {
        Budget b = example("jcgm101-9.2.2-additive-normal.json");
        b = b.withSettings(b.settings().withTrials(200_000));
        GumResult gum = GumEvaluator.evaluate(b, Engine.library());
        long[] last = new long[2];
        MonteCarloOutcome o = new EngineMonteCarloRunner().run(b, gum, new MonteCarloRunner.Progress() {
            @Override public void trialsDone(long done, long planned) { last[0] = done; last[1] = planned; }
            @Override public boolean cancelRequested() { return false; }
        });
        assertEquals(200_000, o.trials());
        // JCGM 101:2008 9.2.2: u(y) = 2.00; 3 standard errors u/sqrt(2M) = 0.0095 at M = 2e5
        assertEquals(2.00, o.outputs().get(0).standardUncertainty(), 0.015);
        assertTrue(o.outputs().get(0).comparison().gumValidated());
    }

    @Test
    void cancellingStopsTheRun() throws Exception {
        Budget b = example("tarrow-vale-benchmark.json");
        b = b.withSettings(b.settings().withTrials(50_000_000));
        GumResult gum = GumEvaluator.evaluate(b, Engine.library());
        Budget big = b;
        assertThrows(InterruptedException.class, () -> new EngineMonteCarloRunner().run(big, gum,
                new MonteCarloRunner.Progress() {
                    @Override public void trialsDone(long done, long planned) { }
                    @Override public boolean cancelRequested() { return true; }
                }));
    }
}
