package org.quire.app.ui;

import java.awt.Dimension;
import java.awt.Font;
import java.awt.Frame;
import javax.swing.JDialog;
import javax.swing.JScrollPane;
import javax.swing.JTabbedPane;
import javax.swing.JTextArea;
import org.quire.app.common.LanguageHelp;

/**
 * Help &gt; Model language reference: the model language, the units and the functions, with the cautions; the
 * same text as {@code quire help model|units|functions} ({@link LanguageHelp}).
 */
final class ReferenceDialog {
    private ReferenceDialog() {
    }

    static void show(Frame owner, org.quire.engine.model.FunctionLibrary library) {
        JDialog d = new JDialog(owner, "Model language reference", false);
        JTabbedPane tabs = new JTabbedPane();
        for (String topic : LanguageHelp.TOPICS) {
            JTextArea text = new JTextArea(LanguageHelp.text(topic, org.quire.app.common.Engine.of(library)));
            text.setEditable(false);
            text.setFont(new Font(Font.MONOSPACED, Font.PLAIN, text.getFont().getSize()));
            text.setCaretPosition(0);
            text.getAccessibleContext().setAccessibleName("Reference: " + topic);
            tabs.addTab(Character.toUpperCase(topic.charAt(0)) + topic.substring(1), new JScrollPane(text));
        }
        d.setContentPane(tabs);
        d.setPreferredSize(new Dimension(860, 640));
        d.pack();
        d.setLocationRelativeTo(owner);
        d.setVisible(true);
    }
}
