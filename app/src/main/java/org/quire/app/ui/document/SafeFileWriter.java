package org.quire.app.ui.document;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;

/**
 * Writes a text file so that a crash or a full disk never leaves a half-written budget: the text goes to a
 * temporary file in the same folder, is forced to the disk, and then replaces the target in one atomic move.
 *
 * <p>A small private helper of the workbench until the engine's document store takes over saving.
 * Stateless and thread-safe.
 */
final class SafeFileWriter {
    private SafeFileWriter() {
    }

    static void write(Path target, String text) throws IOException {
        Path folder = target.getParent();
        if (folder == null || !Files.isDirectory(folder)) {
            throw new IOException("cannot save " + target + ": the folder " + folder + " does not exist");
        }
        Path temp = Files.createTempFile(folder, "." + target.getFileName() + ".", ".saving");
        try {
            try (FileChannel ch = FileChannel.open(temp, StandardOpenOption.WRITE,
                    StandardOpenOption.TRUNCATE_EXISTING)) {
                ByteBuffer buf = ByteBuffer.wrap(text.getBytes(StandardCharsets.UTF_8));
                while (buf.hasRemaining()) {
                    ch.write(buf);
                }
                ch.force(true);
            }
            try {
                Files.move(temp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                throw new IOException("cannot save " + target + " safely: the file system of " + folder
                        + " does not support replacing a file in one step", e);
            }
        } finally {
            Files.deleteIfExists(temp);
        }
    }
}
