package org.quire.app.cli;

import java.time.LocalDate;
import java.time.format.DateTimeParseException;
import org.quire.engine.budget.EvaluationSettings;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.Option;
import picocli.CommandLine.TypeConversionException;

/**
 * The options that several commands share, each named and checked once here (picocli mixins), and the converters
 * of their values.
 */
final class Options {
    private Options() {
    }

    /** {@code --trials N --seed S}: the size and seed of a Monte Carlo run (JCGM 101:2008 7.2, 6.4). */
    static final class Trials {
        @Option(names = "--trials", paramLabel = "N", converter = WholeNumber.class,
                description = "Monte Carlo trials (e.g. 1e6; JCGM 101:2008 7.2); default: the budget's setting")
        Long trials;

        @Option(names = "--seed", paramLabel = "S", converter = WholeNumber.class,
                description = "seed of the random generator, recorded with the result; default: the budget's")
        Long seed;

        boolean given() {
            return trials != null || seed != null;
        }

        /** @return the settings with the trials and seed given on the command line */
        EvaluationSettings apply(EvaluationSettings s) throws UsageException {
            try {
                if (trials != null) {
                    if (trials < 1) {
                        throw new UsageException("--trials must be a whole number of at least 1, not " + trials);
                    }
                    s = s.withTrials(trials);
                }
                if (seed != null) {
                    s = s.withSeed(seed);
                }
            } catch (IllegalArgumentException e) {
                throw new UsageException(e.getMessage());
            }
            return s;
        }
    }

    /** {@code --coverage P}: the coverage probability (JCGM 100:2008 6.2.2), as 0.95 or 95. */
    static final class Coverage {
        @Option(names = "--coverage", paramLabel = "P", converter = FiniteNumber.class,
                description = "coverage probability, 0.95 or 95 (JCGM 100:2008 6.2.2); default: the budget's")
        Double coverage;

        EvaluationSettings apply(EvaluationSettings s) throws UsageException {
            if (coverage == null) {
                return s;
            }
            double p = coverage;
            try {
                return s.withCoverageProbability(p > 1 && p < 100 ? p / 100 : p);
            } catch (IllegalArgumentException e) {
                throw new UsageException(e.getMessage());
            }
        }
    }

    /** {@code --threads T}: worker threads of a Monte Carlo run. */
    static final class Threads {
        @Option(names = "--threads", paramLabel = "T", converter = WholeNumber.class,
                description = "worker threads (1 to 1024); default: one per processor core")
        Long threads;

        int count() throws UsageException {
            long t = threads == null ? Runtime.getRuntime().availableProcessors() : threads;
            if (t < 1 || t > 1024) {
                throw new UsageException("--threads must be between 1 and 1024, not " + t);
            }
            return (int) t;
        }
    }

    /** {@code -q, --quiet}: no progress line on the terminal. */
    static final class Quiet {
        @Option(names = {"-q", "--quiet"}, description = "no progress line (it is shown only on a terminal anyway)")
        boolean quiet;
    }

    /** A whole number, also written with an exponent ({@code 1e6}) or underscores ({@code 1_000_000}). */
    static final class WholeNumber implements ITypeConverter<Long> {
        @Override
        public Long convert(String v) {
            String t = v.trim().replace("_", "");
            try {
                if (t.matches("[0-9.]+[eE][0-9]+")) {
                    double d = Double.parseDouble(t);
                    if (d != Math.rint(d) || d > Long.MAX_VALUE) {
                        throw new NumberFormatException();
                    }
                    return (long) d;
                }
                return Long.parseLong(t);
            } catch (NumberFormatException e) {
                throw new TypeConversionException("needs a whole number, not '" + v + "'");
            }
        }
    }

    /** A finite decimal number with a point as the decimal separator. */
    static final class FiniteNumber implements ITypeConverter<Double> {
        @Override
        public Double convert(String v) {
            String t = v.trim();
            if (t.matches("[-+]?(\\d+\\.?\\d*|\\.\\d+)([eE][-+]?\\d+)?")) {
                double d = Double.parseDouble(t);
                if (Double.isFinite(d)) {
                    return d;
                }
            }
            throw new TypeConversionException("needs a number, not '" + v + "'"
                    + (v.matches("[-+]?\\d+,\\d+") ? " (use a point as the decimal separator)" : ""));
        }
    }

    /** A calendar date written YYYY-MM-DD (ISO 8601). */
    static final class IsoDate implements ITypeConverter<LocalDate> {
        @Override
        public LocalDate convert(String v) {
            try {
                return LocalDate.parse(v.trim());
            } catch (DateTimeParseException e) {
                throw new TypeConversionException("needs a date written YYYY-MM-DD, not '" + v + "'");
            }
        }
    }
}
