package org.quire.engine.document;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFileAttributeView;
import java.nio.file.attribute.PosixFilePermission;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Issue 11: every file Quire wrote was mode 0600 whatever the umask, and re-saving a 0644 budget made it 0600.
 * The expected mode of a new file is the one the operating system gives any new file in the folder (the umask's
 * mode, POSIX.1-2017 open() with mode 0666), found by creating one beside it.
 */
class FilePermissionsTest {

    private static Set<PosixFilePermission> umaskMode(Path dir) throws Exception {
        Path probe = Files.createFile(dir.resolve("probe"));
        Set<PosixFilePermission> p = Files.getPosixFilePermissions(probe);
        Files.delete(probe);
        return p;
    }

    @Test
    void aNewFileGetsTheUmasksModeAndAResaveKeepsTheFilesMode(@TempDir Path dir) throws Exception {
        assumeTrue(Files.getFileStore(dir).supportsFileAttributeView(PosixFileAttributeView.class));
        Path f = dir.resolve("budget.json");
        DocumentStore.writeAtomically(f, "{}".getBytes(StandardCharsets.UTF_8), true);
        assertEquals(umaskMode(dir), Files.getPosixFilePermissions(f));
        for (String mode : new String[] {"rw-r--r--", "rw-r-----"}) {
            Files.setPosixFilePermissions(f, PosixFilePermissions.fromString(mode));
            DocumentStore.writeAtomically(f, "{\"a\":1}".getBytes(StandardCharsets.UTF_8), true);
            assertEquals(mode, PosixFilePermissions.toString(Files.getPosixFilePermissions(f)));
            assertEquals("{\"a\":1}", Files.readString(f));
        }
        Path report = dir.resolve("report.html");
        DocumentStore.writeAtomically(report, out -> out.write("<p>".getBytes(StandardCharsets.UTF_8)));
        assertEquals(umaskMode(dir), Files.getPosixFilePermissions(report));
    }

    @Test
    void aRecoveryCopyStaysPrivate(@TempDir Path dir) throws Exception {
        assumeTrue(Files.getFileStore(dir).supportsFileAttributeView(PosixFileAttributeView.class));
        Path f = dir.resolve("x.recovery.json");
        DocumentStore.writePrivately(f, "{}".getBytes(StandardCharsets.UTF_8));
        assertEquals("rw-------", PosixFilePermissions.toString(Files.getPosixFilePermissions(f)));
    }
}
