package org.quire.engine.calibration;

import java.time.LocalDate;
import java.util.Locale;
import java.util.Objects;
import java.util.regex.Pattern;

/**
 * The one rule for the number of a calibration certificate, which must identify it uniquely and appear on every
 * page (ISO/IEC 17025:2017 7.8.2.1 b). Derived, it is the laboratory's initials, the date of calibration and the
 * first eight hexadecimal digits of the certificate's content hash, e.g. {@code TVFL-20261124-3F2A9C01}: two
 * certificates with different content get different numbers, and the same content always the same number. A
 * number the laboratory gives instead (from its own register of certificates) is accepted when it is 1 to 40
 * letters, digits, spaces and {@code - / . _}, so that it prints on one line of every page header.
 *
 * <p>Stateless and thread-safe.
 */
public final class CertificateNumber {
    /** The characters of a given number, and its length. */
    private static final Pattern GIVEN = Pattern.compile("[A-Za-z0-9][A-Za-z0-9 ./_-]{0,39}");
    /** Hexadecimal digits of the content hash in a derived number. */
    public static final int HASH_DIGITS = 8;

    private CertificateNumber() {
    }

    /**
     * @param laboratory the laboratory's name, e.g. "Tarrow Vale Flow Laboratory"
     * @param calibrated the date of calibration
     * @param contentHash the certificate's content hash, hexadecimal, at least {@value #HASH_DIGITS} digits
     * @return e.g. {@code TVFL-20261124-3F2A9C01}
     * @throws IllegalArgumentException when the hash is too short or not hexadecimal
     */
    public static String derive(String laboratory, LocalDate calibrated, String contentHash) {
        Objects.requireNonNull(calibrated, "calibrated");
        if (contentHash == null || !contentHash.matches("[0-9a-fA-F]{" + HASH_DIGITS + ",}")) {
            throw new IllegalArgumentException("a certificate number needs at least " + HASH_DIGITS
                    + " hexadecimal digits of the content hash, not '" + contentHash + "'");
        }
        return initials(laboratory) + "-" + calibrated.toString().replace("-", "") + "-"
                + contentHash.substring(0, HASH_DIGITS).toUpperCase(Locale.ROOT);
    }

    /**
     * @param laboratory a laboratory's name
     * @return the first letters of its words, upper case, at most six; {@code CAL} when it has no letters
     */
    static String initials(String laboratory) {
        StringBuilder s = new StringBuilder();
        if (laboratory != null) {
            for (String w : laboratory.strip().split("[^\\p{L}\\p{N}]+")) {
                if (!w.isEmpty() && s.length() < 6 && w.charAt(0) < 128 && Character.isLetterOrDigit(w.charAt(0))) {
                    s.append(Character.toUpperCase(w.charAt(0)));
                }
            }
        }
        return s.length() == 0 ? "CAL" : s.toString();
    }

    /**
     * @param given a certificate number the laboratory gives
     * @return why it cannot be used, or null when it can
     */
    public static String problem(String given) {
        if (given == null || given.isBlank()) {
            return "the certificate number is empty";
        }
        if (!GIVEN.matcher(given).matches()) {
            return "the certificate number '" + given + "' must be 1 to 40 letters, digits, spaces and - / . _, "
                    + "starting with a letter or digit, so that it prints on one line of every page";
        }
        return null;
    }
}
