package org.quire.app.ui.inspector;

import java.awt.GridBagConstraints;
import java.awt.GridBagLayout;
import java.awt.Insets;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Consumer;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JTextField;
import org.quire.app.ui.common.Fmt;
import org.quire.engine.budget.TypeB;

/**
 * Every option of a Type B evaluation: the distribution and each parameter the engine knows, blank for absent.
 * A change is offered to the engine's {@link TypeB#of} and applied only when it accepts it.
 */
final class TypeBForm extends JPanel {
    /** The parameters in the order shown, with their labels. */
    private static final Map<String, String> LABELS = new LinkedHashMap<>();

    static {
        LABELS.put("estimate", "Estimate");
        LABELS.put("standardUncertainty", "Standard uncertainty u");
        LABELS.put("expandedUncertainty", "Expanded uncertainty U");
        LABELS.put("coverageFactor", "Coverage factor k of U");
        LABELS.put("coverageProbability", "Coverage probability of U (0-1)");
        LABELS.put("halfWidth", "Half-width a");
        LABELS.put("lower", "Lower limit");
        LABELS.put("upper", "Upper limit");
        LABELS.put("beta", "Top/base ratio \u03b2 (trapezoid)");
        LABELS.put("halfWidthUncertainty", "Inexactness d of the limits");
        LABELS.put("scale", "Scale (Student t)");
        LABELS.put("dof", "Degrees of freedom \u03bd");
        LABELS.put("relativeUncertaintyOfU", "Relative uncertainty of u (0-1)");
    }

    private final JComboBox<String> distribution = new JComboBox<>(TypeB.DISTRIBUTIONS.toArray(new String[0]));
    private final Map<String, JTextField> fields = new LinkedHashMap<>();
    private final Consumer<TypeB> apply;
    private final Consumer<String> problem;
    private boolean updating;

    TypeBForm(Consumer<TypeB> apply, Consumer<String> problem) {
        super(new GridBagLayout());
        this.apply = apply;
        this.problem = problem;
        distribution.setName("distribution");
        GridBagConstraints c = new GridBagConstraints();
        c.insets = new Insets(2, 0, 2, 6);
        c.anchor = GridBagConstraints.WEST;
        c.gridy = 0;
        add(new JLabel("Distribution"), c);
        c.fill = GridBagConstraints.HORIZONTAL;
        c.weightx = 1;
        add(distribution, c);
        for (Map.Entry<String, String> e : LABELS.entrySet()) {
            c.gridy++;
            c.weightx = 0;
            c.fill = GridBagConstraints.NONE;
            add(new JLabel(e.getValue()), c);
            JTextField f = new JTextField(6);
            f.setName("param:" + e.getKey());
            f.setToolTipText("'" + e.getKey() + "' in the budget file; leave blank when not given");
            f.addActionListener(x -> commit());
            f.addFocusListener(new java.awt.event.FocusAdapter() {
                @Override public void focusLost(java.awt.event.FocusEvent x) { commit(); }
            });
            c.weightx = 1;
            c.fill = GridBagConstraints.HORIZONTAL;
            add(f, c);
            fields.put(e.getKey(), f);
        }
        distribution.addActionListener(x -> commit());
    }

    void show(TypeB b) {
        updating = true;
        try {
            distribution.setSelectedItem(b.distributionName());
            for (Map.Entry<String, JTextField> e : fields.entrySet()) {
                Double v = b.parameters().get(e.getKey());
                e.getValue().setText(v == null ? "" : Fmt.num(v));
            }
        } finally {
            updating = false;
        }
    }

    void setEditable(boolean on) {
        distribution.setEnabled(on);
        fields.values().forEach(f -> f.setEditable(on));
    }

    private void commit() {
        if (updating || !distribution.isEnabled()) {
            return;
        }
        Map<String, Double> p = new LinkedHashMap<>();
        for (Map.Entry<String, JTextField> e : fields.entrySet()) {
            String t = e.getValue().getText().trim();
            if (!t.isEmpty()) {
                try {
                    p.put(e.getKey(), Fmt.parse(t));
                } catch (NumberFormatException x) {
                    problem.accept(LABELS.get(e.getKey()) + ": " + x.getMessage());
                    return;
                }
            }
        }
        try {
            TypeB b = TypeB.of((String) distribution.getSelectedItem(), p);
            problem.accept(null);
            apply.accept(b);
        } catch (IllegalArgumentException x) {
            problem.accept(x.getMessage());
        }
    }

    static List<String> parameterOrder() {
        return List.copyOf(LABELS.keySet());
    }
}
