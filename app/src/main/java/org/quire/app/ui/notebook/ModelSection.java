package org.quire.app.ui.notebook;

import org.quire.app.ui.common.EditorContext;
import org.quire.app.ui.common.Section;
import java.awt.BorderLayout;
import java.awt.Dimension;
import java.awt.EventQueue;
import java.awt.Font;
import java.awt.event.MouseEvent;
import java.util.ArrayList;
import java.util.List;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTextPane;
import javax.swing.text.BadLocationException;
import javax.swing.text.DefaultStyledDocument;
import javax.swing.text.Element;
import org.quire.app.ui.common.Colors;
import org.quire.app.ui.document.Problem;
import org.quire.app.ui.document.Recalculation;
import org.quire.engine.budget.Budget;

/**
 * The measurement model: equations with syntax colouring and the engine's problems marked where they are,
 * and the declared outputs below.
 */
final class ModelSection implements Section {
    private final JPanel body = new JPanel(new BorderLayout(6, 6));
    private final DefaultStyledDocument text = new DefaultStyledDocument();
    private final List<Problem> marked = new ArrayList<>();
    private final JTextPane editor = new JTextPane(text) {
        @Override
        public String getToolTipText(MouseEvent e) {
            return problemAt(viewToModel2D(e.getPoint()));
        }

        @Override
        public boolean getScrollableTracksViewportWidth() {
            return getUI().getPreferredSize(this).width <= getParent().getWidth();
        }
    };
    private final TextCommit commit;
    private final OutputsPanel outputs;
    private final JLabel state = new JLabel(" ");
    private final EditorContext ctx;
    private final JLabel hint = new JLabel();
    private static final String HINT = "One equation a line: name = expression, or name(args) = expression for a "
            + "function. # starts a comment.";

    ModelSection(EditorContext ctx) {
        this.ctx = ctx;
        editor.setName("model");
        editor.setFont(new Font(Font.MONOSPACED, Font.PLAIN, editor.getFont().getSize()));
        editor.setToolTipText("");
        JScrollPane sp = new JScrollPane(editor);
        sp.setPreferredSize(new Dimension(600, 16 * editor.getFontMetrics(editor.getFont()).getHeight() + 8));
        hint.setText(HINT);
        hint.setName("modelHint");
        hint.setForeground(Colors.get("Label.disabledForeground"));
        body.add(hint, BorderLayout.NORTH);
        body.add(sp, BorderLayout.CENTER);
        outputs = new OutputsPanel(ctx);
        JPanel south = new JPanel(new BorderLayout());
        south.add(state, BorderLayout.NORTH);
        south.add(outputs, BorderLayout.CENTER);
        body.add(south, BorderLayout.SOUTH);
        commit = TextCommit.bind(editor, t -> {
            recolour();
            ctx.edit("Edit model", "model", b -> b.withModel(t));
        });
    }

    @Override public String title() { return "Model"; }
    @Override public JComponent body() { return body; }

    JTextPane editor() { return editor; }

    @Override
    public void budgetChanged(Budget b) {
        if (!editor.getText().equals(b.model())) {
            commit.show(b.model());
            recolour();
        }
        outputs.budgetChanged(b);
    }

    private void recolour() {
        EventQueue.invokeLater(() -> ModelHighlighter.apply(text, editor.getText()));
    }

    @Override
    public void recalculated(Recalculation r) {
        if (!r.budget().model().equals(editor.getText())) {
            return;
        }
        editor.getHighlighter().removeAllHighlights();
        marked.clear();
        int errors = 0;
        for (Problem p : r.problems()) {
            if (p.area() != Problem.Area.MODEL) {
                continue;
            }
            if (p.severity() == Problem.Severity.ERROR) {
                errors++;
            }
            if (p.line() <= 0) {
                continue;
            }
            int start = offset(p.line(), p.column());
            if (start < 0) {
                continue;
            }
            int end = Math.min(text.getLength(), start + Math.max(1, p.length()));
            try {
                editor.getHighlighter().addHighlight(start, Math.max(end, start + 1), SquigglePainter.of(
                        Colors.get(p.severity() == Problem.Severity.ERROR ? "Quire.error" : "Quire.warning")));
                marked.add(p);
            } catch (BadLocationException e) {
                // the text changed since; the next answer marks it again
            }
        }
        state.setText(errors == 0 ? "The model compiles." : errors + (errors == 1 ? " error" : " errors")
                + " in the model: see the marks above and the problems list.");
        state.setForeground(Colors.get(errors == 0 ? "Quire.ok" : "Quire.error"));
    }

    /** @return the offset of a 1-based line and column, or -1 */
    int offset(int line, int column) {
        Element root = text.getDefaultRootElement();
        if (line < 1 || line > root.getElementCount()) {
            return -1;
        }
        Element l = root.getElement(line - 1);
        return Math.min(l.getEndOffset() - 1, l.getStartOffset() + Math.max(0, column - 1));
    }

    /** Moves the caret to a problem's place. */
    void reveal(Problem p) {
        int o = offset(p.line(), p.column());
        if (o >= 0) {
            editor.requestFocusInWindow();
            editor.setCaretPosition(o);
        }
    }

    private String problemAt(int pos) {
        for (Problem p : marked) {
            int s = offset(p.line(), p.column());
            if (pos >= s && pos <= s + Math.max(1, p.length())) {
                return p.message();
            }
        }
        return null;
    }

    @Override
    public void readOnlyChanged(boolean ro) {
        org.quire.engine.document.TemplateOrigin o = ctx.document().content().templateOrigin();
        boolean locked = o != null && o.locked().contains("model");
        editor.setEditable(!ro && !locked);
        hint.setText(locked ? "The model is " + o.lockReason() + " (the method's model): read-only." : HINT);
        outputs.readOnlyChanged(ro || o != null && o.locked().contains("outputs"));
    }
}
