package org.quire.app.ui.notebook;

import org.quire.app.ui.common.EditorContext;
import org.quire.app.ui.common.Section;
import java.awt.BorderLayout;
import java.awt.GridBagConstraints;
import java.awt.GridBagLayout;
import java.awt.Insets;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.List;
import javax.swing.BorderFactory;
import javax.swing.DefaultListModel;
import javax.swing.JComboBox;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JList;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTextArea;
import javax.swing.JTextField;
import org.quire.engine.budget.Budget;
import org.quire.engine.document.BudgetDocument;
import org.quire.engine.document.DocumentStatus;
import org.quire.engine.document.RevisionEntry;

/**
 * Purpose and notes: the budget's title, the document's details (laboratory, device under test, author), its
 * revision and status, the revision history, and what the budget is for as free text. The status offers only
 * the moves the review cycle allows from where the document stands.
 */
final class PurposeSection implements Section {
    private static final DateTimeFormatter WHEN = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm 'UTC'")
            .withZone(ZoneOffset.UTC);
    private final EditorContext ctx;
    private final JPanel body = new JPanel(new BorderLayout(6, 6));
    private final JTextField title = new JTextField();
    private final JTextField laboratory = new JTextField();
    private final JTextField device = new JTextField();
    private final JTextField author = new JTextField();
    private final JLabel revision = new JLabel();
    private final JComboBox<DocumentStatus> status = new JComboBox<>();
    private final DefaultListModel<String> historyModel = new DefaultListModel<>();
    private final JList<String> history = new JList<>(historyModel);
    private final JTextArea notes = new JTextArea(5, 60);
    private final TextCommit titleCommit;
    private final TextCommit labCommit;
    private final TextCommit deviceCommit;
    private final TextCommit authorCommit;
    private final TextCommit notesCommit;
    private boolean updatingStatus;
    private boolean readOnly;

    PurposeSection(EditorContext ctx) {
        this.ctx = ctx;
        title.setName("title");
        laboratory.setName("laboratory");
        device.setName("deviceUnderTest");
        author.setName("author");
        status.setName("status");
        revision.setName("revision");
        history.setName("history");
        notes.setName("notes");
        notes.setLineWrap(true);
        notes.setWrapStyleWord(true);
        JPanel form = new JPanel(new GridBagLayout());
        GridBagConstraints c = new GridBagConstraints();
        c.insets = new Insets(2, 0, 2, 8);
        c.anchor = GridBagConstraints.WEST;
        row(form, c, 0, "Title", title, 3);
        row(form, c, 1, "Laboratory", laboratory, 3);
        cell(form, c, 0, 2, "Device under test", device);
        cell(form, c, 2, 2, "Author", author);
        JPanel state = new JPanel(new java.awt.FlowLayout(java.awt.FlowLayout.LEFT, 0, 0));
        state.add(revision);
        state.add(javax.swing.Box.createHorizontalStrut(16));
        state.add(new JLabel("Status "));
        state.add(status);
        row(form, c, 3, "Revision", state, 3);
        history.setVisibleRowCount(3);
        JScrollPane hs = new JScrollPane(history);
        hs.setBorder(BorderFactory.createTitledBorder("Revision history"));
        JScrollPane sp = new JScrollPane(notes);
        sp.setBorder(BorderFactory.createTitledBorder("Purpose, method and notes"));
        JPanel north = new JPanel(new BorderLayout(0, 4));
        north.add(form, BorderLayout.NORTH);
        north.add(hs, BorderLayout.CENTER);
        body.add(north, BorderLayout.NORTH);
        body.add(sp, BorderLayout.CENTER);
        titleCommit = TextCommit.bind(title, t -> ctx.edit("Edit title", "title", b -> b.withTitle(t)));
        labCommit = TextCommit.bind(laboratory, t -> ctx.editDocument("Edit laboratory", "laboratory",
                d -> d.withDetails(t, d.deviceUnderTest(), d.author(), ctx.document().user(), ctx.document().now())));
        deviceCommit = TextCommit.bind(device, t -> ctx.editDocument("Edit device under test", "device",
                d -> d.withDetails(d.laboratory(), t, d.author(), ctx.document().user(), ctx.document().now())));
        authorCommit = TextCommit.bind(author, t -> ctx.editDocument("Edit author", "author",
                d -> d.withDetails(d.laboratory(), d.deviceUnderTest(), t, ctx.document().user(),
                        ctx.document().now())));
        notesCommit = TextCommit.bind(notes, t -> ctx.edit("Edit notes", "notes", b -> b.withNotes(t)));
        status.addActionListener(e -> statusChosen());
    }

    private static void row(JPanel form, GridBagConstraints c, int y, String label, JComponent field, int span) {
        c.gridy = y;
        c.gridx = 0;
        c.gridwidth = 1;
        c.weightx = 0;
        c.fill = GridBagConstraints.NONE;
        form.add(new JLabel(label), c);
        c.gridx = 1;
        c.gridwidth = span;
        c.weightx = 1;
        c.fill = GridBagConstraints.HORIZONTAL;
        form.add(field, c);
    }

    private static void cell(JPanel form, GridBagConstraints c, int x, int y, String label, JComponent field) {
        c.gridy = y;
        c.gridx = x;
        c.gridwidth = 1;
        c.weightx = 0;
        c.fill = GridBagConstraints.NONE;
        form.add(new JLabel(label), c);
        c.gridx = x + 1;
        c.weightx = 1;
        c.fill = GridBagConstraints.HORIZONTAL;
        form.add(field, c);
    }

    private void statusChosen() {
        if (updatingStatus) {
            return;
        }
        DocumentStatus target = (DocumentStatus) status.getSelectedItem();
        BudgetDocument d = ctx.document().content();
        if (target == null || target == d.status()) {
            return;
        }
        if (!ctx.editDocument("Move to " + target.label(), "", x -> x.moveTo(target, ctx.document().user(),
                ctx.document().now(), ""))) {
            documentChanged(ctx.document().content());
        }
    }

    @Override public String title() { return "Purpose and notes"; }
    @Override public JComponent body() { return body; }

    @Override
    public void budgetChanged(Budget b) {
        titleCommit.show(b.title());
        notesCommit.show(b.notes());
    }

    @Override
    public void documentChanged(BudgetDocument d) {
        labCommit.show(d.laboratory());
        deviceCommit.show(d.deviceUnderTest());
        authorCommit.show(d.author());
        revision.setText(d.revision() + "   (last changed " + WHEN.format(d.modified()) + ")");
        updatingStatus = true;
        try {
            status.removeAllItems();
            status.addItem(d.status());
            for (DocumentStatus s : DocumentStatus.values()) {
                // approval is the assessor's decision, recorded in review mode with the content hash
                if (d.status().canMoveTo(s) && s != DocumentStatus.APPROVED) {
                    status.addItem(s);
                }
            }
            status.setSelectedItem(d.status());
            status.setEnabled(!readOnly && status.getItemCount() > 1);
        } finally {
            updatingStatus = false;
        }
        List<String> lines = new ArrayList<>();
        for (RevisionEntry e : d.history()) {
            lines.add(describe(e));
        }
        historyModel.clear();
        if (lines.isEmpty()) {
            historyModel.addElement("no status changes recorded yet");
        }
        for (int i = lines.size() - 1; i >= 0; i--) {
            historyModel.addElement(lines.get(i));
        }
    }

    /** @return one line of the history, newest shown first */
    static String describe(RevisionEntry e) {
        return "revision " + e.revision() + ": " + e.status().label() + " by " + e.by() + ", " + WHEN.format(e.at())
                + (e.comment().isEmpty() ? "" : " \u2014 " + e.comment())
                + (e.contentHash().isEmpty() ? "" : "  [SHA-256 " + e.contentHash().substring(0, 12) + "\u2026]");
    }

    @Override
    public void readOnlyChanged(boolean ro) {
        readOnly = ro;
        title.setEditable(!ro);
        laboratory.setEditable(!ro);
        device.setEditable(!ro);
        author.setEditable(!ro);
        notes.setEditable(!ro);
        status.setEnabled(!ro && status.getItemCount() > 1);
    }
}
