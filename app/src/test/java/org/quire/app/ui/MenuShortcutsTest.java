package org.quire.app.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Component;
import java.awt.Container;
import java.awt.event.InputEvent;
import java.awt.event.KeyEvent;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import javax.swing.JComponent;
import javax.swing.JMenuBar;
import javax.swing.JMenuItem;
import javax.swing.KeyStroke;
import org.junit.jupiter.api.Test;
import org.quire.app.ui.notebook.BudgetEditor;

/**
 * Every menu shortcut reaches its command: no text field, text pane, table, tree, list or other component binds
 * one of the menu's accelerators for itself (Ctrl+Shift+O used to turn the model text right-to-left).
 */
class MenuShortcutsTest extends GuiTestSupport {
    private static final int[] CONDITIONS = {JComponent.WHEN_FOCUSED, JComponent.WHEN_ANCESTOR_OF_FOCUSED_COMPONENT};

    @Test
    void noComponentBindsAMenuAcceleratorForItself() throws Exception {
        BudgetEditor ed = openDemo();
        onEdt(() -> {
            ed.selectInput("V_ind");
            return null;
        });
        List<String> clashes = onEdt(() -> {
            JMenuBar bar = frame.getJMenuBar();
            Set<KeyStroke> keys = KeyBindings.accelerators(bar);
            assertTrue(keys.contains(KeyStroke.getKeyStroke(KeyEvent.VK_O, menuMask() | InputEvent.SHIFT_DOWN_MASK)),
                    "Open for review has Ctrl+Shift+O");
            assertTrue(keys.size() >= 15, "the menus carry their shortcuts: " + keys);
            List<String> out = new ArrayList<>();
            List<Component> all = new ArrayList<>();
            walk(frame.getContentPane(), all);
            for (JComponent fresh : new JComponent[] {new javax.swing.JTextField(), new javax.swing.JTextPane(),
                new javax.swing.JTextArea(), new javax.swing.JEditorPane(), new javax.swing.JFormattedTextField(),
                new javax.swing.JTable(), new javax.swing.JTree(), new javax.swing.JList<String>(),
                new javax.swing.JComboBox<String>(), new javax.swing.JSpinner(), new javax.swing.JTabbedPane(),
                new javax.swing.JScrollPane(), new javax.swing.JSplitPane(), new javax.swing.JSlider()}) {
                all.add(fresh);
            }
            for (Component c : all) {
                if (!(c instanceof JComponent) || c instanceof JMenuItem || c instanceof JMenuBar) {
                    continue;
                }
                JComponent j = (JComponent) c;
                for (KeyStroke k : keys) {
                    for (int cond : CONDITIONS) {
                        Object action = j.getInputMap(cond).get(k);
                        if (action != null) {
                            out.add(c.getClass().getSimpleName() + " '" + c.getName() + "' binds " + k + " to " + action);
                        }
                    }
                    if (c instanceof javax.swing.text.JTextComponent
                            && ((javax.swing.text.JTextComponent) c).getKeymap() != null
                            && ((javax.swing.text.JTextComponent) c).getKeymap().getAction(k) != null) {
                        out.add(c.getClass().getSimpleName() + " keymap binds " + k);
                    }
                }
            }
            return out;
        });
        assertEquals(List.of(), clashes);
    }

    @Test
    void ctrlShiftOInTheModelEditorLeavesTheTextLeftToRight() throws Exception {
        BudgetEditor ed = openDemo();
        boolean ltr = onEdt(() -> {
            javax.swing.JTextPane model = ed.modelEditor();
            KeyStroke k = KeyStroke.getKeyStroke(KeyEvent.VK_O, menuMask() | InputEvent.SHIFT_DOWN_MASK);
            Object name = model.getInputMap(JComponent.WHEN_FOCUSED).get(k);
            assertFalse(name != null && model.getActionMap().get(name) != null, "the model editor has no action of its own for " + k);
            return model.getComponentOrientation().isLeftToRight();
        });
        assertTrue(ltr);
    }

    private static int menuMask() {
        return java.awt.Toolkit.getDefaultToolkit().getMenuShortcutKeyMaskEx();
    }

    private static void walk(Container c, List<Component> out) {
        for (Component k : c.getComponents()) {
            out.add(k);
            if (k instanceof Container) {
                walk((Container) k, out);
            }
        }
    }
}
