package org.quire.app.ui;

import javax.swing.JOptionPane;
import javax.swing.JTextArea;
import org.quire.app.common.Cautions;
import org.quire.engine.io.EngineVersion;

/** The About box: what Quire is, its version, and the cautions. */
final class AboutDialog {
    private AboutDialog() {
    }

    static String text() {
        return "Quire " + EngineVersion.get() + "\nMeasurement-uncertainty budgets for flow metrology: the GUM "
                + "(JCGM 100) with a Monte Carlo check (JCGM 101).\n\nCautions\n" + Cautions.TEXT;
    }

    static void show(java.awt.Component parent) {
        JTextArea t = new JTextArea(text(), 10, 52);
        t.setName("aboutText");
        t.setLineWrap(true);
        t.setWrapStyleWord(true);
        t.setEditable(false);
        t.setOpaque(false);
        JOptionPane.showMessageDialog(parent, t, "About Quire", JOptionPane.INFORMATION_MESSAGE);
    }
}
