package org.quire.app.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Component;
import java.awt.Rectangle;
import java.util.ArrayList;
import java.util.List;
import javax.swing.JComponent;
import javax.swing.SwingUtilities;
import org.junit.jupiter.api.Test;
import org.quire.app.ui.notebook.BudgetEditor;

/**
 * The first window on a 1366 x 768 screen: it fits, and every settings control of the results and the Monte Carlo
 * sections is inside the visible width of the notebook (nothing hidden past the right edge).
 */
class SmallScreenGuiTest extends GuiTestSupport {

    @Test
    void everySettingsControlIsVisibleInA1366By768Window() throws Exception {
        onEdt(() -> {
            frame.setExtendedState(java.awt.Frame.NORMAL);
            frame.setBounds(WorkbenchFrame.clamp(new Rectangle(0, 0, 1366, 768), new Rectangle(0, 0, 1366, 768)));
            frame.validate();
            return null;
        });
        BudgetEditor ed = openDemo();
        assertEquals(1366, (int) onEdt(frame::getWidth));
        assertEquals(768, (int) onEdt(frame::getHeight));
        for (String section : List.of("Results (GUM)", "Monte Carlo check")) {
            onEdt(() -> { ed.revealSection(section); return null; });
            Thread.sleep(200);
            List<String> hidden = onEdt(() -> {
                ed.validate();
                List<String> out = new ArrayList<>();
                Rectangle view = ed.getVisibleRect();
                for (String name : List.of("coverageProbability", "significantDigits", "mcTrials", "mcSeed",
                        "mcAdaptive", "mcRun", "mcCancel")) {
                    Component c = WorkbenchEditingTest.find(ed, name);
                    if (c == null) {
                        out.add(name + " missing");
                        continue;
                    }
                    Rectangle r = SwingUtilities.convertRectangle(c.getParent(), c.getBounds(), ed);
                    if (r.x < 0 || r.x + r.width > view.width || c.getWidth() == 0) {
                        out.add(name + " at " + r + " outside the editor's width " + view.width);
                    }
                }
                return out;
            });
            assertEquals(List.of(), hidden, "in the section " + section);
        }
        assertTrue(onEdt(() -> ((JComponent) WorkbenchEditingTest.find(frame.getContentPane(), "inspector"))
                .getWidth()) > 200, "the inspector has room");
    }

    @Test
    void boundsLargerThanTheScreenAreClampedIntoIt() {
        Rectangle screen = new Rectangle(0, 0, 1366, 728);
        assertEquals(new Rectangle(0, 0, 1366, 728), WorkbenchFrame.clamp(new Rectangle(100, 50, 1440, 900), screen));
        assertEquals(new Rectangle(566, 328, 800, 400), WorkbenchFrame.clamp(new Rectangle(900, 500, 800, 400), screen));
    }
}
