package org.quire.app.ui;

import java.awt.Toolkit;
import java.awt.event.ActionEvent;
import java.awt.event.InputEvent;
import java.awt.event.KeyEvent;
import java.nio.file.Path;
import java.util.Optional;
import java.util.function.Consumer;
import javax.swing.AbstractAction;
import javax.swing.Action;
import javax.swing.JCheckBoxMenuItem;
import javax.swing.JMenu;
import javax.swing.JMenuBar;
import javax.swing.JMenuItem;
import javax.swing.KeyStroke;
import org.quire.app.ui.document.BudgetDocument;
import org.quire.app.ui.notebook.BudgetEditor;

/**
 * The workbench's commands as actions that carry their name and shortcut and enable themselves from the active
 * editor and its history, and the menu bar built from them.
 */
final class WorkbenchActions {
    private static final int MENU = Toolkit.getDefaultToolkit().getMenuShortcutKeyMaskEx();
    private final WorkbenchFrame frame;
    private final JMenu recent = new JMenu("Open recent");
    final Action newBudget;
    final Action open;
    final Action openReview;
    final Action save;
    final Action saveAs;
    final Action close;
    final Action undo;
    final Action redo;
    final Action runMonteCarlo;
    final Action preferences;
    final Action newFromTemplate;
    final Action exportReport;
    final Action compareWith;
    final Action flowRange;

    WorkbenchActions(WorkbenchFrame frame) {
        this.frame = frame;
        newBudget = action("New budget", KeyEvent.VK_N, 0, e -> frame.newBudget());
        open = action("Open\u2026", KeyEvent.VK_O, 0, e -> {
            Path p = FileChooser.openTarget(frame, "Open budget");
            if (p != null) {
                frame.open(p);
            }
        });
        openReview = action("Open for review (read-only)\u2026", KeyEvent.VK_O, InputEvent.SHIFT_DOWN_MASK, e -> {
            Path p = FileChooser.openTarget(frame, "Open budget for review");
            if (p != null) {
                frame.open(p, true);
            }
        });
        save = action("Save", KeyEvent.VK_S, 0, e -> active().ifPresent(ed -> frame.files().save(ed, false)));
        saveAs = action("Save as\u2026", KeyEvent.VK_S, InputEvent.SHIFT_DOWN_MASK,
                e -> active().ifPresent(ed -> frame.files().save(ed, true)));
        close = action("Close budget", KeyEvent.VK_W, 0, e -> active().ifPresent(frame::close));
        undo = action("Undo", KeyEvent.VK_Z, 0, e -> active().ifPresent(ed -> ed.document().undo()));
        redo = action("Redo", KeyEvent.VK_Y, 0, e -> active().ifPresent(ed -> ed.document().redo()));
        runMonteCarlo = action("Run Monte Carlo", KeyEvent.VK_M, 0, e -> active().ifPresent(BudgetEditor::runMonteCarlo));
        newFromTemplate = action("New from template\u2026", KeyEvent.VK_N, InputEvent.SHIFT_DOWN_MASK,
                e -> frame.newFromTemplate(null));
        exportReport = action("Export report\u2026", KeyEvent.VK_E, InputEvent.SHIFT_DOWN_MASK,
                e -> active().ifPresent(frame::exportReport));
        compareWith = action("Compare with\u2026", KeyEvent.VK_D, InputEvent.SHIFT_DOWN_MASK,
                e -> active().ifPresent(frame::compareWith));
        flowRange = action("Flow range\u2026", 0, 0, e -> frame.openFlowRange());
        preferences = action("Preferences\u2026", KeyEvent.VK_COMMA, 0, e -> PreferencesDialog.show(frame));
        update();
    }

    private Optional<BudgetEditor> active() {
        return frame.activeEditor();
    }

    private static Action action(String name, int key, int extra, Consumer<ActionEvent> run) {
        Action a = new AbstractAction(name) {
            @Override
            public void actionPerformed(ActionEvent e) {
                run.accept(e);
            }
        };
        if (key != 0) {
            a.putValue(Action.ACCELERATOR_KEY, KeyStroke.getKeyStroke(key, MENU | extra));
        }
        return a;
    }

    /** Enables the actions from the active editor and names Undo and Redo after their edits. */
    void update() {
        Optional<BudgetEditor> ed = active();
        BudgetDocument d = ed.map(BudgetEditor::document).orElse(null);
        boolean editable = d != null && !d.isReadOnly();
        save.setEnabled(editable);
        saveAs.setEnabled(d != null);
        close.setEnabled(d != null);
        runMonteCarlo.setEnabled(d != null);
        exportReport.setEnabled(d != null);
        compareWith.setEnabled(d != null);
        flowRange.setEnabled(d != null && d.budget().flowPoints() != null);
        undo.setEnabled(editable && d.history().canUndo());
        redo.setEnabled(editable && d.history().canRedo());
        undo.putValue(Action.NAME, undo.isEnabled() ? "Undo " + d.history().undoName() : "Undo");
        redo.putValue(Action.NAME, redo.isEnabled() ? "Redo " + d.history().redoName() : "Redo");
    }

    void updateRecent() {
        recent.removeAll();
        for (Path p : frame.prefs().recentFiles()) {
            JMenuItem i = new JMenuItem(p.getFileName() + "  \u2014  " + p.getParent());
            i.addActionListener(e -> frame.open(p));
            recent.add(i);
        }
        recent.setEnabled(recent.getItemCount() > 0);
    }

    JMenuBar menuBar() {
        JMenuBar bar = new JMenuBar();
        JMenu file = menu("File", KeyEvent.VK_F);
        file.add(newBudget);
        file.add(newFromTemplate);
        file.add(action("Open the demo budget", 0, 0, e -> frame.openDemo()));
        file.add(open);
        file.add(openReview);
        file.add(action("Open calibration\u2026", 0, 0, e -> frame.openCalibration()));
        updateRecent();
        file.add(recent);
        file.addSeparator();
        file.add(save);
        file.add(saveAs);
        file.add(close);
        file.addSeparator();
        file.add(preferences);
        file.addSeparator();
        file.add(action("Quit", KeyEvent.VK_Q, 0, e -> frame.quit()));
        bar.add(file);
        JMenu edit = menu("Edit", KeyEvent.VK_E);
        edit.add(undo);
        edit.add(redo);
        bar.add(edit);
        JMenu view = menu("View", KeyEvent.VK_V);
        view.add(toggle("Workspace navigator", KeyEvent.VK_1, PaneLayout.Pane.NAVIGATOR));
        view.add(toggle("Inspector", KeyEvent.VK_2, PaneLayout.Pane.INSPECTOR));
        view.add(toggle("Problems", KeyEvent.VK_3, PaneLayout.Pane.PROBLEMS));
        view.addSeparator();
        view.add(action("Unfold all sections", KeyEvent.VK_PLUS, 0, e -> active().ifPresent(ed -> ed.setAllOpen(true))));
        view.add(action("Fold all sections", KeyEvent.VK_MINUS, 0, e -> active().ifPresent(ed -> ed.setAllOpen(false))));
        for (String[] s : new String[][] {{"Model", "4"}, {"Inputs", "5"}, {"Results (GUM)", "6"}}) {
            view.add(action("Go to " + s[0], KeyEvent.VK_0 + Integer.parseInt(s[1]), 0,
                    e -> active().ifPresent(ed -> ed.revealSection(s[0]))));
        }
        bar.add(view);
        JMenu budget = menu("Budget", KeyEvent.VK_B);
        budget.add(runMonteCarlo);
        budget.add(flowRange);
        budget.addSeparator();
        budget.add(exportReport);
        budget.add(compareWith);
        bar.add(budget);
        JMenu help = menu("Help", KeyEvent.VK_H);
        help.add(action("Model language reference", 0, 0, e -> ReferenceDialog.show(frame, frame.library())));
        help.addSeparator();
        help.add(action("About Quire", 0, 0, e -> AboutDialog.show(frame)));
        bar.add(help);
        return bar;
    }

    private JCheckBoxMenuItem toggle(String name, int key, PaneLayout.Pane pane) {
        JCheckBoxMenuItem i = new JCheckBoxMenuItem(name, true);
        i.setAccelerator(KeyStroke.getKeyStroke(key, MENU));
        i.addActionListener(e -> frame.panes().setShown(pane, i.isSelected()));
        frame.addWindowListener(new java.awt.event.WindowAdapter() {
            @Override
            public void windowOpened(java.awt.event.WindowEvent e) {
                i.setSelected(frame.panes().isShown(pane));
            }
        });
        return i;
    }

    private static JMenu menu(String name, int mnemonic) {
        JMenu m = new JMenu(name);
        m.setMnemonic(mnemonic);
        return m;
    }
}
