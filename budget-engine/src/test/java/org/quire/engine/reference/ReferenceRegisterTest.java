package org.quire.engine.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.quire.engine.io.BudgetFormatException;
import org.quire.engine.io.ReferenceRegisterJson;

/**
 * The reference register and the check of a calibration's references on its date (ISO/IEC 17025:2017 6.4.13: the
 * due date of the next calibration; common practice: a standard may be used up to and including its due date).
 */
class ReferenceRegisterTest {
    private static final Path FILE = java.nio.file.Files.isDirectory(Path.of("..", "worked-examples"))
            ? Path.of("..", "worked-examples", "registers", "tarrow-vale-reference-register.json")
            : Path.of("worked-examples", "registers", "tarrow-vale-reference-register.json");

    @Test
    void theDemonstrationRegisterReads() throws Exception {
        ReferenceRegister r = ReferenceRegisterJson.read(FILE);
        assertEquals("Tarrow Vale Flow Laboratory", r.laboratory());
        ReferenceStandard bal = r.find("TVFL-BAL-02");
        assertEquals("HRC-M-26-0412", bal.certificateNumber());
        assertEquals(LocalDate.of(2027, 3, 8), bal.due());
    }

    @Test
    void aReferenceIsValidUpToAndIncludingItsDueDate() throws Exception {
        ReferenceRegister r = ReferenceRegisterJson.read(FILE);
        // TVFL-MM-05 is due on 2026-11-17 in the register file
        assertTrue(r.check(List.of("TVFL-MM-05"), LocalDate.of(2026, 11, 17)).isEmpty());
        List<TraceabilityFinding> late = r.check(List.of("TVFL-BAL-02", "TVFL-MM-05"), LocalDate.of(2026, 11, 18));
        assertEquals(1, late.size());
        assertEquals(TraceabilityFinding.Kind.EXPIRED, late.get(0).kind());
        assertEquals("TVFL-MM-05", late.get(0).referenceId());
        assertTrue(late.get(0).message().contains("2026-11-17") && late.get(0).message().contains("2026-11-18"),
                late.get(0).message());
        assertTrue(late.get(0).message().contains("1 day(s) after its due date"), late.get(0).message());
    }

    @Test
    void unknownAndNotYetCalibratedReferencesAreFindings() throws Exception {
        ReferenceRegister r = ReferenceRegisterJson.read(FILE);
        List<TraceabilityFinding> f = r.check(List.of("TVFL-XX-99", "TVFL-MM-05"), LocalDate.of(2026, 5, 1));
        assertEquals(List.of(TraceabilityFinding.Kind.UNKNOWN, TraceabilityFinding.Kind.NOT_YET_CALIBRATED),
                f.stream().map(TraceabilityFinding::kind).toList());
    }

    @Test
    void badFilesNameTheJsonPath() {
        String base = "{\"format\":\"quire-reference-register\",\"formatVersion\":1,\"laboratory\":\"L\",\"references\":[";
        String ok = "{\"id\":\"A\",\"kind\":\"balance\",\"description\":\"d\",\"certificate\":\"c\",\"issuedBy\":\"i\","
                + "\"calibrated\":\"2026-01-01\",\"due\":";
        BudgetFormatException e = assertThrows(BudgetFormatException.class,
                () -> ReferenceRegisterJson.read(base + ok + "\"2026/12/31\"}]}"));
        assertEquals("$.references[0].due", e.path());
        e = assertThrows(BudgetFormatException.class,
                () -> ReferenceRegisterJson.read(base + ok + "\"2025-12-31\"}]}"));
        assertEquals("$.references[0].due", e.path());
        e = assertThrows(BudgetFormatException.class,
                () -> ReferenceRegisterJson.read(base + ok + "\"2026-12-31\"}," + ok + "\"2026-12-31\"}]}"));
        assertEquals("$.references[1].id", e.path());
        e = assertThrows(BudgetFormatException.class,
                () -> ReferenceRegisterJson.read(base + ok + "\"2026-12-31\",\"dew\":1}]}"));
        assertEquals("$.references[0].dew", e.path());
    }
}
