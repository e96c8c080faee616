package org.quire.engine.document;

import java.io.IOException;
import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.channels.OverlappingFileLockException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.UUID;

/**
 * One recovery folder per running program: each running workbench claims a folder {@code session-ID} inside the
 * recovery folder and holds an operating-system lock on its file {@code session.lock} while it runs. Copies it
 * keeps go to its own folder, so a second workbench started beside it is never offered the first one's work.
 * When a workbench stops (normally or by a crash) the operating system releases its lock; the next workbench
 * that starts finds the folder unlocked and offers its copies ({@link #orphans}).
 *
 * <p>Copies written by a version of Quire that kept them directly in the recovery folder are offered as one more
 * orphan (the folder itself, without a lock file).
 *
 * <p>Not thread-safe: use one instance from one thread.
 */
public final class RecoverySessions {
    private static final String PREFIX = "session-";
    /** The lock file inside each session folder. */
    public static final String LOCK_FILE = "session.lock";

    private final Path base;

    private RecoverySessions(Path base) {
        this.base = base;
    }

    /** @param base the recovery folder (created on {@link #claim} when missing) */
    public static RecoverySessions in(Path base) {
        return new RecoverySessions(Objects.requireNonNull(base, "base").toAbsolutePath());
    }

    public Path base() {
        return base;
    }

    /** A session folder and the lock on it; closing releases the lock and removes the folder when it is empty. */
    public static final class Session implements AutoCloseable {
        private final Path folder;
        private final FileChannel channel;
        private final FileLock lock;

        private Session(Path folder, FileChannel channel, FileLock lock) {
            this.folder = folder;
            this.channel = channel;
            this.lock = lock;
        }

        /** @return the session folder */
        public Path folder() {
            return folder;
        }

        /** @return the recovery store of this session's folder */
        public RecoveryStore store() {
            return RecoveryStore.of(folder);
        }

        /** @return whether this session still holds its lock */
        public boolean isHeld() {
            return lock != null && lock.isValid();
        }

        /**
         * Moves a recovery copy into this session's folder (the same file name), so that it is kept by this
         * session from now on.
         *
         * @return the moved file
         */
        public Path adopt(Path copy) throws IOException {
            Files.createDirectories(folder);
            return Files.move(copy, folder.resolve(copy.getFileName()), StandardCopyOption.REPLACE_EXISTING);
        }

        /** Releases the lock; the folder (and its lock file) is removed when no copy is left in it. */
        @Override
        public void close() throws IOException {
            try {
                if (lock != null && lock.isValid()) {
                    lock.release();
                }
            } finally {
                if (channel != null) {
                    channel.close();
                }
            }
            if (lock != null && isEmptyButLock(folder)) {
                Files.deleteIfExists(folder.resolve(LOCK_FILE));
                try {
                    Files.deleteIfExists(folder);
                } catch (java.nio.file.DirectoryNotEmptyException e) {
                    // a copy was written meanwhile: the folder stays, to be offered next time
                }
            }
        }
    }

    private static boolean isEmptyButLock(Path folder) throws IOException {
        if (!Files.isDirectory(folder)) {
            return false;
        }
        try (DirectoryStream<Path> s = Files.newDirectoryStream(folder)) {
            for (Path p : s) {
                if (!p.getFileName().toString().equals(LOCK_FILE)) {
                    return false;
                }
            }
        }
        return true;
    }

    /**
     * Creates and locks a new session folder for this running program.
     *
     * @throws DocumentSaveException naming the folder when it cannot be created or locked
     */
    public Session claim() throws IOException {
        Path folder = base.resolve(PREFIX + UUID.randomUUID());
        try {
            Files.createDirectories(folder);
            FileChannel ch = FileChannel.open(folder.resolve(LOCK_FILE), StandardOpenOption.CREATE,
                    StandardOpenOption.WRITE);
            FileLock lock;
            try {
                lock = ch.tryLock();
            } catch (IOException | RuntimeException e) {
                ch.close();
                throw e;
            }
            if (lock == null) {
                ch.close();
                throw new IOException("the lock is held by another program");
            }
            return new Session(folder, ch, lock);
        } catch (IOException e) {
            throw new DocumentSaveException(folder, "the recovery folder cannot be created or locked: "
                    + e.getMessage(), e);
        }
    }

    /**
     * @return the session folders of workbenches that are no longer running (their lock is free) and that hold
     *     recovery copies, each locked by the caller until closed; plus the recovery folder itself when it holds
     *     copies of an earlier version (not locked). Folders of running workbenches are left out.
     */
    public List<Session> orphans() throws IOException {
        List<Session> out = new ArrayList<>();
        if (!Files.isDirectory(base)) {
            return out;
        }
        if (!RecoveryStore.of(base).pending().isEmpty()) {
            out.add(new Session(base, null, null));
        }
        try (DirectoryStream<Path> s = Files.newDirectoryStream(base, PREFIX + "*")) {
            for (Path folder : s) {
                if (!Files.isDirectory(folder)) {
                    continue;
                }
                Session orphan = tryLock(folder);
                if (orphan == null) {
                    continue;
                }
                if (orphan.store().pending().isEmpty() && isEmptyButLock(folder)) {
                    orphan.close(); // a workbench that stopped with nothing unsaved: its empty folder goes
                } else {
                    out.add(orphan);
                }
            }
        }
        return out;
    }

    /** @return the folder locked by the caller, or null when a running program holds its lock */
    private static Session tryLock(Path folder) throws IOException {
        FileChannel ch;
        try {
            ch = FileChannel.open(folder.resolve(LOCK_FILE), StandardOpenOption.CREATE, StandardOpenOption.WRITE);
        } catch (IOException e) {
            return null;
        }
        FileLock lock;
        try {
            lock = ch.tryLock();
        } catch (OverlappingFileLockException e) {
            lock = null; // held by this same program (another workbench window of this process)
        } catch (IOException e) {
            ch.close();
            throw e;
        }
        if (lock == null) {
            ch.close();
            return null;
        }
        return new Session(folder, ch, lock);
    }
}
