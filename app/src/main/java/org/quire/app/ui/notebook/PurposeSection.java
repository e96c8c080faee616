package org.quire.app.ui.notebook;

import java.awt.BorderLayout;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTextArea;
import javax.swing.JTextField;
import org.quire.engine.budget.Budget;

/** Purpose and notes: the budget's title and what it is for, as free text. */
final class PurposeSection implements Section {
    private final JPanel body = new JPanel(new BorderLayout(6, 6));
    private final JTextField title = new JTextField();
    private final JTextArea notes = new JTextArea(5, 60);
    private final TextCommit titleCommit;
    private final TextCommit notesCommit;

    PurposeSection(EditorContext ctx) {
        title.setName("title");
        notes.setName("notes");
        notes.setLineWrap(true);
        notes.setWrapStyleWord(true);
        JPanel top = new JPanel(new BorderLayout(6, 0));
        top.add(new JLabel("Title"), BorderLayout.WEST);
        top.add(title, BorderLayout.CENTER);
        body.add(top, BorderLayout.NORTH);
        JScrollPane sp = new JScrollPane(notes);
        sp.setBorder(javax.swing.BorderFactory.createTitledBorder("Purpose, method and notes"));
        body.add(sp, BorderLayout.CENTER);
        titleCommit = TextCommit.bind(title, t -> ctx.edit("Edit title", "title", b -> b.withTitle(t)));
        notesCommit = TextCommit.bind(notes, t -> ctx.edit("Edit notes", "notes", b -> b.withNotes(t)));
    }

    @Override public String title() { return "Purpose and notes"; }
    @Override public JComponent body() { return body; }

    @Override
    public void budgetChanged(Budget b) {
        titleCommit.show(b.title());
        notesCommit.show(b.notes());
    }

    @Override
    public void readOnlyChanged(boolean ro) {
        title.setEditable(!ro);
        notes.setEditable(!ro);
    }
}
