package org.quire.engine.document;

import java.util.Locale;

/**
 * The rule that the person who approves a piece of work is not the person who did it: a budget's author does not
 * approve it, a calibration's author does not authorise its certificate. Names are compared without regard to
 * case, surrounding blanks or repeated spaces.
 *
 * <p>References: ISO/IEC 17025:2017 6.2.6 and 7.8.2.1 o) (authorisation of results by identified, competent
 * personnel); separation of the one who performs from the one who reviews and approves is common practice in
 * accredited laboratories.
 *
 * <p>Stateless and thread-safe.
 */
public final class SeparationOfDuties {
    private SeparationOfDuties() {
    }

    /**
     * @param what the work, e.g. "the calibration" or "budget 'X'"
     * @param author who did it (blank when not recorded)
     * @param approver who approves it
     * @return null when the approver may approve, otherwise the sentence saying why not
     */
    public static String problem(String what, String author, String approver) {
        String a = normal(author);
        String p = normal(approver);
        if (p.isEmpty()) {
            return "name the person who approves " + what;
        }
        if (!a.isEmpty() && a.equals(p)) {
            return "'" + approver.strip() + "' is the author of " + what + " and may not also approve it: another "
                    + "qualified person approves (separation of duties)";
        }
        return null;
    }

    private static String normal(String s) {
        return s == null ? "" : s.strip().replaceAll("\\s+", " ").toLowerCase(Locale.ROOT);
    }
}
