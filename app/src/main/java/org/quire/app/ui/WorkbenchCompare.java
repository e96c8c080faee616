package org.quire.app.ui;

import java.nio.file.Path;
import java.util.concurrent.ExecutionException;
import javax.swing.SwingWorker;
import org.quire.app.compare.BudgetComparison;
import org.quire.app.compare.Comparison;
import org.quire.app.ui.common.GuardedWorker;
import org.quire.app.ui.compare.CompareWindow;
import org.quire.app.ui.notebook.BudgetEditor;
import org.quire.engine.budget.Budget;
import org.quire.engine.document.DocumentStore;

/**
 * Budget &gt; Compare with for a workbench window: reads the other budget file and has the engine compare the
 * two off the event thread ({@link BudgetComparison}), then shows them side by side in a {@link CompareWindow}.
 *
 * <p>Not thread-safe: call on the event thread.
 */
final class WorkbenchCompare {
    private final WorkbenchFrame frame;

    WorkbenchCompare(WorkbenchFrame frame) {
        this.frame = frame;
    }

    /** Asks for a second budget file and compares it with the editor's budget. */
    void compareWith(BudgetEditor ed) {
        Path other = FileChooser.openTarget(frame, "Compare " + ed.document().name() + " with");
        if (other != null) {
            compareWith(ed, other);
        }
    }

    /**
     * Compares the budget in {@code other} (A, usually an earlier version) with the editor's budget (B), off the
     * event thread, and shows the two side by side.
     *
     * @return the running task
     */
    SwingWorker<Comparison, Void> compareWith(BudgetEditor ed, Path other) {
        Budget b = ed.document().budget();
        String nameB = ed.document().name() + " (open)";
        frame.status("Comparing with " + other + "\u2026", false);
        SwingWorker<Comparison, Void> w = new GuardedWorker<>() {
            @Override
            protected Comparison doInBackground() throws Exception {
                Budget a = DocumentStore.open(other).budget();
                return BudgetComparison.compare(a, b, frame.library());
            }

            @Override
            protected void finished() {
                try {
                    Comparison c = get();
                    frame.status("Compared with " + other, false);
                    new CompareWindow(frame, c, String.valueOf(other.getFileName()), nameB).setVisible(true);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                } catch (ExecutionException e) {
                    frame.showError("Cannot compare", other + ":\n" + e.getCause().getMessage());
                }
            }
        };
        w.execute();
        return w;
    }
}
