package org.quire.engine.io;

import java.io.IOException;
import java.nio.file.Path;
import java.time.LocalDate;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.quire.engine.reference.ReferenceRegister;
import org.quire.engine.reference.ReferenceStandard;

/**
 * Reads a laboratory's reference register ({@code "format": "quire-reference-register"}, described in
 * {@code budget-engine/doc/reference-register.md}). Every error names the JSON path of the bad field.
 *
 * <p>Stateless and thread-safe.
 */
public final class ReferenceRegisterJson {
    /** The value of the {@code format} field. */
    public static final String FORMAT = "quire-reference-register";
    /** The format version this engine writes and reads. */
    public static final int FORMAT_VERSION = 1;
    private static final Set<String> ROOT_FIELDS = Set.of("format", "formatVersion", "laboratory", "references");
    private static final Set<String> REFERENCE_FIELDS = Set.of("id", "kind", "description", "certificate",
            "issuedBy", "calibrated", "due");

    private ReferenceRegisterJson() {
    }

    /** Reads a register file (strict UTF-8, size-limited as budget files are). */
    public static ReferenceRegister read(Path file) throws IOException, BudgetFormatException {
        return read(BudgetJson.readText(file));
    }

    /** Reads a register from JSON text. */
    public static ReferenceRegister read(String text) throws BudgetFormatException {
        JsonCursor root = JsonCursor.root(BudgetJson.parseObject(text));
        root.onlyFields(ROOT_FIELDS);
        String format = root.get("format").string();
        if (!format.equals(FORMAT)) {
            throw new BudgetFormatException("$.format", "this is not a reference register: format is '" + format
                    + "', expected '" + FORMAT + "'");
        }
        long version = root.get("formatVersion").integer();
        if (version != FORMAT_VERSION) {
            throw new BudgetFormatException("$.formatVersion", "reference registers of format version " + version
                    + " are not read by this version, which reads version " + FORMAT_VERSION);
        }
        String laboratory = root.get("laboratory").string();
        if (laboratory.isBlank()) {
            throw new BudgetFormatException("$.laboratory", "name the laboratory whose register this is");
        }
        List<ReferenceStandard> refs = new ArrayList<>();
        List<String> ids = new ArrayList<>();
        for (JsonCursor r : root.get("references").elements()) {
            r.onlyFields(REFERENCE_FIELDS);
            String id = text(r, "id");
            int before = ids.indexOf(id);
            if (before >= 0) {
                throw new BudgetFormatException(r.path() + ".id", "reference id '" + id + "' is already used by "
                        + "$.references[" + before + "]");
            }
            ids.add(id);
            LocalDate calibrated = date(r, "calibrated");
            LocalDate due = date(r, "due");
            if (!due.isAfter(calibrated)) {
                throw new BudgetFormatException(r.path() + ".due", "due date " + due + " of reference '" + id
                        + "' must be after its calibration date " + calibrated);
            }
            refs.add(ReferenceStandard.of(id, text(r, "kind"), text(r, "description"), text(r, "certificate"),
                    text(r, "issuedBy"), calibrated, due));
        }
        if (refs.isEmpty()) {
            throw new BudgetFormatException("$.references", "the register lists no reference standard");
        }
        return ReferenceRegister.of(laboratory, refs);
    }

    private static String text(JsonCursor r, String key) throws BudgetFormatException {
        String s = r.get(key).string();
        if (s.isBlank()) {
            throw new BudgetFormatException(r.path() + "." + key, "must not be blank");
        }
        return s.strip();
    }

    private static LocalDate date(JsonCursor r, String key) throws BudgetFormatException {
        String s = r.get(key).string();
        try {
            return LocalDate.parse(s);
        } catch (DateTimeParseException e) {
            throw new BudgetFormatException(r.path() + "." + key, "expected a date written YYYY-MM-DD, found '" + s
                    + "'");
        }
    }
}
