package org.quire.app.ui.notebook;

import org.quire.app.ui.common.EditorContext;
import org.quire.app.ui.common.Section;
import java.awt.BorderLayout;
import java.awt.FlowLayout;
import java.util.LinkedHashMap;
import java.util.Map;
import javax.swing.BoxLayout;
import javax.swing.ButtonGroup;
import javax.swing.JCheckBox;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JRadioButton;
import javax.swing.JSpinner;
import javax.swing.JTextField;
import javax.swing.SpinnerNumberModel;
import org.quire.app.ui.common.Colors;
import org.quire.app.ui.common.SettingsLock;
import org.quire.app.ui.common.Fmt;
import org.quire.app.ui.document.Recalculation;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.EvaluationSettings;
import org.quire.engine.gum.GumResult;
import org.quire.engine.gum.OutputResult;

/** The GUM results of every output, recalculated as the budget changes, with the budget's coverage settings. */
final class ResultsSection implements Section {
    private final EditorContext ctx;
    private final JPanel body = new JPanel(new BorderLayout(4, 4));
    private final JPanel outputs = new JPanel();
    private final Map<String, OutputResultPanel> panels = new LinkedHashMap<>();
    private final JLabel state = new JLabel(" ");
    private final JRadioButton byP = new JRadioButton("Coverage probability");
    private final JRadioButton byK = new JRadioButton("Fixed coverage factor k");
    private final JTextField p = new JTextField(6);
    private final JTextField k = new JTextField(4);
    private final JSpinner digits = new JSpinner(new SpinnerNumberModel(2, 1, 4, 1));
    private final JCheckBox higher = new JCheckBox("Higher-order terms");
    private final JCheckBox truncate = new JCheckBox("<html>Truncate \u03bd<sub>eff</sub></html>");
    private final SettingsLock lock;
    private final JPanel flowRange = new JPanel(new org.quire.app.ui.common.WrapLayout(FlowLayout.LEFT, 6, 2));
    private final JLabel flowRangeText = new JLabel();
    private Runnable flowRangeOpener;
    private boolean updating;
    private GumResult last;

    ResultsSection(EditorContext ctx) {
        this.ctx = ctx;
        p.setName("coverageProbability");
        digits.setName("significantDigits");
        JPanel settings = new JPanel(new org.quire.app.ui.common.WrapLayout(FlowLayout.LEFT, 6, 2));
        ButtonGroup g = new ButtonGroup();
        g.add(byP);
        g.add(byK);
        settings.add(byP);
        settings.add(p);
        settings.add(new JLabel("%"));
        settings.add(byK);
        settings.add(k);
        settings.add(new JLabel("   Significant digits"));
        settings.add(digits);
        settings.add(higher);
        settings.add(truncate);
        higher.setToolTipText("Add the higher-order terms of JCGM 100:2008 5.1.2 note (uncorrelated inputs only)");
        truncate.setToolTipText("Truncate the effective degrees of freedom to an integer before looking up k "
                + "(JCGM 100:2008 G.4.1 note 1)");
        JPanel north = new JPanel(new BorderLayout());
        state.setName("resultsState");
        state.setFont(state.getFont().deriveFont(java.awt.Font.BOLD));
        north.add(state, BorderLayout.NORTH);
        lock = new SettingsLock("resultsLock", "Coverage and evaluation settings", byP, byK, p, k, digits, higher,
                truncate);
        north.add(lock.label(), BorderLayout.CENTER);
        north.add(settings, BorderLayout.SOUTH);
        javax.swing.JButton showRange = new javax.swing.JButton("Show the flow range\u2026");
        showRange.setName("showFlowRange");
        showRange.addActionListener(e -> {
            if (flowRangeOpener != null) {
                flowRangeOpener.run();
            }
        });
        flowRange.add(flowRangeText);
        flowRange.add(showRange);
        flowRange.setVisible(false);
        JPanel northAndRange = new JPanel(new BorderLayout());
        northAndRange.add(north, BorderLayout.NORTH);
        northAndRange.add(flowRange, BorderLayout.SOUTH);
        body.add(northAndRange, BorderLayout.NORTH);
        outputs.setLayout(new BoxLayout(outputs, BoxLayout.Y_AXIS));
        body.add(outputs, BorderLayout.CENTER);
        p.addActionListener(e -> commitSettings());
        k.addActionListener(e -> commitSettings());
        p.addFocusListener(new java.awt.event.FocusAdapter() {
            @Override public void focusLost(java.awt.event.FocusEvent e) { commitSettings(); }
        });
        k.addFocusListener(new java.awt.event.FocusAdapter() {
            @Override public void focusLost(java.awt.event.FocusEvent e) { commitSettings(); }
        });
        byP.addActionListener(e -> commitSettings());
        byK.addActionListener(e -> commitSettings());
        digits.addChangeListener(e -> commitSettings());
        higher.addActionListener(e -> commitSettings());
        truncate.addActionListener(e -> commitSettings());
    }

    private void commitSettings() {
        if (updating || ctx.readOnly() || lockedBy() != null) {
            return;
        }
        EvaluationSettings s = ctx.document().budget().settings();
        try {
            if (byK.isSelected()) {
                s = s.withCoverageFactor(Fmt.parse(k.getText()));
            } else {
                s = s.withCoverageProbability(Fmt.parse(p.getText()) / 100);
            }
        } catch (IllegalArgumentException e) {
            ctx.status(e.getMessage(), true);
            return;
        }
        EvaluationSettings ns = s.withSignificantDigits((Integer) digits.getValue()).withHigherOrder(higher.isSelected())
                .withDofRounding(truncate.isSelected() ? EvaluationSettings.DofRounding.TRUNCATE
                        : EvaluationSettings.DofRounding.EXACT);
        ctx.edit("Change evaluation settings", "settings", b -> b.withSettings(ns));
    }

    @Override public String title() { return "Results (GUM)"; }
    @Override public JComponent body() { return body; }

    void setFlowRangeOpener(Runnable opener) {
        flowRangeOpener = opener;
        showFlowPoints(ctx.document().budget());
    }

    private void showFlowPoints(Budget b) {
        int points = b.flowPoints() == null ? 0 : b.flowPoints().rows().size();
        flowRange.setVisible(points > 0 && flowRangeOpener != null);
        flowRangeText.setText(points == 0 ? "" : "This budget has " + points + " flow points; the results below are "
                + "those of the inputs as entered.");
    }

    @Override
    public void budgetChanged(Budget b) {
        showFlowPoints(b);
        updating = true;
        try {
            EvaluationSettings s = b.settings();
            byK.setSelected(s.hasFixedCoverageFactor());
            byP.setSelected(!s.hasFixedCoverageFactor());
            String pText = Fmt.probability(s.coverageProbability()).replace(" %", "");
            if (!p.isFocusOwner()) {
                p.setText(pText);
            }
            if (!k.isFocusOwner()) {
                k.setText(s.hasFixedCoverageFactor() ? Fmt.num(s.coverageFactor()) : "");
            }
            digits.setValue(s.significantDigits());
            higher.setSelected(s.higherOrder());
            truncate.setSelected(s.dofRounding() == EvaluationSettings.DofRounding.TRUNCATE);
        } finally {
            updating = false;
        }
    }

    @Override
    public void recalculated(Recalculation r) {
        if (r.result() == null) {
            long errors = r.problems().stream().filter(x -> x.severity()
                    == org.quire.app.ui.document.Problem.Severity.ERROR).count();
            String count = errors + (errors == 1 ? " error" : " errors");
            org.quire.app.ui.document.Problem first = r.problems().stream().filter(x -> x.severity()
                    == org.quire.app.ui.document.Problem.Severity.ERROR).findFirst().orElse(null);
            String firstText = first == null ? "" : " (" + first.area().name().toLowerCase(java.util.Locale.ROOT)
                    + (first.where().isEmpty() ? "" : ", " + first.where()) + (errors > 1 ? ", the first" : "") + ")";
            state.setText(last == null ? "No results: the budget has " + count + firstText + "; see the Problems panel."
                    : "Not current: the budget has " + count + firstText + "; below, the last results evaluated.");
            state.setForeground(Colors.get("Quire.error"));
            for (OutputResultPanel panel : panels.values()) {
                panel.markNotCurrent("not current, the budget has " + count);
            }
            return;
        }
        last = r.result();
        state.setText("Evaluated in " + r.millis() + " ms.");
        state.setForeground(Colors.get("Label.disabledForeground"));
        if (!panels.keySet().equals(r.result().outputs().stream().map(OutputResult::name)
                .collect(java.util.stream.Collectors.toCollection(java.util.LinkedHashSet::new)))) {
            panels.clear();
            outputs.removeAll();
            for (OutputResult o : r.result().outputs()) {
                OutputResultPanel panel = new OutputResultPanel(o.name());
                panels.put(o.name(), panel);
                outputs.add(panel);
            }
        }
        int d = r.budget().settings().significantDigits();
        for (OutputResult o : r.result().outputs()) {
            panels.get(o.name()).show(o, d);
        }
        outputs.revalidate();
        outputs.repaint();
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
        for (JComponent c : lock.guarded()) {
            c.setEnabled(!ro && o == null);
        }
        lock.show(o);
    }

    /** @return the result panel of an output, for tests and reports */
    OutputResultPanel panel(String output) {
        return panels.get(output);
    }
}
