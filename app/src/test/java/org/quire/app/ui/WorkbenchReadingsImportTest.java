package org.quire.app.ui;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.quire.app.ui.notebook.BudgetEditor;
import org.quire.engine.budget.TypeA;

/** A CSV file of readings dropped on the workbench becomes the selected input's Type A evaluation. */
class WorkbenchReadingsImportTest extends GuiTestSupport {
    @TempDir
    Path tmp;

    @Test
    void droppedReadingsBecomeTheSelectedInputsTypeAEvaluation() throws Exception {
        BudgetEditor ed = openDemo();
        Path csv = tmp.resolve("v-ind.csv");
        Files.writeString(csv, "run,reading\n1,1002.21\n2,1002.47\n3,1002.30\n4,1002.41\n5,1002.36\n");
        javax.swing.SwingUtilities.invokeLater(() -> frame.importReadings(csv));
        String none = takeMessageBox();
        assertTrue(none.contains("Select the input"), none);
        onEdt(() -> { ed.selectInput("V_ind"); return null; });
        assertTrue(await(onEdt(() -> frame.importReadings(csv))));
        TypeA a = (TypeA) ed.document().budget().input("V_ind").evaluation();
        assertArrayEquals(new double[] {1002.21, 1002.47, 1002.30, 1002.41, 1002.36}, a.readings(), 0);
        // mean of the five readings, by hand: 5011.75 / 5
        assertEquals(1002.35, a.estimate(), 1e-9);
        assertEquals(4, a.dof(), 0);
        onEdt(() -> { ed.document().undo(); return null; });
        assertTrue(ed.document().budget().input("V_ind").evaluation() instanceof TypeA);
        assertEquals(null, ((TypeA) ed.document().budget().input("V_ind").evaluation()).readings(),
                "undo brings the summary back");
        Files.writeString(csv, "reading\n1002.21\nabc\n");
        javax.swing.SwingUtilities.invokeLater(() -> frame.importReadings(csv));
        String bad = takeMessageBox();
        assertTrue(bad.contains("line 3, column 1") && bad.contains("\"abc\" is not a number"), bad);
        // issue 11: readings 1,002 / 1,004 / 1,003 became 1.0, 1.0, 1.0; now they are refused, not guessed
        Files.writeString(csv, "reading\n1,002\n1,004\n1,003\n");
        javax.swing.SwingUtilities.invokeLater(() -> frame.importReadings(csv));
        String ambiguous = takeMessageBox();
        assertTrue(ambiguous.contains("line 2, column 1 (reading): \"1,002\" is ambiguous"), ambiguous);
    }
}
