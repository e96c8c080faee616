package org.quire.app.ui.review;

import java.awt.BorderLayout;
import java.awt.Dimension;
import java.awt.FlowLayout;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.time.Clock;
import java.time.LocalDate;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.List;
import javax.swing.BorderFactory;
import javax.swing.ButtonGroup;
import javax.swing.DefaultCellEditor;
import javax.swing.DefaultListModel;
import javax.swing.JButton;
import javax.swing.JComboBox;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JList;
import javax.swing.JPanel;
import javax.swing.JRadioButton;
import javax.swing.JScrollPane;
import javax.swing.JTable;
import javax.swing.JTextArea;
import javax.swing.JTextField;
import javax.swing.ListSelectionModel;
import javax.swing.table.AbstractTableModel;
import org.quire.app.review.CheckItem;
import org.quire.app.review.Comment;
import org.quire.app.review.Mark;
import org.quire.app.review.Review;
import org.quire.app.review.ReviewContext;
import org.quire.engine.document.Verdict;
import org.quire.app.ui.common.Colors;
import org.quire.app.ui.common.WrapLayout;
import org.quire.app.ui.document.Recalculation;
import org.quire.app.ui.common.EditorContext;
import org.quire.app.ui.common.Section;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.InputQuantity;
import org.quire.engine.document.BudgetDocument;
import org.quire.engine.document.DocumentStore;

/**
 * The assessor's review of a budget open read-only: the automatic checklist ({@link Review#start}) with each
 * item's outcome, where the assessor sets a mark and a comment; comments on inputs; and the decision (endorse or
 * send back, with the assessor's name, the date and a reason), recorded in the document's history and saved to
 * its file; the engine's {@link org.quire.engine.document.ReviewDecisions} owns the rules of the decision.
 */
public final class ReviewPanel implements Section {
    /** The heading of this section. */
    public static final String TITLE = "Assessor's review";
    private static final String NO_MARK = "\u2014";

    private final EditorContext ctx;
    private final Clock clock;
    private final JPanel body = new JPanel(new BorderLayout(0, 8));
    private final JLabel head = new JLabel(" ");
    private final ItemsModel items = new ItemsModel();
    private final JTable checklist = new JTable(items);
    private final JTextArea details = new JTextArea(3, 40);
    private final JComboBox<String> commentInput = new JComboBox<>();
    private final JTextField commentText = new JTextField(30);
    private final DefaultListModel<String> commentLines = new DefaultListModel<>();
    private final List<Comment> comments = new ArrayList<>();
    private final JTextField assessor = new JTextField(16);
    private final JTextField date = new JTextField(10);
    private final JRadioButton endorse = new JRadioButton("Endorse");
    private final JRadioButton sendBack = new JRadioButton("Send back");
    private final JTextField reason = new JTextField(30);
    private final JButton record = new JButton("Record decision");
    private final JLabel outcome = new JLabel(" ");
    private final JLabel templateFindings = new JLabel(" ");
    /** The template library the budget is checked against (shipped, personal and team folders), or null. */
    private java.util.function.Supplier<org.quire.engine.document.TemplateLibrary> templates;
    private Review base;
    /** The document whose checklist is being worked out off the event thread, or null. */
    private BudgetDocument pending;
    private Review decided;

    public ReviewPanel(EditorContext ctx, Clock clock) {
        this.ctx = ctx;
        this.clock = clock;
        body.setName("reviewPanel");
        checklist.setName("checklist");
        details.setName("checkDetails");
        commentInput.setName("commentInput");
        commentText.setName("commentText");
        assessor.setName("assessor");
        date.setName("decisionDate");
        endorse.setName("endorse");
        sendBack.setName("sendBack");
        reason.setName("reason");
        record.setName("recordDecision");
        outcome.setName("decisionOutcome");
        head.setName("reviewHead");
        templateFindings.setName("templateFindings");
        templateFindings.setVisible(false);
        templateFindings.setBorder(BorderFactory.createEmptyBorder(2, 0, 4, 0));

        checklist.setSelectionMode(ListSelectionModel.SINGLE_SELECTION);
        checklist.getColumnModel().getColumn(0).setPreferredWidth(360);
        checklist.getColumnModel().getColumn(1).setPreferredWidth(120);
        checklist.getColumnModel().getColumn(2).setPreferredWidth(110);
        checklist.getColumnModel().getColumn(3).setPreferredWidth(70);
        checklist.getColumnModel().getColumn(4).setPreferredWidth(220);
        checklist.setDefaultRenderer(Object.class, new ItemRenderer());
        JComboBox<String> marks = new JComboBox<>(new String[] {NO_MARK, Mark.AGREED.label(), Mark.FINDING.label(),
            Mark.REMARK.label()});
        checklist.getColumnModel().getColumn(3).setCellEditor(new DefaultCellEditor(marks));
        checklist.getSelectionModel().addListSelectionListener(e -> showDetails());
        JScrollPane tableScroll = new JScrollPane(checklist);
        tableScroll.setPreferredSize(new Dimension(600, checklist.getRowHeight() * 11 + 28));
        details.setEditable(false);
        details.setLineWrap(true);
        details.setWrapStyleWord(true);
        JScrollPane detailScroll = new JScrollPane(details);
        detailScroll.setBorder(BorderFactory.createTitledBorder("What the check found"));

        JPanel commentRow = new JPanel(new WrapLayout(FlowLayout.LEFT, 4, 2));
        commentRow.add(new JLabel("Comment on input"));
        commentRow.add(commentInput);
        commentRow.add(commentText);
        JButton add = new JButton("Add comment");
        add.setName("addComment");
        add.addActionListener(e -> addComment());
        commentRow.add(add);
        JList<String> commentList = new JList<>(commentLines);
        commentList.setName("comments");
        commentList.setVisibleRowCount(3);
        JPanel commentsPanel = new JPanel(new BorderLayout(0, 4));
        commentsPanel.add(commentRow, BorderLayout.NORTH);
        commentsPanel.add(new JScrollPane(commentList), BorderLayout.CENTER);

        ButtonGroup g = new ButtonGroup();
        g.add(endorse);
        g.add(sendBack);
        endorse.setSelected(true);
        JPanel verdictRow = new JPanel(new java.awt.GridBagLayout());
        java.awt.GridBagConstraints c = new java.awt.GridBagConstraints();
        c.insets = new java.awt.Insets(2, 2, 2, 6);
        verdictRow.add(endorse, c);
        verdictRow.add(sendBack, c);
        verdictRow.add(new JLabel("Reason"), c);
        c.weightx = 1;
        c.fill = java.awt.GridBagConstraints.HORIZONTAL;
        verdictRow.add(reason, c);
        JPanel signRow = new JPanel(new BorderLayout());
        JPanel who = new JPanel(new FlowLayout(FlowLayout.LEFT, 6, 2));
        who.add(new JLabel("Assessor"));
        who.add(assessor);
        who.add(new JLabel("Date"));
        who.add(date);
        assessor.setMinimumSize(assessor.getPreferredSize());
        date.setMinimumSize(date.getPreferredSize());
        signRow.add(who, BorderLayout.CENTER);
        signRow.add(record, BorderLayout.EAST);
        JPanel decision = new JPanel(new BorderLayout(0, 2));
        decision.setBorder(BorderFactory.createTitledBorder("Decision"));
        decision.add(verdictRow, BorderLayout.NORTH);
        decision.add(signRow, BorderLayout.SOUTH);
        record.addActionListener(e -> recordDecision());
        outcome.setBorder(BorderFactory.createEmptyBorder(2, 4, 2, 4));

        JPanel top = new JPanel(new BorderLayout(0, 4));
        JPanel heads = new JPanel(new BorderLayout(0, 2));
        heads.add(head, BorderLayout.NORTH);
        heads.add(templateFindings, BorderLayout.SOUTH);
        top.add(heads, BorderLayout.NORTH);
        top.add(tableScroll, BorderLayout.CENTER);
        top.add(detailScroll, BorderLayout.SOUTH);
        JPanel bottom = new JPanel(new BorderLayout(0, 6));
        bottom.add(commentsPanel, BorderLayout.NORTH);
        bottom.add(decision, BorderLayout.CENTER);
        bottom.add(outcome, BorderLayout.SOUTH);
        body.add(top, BorderLayout.CENTER);
        body.add(bottom, BorderLayout.SOUTH);
        assessor.setText(ctx.document().user());
        date.setText(LocalDate.now(clock).toString());
        setOpen(false);
    }

    /**
     * @param library the template library a budget made from a template is checked against (the engine's
     *     {@link org.quire.engine.document.TemplateConformance}, the check {@code quire template check} makes)
     */
    public void useTemplates(java.util.function.Supplier<org.quire.engine.document.TemplateLibrary> library) {
        templates = library;
    }

    @Override public String title() { return TITLE; }
    @Override public JComponent body() { return body; }

    @Override
    public void budgetChanged(Budget b) {
        commentInput.removeAllItems();
        for (InputQuantity q : b.inputs()) {
            commentInput.addItem(q.name());
        }
    }

    @Override
    public void recalculated(Recalculation r) {
        if (decided != null) {
            return;
        }
        if (r.result() == null) {
            base = null;
            pending = null;
            items.set(List.of());
            head.setText("The budget cannot be evaluated (see the problems list); the checklist needs its GUM result.");
            setOpen(false);
            return;
        }
        BudgetDocument d = ctx.document().content();
        Review prior = base;
        pending = d;
        java.util.function.Supplier<org.quire.engine.document.TemplateLibrary> library = templates;
        // what is shown now, read here on the event thread: an unchanged budget keeps it
        org.quire.engine.document.TemplateConformance.Finding shown = shownFinding;
        String shownUnchecked = uncheckedShown;
        // the content hash of a large budget (200 000 readings) takes seconds, and the template library is read from
        // its folders: both worked out off the event thread
        // delivered by invokeLater, not by SwingWorker.done(): Swing hands every worker's done() to the event thread
        // in shared batches, and one that throws loses the rest of its batch, which would leave this checklist
        // waiting for ever
        REVIEWS.execute(() -> {
            Drawn drawn;
            try {
                drawn = draw(d, r, prior, shown, shownUnchecked, library);
            } catch (RuntimeException | Error e) {
                drawn = new Drawn(null, null, null, e);
            }
            Drawn answer = drawn;
            java.awt.EventQueue.invokeLater(() -> showDrawn(d, prior, answer));
        });
    }

    /** What the background step worked out: the checklist, the template check shown with it, or the failure. */
    private record Drawn(Review review, org.quire.engine.document.TemplateConformance.Finding finding,
            String unchecked, Throwable failure) {
    }

    /** Draws up the checklist off the event thread; reuses the prior one for unchanged content. */
    private Drawn draw(BudgetDocument d, Recalculation r, Review prior,
            org.quire.engine.document.TemplateConformance.Finding shown, String shownUnchecked,
            java.util.function.Supplier<org.quire.engine.document.TemplateLibrary> library) {
        if (prior != null && prior.contentHash().equals(d.contentHash())) {
            return new Drawn(prior, shown, shownUnchecked, null);
        }
        org.quire.engine.document.TemplateConformance.Finding finding = null;
        String unchecked = null;
        ReviewContext rc = ReviewContext.none().withUnits(new org.quire.app.review.EngineUnitChecker(ctx.library()))
                .withDocument(d);
        if (library != null && d.templateOrigin() != null) {
            try {
                finding = org.quire.engine.document.TemplateConformance.check(d, library.get());
                rc = rc.withTemplate(finding);
            } catch (java.io.IOException | UncheckedIOException e) {
                unchecked = "The template library cannot be read (" + e.getMessage() + "): the fields the "
                        + "template locks are not checked.";
            }
        }
        return new Drawn(Review.start(r.budget(), r.result(), rc, org.quire.app.report.ContentHasher.of(d)),
                finding, unchecked, null);
    }

    /** Shows a checklist drawn up in the background, on the event thread, unless a newer one is on its way. */
    private void showDrawn(BudgetDocument d, Review prior, Drawn drawn) {
        if (pending != d || decided != null) {
            return;
        }
        pending = null;
        if (drawn.failure() != null) {
            // a fault of Quire's (the expected failures, such as an unreadable template library, are findings of
            // the checklist): said here, and handed to the workbench's internal-error report
            Throwable f = drawn.failure();
            head.setText("The checklist cannot be drawn up: an internal error ("
                    + (f.getMessage() == null ? f.getClass().getSimpleName() : f.getMessage()) + ")");
            Thread t = Thread.currentThread();
            t.getUncaughtExceptionHandler().uncaughtException(t, f);
            return;
        }
        showTemplate(drawn.finding(), drawn.unchecked());
        Review started = drawn.review();
        if (started == prior) {
            return;
        }
        base = started;
        items.set(base.items());
        // every item and clause readable in full: columns as wide as their text, scrolled sideways
        org.quire.app.ui.table.SpreadsheetTable.fitColumns(checklist, 560);
        javax.swing.table.TableColumn comment = checklist.getColumnModel().getColumn(4);
        comment.setPreferredWidth(Math.max(220, comment.getPreferredWidth())); // room to type a comment
        head.setText("<html>Checklist of revision " + d.revision() + " (" + d.status().label()
                + "), content SHA-256 " + d.contentHash().substring(0, 16) + "\u2026. Items <i>not met</i> or "
                + "<i>to confirm</i> need your mark before the budget can be endorsed.</html>");
        setOpen(true);
        if (checklist.getRowCount() > 0 && checklist.getSelectedRow() < 0) {
            checklist.setRowSelectionInterval(0, 0);
        }
    }

    private org.quire.engine.document.TemplateConformance.Finding shownFinding;

    /**
     * The checklists' background work (content hash, template check), one at a time on a thread of its own: not
     * on Swing's shared pool of ten, where long file work elsewhere could keep the checklist waiting.
     */
    private static final java.util.concurrent.ExecutorService REVIEWS = java.util.concurrent.Executors
            .newSingleThreadExecutor(r -> {
                Thread t = new Thread(r, "quire-review");
                t.setDaemon(true);
                return t;
            });
    /** Why the template check could not be made, as shown, or null. */
    private String uncheckedShown;

    /**
     * Shows the engine's template check of the budget above the checklist: each deviation from the template's
     * locked fields as the sentence {@code quire template check} prints, or that the budget keeps them all.
     */
    private void showTemplate(org.quire.engine.document.TemplateConformance.Finding f,
            String unchecked) {
        shownFinding = f;
        uncheckedShown = unchecked;
        String text;
        java.awt.Color colour = Colors.get("Label.foreground");
        if (unchecked != null) {
            text = "<html>" + esc(unchecked) + "</html>";
            colour = Colors.get("Quire.warning");
        } else if (f == null || f.state() == org.quire.engine.document.TemplateConformance.State.NOT_FROM_TEMPLATE) {
            text = "";
        } else if (f.state() == org.quire.engine.document.TemplateConformance.State.FOLLOWS) {
            text = "<html>Template " + esc(f.origin().id()) + " v" + f.origin().version() + ": the budget keeps every "
                    + "field the template locks.</html>";
            colour = Colors.get("Quire.ok");
        } else {
            int n = f.messages().size();
            StringBuilder b = new StringBuilder("<html><b>");
            b.append(f.state() == org.quire.engine.document.TemplateConformance.State.DEVIATES
                    ? n + (n == 1 ? " deviation" : " deviations") + " from template " + esc(f.origin().id()) + " v"
                            + f.origin().version() + ":"
                    : "The template cannot be checked:").append("</b>");
            for (String m : f.messages()) {
                b.append("<br>\u2022 ").append(esc(m));
            }
            text = b.append("</html>").toString();
            colour = f.state() == org.quire.engine.document.TemplateConformance.State.DEVIATES
                    ? Colors.get("Quire.error") : Colors.get("Quire.warning");
        }
        templateFindings.setText(text);
        templateFindings.setForeground(colour);
        templateFindings.setVisible(!text.isEmpty());
    }

    private static String esc(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;");
    }

    /** @return the engine's template check shown above the checklist, or null when none was made */
    public org.quire.engine.document.TemplateConformance.Finding templateFinding() {
        return shownFinding;
    }

    /** @return whether the checklist is drawn up for the latest result (none is being worked out) */
    public boolean isCurrent() {
        return pending == null;
    }

    private void setOpen(boolean on) {
        record.setEnabled(on);
        checklist.setEnabled(on);
    }

    private void showDetails() {
        int r = checklist.getSelectedRow();
        if (r < 0 || r >= items.rows.size()) {
            details.setText("");
            return;
        }
        CheckItem i = items.rows.get(r);
        details.setText(i.title() + " (" + i.reference() + "): " + i.outcome().label() + "\n"
                + (i.details().isEmpty() ? "nothing to report" : String.join("\n", i.details())));
        details.setCaretPosition(0);
    }

    private void addComment() {
        String input = (String) commentInput.getSelectedItem();
        String text = commentText.getText();
        if (input == null || text.isBlank()) {
            ctx.status("choose an input and write the comment first", true);
            return;
        }
        Comment c = new Comment(Comment.Target.input(input), assessor.getText(), text);
        comments.add(c);
        commentLines.addElement(input + ": " + c.text());
        commentText.setText("");
    }

    /** @return the review with the marks, comments and the decision as entered; refuses with a message */
    private Review decide() {
        if (checklist.isEditing()) {
            checklist.getCellEditor().stopCellEditing();
        }
        Review r = base;
        for (int i = 0; i < items.rows.size(); i++) {
            String id = items.rows.get(i).id();
            Mark m = items.marks[i];
            String comment = items.comments[i];
            if (m != null) {
                r = r.withMark(id, m, comment);
            } else if (!comment.isBlank()) {
                r = r.withComment(new Comment(Comment.Target.item(id), assessor.getText(), comment));
            }
        }
        for (Comment c : comments) {
            r = r.withComment(c);
        }
        LocalDate day;
        try {
            day = LocalDate.parse(date.getText().trim());
        } catch (DateTimeParseException e) {
            throw new IllegalArgumentException("the date must be written YYYY-MM-DD, not '" + date.getText().trim() + "'");
        }
        return r.decide(endorse.isSelected() ? Verdict.ENDORSED : Verdict.SENT_BACK, assessor.getText(), day,
                reason.getText());
    }

    private void recordDecision() {
        Path file = ctx.document().file();
        if (base == null) {
            ctx.status("there is no checklist to decide on yet", true);
            return;
        }
        if (file == null) {
            ctx.status("this budget has no file to record the decision in; save it first", true);
            return;
        }
        try {
            Review r = decide();
            BudgetDocument saved = r.recordIn(ctx.document().content(), clock.instant());
            try {
                DocumentStore.save(saved, file);
            } catch (java.io.IOException e) {
                throw new UncheckedIOException(e.getMessage(), e);
            }
            decided = r;
            ctx.document().replaceSaved(saved, file, "Record the review decision");
            setOpen(false);
            outcome.setForeground(Colors.get("Label.foreground"));
            outcome.setText(r.decision().verdict().label().substring(0, 1).toUpperCase(java.util.Locale.ROOT)
                    + r.decision().verdict().label().substring(1) + " by " + r.decision().assessor() + " on "
                    + r.decision().date() + ": the document is now revision " + saved.revision() + ", "
                    + saved.status().label() + ", saved to " + file.getFileName() + ".");
            ctx.status("Review decision recorded in " + file, false);
        } catch (IllegalArgumentException | IllegalStateException | UncheckedIOException e) {
            outcome.setForeground(Colors.get("Quire.error"));
            outcome.setText("<html>" + e.getMessage().replace("&", "&amp;").replace("<", "&lt;") + "</html>");
            ctx.status(e.getMessage(), true);
        }
    }

    /** Shows the full text as a tooltip and the outcome in the theme's colour for its weight. */
    private final class ItemRenderer extends javax.swing.table.DefaultTableCellRenderer {
        private static final long serialVersionUID = 1L;

        @Override
        public java.awt.Component getTableCellRendererComponent(JTable t, Object v, boolean sel, boolean focus,
                int r, int c) {
            super.getTableCellRendererComponent(t, v, sel, focus, r, c);
            setToolTipText(v == null || v.toString().isEmpty() ? null : v.toString());
            if (!sel) {
                setForeground(t.getForeground());
                if (c == 2 && r < items.rows.size()) {
                    org.quire.app.review.Outcome o = items.rows.get(r).outcome();
                    if (o == org.quire.app.review.Outcome.NOT_MET) {
                        setForeground(Colors.get("Quire.error"));
                    } else if (o == org.quire.app.review.Outcome.TO_CONFIRM) {
                        setForeground(Colors.get("Quire.warning"));
                    } else if (o == org.quire.app.review.Outcome.MET) {
                        setForeground(Colors.get("Quire.ok"));
                    }
                }
            }
            return this;
        }
    }

    /** The checklist rows with the assessor's marks and comments. */
    private static final class ItemsModel extends AbstractTableModel {
        private static final long serialVersionUID = 1L;
        private static final String[] COLUMNS = {"Item", "Clause", "Outcome", "Mark", "Comment"};
        private List<CheckItem> rows = List.of();
        private Mark[] marks = new Mark[0];
        private String[] comments = new String[0];

        void set(List<CheckItem> r) {
            rows = List.copyOf(r);
            marks = new Mark[rows.size()];
            comments = new String[rows.size()];
            java.util.Arrays.fill(comments, "");
            fireTableDataChanged();
        }

        @Override public int getRowCount() { return rows.size(); }
        @Override public int getColumnCount() { return COLUMNS.length; }
        @Override public String getColumnName(int c) { return COLUMNS[c]; }
        @Override public boolean isCellEditable(int r, int c) { return c >= 3; }

        @Override
        public Object getValueAt(int r, int c) {
            CheckItem i = rows.get(r);
            switch (c) {
                case 0: return i.title();
                case 1: return i.reference();
                case 2: return i.outcome().label();
                case 3: return marks[r] == null ? NO_MARK : marks[r].label();
                default: return comments[r];
            }
        }

        @Override
        public void setValueAt(Object v, int r, int c) {
            if (c == 3) {
                marks[r] = null;
                for (Mark m : Mark.values()) {
                    if (m.label().equals(v)) {
                        marks[r] = m;
                    }
                }
            } else if (c == 4) {
                comments[r] = v == null ? "" : v.toString();
            }
            fireTableRowsUpdated(r, r);
        }
    }
}
