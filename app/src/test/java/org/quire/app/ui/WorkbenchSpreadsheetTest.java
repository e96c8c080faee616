package org.quire.app.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Toolkit;
import java.awt.datatransfer.DataFlavor;
import java.awt.datatransfer.StringSelection;
import java.awt.event.KeyEvent;
import javax.swing.JComponent;
import javax.swing.JTable;
import javax.swing.KeyStroke;
import org.junit.jupiter.api.Test;
import org.quire.app.ui.notebook.BudgetEditor;
import org.quire.engine.budget.Budget;

/**
 * The inputs table and the readings grid behave like a spreadsheet: a block pasted with tabs or semicolons, a
 * decimal comma where it is unambiguous, typing replaces a cell, Copy writes the headers and the numbers as shown.
 */
class WorkbenchSpreadsheetTest extends GuiTestSupport {

    private static int row(JTable t, String input) {
        for (int r = 0; r < t.getRowCount(); r++) {
            if (t.getModel().getValueAt(r, 0).equals(input)) {
                return r;
            }
        }
        throw new AssertionError("no input " + input);
    }

    private static void press(JComponent c, int key, int modifiers) {
        KeyStroke k = KeyStroke.getKeyStroke(key, modifiers);
        Object name = c.getInputMap(JComponent.WHEN_FOCUSED).get(k);
        if (name == null) {
            name = c.getInputMap(JComponent.WHEN_ANCESTOR_OF_FOCUSED_COMPONENT).get(k);
        }
        c.getActionMap().get(name).actionPerformed(new java.awt.event.ActionEvent(c, 0, String.valueOf(name)));
    }

    private static int menu() {
        return Toolkit.getDefaultToolkit().getMenuShortcutKeyMaskEx();
    }

    @Test
    void aBlockPastedIntoTheInputsTableIsOneEditReadByTheNumberRule() throws Exception {
        BudgetEditor ed = openDemo();
        Budget before = ed.document().budget();
        JTable t = ed.inputsTable();
        onEdt(() -> {
            int r = row(t, "T_tank");
            assertEquals("T_meter", t.getModel().getValueAt(r + 1, 0), "T_meter follows T_tank in the demo");
            t.changeSelection(r, 3, false, false);
            // estimate to standard uncertainty of two inputs, tab-separated with decimal commas
            Toolkit.getDefaultToolkit().getSystemClipboard().setContents(
                    new StringSelection("20,55\tType B\tnormal\t0,04\n20,25\tType B\tnormal\t0,06\n"), null);
            press(t, KeyEvent.VK_V, menu());
            return null;
        });
        Budget after = ed.document().budget();
        assertEquals(20.55, after.input("T_tank").evaluation().estimate(), 0.0);
        assertEquals(0.04, after.input("T_tank").evaluation().standardUncertainty(), 0.0);
        assertEquals(20.25, after.input("T_meter").evaluation().estimate(), 0.0);
        assertEquals(0.06, after.input("T_meter").evaluation().standardUncertainty(), 0.0);
        onEdt(() -> { ed.document().undo(); return null; });
        assertEquals(before, ed.document().budget(), "one Undo takes the whole paste back");
    }

    @Test
    void anAmbiguousPastedNumberIsRefusedWithItsPlace() throws Exception {
        BudgetEditor ed = openDemo();
        Budget before = ed.document().budget();
        JTable t = ed.inputsTable();
        onEdt(() -> {
            t.changeSelection(row(t, "T_tank"), 3, false, false);
            Toolkit.getDefaultToolkit().getSystemClipboard().setContents(new StringSelection("1,002\n"), null);
            press(t, KeyEvent.VK_V, menu());
            return null;
        });
        assertEquals(before, ed.document().budget(), "1,002 may be one thousand and two: not taken");
        String status = onEdt(frame::statusText);
        assertTrue(status.contains("1,002") && status.contains("line 1"), status);
    }

    @Test
    void typingIntoASelectedCellReplacesItsValue() throws Exception {
        BudgetEditor ed = openDemo();
        JTable t = ed.inputsTable();
        onEdt(() -> {
            int r = row(t, "T_tank");
            t.changeSelection(r, 3, false, false);
            t.requestFocusInWindow();
            return null;
        });
        waitFor("the table focused", t::isFocusOwner);
        onEdt(() -> {
            for (char ch : "21.5".toCharArray()) {
                KeyEvent typed = new KeyEvent(t, KeyEvent.KEY_PRESSED, System.currentTimeMillis(), 0,
                        KeyEvent.getExtendedKeyCodeForChar(ch), ch);
                java.awt.Component target = t.isEditing() ? t.getEditorComponent() : t;
                target.dispatchEvent(typed);
                target = t.isEditing() ? t.getEditorComponent() : t;
                target.dispatchEvent(new KeyEvent(target, KeyEvent.KEY_TYPED, System.currentTimeMillis(), 0,
                        KeyEvent.VK_UNDEFINED, ch));
            }
            t.getCellEditor().stopCellEditing();
            return null;
        });
        assertEquals(21.5, ed.document().budget().input("T_tank").evaluation().estimate(), 0.0,
                "the typed value replaced 20.42 instead of being appended to it");
    }

    @Test
    void copyWritesHeadersAndTheNumbersAsShown() throws Exception {
        BudgetEditor ed = openDemo();
        String copied = onEdt(() -> {
            JTable t = named(ed.resultsPanel(), "budget:E");
            t.changeSelection(0, 0, false, false);
            t.changeSelection(1, t.getColumnCount() - 1, false, true);
            press(t, KeyEvent.VK_C, menu());
            return (String) Toolkit.getDefaultToolkit().getSystemClipboard().getData(DataFlavor.stringFlavor);
        });
        String[] lines = copied.split("\n");
        assertEquals(3, lines.length, copied);
        assertTrue(lines[0].startsWith("Input\tEvaluation\tDistribution"), lines[0]);
        assertTrue(lines[0].endsWith("Share of combined variance / %"), lines[0]);
        String[] first = lines[1].split("\t");
        // the share as a percentage with one decimal, as the table shows it (not a fraction such as 0.62)
        assertTrue(first[first.length - 1].matches("\\d{1,3}\\.\\d"), lines[1]);
        assertTrue(!lines[1].contains("E-") && !lines[1].contains("e-"), "no raw doubles: " + lines[1]);
    }

    @Test
    void aRowPastedIntoTheReadingsGridFillsItFromTheSelectedReading() throws Exception {
        JTable grid = readingsGridOfTheDemo();
        onEdt(() -> {
            grid.clearSelection();
            Toolkit.getDefaultToolkit().getSystemClipboard().setContents(
                    new StringSelection("1002,1;1002,4\n"), null);
            press(grid, KeyEvent.VK_V, menu());
            javax.swing.JLabel pr = named(frame.getContentPane(), "inspectorProblem");
            assertEquals(3, grid.getRowCount(), pr.getText() + " two readings and the empty row to type the next into");
            assertEquals("1002.4", grid.getValueAt(1, 1));
            grid.changeSelection(1, 1, false, false);
            Toolkit.getDefaultToolkit().getSystemClipboard().setContents(
                    new StringSelection("1002,4\t1002,3\t1002,6\n"), null);
            press(grid, KeyEvent.VK_V, menu());
            return null;
        });
        assertEquals("1002.1", onEdt(() -> grid.getValueAt(0, 1)));
        assertEquals("1002.4", onEdt(() -> grid.getValueAt(1, 1)));
        assertEquals("1002.3", onEdt(() -> grid.getValueAt(2, 1)));
        assertEquals("1002.6", onEdt(() -> grid.getValueAt(3, 1)));
    }

    /** @return the readings grid of the demo budget's Type A input V_ind, shown in the inspector */
    private JTable readingsGridOfTheDemo() throws Exception {
        BudgetEditor ed = openDemo();
        onEdt(() -> {
            ed.revealSection("Inputs");
            ed.selectInput("V_ind");
            return null;
        });
        JTable grid = onEdt(() -> named(frame.getContentPane(), "readings"));
        waitFor("the readings grid shown", grid::isShowing);
        return grid;
    }

    /** Each character as a real key press and release through the window system, as a user types it. */
    private static void typeWithRobot(java.awt.Robot robot, String text) {
        for (char ch : text.toCharArray()) {
            int key = ch == '.' ? KeyEvent.VK_PERIOD : ch == '\n' ? KeyEvent.VK_ENTER
                    : KeyEvent.getExtendedKeyCodeForChar(ch);
            robot.keyPress(key);
            robot.keyRelease(key);
        }
        robot.waitForIdle();
    }

    @Test
    void aSemicolonBlockOfSeveralLinesPastedIntoTheReadingsGridIsReadInReadingOrder() throws Exception {
        JTable grid = readingsGridOfTheDemo();
        onEdt(() -> {
            grid.clearSelection();
            // two lines of two cells, semicolon-separated with decimal commas, as a European spreadsheet copies
            Toolkit.getDefaultToolkit().getSystemClipboard().setContents(
                    new StringSelection("1002,1;1002,5\n1002,2;1002,6\n"), null);
            press(grid, KeyEvent.VK_V, menu());
            return null;
        });
        assertEquals(5, (int) onEdt(grid::getRowCount), "four readings and the empty row");
        String[] expected = {"1002.1", "1002.5", "1002.2", "1002.6"};
        for (int i = 0; i < expected.length; i++) {
            int r = i;
            assertEquals(expected[i], onEdt(() -> grid.getValueAt(r, 1)), "reading " + (i + 1));
        }
    }

    @Test
    void typingIntoASelectedReadingReplacesIt() throws Exception {
        JTable grid = readingsGridOfTheDemo();
        onEdt(() -> {
            grid.clearSelection();
            Toolkit.getDefaultToolkit().getSystemClipboard().setContents(
                    new StringSelection("1002.1\n1002.4\n1002.3\n"), null);
            press(grid, KeyEvent.VK_V, menu());
            frame.toFront();
            grid.changeSelection(1, 1, false, false);
            grid.requestFocusInWindow();
            return null;
        });
        waitFor("the grid focused", grid::isFocusOwner);
        java.awt.Robot robot = new java.awt.Robot();
        robot.setAutoDelay(5);
        typeWithRobot(robot, "1001.5\n");
        waitFor("the edit ended", () -> !grid.isEditing());
        assertEquals("1001.5", onEdt(() -> grid.getValueAt(1, 1)),
                "the typed reading replaced 1002.4 instead of being appended to it");
        assertEquals("1002.1", onEdt(() -> grid.getValueAt(0, 1)));
        assertEquals("1002.3", onEdt(() -> grid.getValueAt(2, 1)));
    }

    @Test
    void copyFromTheInputsTableWritesItsHeadersAndTheFiguresAsShown() throws Exception {
        BudgetEditor ed = openDemo();
        JTable t = ed.inputsTable();
        String copied = onEdt(() -> {
            int r = row(t, "T_tank");
            t.changeSelection(r, 0, false, false);
            t.changeSelection(r + 1, t.getColumnCount() - 1, false, true);
            press(t, KeyEvent.VK_C, menu());
            return (String) Toolkit.getDefaultToolkit().getSystemClipboard().getData(DataFlavor.stringFlavor);
        });
        String[] lines = copied.split("\n");
        assertEquals(3, lines.length, "the headers and two rows: " + copied);
        java.util.List<String> headers = onEdt(() -> {
            java.util.List<String> h = new java.util.ArrayList<>();
            for (int c = 0; c < t.getColumnCount(); c++) {
                h.add(t.getColumnName(c).replaceAll("<[^>]*>", "").strip());
            }
            return h;
        });
        assertEquals(String.join("\t", headers), lines[0], "the full headers, without markup");
        // the demo budget's T_tank: normal, estimate 20.42 degC, standard uncertainty 0.05 (the shipped demo file)
        java.util.List<String> tank = java.util.List.of(lines[1].split("\t"));
        assertEquals("T_tank", tank.get(0), lines[1]);
        assertTrue(tank.contains("20.42") && tank.contains("0.05"), "the estimate and u as shown: " + lines[1]);
        assertTrue(lines[2].startsWith("T_meter\t") && lines[2].contains("20.31"), lines[2]);
        assertTrue(!copied.contains("E-") && !copied.contains("e-"), "no raw doubles: " + copied);
    }
}
