package org.quire.app.ui.montecarlo;

import java.util.Optional;
import java.util.ServiceLoader;

/** Finds the installed {@link MonteCarloRunner}, if any. Thread-safe. */
public final class MonteCarloRunners {
    private MonteCarloRunners() {
    }

    /** @return the first runner registered as a service, or empty when this build has none */
    public static Optional<MonteCarloRunner> installed() {
        return ServiceLoader.load(MonteCarloRunner.class, MonteCarloRunner.class.getClassLoader()).findFirst();
    }
}
