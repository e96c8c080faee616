package org.quire.app.report;

import java.io.BufferedOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

/**
 * Writes a file so that it is either whole or absent: the content goes to a temporary file in the target's
 * own folder, which is then moved over the target in one step. When writing fails the temporary file is
 * removed and an existing target is left as it was.
 *
 * <p>Stateless and thread-safe; two writers of one target race, and the last move wins.
 */
public final class AtomicFile {

    /** Produces a file's content. */
    @FunctionalInterface
    public interface Content {
        void writeTo(OutputStream out) throws IOException;
    }

    private AtomicFile() {
    }

    /**
     * @param target the file to create or replace
     * @param content writes the content
     * @throws IOException with a message naming the file when its folder is missing or not writable, the target
     *     is a folder, or the content cannot be written
     */
    public static void write(Path target, Content content) throws IOException {
        Path abs = target.toAbsolutePath();
        Path dir = abs.getParent();
        if (Files.isDirectory(abs)) {
            throw new IOException("cannot write " + target + ": it is a folder");
        }
        if (dir == null || !Files.isDirectory(dir)) {
            throw new NoSuchFileException(target.toString(), null, "cannot write " + target
                    + ": the folder " + (dir == null ? "" : dir) + " does not exist");
        }
        Path tmp;
        try {
            tmp = Files.createTempFile(dir, "." + abs.getFileName() + ".", ".part");
        } catch (IOException e) {
            throw new IOException("cannot write " + target + ": the folder " + dir + " is not writable ("
                    + e.getClass().getSimpleName() + ")", e);
        }
        boolean moved = false;
        try {
            try (OutputStream out = new BufferedOutputStream(Files.newOutputStream(tmp))) {
                content.writeTo(out);
            }
            try {
                Files.move(tmp, abs, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, abs, StandardCopyOption.REPLACE_EXISTING);
            }
            moved = true;
        } catch (IOException e) {
            throw new IOException("cannot write " + target + ": " + (e.getMessage() == null ? e.toString() : e.getMessage()), e);
        } finally {
            if (!moved) {
                Files.deleteIfExists(tmp);
            }
        }
    }
}
