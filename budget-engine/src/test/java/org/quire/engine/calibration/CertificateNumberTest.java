package org.quire.engine.calibration;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.time.LocalDate;
import org.junit.jupiter.api.Test;

/** The certificate number rule: unique identification on every page (ISO/IEC 17025:2017 7.8.2.1 b). */
class CertificateNumberTest {
    private static final LocalDate DAY = LocalDate.of(2026, 11, 24);

    @Test
    void derivedFromInitialsDateAndHash() {
        assertEquals("TVFL-20261124-0A1B2C3D",
                CertificateNumber.derive("Tarrow Vale Flow Laboratory", DAY, "0a1b2c3d4e5f"));
        assertEquals("CAL-20261124-FFFFFFFF", CertificateNumber.derive("", DAY, "ffffffff"));
        // different content, different number
        assertNotEquals(CertificateNumber.derive("Tarrow Vale Flow Laboratory", DAY, "0a1b2c3d"),
                CertificateNumber.derive("Tarrow Vale Flow Laboratory", DAY, "0a1b2c3e"));
    }

    @Test
    void shortOrNonHexHashIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> CertificateNumber.derive("X", DAY, "abc"));
        assertThrows(IllegalArgumentException.class, () -> CertificateNumber.derive("X", DAY, "ghijklmn"));
    }

    @Test
    void givenNumbersAreChecked() {
        assertNull(CertificateNumber.problem("TVFL/2026/0412"));
        assertNotNull(CertificateNumber.problem(""));
        assertNotNull(CertificateNumber.problem("line\nbreak"));
        assertNotNull(CertificateNumber.problem("x".repeat(41)));
        assertNotNull(CertificateNumber.problem("-leading"));
    }
}
