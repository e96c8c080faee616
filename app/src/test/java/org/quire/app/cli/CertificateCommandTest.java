package org.quire.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.quire.app.testing.Examples;

/** {@code quire certificate}: written whole, refused with exit status 2 and a message naming the reference. */
class CertificateCommandTest {
    private final ByteArrayOutputStream out = new ByteArrayOutputStream();
    private final ByteArrayOutputStream err = new ByteArrayOutputStream();

    private int run(String... args) {
        return CommandLine.run(args, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
    }

    private static String cal() {
        return Examples.file("calibration/tarrow-vale-dn80-calibration.json").toString();
    }

    private static String register() {
        return Examples.file("registers/tarrow-vale-reference-register.json").toString();
    }

    @Test
    void writesTheCertificate(@TempDir Path dir) throws Exception {
        Path pdf = dir.resolve("c.pdf");
        assertEquals(0, run("certificate", cal(), "--register", register(), "--approver", "M. Fenwick (invented)",
                "--role", "technical manager", "--issued", "2026-11-25", "-o", pdf.toString()), err.toString());
        assertTrue(Files.size(pdf) > 10_000);
        assertTrue(out.toString(StandardCharsets.UTF_8).contains("wrote certificate TVFL-20261124-"));
    }

    @Test
    void aReferencePastItsDueDateIsRefusedUnlessAccepted(@TempDir Path dir) throws Exception {
        // the pressure transmitter TVFL-PT-03 falls due on 2026-11-20, before the calibration of 2026-11-24
        String reg = Files.readString(Path.of(register()), StandardCharsets.UTF_8).replace("\"due\": \"2027-01-31\"",
                "\"due\": \"2026-11-20\"");
        assertTrue(reg.contains("2026-11-20"));
        Path r = dir.resolve("reg.json");
        Files.writeString(r, reg, StandardCharsets.UTF_8);
        Path pdf = dir.resolve("c.pdf");
        assertEquals(2, run("certificate", cal(), "--register", r.toString(), "--approver", "M. Fenwick (invented)",
                "--role", "technical manager", "-o", pdf.toString()));
        String e = err.toString(StandardCharsets.UTF_8);
        assertTrue(e.contains("TVFL-PT-03") && e.contains("2026-11-20") && e.contains("2026-11-24"), e);
        assertFalse(Files.exists(pdf), "a refused certificate writes nothing");
        assertEquals(0, run("certificate", cal(), "--register", r.toString(), "--approver", "M. Fenwick (invented)",
                "--role", "technical manager", "--accept-reference-findings", "-o", pdf.toString()));
        assertTrue(Files.exists(pdf));
    }

    @Test
    void theAuthorCannotApproveAndABadRegisterNamesItsPath(@TempDir Path dir) throws Exception {
        Path pdf = dir.resolve("c.pdf");
        assertEquals(2, run("certificate", cal(), "--register", register(), "--approver", "R. Okonedo (invented)",
                "--role", "technical manager", "-o", pdf.toString()));
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("separation of duties"));
        Path bad = dir.resolve("bad.json");
        Files.writeString(bad, "{\"format\":\"quire-reference-register\",\"formatVersion\":1,\"laboratory\":\"L\","
                + "\"references\":[{\"id\":\"A\"}]}");
        assertEquals(2, run("certificate", cal(), "--register", bad.toString(), "--approver", "M. Fenwick",
                "--role", "technical manager", "-o", pdf.toString()));
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("$.references[0]"), err.toString());
        assertFalse(Files.exists(pdf));
    }
}
