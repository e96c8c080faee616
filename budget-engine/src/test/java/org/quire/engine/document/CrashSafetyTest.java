package org.quire.engine.document;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicLong;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Kills a process that saves large documents in a loop at random moments and checks, after every kill, that the
 * file on disk is a complete document: the last version whose save returned, or the one being saved.
 */
class CrashSafetyTest {
    private static final int INPUTS = 300;
    private static final int KILLS = 20;

    static long generationOf(BudgetDocument d) {
        return Long.parseLong(d.budget().notes().replace("generation ", ""));
    }

    @Test
    void aKilledSaveLeavesTheCompleteOldOrTheCompleteNewFile(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("tv-g2-large.json");
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        SplittableRandom random = new SplittableRandom(20260302);
        int killedAfterASave = 0;
        long newest = 0;
        for (int run = 0; run < KILLS; run++) {
            Process p = new ProcessBuilder(java, "-XX:TieredStopAtLevel=1", "-XX:+UseSerialGC", "-cp",
                    System.getProperty("java.class.path"), CrashSaver.class.getName(), file.toString(),
                    Integer.toString(INPUTS), Long.toString(newest)).redirectErrorStream(true).start();
            AtomicLong lastSaved = new AtomicLong(-1);
            StringBuilder other = new StringBuilder();
            Thread reader = new Thread(() -> {
                try (BufferedReader r = new BufferedReader(new InputStreamReader(p.getInputStream(),
                        StandardCharsets.UTF_8))) {
                    for (String line = r.readLine(); line != null; line = r.readLine()) {
                        if (line.startsWith("saved ")) {
                            lastSaved.set(Long.parseLong(line.substring(6)));
                        } else {
                            synchronized (other) {
                                other.append(line).append('\n');
                            }
                        }
                    }
                } catch (java.io.IOException e) {
                    // the stream closes when the process is killed
                }
            });
            reader.start();
            // wait until the child saves, then kill it at a random moment of the following saves
            long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(10);
            while (lastSaved.get() < 0 && p.isAlive() && System.nanoTime() < deadline) {
                Thread.sleep(2);
            }
            assertTrue(lastSaved.get() >= 0, "the saving process did not start: " + other);
            long before = lastSaved.get();
            Thread.sleep(random.nextInt(1, 400));
            p.destroyForcibly();
            assertTrue(p.waitFor(10, TimeUnit.SECONDS));
            // every "saved" line the child wrote before it was killed is read before the file is checked
            reader.join(60000);
            assertTrue(!reader.isAlive(), "the child's output was not read to its end");
            long saved = lastSaved.get();
            BudgetDocument onDisk = DocumentStore.open(file);
            long g = generationOf(onDisk);
            assertTrue(g == saved || g == saved + 1, "run " + run + ": file holds generation " + g
                    + ", the last completed save was " + saved);
            assertTrue(g >= newest, "the file went back from generation " + newest + " to " + g);
            newest = g;
            assertEquals(BudgetDocument.newDraft(Fixtures.sumBudget(INPUTS, g), "crash test",
                    Instant.parse("2026-03-02T10:00:00Z")).budget(), onDisk.budget(), "run " + run);
            Path bak = DocumentStore.backupOf(file);
            if (Files.exists(bak)) {
                long b = generationOf(DocumentStore.open(bak));
                assertTrue(b <= g && b >= g - 2, "backup generation " + b + " beside " + g);
            }
            if (g > before) {
                killedAfterASave++;
            }
        }
        assertTrue(killedAfterASave > 0, "no save completed between the first report and the kill");
    }
}
