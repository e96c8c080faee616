package org.quire.engine.document;

import java.io.IOException;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.NotDirectoryException;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.Locale;
import org.quire.engine.io.BudgetFormatException;

/**
 * Opens and saves budget documents so that a crash, a power cut or a full disk never leaves a half-written
 * file: the file on disk is always either the complete old version or the complete new one.
 *
 * <p>Saving writes the new text to a temporary file in the same folder, forces it to the storage device
 * ({@link FileChannel#force(boolean)}), keeps the previous version as {@code NAME.bak} beside the file (a hard
 * link, or a copy where the file system has no links, itself moved into place atomically), and then renames
 * the temporary file over the old one with {@link StandardCopyOption#ATOMIC_MOVE}; finally it forces the folder
 * itself where the platform allows it. A file system that cannot rename atomically within a folder falls back
 * to a plain replacing move. Temporary files are named {@code .NAME.*.tmp}; one left behind by a crash is
 * harmless, and a later save of the same file removes it once it is an hour old.
 *
 * <p>References: POSIX.1-2017 rename() ("If newpath exists, it shall be replaced atomically") and fsync();
 * T. S. Pillai et al., "All File Systems Are Not Created Equal", OSDI 2014 (why the data must be forced before
 * the rename and the folder after it).
 *
 * <p>Stateless and thread-safe for different files; the caller must not save one file from two threads at once.
 */
public final class DocumentStore {
    private DocumentStore() {
    }

    /** @return the document in {@code file}, migrated when it is of format version 1 */
    public static BudgetDocument open(Path file) throws IOException, BudgetFormatException {
        return DocumentJson.read(file);
    }

    /**
     * Saves a document as a format version 2 file.
     *
     * @throws DocumentSaveException naming the folder and the reason when the file cannot be written
     */
    public static void save(BudgetDocument doc, Path file) throws IOException {
        writeAtomically(file, DocumentJson.write(doc).getBytes(StandardCharsets.UTF_8), true);
    }

    /** @return the path of the backup kept beside {@code file}: {@code NAME.bak} */
    public static Path backupOf(Path file) {
        return file.resolveSibling(file.getFileName() + ".bak");
    }

    /**
     * Replaces {@code file} by {@code bytes} atomically, as described in the class description.
     *
     * @param keepBackup whether to keep the previous version as {@code NAME.bak}
     * @throws DocumentSaveException naming the folder and the reason when the file cannot be written
     */
    public static void writeAtomically(Path file, byte[] bytes, boolean keepBackup) throws IOException {
        write(file, out -> out.write(bytes), keepBackup, false);
    }

    /**
     * Replaces {@code file} by what {@code content} writes, atomically, as described in the class description;
     * the one atomic writer of Quire (budgets, reports, CSV tables, templates, manual pages).
     *
     * @throws DocumentSaveException naming the folder and the reason when the file cannot be written
     */
    public static void writeAtomically(Path file, Content content) throws IOException {
        write(file, content, false, false);
    }

    /**
     * Like {@link #writeAtomically(Path, byte[], boolean)}, but the file is readable by its owner only (mode
     * 0600 where the file system has POSIX permissions), for copies of unsaved work such as recovery files.
     */
    public static void writePrivately(Path file, byte[] bytes) throws IOException {
        write(file, out -> out.write(bytes), false, true);
    }

    /** Produces a file's content. */
    @FunctionalInterface
    public interface Content {
        /** Writes the content; the stream is closed by the caller. */
        void writeTo(java.io.OutputStream out) throws IOException;
    }

    /**
     * The temporary file is created as a new file is (so its mode is the one the umask gives, 0644 under umask
     * 022) and, when the target exists, given the target's permissions, so that saving never narrows or widens
     * who may read a file; {@code privately} makes it 0600.
     */
    private static void write(Path file, Content content, boolean keepBackup, boolean privately) throws IOException {
        Path abs = file.toAbsolutePath();
        Path dir = abs.getParent();
        if (dir == null) {
            throw new DocumentSaveException(abs, "a file needs a folder", null);
        }
        String name = abs.getFileName().toString();
        if (Files.isDirectory(abs)) {
            throw new DocumentSaveException(abs, "a folder of that name is in the way", null);
        }
        removeStaleTemporaries(dir, name);
        Path tmp;
        try {
            tmp = newTemporary(dir, name);
        } catch (IOException e) {
            throw failure(abs, e);
        }
        try {
            try (FileChannel ch = FileChannel.open(tmp, StandardOpenOption.WRITE,
                    StandardOpenOption.TRUNCATE_EXISTING)) {
                java.io.OutputStream out = new java.io.BufferedOutputStream(java.nio.channels.Channels.newOutputStream(ch));
                content.writeTo(out);
                out.flush();
                ch.force(true);
            }
            permissions(tmp, abs, privately);
            if (keepBackup && Files.isRegularFile(abs)) {
                keepBackup(abs);
            }
            try {
                Files.move(tmp, abs, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, abs, StandardCopyOption.REPLACE_EXISTING);
            }
            forceFolder(dir);
        } catch (IOException e) {
            try {
                Files.deleteIfExists(tmp);
            } catch (IOException ignored) {
                // the temporary file stays; the next save removes it
            }
            throw e instanceof DocumentSaveException ? e : failure(abs, e);
        }
    }

    private static Path newTemporary(Path dir, String name) throws IOException {
        java.security.SecureRandom random = new java.security.SecureRandom();
        for (int attempt = 0; ; attempt++) {
            Path tmp = dir.resolve("." + name + "." + Long.toUnsignedString(random.nextLong(), 36) + ".tmp");
            try {
                return Files.createFile(tmp);
            } catch (java.nio.file.FileAlreadyExistsException e) {
                if (attempt > 100) {
                    throw e;
                }
            }
        }
    }

    private static void permissions(Path tmp, Path target, boolean privately) throws IOException {
        if (!Files.getFileStore(tmp).supportsFileAttributeView(java.nio.file.attribute.PosixFileAttributeView.class)) {
            return;
        }
        if (privately) {
            Files.setPosixFilePermissions(tmp, java.nio.file.attribute.PosixFilePermissions.fromString("rw-------"));
        } else if (Files.isRegularFile(target)) {
            Files.setPosixFilePermissions(tmp, Files.getPosixFilePermissions(target));
        }
    }

    private static void keepBackup(Path abs) throws IOException {
        Path bak = backupOf(abs);
        Path link = abs.resolveSibling("." + abs.getFileName() + ".bak.tmp");
        Files.deleteIfExists(link);
        try {
            Files.createLink(link, abs);
        } catch (UnsupportedOperationException | FileSystemException e) {
            Files.copy(abs, link, StandardCopyOption.REPLACE_EXISTING);
            try (FileChannel ch = FileChannel.open(link, StandardOpenOption.WRITE)) {
                ch.force(true);
            }
        }
        try {
            Files.move(link, bak, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(link, bak, StandardCopyOption.REPLACE_EXISTING);
        }
    }

    private static void removeStaleTemporaries(Path dir, String name) {
        if (!Files.isDirectory(dir)) {
            return;
        }
        String prefix = "." + name + ".";
        try (var s = Files.newDirectoryStream(dir, p -> {
            String n = p.getFileName().toString();
            return n.startsWith(prefix) && n.endsWith(".tmp");
        })) {
            java.nio.file.attribute.FileTime hourAgo = java.nio.file.attribute.FileTime.from(
                    java.time.Instant.now().minusSeconds(3600));
            for (Path p : s) {
                if (Files.getLastModifiedTime(p).compareTo(hourAgo) < 0) {
                    Files.deleteIfExists(p);
                }
            }
        } catch (IOException | java.nio.file.DirectoryIteratorException e) {
            // leftovers are harmless; the save itself reports any real problem
        }
    }

    /** Forces the folder's entry for the renamed file to the device; not every platform can open a folder. */
    private static void forceFolder(Path dir) {
        try (FileChannel ch = FileChannel.open(dir, StandardOpenOption.READ)) {
            ch.force(true);
        } catch (IOException e) {
            // Windows cannot open a folder as a channel; its rename is durable once it returns
        }
    }

    private static DocumentSaveException failure(Path abs, IOException e) {
        String m = e.getMessage() == null ? "" : e.getMessage().toLowerCase(Locale.ROOT);
        String reason;
        if (m.contains("no space") || m.contains("disk full") || m.contains("not enough space")) {
            reason = "there is no space left on the device";
        } else if (e instanceof AccessDeniedException || m.contains("read-only") || m.contains("permission")) {
            reason = "the folder cannot be written (read-only or no permission)";
        } else if (e instanceof NotDirectoryException || m.contains("not a directory")) {
            reason = "that path is not a folder";
        } else if (e instanceof NoSuchFileException) {
            reason = "the folder does not exist";
        } else if (e instanceof FileAlreadyExistsException) {
            reason = "a file is in the way";
        } else {
            reason = e.getClass().getSimpleName() + ": " + e.getMessage();
        }
        return new DocumentSaveException(abs, reason, e);
    }
}
