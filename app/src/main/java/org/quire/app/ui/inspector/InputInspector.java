package org.quire.app.ui.inspector;

import java.awt.BorderLayout;
import java.awt.CardLayout;
import java.awt.GridBagConstraints;
import java.awt.GridBagLayout;
import java.awt.Insets;
import java.util.function.Function;
import javax.swing.BoxLayout;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JTextField;
import org.quire.app.ui.common.Colors;
import org.quire.app.ui.common.EditorContext;
import org.quire.engine.budget.Evaluation;
import org.quire.engine.budget.InputQuantity;
import org.quire.engine.budget.TypeA;
import org.quire.engine.budget.TypeB;

/** Every option of the selected input, a small plot of its distribution, and its readings for a Type A. */
final class InputInspector extends JPanel {
    private final EditorContext ctx;
    private final JLabel heading = new JLabel();
    private final DistributionPlot plot = new DistributionPlot();
    private final JTextField name = new JTextField();
    private final JTextField description = new JTextField();
    private final JTextField unit = new JTextField();
    private final JTextField source = new JTextField();
    private final JTextField notes = new JTextField();
    private final JLabel basis = new JLabel();
    private final JComboBox<String> type = new JComboBox<>(new String[] {"Type A (from observations)",
        "Type B (other information)"});
    private final CardLayout cards = new CardLayout();
    private final JPanel evaluation = new JPanel(cards);
    private final TypeBForm typeB;
    private final TypeAForm typeA;
    private final JLabel problem = new JLabel();
    private InputQuantity shown;
    private boolean updating;

    InputInspector(EditorContext ctx) {
        this.ctx = ctx;
        setLayout(new BoxLayout(this, BoxLayout.Y_AXIS));
        heading.setFont(heading.getFont().deriveFont(java.awt.Font.BOLD, heading.getFont().getSize2D() + 2));
        typeB = new TypeBForm(b -> applyEvaluation(b), this::problem);
        typeA = new TypeAForm(a -> applyEvaluation(a), this::problem);
        JPanel fields = new JPanel(new GridBagLayout());
        GridBagConstraints c = new GridBagConstraints();
        c.insets = new Insets(2, 0, 2, 6);
        c.anchor = GridBagConstraints.WEST;
        c.gridy = 0;
        row(fields, c, "Name", name, q -> q.name(), (q, v) -> q.withName(v));
        row(fields, c, "Description", description, InputQuantity::description, InputQuantity::withDescription);
        row(fields, c, "Unit", unit, InputQuantity::unit, InputQuantity::withUnit);
        row(fields, c, "Source", source, InputQuantity::source, InputQuantity::withSource);
        row(fields, c, "Notes", notes, InputQuantity::notes, InputQuantity::withNotes);
        c.gridy++;
        fields.add(new JLabel("Evaluation"), c);
        c.weightx = 1;
        c.fill = GridBagConstraints.HORIZONTAL;
        fields.add(type, c);
        evaluation.add(typeA, "A");
        evaluation.add(typeB, "B");
        basis.setForeground(Colors.get("Label.disabledForeground"));
        problem.setForeground(Colors.get("Quire.error"));
        problem.setName("inspectorProblem");
        for (javax.swing.JComponent j : new javax.swing.JComponent[] {heading, plot, basis, fields, problem, evaluation}) {
            j.setAlignmentX(LEFT_ALIGNMENT);
            add(j);
        }
        type.addActionListener(e -> {
            if (!updating) {
                switchType();
            }
        });
    }

    private interface Setter {
        InputQuantity set(InputQuantity q, String v);
    }

    private void row(JPanel p, GridBagConstraints c, String label, JTextField f, Function<InputQuantity, String> get,
            Setter set) {
        c.gridy++;
        c.weightx = 0;
        c.fill = GridBagConstraints.NONE;
        p.add(new JLabel(label), c);
        c.weightx = 1;
        c.fill = GridBagConstraints.HORIZONTAL;
        p.add(f, c);
        f.setName("inspector:" + label);
        Runnable commit = () -> {
            if (shown == null || updating || !f.isEditable() || f.getText().equals(get.apply(shown))) {
                return;
            }
            String old = shown.name();
            String v = f.getText().trim();
            if (label.equals("Name")) {
                ctx.edit("Rename " + old + " to " + v, "", b -> org.quire.app.ui.notebook.Renames.input(b, old, v));
                ctx.selectInput(ctx.document().budget().input(v) != null ? v : old);
            } else {
                ctx.edit("Edit " + label.toLowerCase(java.util.Locale.ROOT) + " of " + old, "",
                        b -> b.withInput(old, set.set(b.input(old), v)));
            }
        };
        f.addActionListener(e -> commit.run());
        f.addFocusListener(new java.awt.event.FocusAdapter() {
            @Override public void focusLost(java.awt.event.FocusEvent e) { commit.run(); }
        });
    }

    private void problem(String message) {
        problem.setText(message == null ? "" : "<html>" + message.replace("<", "&lt;") + "</html>");
    }

    private void applyEvaluation(Evaluation e) {
        if (shown == null) {
            return;
        }
        String n = shown.name();
        ctx.edit("Change evaluation of " + n, "", b -> b.withInput(n, b.input(n).withEvaluation(e)));
    }

    private void switchType() {
        if (shown == null) {
            return;
        }
        boolean wantA = type.getSelectedIndex() == 0;
        Evaluation e = shown.evaluation();
        if (wantA && e instanceof TypeB) {
            typeA.show(null, e.estimate());
            cards.show(evaluation, "A");
        } else if (!wantA && e instanceof TypeA) {
            typeB.show(TypeB.of("normal", java.util.Map.of("estimate", e.estimate(),
                    "standardUncertainty", e.standardUncertainty())));
            cards.show(evaluation, "B");
            problem("Shown as a normal distribution with the present estimate and u; change a value and press "
                    + "Enter to make it a Type B evaluation.");
        }
    }

    void show(InputQuantity q) {
        updating = true;
        try {
            boolean changed = shown == null || !shown.equals(q);
            shown = q;
            heading.setText("Input " + q.name());
            plot.show(q.evaluation().distribution());
            basis.setText(q.evaluation().basis());
            name.setText(q.name());
            description.setText(q.description());
            unit.setText(q.unit());
            source.setText(q.source());
            notes.setText(q.notes());
            if (q.evaluation() instanceof TypeA) {
                type.setSelectedIndex(0);
                typeA.show((TypeA) q.evaluation(), q.evaluation().estimate());
                cards.show(evaluation, "A");
            } else {
                type.setSelectedIndex(1);
                typeB.show((TypeB) q.evaluation());
                cards.show(evaluation, "B");
            }
            if (changed) {
                problem(null);
            }
            boolean ro = ctx.readOnly();
            for (JTextField f : new JTextField[] {name, description, unit, source, notes}) {
                f.setEditable(!ro);
            }
            type.setEnabled(!ro);
            typeA.setEditable(!ro);
            typeB.setEditable(!ro);
        } finally {
            updating = false;
        }
    }
}
