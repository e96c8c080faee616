package org.quire.app.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.awt.Component;
import java.awt.Rectangle;
import javax.swing.JSplitPane;
import javax.swing.SwingUtilities;
import org.junit.jupiter.api.Test;

/**
 * The inspector keeps its width: when the window changes width it is the notebook that gives or takes the room,
 * a divider moved by the user sets the width kept, and the next start of the workbench brings it back.
 */
class PaneLayoutGuiTest extends GuiTestSupport {

    private static JSplitPane split(WorkbenchFrame f) {
        Component inspector = WorkbenchEditingTest.find(f.getContentPane(), "inspector");
        return (JSplitPane) SwingUtilities.getAncestorOfClass(JSplitPane.class, inspector);
    }

    private static int inspectorWidth(WorkbenchFrame f) {
        JSplitPane s = split(f);
        return s.getWidth() - s.getDividerLocation();
    }

    private void resize(WorkbenchFrame f, int width) throws Exception {
        onEdt(() -> {
            f.setExtendedState(java.awt.Frame.NORMAL);
            f.setBounds(new Rectangle(0, 0, width, 760));
            f.validate();
            return null;
        });
        waitFor("the window " + width + " px wide", () -> Math.abs(f.getWidth() - width) <= 2);
    }

    @Test
    void theInspectorKeepsItsWidthAsTheWindowChangesAndAfterARestart() throws Exception {
        openDemo();
        waitFor("the inspector at its default width", () -> inspectorWidth(frame) == 340);
        resize(frame, 1000);
        waitFor("340 px at 1000 px", () -> inspectorWidth(frame) == 340);
        resize(frame, 1400);
        waitFor("340 px at 1400 px", () -> inspectorWidth(frame) == 340);
        // the user drags the divider 60 px to the left: the inspector is then 400 px and keeps that
        onEdt(() -> { JSplitPane s = split(frame); s.setDividerLocation(s.getWidth() - 400); return null; });
        resize(frame, 1200);
        waitFor("400 px at 1200 px", () -> inspectorWidth(frame) == 400);
        onEdt(() -> { frame.closeAllAndDispose(); return null; });
        frame = newFrameOnSamePreferences();
        openDemo();
        waitFor("400 px after a restart", () -> frame.getWidth() > 0 && inspectorWidth(frame) == 400);
        assertEquals(400, (int) onEdt(() -> inspectorWidth(frame)));
    }
}
