package org.quire.app.ui;

import java.nio.file.Path;
import java.time.LocalDate;
import java.util.concurrent.ExecutionException;
import javax.swing.SwingWorker;
import org.quire.app.ui.common.GuardedWorker;
import org.quire.app.ui.export.ReportExport;
import org.quire.app.ui.notebook.BudgetEditor;
import org.quire.engine.gum.GumResult;
import org.quire.engine.montecarlo.MonteCarloOutcome;

/**
 * Budget &gt; Export report for a workbench window: asks for the file, then writes the report of the editor's
 * budget off the event thread ({@link ReportExport} does the writing) and tells the outcome in the status line.
 *
 * <p>Not thread-safe: call on the event thread.
 */
final class WorkbenchReportExport {
    private final WorkbenchFrame frame;

    WorkbenchReportExport(WorkbenchFrame frame) {
        this.frame = frame;
    }

    /** Asks for a .pdf or .html file and writes the report to it. */
    void exportReport(BudgetEditor ed) {
        Path target = FileChooser.reportTarget(frame, ed.document().name());
        if (target != null) {
            exportReport(ed, target);
        }
    }

    /**
     * Writes the report of the editor's budget to {@code target} off the event thread.
     *
     * @return the running task, or null when the budget has no current GUM result (an error is shown)
     */
    SwingWorker<Void, Void> exportReport(BudgetEditor ed, Path target) {
        org.quire.engine.document.BudgetDocument content = ed.document().content();
        if (ed.latest() == null || !ed.latest().budget().equals(content.budget()) || ed.latest().result() == null) {
            frame.showError("No report", "The budget has no current GUM result (see the problems list); a report "
                    + "needs one.");
            return null;
        }
        GumResult gum = ed.latest().result();
        MonteCarloOutcome mc = ed.monteCarloOutcome(content.budget());
        frame.status("Writing the report to " + target + "\u2026", false);
        SwingWorker<Void, Void> w = new GuardedWorker<>() {
            @Override
            protected Void doInBackground() throws Exception {
                ReportExport.write(content, gum, mc, target, LocalDate.now(), frame.library());
                return null;
            }

            @Override
            protected void finished() {
                try {
                    get();
                    frame.status("Report written to " + target, false);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                } catch (ExecutionException e) {
                    frame.showError("The report was not written", target + ":\n" + e.getCause().getMessage());
                }
            }
        };
        w.execute();
        return w;
    }
}
