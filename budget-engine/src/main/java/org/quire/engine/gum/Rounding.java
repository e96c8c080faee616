package org.quire.engine.gum;

import java.math.BigDecimal;
import java.math.RoundingMode;

/**
 * Rounding of a reported result: the uncertainty to a few significant digits and the estimate to the same
 * decimal place.
 *
 * <p>References: JCGM 100:2008 7.2.6 (u_c(y) and U "should not be given with an excessive number of digits;
 * it usually suffices to quote [them] to at most two significant digits"; the estimate is rounded to be
 * consistent with the uncertainty).
 *
 * <p>Stateless and thread-safe. Full precision is always kept in results; this is for display only.
 */
public final class Rounding {
    private Rounding() {
    }

    /** @return {@code uncertainty} rounded half-up to {@code digits} significant digits */
    public static BigDecimal uncertainty(double uncertainty, int digits) {
        if (!(uncertainty > 0) || Double.isInfinite(uncertainty)) {
            return BigDecimal.valueOf(Math.abs(uncertainty) == 0 ? 0 : uncertainty);
        }
        BigDecimal b = new BigDecimal(uncertainty);
        int exponent = b.precision() - b.scale() - 1;
        int scale = digits - 1 - exponent;
        BigDecimal r = b.setScale(scale, RoundingMode.HALF_UP);
        if (r.precision() > digits && r.unscaledValue().mod(java.math.BigInteger.TEN).signum() == 0) {
            r = b.setScale(scale - 1, RoundingMode.HALF_UP);
        }
        return r;
    }

    /** @return {@code estimate} rounded to the last decimal place of the rounded {@code uncertainty} */
    public static BigDecimal estimate(double estimate, double uncertainty, int digits) {
        BigDecimal ru = uncertainty(uncertainty, digits);
        if (ru.signum() == 0) {
            return new BigDecimal(estimate).round(new java.math.MathContext(12));
        }
        return new BigDecimal(estimate).setScale(ru.scale(), RoundingMode.HALF_UP);
    }

    /** @return e.g. {@code "50.000838 ± 0.000093"} */
    public static String format(double estimate, double uncertainty, int digits) {
        return estimate(estimate, uncertainty, digits).toPlainString() + " \u00b1 "
                + uncertainty(uncertainty, digits).toPlainString();
    }
}
