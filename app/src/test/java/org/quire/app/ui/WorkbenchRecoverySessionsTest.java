package org.quire.app.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.awt.EventQueue;
import java.awt.Window;
import java.nio.file.Path;
import javax.swing.JButton;
import org.junit.jupiter.api.Test;
import org.quire.app.ui.notebook.BudgetEditor;

/**
 * Each running workbench keeps its recovery copies in a folder of its own: a second workbench started beside the
 * first is not offered the first one's copy; once the first has stopped without clearing its copies (a crash),
 * the next workbench is.
 */
class WorkbenchRecoverySessionsTest extends GuiTestSupport {

    private static boolean recoveryDialogShowing() {
        for (Window w : Window.getWindows()) {
            if (w.isShowing() && "recovery".equals(w.getName())) {
                return true;
            }
        }
        return false;
    }

    @Test
    void aSecondWorkbenchIsNotOfferedTheFirstsCopyButTheNextStartAfterACrashIs() throws Exception {
        node.putInt("autosaveMinutes", 1);
        WorkbenchFrame first = newFrameOnSamePreferences();
        BudgetEditor ed = onEdt(first::openDemo);
        onEdt(() -> ed.edit("Edit notes", "", b -> b.withNotes("unsaved work of the first workbench")));
        assertEquals(1, (int) onEdt(() -> first.recovery().flush()).get(10, java.util.concurrent.TimeUnit.SECONDS), "one copy written");
        Path firstFolder = onEdt(() -> first.recovery().store().folder());

        WorkbenchFrame second = newFrameOnSamePreferences();
        try {
            assertFalse(firstFolder.equals(onEdt(() -> second.recovery().store().folder())),
                    "the second workbench has a folder of its own");
            onEdt(() -> { second.offerRecovery(); return null; });
            Thread.sleep(1500); // the folders are listed off the event thread
            assertFalse(onEdt(WorkbenchRecoverySessionsTest::recoveryDialogShowing),
                    "the running first workbench's copy is not offered to the second");

            onEdt(() -> { first.dispose(); return null; });
            first.recoveryClosed().get(10, java.util.concurrent.TimeUnit.SECONDS); // stops with the changed budget open: its copy stays
            assertEquals(1, recoveryCopies());
            WorkbenchFrame third = newFrameOnSamePreferences();
            try {
                EventQueue.invokeLater(third::offerRecovery);
                RecoveryDialog dlg = waitForWindow("recovery", RecoveryDialog.class);
                assertEquals(1, (int) onEdt(() -> dlg.table().getRowCount()), "the stopped workbench's copy");
                onEdt(() -> { ((JButton) named(dlg.getContentPane(), "restore")).doClick(); return null; });
                waitFor("the restored budget", () -> third.editors().size() == 1);
                assertEquals("unsaved work of the first workbench",
                        onEdt(() -> third.editors().get(0).document().budget().notes()));
                assertEquals(onEdt(() -> third.recovery().store().folder()),
                        onEdt(() -> third.recovery().store().pending().get(0).file().getParent()),
                        "the restored copy is kept by the workbench that restored it");
                assertFalse(java.nio.file.Files.exists(firstFolder), "the stopped workbench's emptied folder is gone");
            } finally {
                onEdt(() -> {
                    for (BudgetEditor e : third.editors()) {
                        third.forceClose(e);
                    }
                    third.dispose();
                    return null;
                });
            }
        } finally {
            onEdt(() -> {
                second.dispose();
                if (first.isDisplayable()) {
                    first.dispose();
                }
                return null;
            });
        }
    }
}
