package org.quire.app.ui;

import java.util.ArrayList;
import java.util.Enumeration;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import javax.swing.InputMap;
import javax.swing.JMenu;
import javax.swing.JMenuBar;
import javax.swing.JMenuItem;
import javax.swing.KeyStroke;
import javax.swing.MenuElement;
import javax.swing.UIDefaults;
import javax.swing.UIManager;

/**
 * Menu shortcuts win over the keys the look and feel binds in text fields, tables, trees and lists. A focused
 * component's own binding is looked up before the menu's, so a shortcut such as Ctrl+Shift+O would otherwise
 * turn the model text right-to-left instead of running its command: each menu accelerator is taken out of the
 * look and feel's shared input maps, which every component's map falls back on.
 */
final class KeyBindings {
    private KeyBindings() {
    }

    /** @return every accelerator of the menu bar's items, in menu order */
    static Set<KeyStroke> accelerators(JMenuBar bar) {
        Set<KeyStroke> out = new LinkedHashSet<>();
        collect(bar, out);
        return out;
    }

    private static void collect(MenuElement e, Set<KeyStroke> out) {
        if (e instanceof JMenuItem && !(e instanceof JMenu) && ((JMenuItem) e).getAccelerator() != null) {
            out.add(((JMenuItem) e).getAccelerator());
        }
        for (MenuElement k : e.getSubElements()) {
            collect(k, out);
        }
    }

    /**
     * Removes the menu's accelerators from the look and feel's input maps (run after the look and feel is
     * installed and the menu bar is built).
     *
     * @return the names of the maps that had a binding taken out, for the record
     */
    static List<String> yieldToMenu(JMenuBar bar) {
        Set<KeyStroke> keys = accelerators(bar);
        List<String> changed = new ArrayList<>();
        UIDefaults d = UIManager.getLookAndFeelDefaults();
        List<Object> names = new ArrayList<>();
        for (Enumeration<Object> en = d.keys(); en.hasMoreElements();) {
            names.add(en.nextElement());
        }
        for (Object name : names) {
            if (!String.valueOf(name).endsWith("InputMap")) {
                continue;
            }
            Object v = d.get(name);
            if (!(v instanceof InputMap)) {
                continue;
            }
            for (InputMap m = (InputMap) v; m != null; m = m.getParent()) {
                for (KeyStroke k : keys) {
                    if (m.get(k) != null) {
                        m.remove(k);
                        changed.add(name + " " + k);
                    }
                }
            }
        }
        return changed;
    }
}
