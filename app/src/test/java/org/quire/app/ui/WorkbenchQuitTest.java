package org.quire.app.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.EventQueue;
import java.awt.Window;
import java.util.List;
import java.util.concurrent.atomic.AtomicReference;
import javax.swing.AbstractButton;
import javax.swing.JDialog;
import org.junit.jupiter.api.Test;
import org.quire.app.ui.notebook.BudgetEditor;

/** Quit asks about every changed budget before it closes any, with Save, Don't save and Cancel. */
class WorkbenchQuitTest extends GuiTestSupport {

    /** Waits for the prompt, checks its three answers, and presses {@code answer}. */
    private static void answer(String answer) throws Exception {
        AtomicReference<JDialog> d = new AtomicReference<>();
        waitFor("the save prompt", () -> {
            for (Window w : Window.getWindows()) {
                if (w.isShowing() && w instanceof JDialog && "Quit Quire".equals(((JDialog) w).getTitle())) {
                    d.set((JDialog) w);
                    return true;
                }
            }
            return false;
        });
        onEdt(() -> {
            List<AbstractButton> buttons = new java.util.ArrayList<>();
            collect(d.get().getContentPane(), buttons);
            assertEquals(List.of("Save", "Don't save", "Cancel"), buttons.stream().map(AbstractButton::getText).toList());
            buttons.stream().filter(b -> b.getText().equals(answer)).findFirst().orElseThrow().doClick();
            return null;
        });
    }

    private static void collect(java.awt.Container c, List<AbstractButton> out) {
        for (java.awt.Component k : c.getComponents()) {
            if (k instanceof AbstractButton) {
                out.add((AbstractButton) k);
            } else if (k instanceof java.awt.Container) {
                collect((java.awt.Container) k, out);
            }
        }
    }

    @Test
    void cancellingAtTheSecondBudgetClosesNone() throws Exception {
        BudgetEditor a = openDemo();
        BudgetEditor b = openDemo();
        onEdt(() -> {
            for (BudgetEditor e : List.of(a, b)) {
                e.edit("Edit notes", "", x -> x.withNotes("changed"));
            }
            return null;
        });
        EventQueue.invokeLater(frame::quit);
        answer("Don't save");
        answer("Cancel");
        waitFor("the prompts gone", () -> java.util.Arrays.stream(Window.getWindows())
                .noneMatch(w -> w.isShowing() && w instanceof JDialog));
        assertEquals(2, (int) onEdt(() -> frame.editors().size()), "no budget was closed");
        assertTrue(onEdt(frame::isDisplayable));
        EventQueue.invokeLater(frame::quit);
        answer("Don't save");
        answer("Don't save");
        waitFor("the workbench closed", () -> !frame.isDisplayable());
        assertEquals(0, (int) onEdt(() -> frame.editors().size()));
    }
}
