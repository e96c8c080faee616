package org.quire.app.report;

import java.util.List;

/**
 * A certificate that cannot be issued as asked: a reference past its due date on the calibration date, an
 * approver who is also the author of the calibration, a missing fact the certificate must state. The message
 * lists every reason, each naming what is wrong.
 */
public final class CertificateRefusedException extends Exception {
    private static final long serialVersionUID = 1L;
    private final List<String> reasons;

    public CertificateRefusedException(List<String> reasons) {
        super("the certificate is not issued:\n  - " + String.join("\n  - ", reasons));
        this.reasons = List.copyOf(reasons);
    }

    /** @return every reason, one sentence each */
    public List<String> reasons() {
        return reasons;
    }
}
