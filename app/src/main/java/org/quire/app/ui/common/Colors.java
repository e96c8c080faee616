package org.quire.app.ui.common;

import java.awt.Color;
import javax.swing.UIManager;

/** Reads Quire's own colours from the look and feel (themes/*.properties); never defines them in code. */
public final class Colors {
    private Colors() {
    }

    /** @return the colour of a {@code Quire.*} key, or the label foreground if the theme lacks it */
    public static Color get(String key) {
        Color c = UIManager.getColor(key);
        return c != null ? c : UIManager.getColor("Label.foreground");
    }
}
