package org.quire.app.report;

import java.time.LocalDate;
import java.util.Objects;

/**
 * What the person who authorises a certificate adds to a calibration: the date of issue, their name and role,
 * optionally the certificate number (otherwise derived from the content), and whether a reference whose
 * calibration was not valid on the calibration date is accepted as a finding stated on the certificate.
 *
 * @param issued the date of issue
 * @param approver the name of the person who authorises the certificate
 * @param role the approver's role, e.g. "technical manager"
 * @param number the certificate number, or blank to derive a unique one from the content hash
 * @param acceptReferenceFindings whether to issue despite reference findings, stating each on the certificate
 *
 * <p>Immutable and thread-safe.
 */
public record CertificateIssue(LocalDate issued, String approver, String role, String number,
        boolean acceptReferenceFindings) {
    public CertificateIssue {
        Objects.requireNonNull(issued, "issued");
        approver = approver == null ? "" : approver.strip();
        role = role == null ? "" : role.strip();
        number = number == null ? "" : number.strip();
    }
}
