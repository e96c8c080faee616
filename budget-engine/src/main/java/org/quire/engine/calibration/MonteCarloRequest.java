package org.quire.engine.calibration;

/**
 * A request for the Monte Carlo method (JCGM 101:2008) at every point, with its GUM comparison (clause 8).
 *
 * @param trials the number of trials per point, at least 10 000
 * @param seed the seed of the random generator (recorded with the result)
 */
public record MonteCarloRequest(long trials, long seed) {
    public MonteCarloRequest {
        if (trials < 10_000 || trials > 100_000_000L) {
            throw new IllegalArgumentException(CalibrationMessages.trials(trials));
        }
    }

    public static MonteCarloRequest of(long trials, long seed) {
        return new MonteCarloRequest(trials, seed);
    }
}
