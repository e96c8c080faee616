package org.quire.app.ui.inspector;

import java.awt.BorderLayout;
import java.awt.CardLayout;
import javax.swing.BorderFactory;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.ScrollPaneConstants;
import org.quire.app.ui.common.Fmt;
import org.quire.app.ui.notebook.BudgetEditor;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.EvaluationSettings;
import org.quire.engine.budget.InputQuantity;

/**
 * The pane on the right: every option of the item selected in the active editor (an input), or an overview of
 * the budget when nothing is selected. One inspector per editor, shown when the editor is active.
 */
public final class InspectorPanel extends JPanel {
    private final BudgetEditor editor;
    private final CardLayout cards = new CardLayout();
    private final JLabel overview = new JLabel();
    /** The options of the selected input: built when an input is first selected, not before the first paint. */
    private InputInspector input;

    public InspectorPanel(BudgetEditor editor) {
        this.editor = editor;
        setLayout(cards);
        setName("inspector");
        JPanel ov = new JPanel(new BorderLayout());
        overview.setVerticalAlignment(JLabel.TOP);
        ov.add(overview, BorderLayout.NORTH);
        ov.setBorder(BorderFactory.createEmptyBorder(8, 8, 8, 8));
        add(ov, "overview");
        editor.addSelectionListener(this::selectionChanged);
        editor.document().addListener((doc, before, after, cause) -> selectionChanged(editor.selectedInput()));
        selectionChanged(null);
    }

    /** @return the input's options, built (with their card) on the first call */
    private InputInspector input() {
        if (input == null) {
            input = new InputInspector(editor);
            JPanel wrap = new WidthTracking();
            wrap.add(input, BorderLayout.NORTH);
            wrap.setBorder(BorderFactory.createEmptyBorder(8, 8, 8, 8));
            JScrollPane sp = new JScrollPane(wrap, ScrollPaneConstants.VERTICAL_SCROLLBAR_AS_NEEDED,
                    ScrollPaneConstants.HORIZONTAL_SCROLLBAR_NEVER);
            sp.setBorder(BorderFactory.createEmptyBorder());
            sp.getVerticalScrollBar().setUnitIncrement(20);
            add(sp, "input");
        }
        return input;
    }

    private void selectionChanged(String name) {
        Budget b = editor.document().budget();
        InputQuantity q = name == null ? null : b.input(name);
        if (q == null) {
            if (input != null) {
                input.leave();
            }
            EvaluationSettings s = b.settings();
            String text = ("<html><b>" + esc(b.title().isEmpty() ? editor.document().name() : b.title()) + "</b><br><br>"
                    + (editor.document().file() == null ? "Not saved to a file yet." : fileLines(editor.document().file()))
                    + "<br><br>" + count(b.inputs().size(), "input") + ", " + count(b.outputs().size(), "output") + ", "
                    + count(b.correlations().size(), "correlation") + "<br>"
                    + (s.hasFixedCoverageFactor() ? "k = " + Fmt.num(s.coverageFactor())
                            : "p = " + Fmt.probability(s.coverageProbability()))
                    + ", " + s.significantDigits() + " significant digits<br>Monte Carlo: " + Fmt.count(s.trials())
                    + " trials, seed " + s.seed()
                    + "<br><br>Select an input in the Inputs table to see and change all of its options here.</html>");
            if (!text.equals(overview.getText())) {
                overview.setText(text);
                overview.setToolTipText(editor.document().file() == null ? null
                        : String.valueOf(editor.document().file().toAbsolutePath()));
            }
            cards.show(this, "overview");
        } else {
            input().show(q);
            cards.show(this, "input");
        }
    }

    /**
     * The file as its name and, below it, its folder shortened to the last two folders: a long path would
     * otherwise set the inspector's width (the full path is the overview's tooltip).
     */
    private static String fileLines(java.nio.file.Path file) {
        java.nio.file.Path abs = file.toAbsolutePath();
        java.nio.file.Path folder = abs.getParent();
        String in = "";
        if (folder != null) {
            int n = folder.getNameCount();
            in = n <= 2 ? folder.toString()
                    : "\u2026" + java.io.File.separator + folder.subpath(n - 2, n);
        }
        return esc(String.valueOf(abs.getFileName())) + (in.isEmpty() ? "" : "<br>in " + esc(in));
    }

    /** A panel that takes the width of the scroll pane's viewport, so the inspector never clips on the right. */
    private static final class WidthTracking extends JPanel implements javax.swing.Scrollable {
        WidthTracking() {
            super(new BorderLayout());
        }

        @Override public java.awt.Dimension getPreferredScrollableViewportSize() { return getPreferredSize(); }
        @Override public int getScrollableUnitIncrement(java.awt.Rectangle r, int o, int d) { return 20; }
        @Override public int getScrollableBlockIncrement(java.awt.Rectangle r, int o, int d) { return r.height; }
        @Override public boolean getScrollableTracksViewportWidth() { return true; }
        @Override public boolean getScrollableTracksViewportHeight() { return false; }
    }

    private static String esc(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;");
    }

    /** @return e.g. "1 output", "2 outputs" */
    private static String count(int n, String noun) {
        return n + " " + noun + (n == 1 ? "" : "s");
    }
}
