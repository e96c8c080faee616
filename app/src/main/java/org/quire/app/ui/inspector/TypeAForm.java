package org.quire.app.ui.inspector;

import java.awt.BorderLayout;
import java.awt.Dimension;
import java.awt.FlowLayout;
import java.awt.GridLayout;
import java.util.List;
import java.util.function.Consumer;
import javax.swing.JButton;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTextField;
import org.quire.app.ui.common.Fmt;
import org.quire.engine.budget.TypeA;

/**
 * A Type A evaluation: the readings grid (paste from a spreadsheet) with the engine's statistics of them, or a
 * summary (mean, s, n), optionally with a pooled standard deviation from an earlier study.
 */
final class TypeAForm extends JPanel {
    private final ReadingsGrid grid = new ReadingsGrid();
    private final JLabel stats = new JLabel(" ");
    private final JTextField mean = new JTextField(6);
    private final JTextField s = new JTextField(6);
    private final JTextField n = new JTextField(4);
    private final JTextField pooledS = new JTextField(6);
    private final JTextField pooledDof = new JTextField(4);
    private final JButton useReadings = new JButton("Use readings");
    private final JButton useSummary = new JButton("Use summary");
    private final JButton importCsv = new JButton("Import CSV\u2026");

    /**
     * @param apply told of the evaluation when the engineer presses Use readings or Use summary
     * @param problem told of a refusal (null when there is none)
     * @param typed told when the engineer changes a reading or a summary text
     */
    TypeAForm(Consumer<TypeA> apply, Consumer<String> problem, Runnable typed) {
        super(new BorderLayout(4, 4));
        javax.swing.event.DocumentListener onText = new javax.swing.event.DocumentListener() {
            @Override public void insertUpdate(javax.swing.event.DocumentEvent e) { typed.run(); }
            @Override public void removeUpdate(javax.swing.event.DocumentEvent e) { typed.run(); }
            @Override public void changedUpdate(javax.swing.event.DocumentEvent e) { }
        };
        for (JTextField f : new JTextField[] {mean, s, n, pooledS, pooledDof}) {
            f.getDocument().addDocumentListener(onText);
        }
        grid.getModel().addTableModelListener(e -> typed.run());
        mean.setName("summary:mean");
        s.setName("summary:s");
        n.setName("summary:n");
        JScrollPane sp = new JScrollPane(grid);
        sp.setPreferredSize(new Dimension(200, 150));
        JPanel top = new JPanel(new BorderLayout(2, 2));
        top.add(new JLabel("Readings (paste a column from a spreadsheet with Ctrl+V)"), BorderLayout.NORTH);
        top.add(sp, BorderLayout.CENTER);
        top.add(stats, BorderLayout.SOUTH);
        add(top, BorderLayout.NORTH);
        JPanel summary = new JPanel(new GridLayout(0, 2, 4, 2));
        summary.setBorder(javax.swing.BorderFactory.createTitledBorder("Or a summary of the observations"));
        summary.add(new JLabel("Mean"));
        summary.add(mean);
        summary.add(new JLabel("s of one observation"));
        summary.add(s);
        summary.add(new JLabel("Observations n"));
        summary.add(n);
        summary.add(new JLabel("Pooled s (optional)"));
        summary.add(pooledS);
        summary.add(new JLabel("\u03bd of pooled s"));
        summary.add(pooledDof);
        add(summary, BorderLayout.CENTER);
        JPanel buttons = new JPanel(new FlowLayout(FlowLayout.LEFT, 4, 0));
        buttons.add(useReadings);
        buttons.add(useSummary);
        buttons.add(importCsv);
        importCsv.setToolTipText("Readings from a CSV file: the column named reading, or a file of one column");
        importCsv.addActionListener(e -> {
            javax.swing.JFileChooser c = new javax.swing.JFileChooser();
            c.setDialogTitle("Import readings");
            c.setFileFilter(new javax.swing.filechooser.FileNameExtensionFilter("CSV files", "csv", "txt"));
            if (c.showOpenDialog(this) != javax.swing.JFileChooser.APPROVE_OPTION) {
                return;
            }
            try {
                grid.setReadings(org.quire.engine.csv.CsvReadings.read(c.getSelectedFile().toPath(),
                        org.quire.engine.csv.CsvOptions.defaults()));
                problem.accept(null);
            } catch (org.quire.engine.csv.CsvException x) {
                problem.accept(x.getMessage());
            } catch (java.io.IOException x) {
                problem.accept(c.getSelectedFile().getName() + ": " + x.getMessage());
            }
        });
        add(buttons, BorderLayout.SOUTH);
        grid.addPropertyChangeListener("pasteProblem", e -> problem.accept((String) e.getNewValue()));
        useReadings.addActionListener(e -> {
            try {
                TypeA a = TypeA.ofReadings(grid.readings());
                a = withPooled(a);
                problem.accept(null);
                apply.accept(a);
            } catch (IllegalArgumentException x) {
                problem.accept(x.getMessage());
            }
        });
        useSummary.addActionListener(e -> {
            try {
                double m = Fmt.parse(mean.getText());
                int count = (int) Fmt.parse(n.getText());
                TypeA a = s.getText().isBlank() ? TypeA.ofMean(m, count)
                        : TypeA.ofSummary(m, Fmt.parse(s.getText()), count);
                a = withPooled(a);
                problem.accept(null);
                apply.accept(a);
            } catch (IllegalArgumentException x) {
                problem.accept(x.getMessage());
            }
        });
    }

    private TypeA withPooled(TypeA a) {
        if (pooledS.getText().isBlank() && pooledDof.getText().isBlank()) {
            return a;
        }
        return a.withPooled(Fmt.parse(pooledS.getText()), Fmt.parse(pooledDof.getText()));
    }

    /** Shows an evaluation; null for an empty form (switching from Type B). */
    void show(TypeA a, double estimate) {
        if (a == null) {
            grid.setReadings(null);
            stats.setText("Enter readings or a summary, then press Use readings or Use summary.");
            mean.setText(Fmt.num(estimate));
            s.setText("");
            n.setText("");
            pooledS.setText("");
            pooledDof.setText("");
            return;
        }
        grid.setReadings(a.readings());
        stats.setText("<html>n = " + a.count() + ", mean = " + Fmt.num(a.estimate()) + ", s = "
                + Fmt.working(a.standardDeviation()) + "<br>u = s/\u221an = " + Fmt.working(a.standardUncertainty())
                + ", \u03bd = " + Fmt.dof(a.dof()) + (a.isPooled() ? " (pooled s = " + Fmt.working(a.pooledStandardDeviation())
                + ")" : "") + "</html>");
        mean.setText(Fmt.num(a.estimate()));
        s.setText(Fmt.num(a.standardDeviation()));
        n.setText(String.valueOf(a.count()));
        pooledS.setText(a.isPooled() ? Fmt.num(a.pooledStandardDeviation()) : "");
        pooledDof.setText(a.isPooled() ? Fmt.dof(a.dof()) : "");
    }

    /** The text of the form, kept while it is not applied. */
    record Texts(List<String> readings, List<String> summary) {
    }

    /** @return the present text of the readings and the summary */
    Texts texts() {
        List<String> r = new java.util.ArrayList<>();
        for (int i = 0; i < grid.getRowCount(); i++) {
            Object v = grid.getModel().getValueAt(i, 1);
            r.add(v == null ? "" : v.toString());
        }
        List<String> f = new java.util.ArrayList<>();
        for (JTextField t : new JTextField[] {mean, s, n, pooledS, pooledDof}) {
            f.add(t.getText());
        }
        return new Texts(List.copyOf(r), List.copyOf(f));
    }

    /** Puts back text taken by {@link #texts()}. */
    void restore(Texts t) {
        grid.setReadingTexts(t.readings());
        JTextField[] fs = {mean, s, n, pooledS, pooledDof};
        for (int i = 0; i < fs.length; i++) {
            fs[i].setText(t.summary().get(i));
        }
    }

    void setEditable(boolean on) {
        grid.setEditableGrid(on);
        for (JTextField f : new JTextField[] {mean, s, n, pooledS, pooledDof}) {
            f.setEditable(on);
        }
        useReadings.setEnabled(on);
        importCsv.setEnabled(on);
        useSummary.setEnabled(on);
    }
}
