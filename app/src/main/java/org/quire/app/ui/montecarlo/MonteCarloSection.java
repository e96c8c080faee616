package org.quire.app.ui.montecarlo;

import java.awt.BorderLayout;
import java.awt.FlowLayout;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutionException;
import javax.swing.BoxLayout;
import javax.swing.JButton;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JProgressBar;
import org.quire.app.ui.common.Colors;
import org.quire.app.ui.common.SettingsLock;
import org.quire.app.ui.common.Fmt;
import org.quire.app.ui.document.Recalculation;
import org.quire.app.ui.common.Section;
import org.quire.engine.budget.Budget;
import org.quire.engine.gum.GumResult;
import org.quire.engine.montecarlo.CoverageInterval;
import org.quire.engine.montecarlo.GumComparison;
import org.quire.engine.montecarlo.MonteCarloOutcome;

/**
 * The Monte Carlo check of the budget: Run and Cancel, progress, and per output the histogram, the coverage
 * intervals and the verdict on the GUM result with its reason, all from the engine's {@link MonteCarloOutcome}.
 */
public final class MonteCarloSection implements Section {
    private final MonteCarloRunner runner;
    private final JPanel body = new JPanel(new BorderLayout(4, 4));
    private final JButton run = new JButton("Run Monte Carlo");
    private final JButton cancel = new JButton("Cancel");
    private final JProgressBar progress = new JProgressBar(0, 1000);
    private final JLabel state = new JLabel(" ");
    {
        state.setName("mcState");
    }
    private final JPanel outputs = new JPanel();
    private Budget budget;
    private Recalculation latest;
    private MonteCarloWorker worker;
    private MonteCarloOutcome shown;
    private Budget shownFor;

    private final org.quire.app.ui.common.EditorContext ctx;
    private final javax.swing.JTextField trials = new javax.swing.JTextField(8);
    private final javax.swing.JTextField seed = new javax.swing.JTextField(10);
    private final javax.swing.JCheckBox adaptive = new javax.swing.JCheckBox("Adaptive (JCGM 101:2008 7.9)");
    private final SettingsLock lock;
    private boolean updating;

    /**
     * @param runner the runner, {@link MonteCarloRunner#engine} in the application
     * @param ctx the editor, whose budget's Monte Carlo settings (trials, seed, adaptive) this section edits
     */
    public MonteCarloSection(MonteCarloRunner runner, org.quire.app.ui.common.EditorContext ctx) {
        this.runner = runner;
        this.ctx = ctx;
        run.setName("mcRun");
        cancel.setName("mcCancel");
        trials.setName("mcTrials");
        seed.setName("mcSeed");
        adaptive.setName("mcAdaptive");
        JPanel settings = new JPanel(new org.quire.app.ui.common.WrapLayout(FlowLayout.LEFT, 6, 2));
        javax.swing.JLabel tl = new javax.swing.JLabel("Trials");
        tl.setLabelFor(trials);
        javax.swing.JLabel sl = new javax.swing.JLabel("Seed");
        sl.setLabelFor(seed);
        settings.add(tl);
        settings.add(trials);
        settings.add(sl);
        settings.add(seed);
        settings.add(adaptive);
        trials.setToolTipText("Number of Monte Carlo trials M of this budget (JCGM 101:2008 7.2); with Adaptive, the "
                + "number of trials of each stage");
        seed.setToolTipText("Seed of the random generator; the same seed repeats the same result");
        adaptive.setToolTipText("Run until the results are stable to the budget's significant digits "
                + "(JCGM 101:2008 7.9)");
        for (javax.swing.JTextField f : new javax.swing.JTextField[] {trials, seed}) {
            f.addActionListener(e -> commitSettings());
            f.addFocusListener(new java.awt.event.FocusAdapter() {
                @Override public void focusLost(java.awt.event.FocusEvent e) { commitSettings(); }
            });
        }
        adaptive.addActionListener(e -> commitSettings());
        JPanel bar = new JPanel(new org.quire.app.ui.common.WrapLayout(FlowLayout.LEFT, 6, 2));
        bar.add(run);
        bar.add(cancel);
        bar.add(progress);
        progress.setStringPainted(true);
        progress.setString("");
        java.awt.FontMetrics fm = progress.getFontMetrics(progress.getFont());
        progress.setPreferredSize(new java.awt.Dimension(fm.stringWidth(progressText(9_999_999, 9_999_999)) + 24,
                progress.getPreferredSize().height));
        cancel.setEnabled(false);
        lock = new SettingsLock("mcLock", "Trials, seed and adaptive mode", trials, seed, adaptive);
        JPanel settingsAndLock = new JPanel(new BorderLayout());
        settingsAndLock.add(settings, BorderLayout.CENTER);
        settingsAndLock.add(lock.label(), BorderLayout.SOUTH);
        JPanel top = new JPanel(new BorderLayout());
        top.add(settingsAndLock, BorderLayout.NORTH);
        top.add(bar, BorderLayout.SOUTH);
        body.add(top, BorderLayout.NORTH);
        outputs.setLayout(new BoxLayout(outputs, BoxLayout.Y_AXIS));
        body.add(outputs, BorderLayout.CENTER);
        body.add(state, BorderLayout.SOUTH);
        run.addActionListener(e -> start());
        cancel.addActionListener(e -> stop());
        state.setText("Propagates the distributions (JCGM 101:2008) and checks the GUM result against them.");
    }

    @Override public String title() { return "Monte Carlo check"; }
    @Override public JComponent body() { return body; }

    private static String progressText(long done, long of) {
        return Fmt.count(done) + " of " + Fmt.count(of) + " trials";
    }

    /** Takes the trials, seed and adaptive mode typed into the budget's settings (one undoable edit). */
    private void commitSettings() {
        if (updating || ctx.readOnly() || budget == null || lockedBy() != null) {
            return;
        }
        org.quire.engine.budget.EvaluationSettings s = budget.settings();
        org.quire.engine.budget.EvaluationSettings n;
        try {
            double m = Fmt.parse(trials.getText());
            double sd = Fmt.parse(seed.getText());
            if (m != Math.rint(m) || sd != Math.rint(sd) || Math.abs(sd) > 9.007e15 || m > 1e12) {
                throw new IllegalArgumentException("trials and seed are whole numbers, not "
                        + trials.getText().strip() + " and " + seed.getText().strip());
            }
            n = s.withTrials((long) m).withSeed((long) sd).withAdaptive(adaptive.isSelected());
        } catch (IllegalArgumentException e) {
            ctx.status("Monte Carlo settings: " + e.getMessage(), true);
            return;
        }
        if (!n.equals(s)) {
            ctx.edit("Change Monte Carlo settings", "mcSettings", b -> b.withSettings(n));
        }
    }

    /**
     * @param b the budget a report is made of
     * @return the outcome of the last run when it was made for exactly {@code b}, else null (a run of an earlier
     *     state of the budget never goes into a report of the present one)
     */
    public MonteCarloOutcome outcomeFor(Budget b) {
        return shown != null && b != null && b.equals(shownFor) ? shown : null;
    }

    @Override
    public void budgetChanged(Budget b) {
        budget = b;
        updating = true;
        try {
            if (!trials.isFocusOwner()) {
                trials.setText(Fmt.count(b.settings().trials()).replace(String.valueOf(
                        org.quire.engine.gum.Figures.GROUP), ""));
            }
            if (!seed.isFocusOwner()) {
                seed.setText(Long.toString(b.settings().seed()));
            }
            adaptive.setSelected(b.settings().adaptive());
        } finally {
            updating = false;
        }
        if (shown != null && !b.equals(shownFor)) {
            state.setText("The budget has changed since this run; run again for results of the present budget.");
            state.setForeground(Colors.get("Quire.warning"));
        }
        updateButtons();
    }

    /** @return the template that locks the budget's settings, or null: the engine's rule */
    private org.quire.engine.document.TemplateOrigin lockedBy() {
        return ctx.document().content().settingsLockedBy();
    }

    @Override
    public void documentChanged(org.quire.engine.document.BudgetDocument content) {
        readOnlyChanged(ctx.readOnly());
    }

    @Override
    public void readOnlyChanged(boolean ro) {
        org.quire.engine.document.TemplateOrigin o = lockedBy();
        trials.setEditable(!ro && o == null);
        seed.setEditable(!ro && o == null);
        adaptive.setEnabled(!ro && o == null);
        lock.show(o);
    }

    @Override
    public void recalculated(Recalculation r) {
        latest = r;
        updateButtons();
    }

    private void updateButtons() {
        boolean running = worker != null && !worker.isDone();
        boolean ready = latest != null && latest.result() != null && latest.budget().equals(budget);
        run.setEnabled(!running && ready);
        cancel.setEnabled(running);
    }

    /** Starts a run on the present budget; does nothing when one is running or the budget has errors. */
    public void start() {
        if ((worker != null && !worker.isDone()) || latest == null || latest.result() == null
                || !latest.budget().equals(budget)) {
            return;
        }
        Budget b = latest.budget();
        GumResult gum = latest.result();
        progress.setValue(0);
        progress.setString("starting");
        outputs.removeAll();
        outputs.revalidate();
        outputs.repaint();
        shown = null;
        state.setText("Running " + Fmt.count(b.settings().trials()) + " trials with seed " + b.settings().seed() + " ...");
        state.setForeground(Colors.get("Label.foreground"));
        worker = new MonteCarloWorker(runner, b, gum, p -> {
            progress.setValue((int) Math.min(1000, 1000 * p[0] / Math.max(1, p[1])));
            progress.setString(progressText(p[0], p[1]));
        });
        worker.addPropertyChangeListener(e -> {
            if ("state".equals(e.getPropertyName()) && e.getNewValue() == javax.swing.SwingWorker.StateValue.DONE) {
                finished(worker);
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

    private void finished(MonteCarloWorker w) {
        if (w != worker) {
            return;
        }
        try {
            MonteCarloOutcome o = w.get();
            shown = o;
            shownFor = w.budget();
            showOutcome(o, w.budget().settings().significantDigits());
            progress.setValue(1000);
            progress.setString(Fmt.count(o.trials()) + " trials");
            state.setText("Done: " + Fmt.count(o.trials()) + " trials, seed " + o.seed() + (o.adaptive() ? ", adaptive" : "")
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
            if (c instanceof CancellationException) {
                progress.setString("cancelled");
                state.setText("The run was cancelled; no Monte Carlo result.");
                state.setForeground(Colors.get("Quire.warning"));
                updateButtons();
                return;
            }
            progress.setString("failed");
            state.setText("<html>The Monte Carlo run failed: " + String.valueOf(c.getMessage()).replace("<", "&lt;") + "</html>");
            state.setForeground(Colors.get("Quire.error"));
        }
        updateButtons();
    }

    private void showOutcome(MonteCarloOutcome o, int digits) {
        outputs.removeAll();
        for (MonteCarloOutcome.Output out : o.outputs()) {
            JPanel p = new JPanel(new BorderLayout(8, 2));
            p.setName("mc:" + out.name());
            org.quire.app.ui.chart.ChartView plot = new org.quire.app.ui.chart.ChartView();
            plot.setName("mcHistogram:" + out.name());
            plot.setChart(org.quire.app.report.MonteCarloReport.histogram(out));
            p.add(plot, BorderLayout.CENTER);
            JLabel text = new JLabel(describe(out, digits));
            text.setName("mcVerdict:" + out.name());
            text.putClientProperty(VERDICT, out.comparison().verdict());
            p.add(text, BorderLayout.EAST);
            p.setBorder(javax.swing.BorderFactory.createEmptyBorder(4, 0, 8, 0));
            outputs.add(p);
        }
        outputs.revalidate();
        outputs.repaint();
    }

    /** The client property of an output's verdict label that holds the engine's {@link GumComparison.Verdict}. */
    public static final String VERDICT = "quire.mcVerdict";

    static String describe(MonteCarloOutcome.Output o, int digits) {
        String unit = o.unit().isEmpty() ? "" : " " + org.quire.engine.units.Units.display(o.unit());
        double u = o.hasStandardUncertainty() ? o.standardUncertainty() : Double.NaN;
        StringBuilder s = new StringBuilder("<html><b>").append(esc(o.name())).append(esc(unit)).append("</b><br>");
        if (o.hasStandardUncertainty()) {
            s.append("y = ").append(org.quire.engine.gum.Figures.statedResult(o.estimate(), o.standardUncertainty(), digits)).append(esc(unit))
                    .append(" (u)<br>");
        } else {
            s.append("y = ").append(Fmt.num(o.estimate())).append(esc(unit)).append("<br>u(y) not defined<br>");
        }
        interval(s, "symmetric", o.symmetricInterval(), unit, u, digits);
        interval(s, "shortest", o.shortestInterval(), unit, u, digits);
        interval(s, "GUM y \u00b1 U", o.gumInterval(), unit, u, digits);
        GumComparison c = o.comparison();
        String colour = String.format("#%06x", Colors.get(c.validated() ? "Quire.ok" : "Quire.error")
                .getRGB() & 0xffffff);
        s.append("<b style='color:").append(colour).append("'>")
                .append(c.verdict().statement()).append("</b><br>");
        if (!c.explanation().isEmpty()) {
            s.append("<div style='width:220px'><b>").append(esc(c.explanation())).append("</b></div>");
        }
        s.append("<div style='width:220px'>").append(org.quire.app.report.HtmlReport.math(
                org.quire.app.report.ReportBuilder.sentence(c.reasonPhrases()))).append("</div>");
        o.standardUncertaintyNote().ifPresent(n -> s.append("<div style='width:220px'>").append(esc(n))
                .append("</div>"));
        return s.append("</html>").toString();
    }

    /** An interval's ends to the decimal place of u at the budget's digits (JCGM 100:2008 7.2.6), else 6 digits. */
    private static String end(double v, double u, int digits) {
        return org.quire.engine.gum.Figures.intervalEnd(v, u, digits);
    }

    private static void interval(StringBuilder s, String label, CoverageInterval i, String unit, double u, int digits) {
        s.append(label).append(' ').append(Fmt.probability(i.probability())).append(": [").append(end(i.lower(), u, digits))
                .append(", ").append(end(i.upper(), u, digits)).append("]").append(esc(unit)).append("<br>");
    }

    private static String esc(String t) {
        return t.replace("&", "&amp;").replace("<", "&lt;");
    }

    /** @return whether a run is in progress */
    public boolean isRunning() {
        return worker != null && !worker.isDone();
    }
}
