package org.quire.app.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import javax.swing.JTable;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.quire.app.ui.compare.CompareWindow;
import org.quire.app.ui.notebook.BudgetEditor;

/** Budget &gt; Compare with: the side-by-side view lists a changed input and each output's U in A and B. */
class WorkbenchCompareTest extends GuiTestSupport {
    @TempDir
    Path dir;

    @Test
    void theComparisonListsTheChangedInputAndEachOutput() throws Exception {
        BudgetEditor ed = openDemo();
        Path earlier = dir.resolve("earlier.json");
        assertTrue(await(onEdt(() -> frame.saveTo(ed, earlier))));
        onEdt(() -> ed.edit("Change source", "", b -> b.withInput("I_net", b.input("I_net")
                .withSource("TVFL balance B2, certificate 2026-02"))));
        onEdt(() -> { frame.compareWith(ed, earlier); return null; });
        CompareWindow w = waitForWindow("compare", CompareWindow.class);
        try {
            JTable changes = w.changesTable();
            boolean listed = onEdt(() -> {
                for (int r = 0; r < changes.getRowCount(); r++) {
                    if ("input".equals(changes.getValueAt(r, 0)) && "I_net".equals(changes.getValueAt(r, 1))
                            && "TVFL balance B2, certificate 2026-02".equals(changes.getValueAt(r, 4))) {
                        return true;
                    }
                }
                return false;
            });
            assertTrue(listed, "I_net is listed as changed, with its new source on the side of B (the open budget)");
            JTable effects = w.effectsTable();
            assertEquals(2, (int) onEdt(effects::getRowCount), "one row per output: E and q");
            assertEquals("E", onEdt(() -> effects.getValueAt(0, 0)));
            assertEquals(onEdt(() -> effects.getValueAt(0, 3)), onEdt(() -> effects.getValueAt(0, 6)),
                    "a changed source leaves U as it was");
            assertTrue(onEdt(() -> w.modelTable().getRowCount()) > 0, "the model is shown line against line");
        } finally {
            onEdt(() -> { w.dispose(); return null; });
        }
    }
}
