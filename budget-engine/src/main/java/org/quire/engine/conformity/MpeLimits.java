package org.quire.engine.conformity;

/**
 * The maximum permissible error at one flow (and temperature), in percent of the reading: an error e
 * conforms when {@code -lowerPercent <= e <= upperPercent}. Both magnitudes are non-negative; they differ for
 * an asymmetric limit. Immutable and thread-safe.
 *
 * @param lowerPercent magnitude of the lower limit, % of reading
 * @param upperPercent magnitude of the upper limit, % of reading
 */
public record MpeLimits(double lowerPercent, double upperPercent) {

    /** Checks the components; prefer {@link #of} or {@link #symmetric}. */
    public MpeLimits {
        check("lower limit", lowerPercent);
        check("upper limit", upperPercent);
        if (lowerPercent == 0 && upperPercent == 0) {
            throw new IllegalArgumentException(ConformityMessages.bothLimitsZero());
        }
    }

    private static void check(String what, double v) {
        if (!Double.isFinite(v)) {
            throw new IllegalArgumentException(ConformityMessages.notFinite(what, v));
        }
        if (v < 0) {
            throw new IllegalArgumentException(ConformityMessages.negative(what, v));
        }
    }

    /** @return limits -lowerPercent .. +upperPercent */
    public static MpeLimits of(double lowerPercent, double upperPercent) {
        return new MpeLimits(lowerPercent, upperPercent);
    }

    /** @return limits -percent .. +percent */
    public static MpeLimits symmetric(double percent) {
        return new MpeLimits(percent, percent);
    }

    /** @return the lower tolerance limit T_L as an error, i.e. {@code -lowerPercent} */
    public double lowerTolerance() {
        return -lowerPercent;
    }

    /** @return the upper tolerance limit T_U as an error, i.e. {@code upperPercent} */
    public double upperTolerance() {
        return upperPercent;
    }

    /** @return "±1 %" for symmetric limits, "-1 % / +2 %" otherwise */
    public String label() {
        if (lowerPercent == upperPercent) {
            return "±" + trim(upperPercent) + " %";
        }
        return "-" + trim(lowerPercent) + " % / +" + trim(upperPercent) + " %";
    }

    private static String trim(double v) {
        return v == Math.rint(v) && Math.abs(v) < 1e9 ? Long.toString((long) v) : Double.toString(v);
    }
}
