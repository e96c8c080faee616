package org.quire.app.ui.montecarlo;

import java.awt.BorderLayout;
import java.awt.FlowLayout;
import java.util.Optional;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutionException;
import javax.swing.BoxLayout;
import javax.swing.JButton;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JProgressBar;
import org.quire.app.ui.Colors;
import org.quire.app.ui.Fmt;
import org.quire.app.ui.document.Recalculation;
import org.quire.app.ui.notebook.Section;
import org.quire.engine.budget.Budget;
import org.quire.engine.gum.GumResult;
import org.quire.engine.gum.OutputResult;
import org.quire.engine.gum.Rounding;

/**
 * The Monte Carlo check of the budget: Run and Cancel, progress, and per output the histogram, the coverage
 * interval and the verdict on the GUM result, all from the installed {@link MonteCarloRunner}.
 */
public final class MonteCarloSection implements Section {
    private final Optional<MonteCarloRunner> runner;
    private final JPanel body = new JPanel(new BorderLayout(4, 4));
    private final JButton run = new JButton("Run Monte Carlo");
    private final JButton cancel = new JButton("Cancel");
    private final JProgressBar progress = new JProgressBar(0, 1000);
    private final JLabel state = new JLabel(" ");
    private final JPanel outputs = new JPanel();
    private Budget budget;
    private Recalculation latest;
    private MonteCarloWorker worker;
    private MonteCarloOutcome shown;
    private Budget shownFor;

    /** @param runner the installed runner, or empty when this build has none */
    public MonteCarloSection(Optional<MonteCarloRunner> runner) {
        this.runner = runner;
        run.setName("mcRun");
        cancel.setName("mcCancel");
        JPanel bar = new JPanel(new FlowLayout(FlowLayout.LEFT, 6, 0));
        bar.add(run);
        bar.add(cancel);
        bar.add(progress);
        progress.setStringPainted(true);
        progress.setString("");
        cancel.setEnabled(false);
        body.add(bar, BorderLayout.NORTH);
        outputs.setLayout(new BoxLayout(outputs, BoxLayout.Y_AXIS));
        body.add(outputs, BorderLayout.CENTER);
        body.add(state, BorderLayout.SOUTH);
        run.addActionListener(e -> start());
        cancel.addActionListener(e -> stop());
        if (runner.isEmpty()) {
            run.setEnabled(false);
            state.setText("This build has no Monte Carlo engine installed, so the GUM result cannot be checked "
                    + "against JCGM 101 here.");
        } else {
            state.setText("Propagates the distributions (JCGM 101:2008) and checks the GUM result against them.");
        }
    }

    @Override public String title() { return "Monte Carlo check"; }
    @Override public JComponent body() { return body; }

    @Override
    public void budgetChanged(Budget b) {
        budget = b;
        if (shown != null && !b.equals(shownFor)) {
            state.setText("The budget has changed since this run; run again for results of the present budget.");
            state.setForeground(Colors.get("Quire.warning"));
        }
        updateButtons();
    }

    @Override
    public void recalculated(Recalculation r) {
        latest = r;
        updateButtons();
    }

    private void updateButtons() {
        boolean running = worker != null && !worker.isDone();
        boolean ready = latest != null && latest.result() != null && latest.budget().equals(budget);
        run.setEnabled(runner.isPresent() && !running && ready);
        cancel.setEnabled(running);
    }

    /** Starts a run on the present budget; does nothing when one is running or the budget has errors. */
    public void start() {
        if (runner.isEmpty() || (worker != null && !worker.isDone()) || latest == null || latest.result() == null
                || !latest.budget().equals(budget)) {
            return;
        }
        Budget b = latest.budget();
        GumResult gum = latest.result();
        progress.setValue(0);
        progress.setString("starting");
        state.setText("Running " + b.settings().trials() + " trials with seed " + b.settings().seed() + " ...");
        state.setForeground(Colors.get("Label.foreground"));
        worker = new MonteCarloWorker(runner.get(), b, gum, p -> {
            progress.setValue((int) Math.min(1000, 1000 * p[0] / Math.max(1, p[1])));
            progress.setString(p[0] + " / " + p[1] + " trials");
        });
        worker.addPropertyChangeListener(e -> {
            if ("state".equals(e.getPropertyName()) && e.getNewValue() == javax.swing.SwingWorker.StateValue.DONE) {
                finished(worker, gum);
            }
        });
        worker.execute();
        updateButtons();
    }

    /** Cancels a running run. */
    public void stop() {
        if (worker != null && !worker.isDone()) {
            worker.requestCancel();
        }
    }

    private void finished(MonteCarloWorker w, GumResult gum) {
        if (w != worker) {
            return;
        }
        try {
            MonteCarloOutcome o = w.get();
            shown = o;
            shownFor = w.budget();
            showOutcome(o, gum, w.budget().settings().significantDigits());
            progress.setValue(1000);
            progress.setString(o.trials() + " trials");
            state.setText("Done: " + o.trials() + " trials, seed " + o.seed() + (o.adaptive() ? ", adaptive" : "")
                    + ". Run again with the same seed to repeat the result.");
            state.setForeground(Colors.get("Label.foreground"));
        } catch (CancellationException e) {
            progress.setString("cancelled");
            state.setText("The run was cancelled; no Monte Carlo result.");
            state.setForeground(Colors.get("Quire.warning"));
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        } catch (ExecutionException e) {
            Throwable c = e.getCause();
            progress.setString("failed");
            state.setText("<html>The Monte Carlo run failed: " + (c instanceof InterruptedException ? "cancelled"
                    : String.valueOf(c.getMessage()).replace("<", "&lt;")) + "</html>");
            state.setForeground(Colors.get("Quire.error"));
        }
        updateButtons();
    }

    private void showOutcome(MonteCarloOutcome o, GumResult gum, int digits) {
        outputs.removeAll();
        for (MonteCarloOutcome.OutputOutcome out : o.outputs()) {
            OutputResult g = gum.output(out.name());
            JPanel p = new JPanel(new BorderLayout(8, 2));
            p.setName("mc:" + out.name());
            HistogramPlot plot = new HistogramPlot();
            plot.show(out, g == null ? Double.NaN : g.estimate() - g.expandedUncertainty(),
                    g == null ? Double.NaN : g.estimate() + g.expandedUncertainty());
            p.add(plot, BorderLayout.CENTER);
            JLabel text = new JLabel(describe(out, digits));
            text.setName("mcVerdict:" + out.name());
            p.add(text, BorderLayout.EAST);
            p.setBorder(javax.swing.BorderFactory.createEmptyBorder(4, 0, 8, 0));
            outputs.add(p);
        }
        outputs.revalidate();
        outputs.repaint();
    }

    static String describe(MonteCarloOutcome.OutputOutcome o, int digits) {
        String unit = o.unit().isEmpty() ? "" : " " + o.unit();
        StringBuilder s = new StringBuilder("<html><b>").append(o.name()).append(unit).append("</b><br>")
                .append("y = ").append(Rounding.format(o.estimate(), o.standardUncertainty(), digits)).append(unit)
                .append(" (u)<br>").append(o.shortest() ? "shortest " : "symmetric ")
                .append(Fmt.probability(o.coverageProbability())).append(" interval:<br>[")
                .append(Fmt.num(o.lower())).append(", ").append(Fmt.num(o.upper())).append("]").append(unit);
        if (!Double.isNaN(o.otherLower())) {
            s.append("<br>").append(o.shortest() ? "symmetric: [" : "shortest: [").append(Fmt.num(o.otherLower()))
                    .append(", ").append(Fmt.num(o.otherUpper())).append("]");
        }
        MonteCarloOutcome.GumComparison c = o.comparison();
        if (c != null) {
            String colour = String.format("#%06x", Colors.get(c.gumValidated() ? "Quire.ok" : "Quire.error")
                    .getRGB() & 0xffffff);
            s.append("<br><b style='color:").append(colour).append("'>")
                    .append(c.gumValidated() ? "GUM result confirmed" : "GUM result NOT confirmed")
                    .append("</b><br>d_low = ").append(Fmt.working(c.lowDifference()))
                    .append(", d_high = ").append(Fmt.working(c.highDifference()))
                    .append("<br>tolerance \u03b4 = ").append(Fmt.working(c.numericalTolerance()));
        }
        return s.append("</html>").toString();
    }

    /** @return whether a run is in progress */
    public boolean isRunning() {
        return worker != null && !worker.isDone();
    }
}
