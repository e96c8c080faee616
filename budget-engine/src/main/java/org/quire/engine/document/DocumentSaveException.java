package org.quire.engine.document;

import java.io.IOException;
import java.nio.file.Path;

/**
 * A document or file that could not be saved: the message names the file and the folder and says why (no
 * space left, the folder cannot be written, the folder is not a folder). The file that was there before is
 * left as it was.
 */
public final class DocumentSaveException extends IOException {
    private static final long serialVersionUID = 1L;
    private final transient Path file;

    DocumentSaveException(Path file, String reason, Throwable cause) {
        super("cannot save " + file.getFileName() + " in the folder " + folderOf(file) + ": " + reason, cause);
        this.file = file;
    }

    private static Path folderOf(Path file) {
        Path p = file.toAbsolutePath().getParent();
        return p == null ? file.toAbsolutePath() : p;
    }

    /** @return the file that was to be written */
    public Path file() {
        return file;
    }
}
