package org.quire.engine.calibration;

/**
 * What the repeatability term of a point stands for, as the method states it (JCGM 100:2008 4.2.2 and 4.2.3;
 * OIML R 49-2 and ISO 4185 repeat each test point).
 */
public enum RepeatabilityBasis {
    /**
     * The point result is the mean of its n runs: u = s / sqrt(n) with nu = n - 1 (JCGM 100:2008 4.2.3, eq. 5).
     */
    MEAN_OF_RUNS("mean-of-runs"),
    /**
     * The point result stands for a single run of the meter (as in its later use): u = s with nu = n - 1
     * (JCGM 100:2008 4.2.2, eq. 4).
     */
    SINGLE_RUN("single-run");

    private final String word;

    RepeatabilityBasis(String word) {
        this.word = word;
    }

    /** @return the word used in files and reports */
    public String word() {
        return word;
    }

    /** @return the basis as screens, reports and the command line name it: the word with spaces, e.g. mean of runs */
    public String text() {
        return word.replace('-', ' ');
    }

    /** @return the basis written {@code word}, or null */
    public static RepeatabilityBasis byWord(String word) {
        for (RepeatabilityBasis b : values()) {
            if (b.word.equals(word)) {
                return b;
            }
        }
        return null;
    }
}
