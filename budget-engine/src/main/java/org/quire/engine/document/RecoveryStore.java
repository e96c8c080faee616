package org.quire.engine.document;

import org.quire.engine.io.JsonSupport;
import jakarta.json.spi.JsonProvider;
import jakarta.json.JsonObject;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Objects;
import java.util.regex.Pattern;
import org.quire.engine.io.BudgetFormatException;
import org.quire.engine.io.BudgetJson;
import org.quire.engine.io.JsonCursor;

/**
 * Copies of open documents that have unsaved changes, kept in a recovery folder so that work survives a
 * crash. Each copy is one file {@code ID.recovery.json} written with {@link DocumentStore#writeAtomically}:
 * an object {@code {"format": "quire-recovery", "formatVersion": 1, "id", "originalPath" (empty for a
 * document never saved), "saved" (UTC time), "document" (the document as in a budget file)}}.
 *
 * <p>The workbench calls {@link #autosave} (or hands documents to an {@link Autosaver}), lists
 * {@link #pending()} copies at start-up, offers them to the user, and calls {@link #discard} once a document
 * is saved or closed without saving.
 *
 * <p>Immutable and thread-safe for different ids.
 */
public final class RecoveryStore {
    /** One JSON-P provider for the class: {@code JsonSupport.JSON.create...} looks the provider up on every call, which is slow. */
    private static final JsonProvider JSON = JsonSupport.JSON;
    /** The identifier of the recovery file layout. */
    public static final String FORMAT = "quire-recovery";
    private static final String SUFFIX = ".recovery.json";
    private static final Pattern ID = Pattern.compile("[A-Za-z0-9_-]{1,64}");

    private final Path folder;

    private RecoveryStore(Path folder) {
        this.folder = folder;
    }

    /** @param folder the recovery folder; created on the first autosave when missing */
    public static RecoveryStore of(Path folder) {
        return new RecoveryStore(Objects.requireNonNull(folder, "folder").toAbsolutePath());
    }

    public Path folder() {
        return folder;
    }

    private static void checkId(String id) {
        if (id == null || !ID.matcher(id).matches()) {
            throw new IllegalArgumentException("recovery id '" + id + "' must be 1 to 64 letters, digits, '_' or '-'");
        }
    }

    /**
     * Writes a recovery copy atomically, replacing the previous copy of the same id.
     *
     * @param id an identifier of the open document, e.g. a UUID without braces
     * @param doc the document with its unsaved changes
     * @param originalPath where the document is normally saved, or null when it never was
     * @throws DocumentSaveException naming the recovery folder when it cannot be written
     */
    public void autosave(String id, BudgetDocument doc, Path originalPath) throws IOException {
        autosave(id, doc, originalPath, Instant.now());
    }

    /** As {@link #autosave(String, BudgetDocument, Path)}, recording {@code now} as the time of saving. */
    public void autosave(String id, BudgetDocument doc, Path originalPath, Instant now) throws IOException {
        checkId(id);
        try {
            Files.createDirectories(folder);
        } catch (IOException e) {
            throw new DocumentSaveException(folder.resolve(id + SUFFIX), "the recovery folder cannot be created: "
                    + e.getMessage(), e);
        }
        JsonObject o = JSON.createObjectBuilder().add("format", FORMAT).add("formatVersion", 1).add("id", id)
                .add("originalPath", originalPath == null ? "" : originalPath.toAbsolutePath().toString())
                .add("saved", now.toString()).add("document", DocumentJson.toJson(doc)).build();
        // a copy of unsaved work stays the user's own (mode 0600), unlike saved files, which take the umask's mode
        DocumentStore.writePrivately(folder.resolve(id + SUFFIX), BudgetJson.pretty(o)
                .getBytes(StandardCharsets.UTF_8));
    }

    /** A recovery copy found in the folder. */
    public static final class Pending {
        private final String id;
        private final Path originalPath;
        private final Instant saved;
        private final Path file;

        Pending(String id, Path originalPath, Instant saved, Path file) {
            this.id = id;
            this.originalPath = originalPath;
            this.saved = saved;
            this.file = file;
        }

        public String id() { return id; }
        /** @return where the document is normally saved, or null when it never was */
        public Path originalPath() { return originalPath; }
        /** @return when the copy was written */
        public Instant saved() { return saved; }
        /** @return the recovery file */
        public Path file() { return file; }

        /** @return the recovered document */
        public BudgetDocument load() throws IOException, BudgetFormatException {
            return readFile(file).document;
        }
    }

    private static final class Read {
        String id;
        Path original;
        Instant saved;
        BudgetDocument document;
    }

    private static Read readFile(Path file) throws IOException, BudgetFormatException {
        JsonCursor root = JsonCursor.root(BudgetJson.parseObject(BudgetJson.readText(file)));
        root.onlyFields(java.util.Set.of("format", "formatVersion", "id", "originalPath", "saved", "document"));
        if (!root.get("format").string().equals(FORMAT)) {
            throw new BudgetFormatException("$.format", "this is not a recovery file: format is '"
                    + root.get("format").string() + "', expected '" + FORMAT + "'");
        }
        long v = root.get("formatVersion").integer();
        if (v != 1) {
            throw new BudgetFormatException("$.formatVersion", "recovery format version " + v
                    + " is not known to this version of Quire, which reads version 1");
        }
        Read r = new Read();
        r.id = root.get("id").string();
        String orig = root.get("originalPath").string();
        r.original = orig.isEmpty() ? null : Path.of(orig);
        try {
            r.saved = Instant.parse(root.get("saved").string());
        } catch (java.time.format.DateTimeParseException e) {
            throw new BudgetFormatException("$.saved", "expected a UTC time, found '" + root.get("saved").string() + "'");
        }
        r.document = DocumentJson.read(root.get("document"), r.saved);
        return r;
    }

    /**
     * @return the recovery copies in the folder, newest first; a copy that cannot be read (a crash before the
     *     first complete write cannot leave one, but a disk error can) is listed in {@code unreadable}
     */
    public List<Pending> pending(List<String> unreadable) throws IOException {
        List<Pending> out = new ArrayList<>();
        if (!Files.isDirectory(folder)) {
            return out;
        }
        try (DirectoryStream<Path> s = Files.newDirectoryStream(folder, "*" + SUFFIX)) {
            for (Path p : s) {
                try {
                    Read r = readFile(p);
                    out.add(new Pending(r.id, r.original, r.saved, p));
                } catch (BudgetFormatException | IOException e) {
                    if (unreadable != null) {
                        unreadable.add(p.getFileName() + ": " + e.getMessage());
                    }
                }
            }
        }
        out.sort(Comparator.comparing(Pending::saved).reversed());
        return out;
    }

    /** @return the readable recovery copies, newest first */
    public List<Pending> pending() throws IOException {
        return pending(null);
    }

    /** Removes the recovery copy of {@code id}; nothing happens when there is none. */
    public void discard(String id) throws IOException {
        checkId(id);
        Files.deleteIfExists(folder.resolve(id + SUFFIX));
    }
}
