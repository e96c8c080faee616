package org.quire.app.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Point;
import java.awt.Rectangle;
import java.awt.Robot;
import java.awt.event.InputEvent;
import javax.swing.JTable;
import javax.swing.JTextField;
import org.junit.jupiter.api.Test;
import org.quire.app.ui.notebook.BudgetEditor;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.TypeA;
import org.quire.engine.budget.TypeB;

/**
 * An edit belongs to the input it was made on: text typed into the inspector and not yet confirmed, followed by a
 * click on another row with no pause between (the press arrives before the field loses the focus), goes to the
 * input it was typed for, and the newly selected input stays as it was.
 */
class WorkbenchFastClickTest extends GuiTestSupport {

    private static int row(JTable t, String input) {
        for (int r = 0; r < t.getRowCount(); r++) {
            if (t.getModel().getValueAt(r, 0).equals(input)) {
                return r;
            }
        }
        throw new AssertionError("no input " + input + " in the table");
    }

    @Test
    void aRobotClickOnAnotherRowKeepsTheEditWithItsOwnInput() throws Exception {
        typeThenClickAnotherRow(true);
    }

    /**
     * The press and release are dispatched in one turn of the event thread, as on a desktop where the focus
     * events of the press arrive after it: the selection moves before the field hears that it lost the focus.
     */
    @Test
    void aPressBeforeTheFocusLeavesKeepsTheEditWithItsOwnInput() throws Exception {
        typeThenClickAnotherRow(false);
    }

    /**
     * Text the engine refuses is neither applied to the next input nor dropped: it stays as the draft of its own
     * input, shown again when that input is selected again, and the status line says so.
     */
    @Test
    void refusedTextIsKeptForItsOwnInput() throws Exception {
        BudgetEditor ed = openDemo();
        Budget before = ed.document().budget();
        onEdt(() -> {
            ed.revealSection("Inputs");
            ed.selectInput("d_res_m");
            return null;
        });
        JTextField halfWidth = onEdt(() -> named(frame.getContentPane(), "param:halfWidth"));
        JTextField description = onEdt(() -> named(frame.getContentPane(), "inspector:Description"));
        onEdt(() -> {
            halfWidth.setText("0,00x");
            description.setText("Resolution of the meter's display, as typed");
            JTable t = ed.inputsTable();
            int r = row(t, "V_ind");
            t.getSelectionModel().setSelectionInterval(r, r);
            return null;
        });
        waitFor("V_ind selected", () -> "V_ind".equals(ed.selectedInput()));
        Budget after = ed.document().budget();
        assertEquals(before.input("V_ind"), after.input("V_ind"), "the newly selected input is untouched");
        assertEquals(before.input("d_res_m").evaluation(), after.input("d_res_m").evaluation(),
                "the refused half-width is not applied");
        assertEquals("Resolution of the meter's display, as typed", after.input("d_res_m").description(),
                "the description typed for d_res_m went to d_res_m");
        assertTrue(onEdt(frame::statusText).contains("d_res_m"), "the status line names the input the text is kept for");
        onEdt(() -> {
            ed.selectInput("d_res_m");
            return null;
        });
        assertEquals("0,00x", onEdt(halfWidth::getText), "the draft is shown again with its input");
    }

    private void typeThenClickAnotherRow(boolean withRobot) throws Exception {
        BudgetEditor ed = openDemo();
        Budget before = ed.document().budget();
        assertInstanceOf(TypeA.class, before.input("V_ind").evaluation(), "the demo's V_ind is a Type A input");
        onEdt(() -> {
            ed.revealSection("Inputs");
            ed.selectInput("d_res_m");
            return null;
        });
        JTextField halfWidth = onEdt(() -> named(frame.getContentPane(), "param:halfWidth"));
        waitFor("the inspector showing d_res_m", () -> halfWidth.isShowing() && !halfWidth.getText().isEmpty());
        Robot robot = new Robot();
        robot.setAutoDelay(0);
        clickAt(robot, onEdt(() -> centre(halfWidth, halfWidth.getBounds())));
        waitFor("the half-width field focused", halfWidth::isFocusOwner);
        // typed, not confirmed with Enter
        onEdt(() -> {
            halfWidth.selectAll();
            halfWidth.replaceSelection("0.007");
            return null;
        });
        JTable table = ed.inputsTable();
        Point target = onEdt(() -> {
            Rectangle cell = table.getCellRect(row(table, "V_ind"), 0, true);
            table.scrollRectToVisible(cell);
            return centre(table, table.getCellRect(row(table, "V_ind"), 0, true));
        });
        if (withRobot) {
            clickAt(robot, target);
        } else {
            onEdt(() -> {
                Point at = new Point(target);
                javax.swing.SwingUtilities.convertPointFromScreen(at, table);
                long now = System.currentTimeMillis();
                table.dispatchEvent(new java.awt.event.MouseEvent(table, java.awt.event.MouseEvent.MOUSE_PRESSED, now,
                        InputEvent.BUTTON1_DOWN_MASK, at.x, at.y, 1, false, java.awt.event.MouseEvent.BUTTON1));
                table.dispatchEvent(new java.awt.event.MouseEvent(table, java.awt.event.MouseEvent.MOUSE_RELEASED, now,
                        0, at.x, at.y, 1, false, java.awt.event.MouseEvent.BUTTON1));
                table.dispatchEvent(new java.awt.event.MouseEvent(table, java.awt.event.MouseEvent.MOUSE_CLICKED, now,
                        0, at.x, at.y, 1, false, java.awt.event.MouseEvent.BUTTON1));
                return null;
            });
        }
        waitFor("the table focused", table::isFocusOwner);
        waitFor("V_ind selected", () -> "V_ind".equals(ed.selectedInput()));
        robot.waitForIdle();
        onEdt(() -> null);
        Budget after = ed.document().budget();
        assertEquals(before.input("V_ind"), after.input("V_ind"), "the newly selected input is untouched");
        TypeB own = assertInstanceOf(TypeB.class, after.input("d_res_m").evaluation());
        assertEquals("rectangular", own.distributionName());
        // the typed half-width, read back from the budget's own parameters
        assertEquals(0.007, own.parameters().get("halfWidth"), 0.0, "the typed value went to its own input");
        assertTrue(onEdt(() -> frame.isShowing()));
    }

    private static Point centre(java.awt.Component c, Rectangle r) {
        Point p = c.getLocationOnScreen();
        return new Point(p.x + r.x + r.width / 2 - (c instanceof JTable ? 0 : r.x), p.y + r.y + r.height / 2
                - (c instanceof JTable ? 0 : r.y));
    }

    /** A press and release with no pause, as a touchpad tap gives. */
    private static void clickAt(Robot robot, Point p) {
        robot.mouseMove(p.x, p.y);
        robot.mousePress(InputEvent.BUTTON1_DOWN_MASK);
        robot.mouseRelease(InputEvent.BUTTON1_DOWN_MASK);
    }
}
