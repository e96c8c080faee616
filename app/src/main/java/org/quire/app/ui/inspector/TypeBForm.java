package org.quire.app.ui.inspector;

import java.awt.GridBagConstraints;
import java.awt.GridBagLayout;
import java.awt.Insets;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import javax.swing.DefaultListCellRenderer;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JList;
import javax.swing.JPanel;
import javax.swing.JTextField;
import javax.swing.event.DocumentEvent;
import javax.swing.event.DocumentListener;
import org.quire.app.ui.common.Fmt;
import org.quire.engine.budget.TypeB;

/**
 * The parameters of a Type B evaluation: the distribution and the parameters the engine accepts for it
 * ({@link TypeB#parametersOf}), blank for absent. The form holds text only; the inspector it sits in decides
 * which input the text belongs to and offers it to the engine's {@link TypeB#of} through {@link #read()}.
 */
final class TypeBForm extends JPanel {
    private final JComboBox<String> distribution = new JComboBox<>(TypeB.DISTRIBUTIONS.toArray(new String[0]));
    private final Map<String, JTextField> fields = new LinkedHashMap<>();
    private final Map<String, JLabel> labels = new LinkedHashMap<>();
    private boolean updating;

    /**
     * @param typed told when the engineer changes a text or the distribution
     * @param confirm told when the engineer confirms (Enter, leaving a field, choosing a distribution)
     */
    TypeBForm(Runnable typed, Runnable confirm) {
        super(new GridBagLayout());
        distribution.setName("distribution");
        distribution.setPrototypeDisplayValue("curvilinear-trapezoid");
        distribution.setRenderer(new DefaultListCellRenderer() {
            @Override
            public java.awt.Component getListCellRendererComponent(JList<?> list, Object value, int index,
                    boolean selected, boolean focus) {
                return super.getListCellRendererComponent(list, value == null ? "" : TypeB.screenName((String) value),
                        index, selected, focus);
            }
        });
        GridBagConstraints c = new GridBagConstraints();
        c.insets = new Insets(2, 0, 2, 6);
        c.anchor = GridBagConstraints.WEST;
        c.gridy = 0;
        add(new JLabel("Distribution"), c);
        c.fill = GridBagConstraints.HORIZONTAL;
        c.weightx = 1;
        add(distribution, c);
        for (String key : parameterOrder()) {
            c.gridy++;
            c.weightx = 0;
            c.fill = GridBagConstraints.NONE;
            JLabel label = new JLabel(TypeB.parameterScreenName(key));
            add(label, c);
            JTextField f = new JTextField(5);
            f.setName("param:" + key);
            label.setLabelFor(f);
            f.setToolTipText(key.equals("coverageProbability") || key.equals("relativeUncertaintyOfU")
                    ? "A fraction from 0 to 1; leave blank when not given" : "Leave blank when not given");
            f.addActionListener(x -> confirm.run());
            f.addFocusListener(new java.awt.event.FocusAdapter() {
                @Override public void focusLost(java.awt.event.FocusEvent x) { confirm.run(); }
            });
            f.getDocument().addDocumentListener(new DocumentListener() {
                @Override public void insertUpdate(DocumentEvent e) { fire(); }
                @Override public void removeUpdate(DocumentEvent e) { fire(); }
                @Override public void changedUpdate(DocumentEvent e) { }

                private void fire() {
                    if (!updating) {
                        typed.run();
                    }
                }
            });
            c.weightx = 1;
            c.fill = GridBagConstraints.HORIZONTAL;
            add(f, c);
            fields.put(key, f);
            labels.put(key, label);
        }
        distribution.addActionListener(x -> {
            if (!updating) {
                showParametersOf((String) distribution.getSelectedItem());
                typed.run();
                confirm.run();
            }
        });
    }

    /** Shows an evaluation's distribution and parameters. */
    void show(TypeB b) {
        updating = true;
        try {
            distribution.setSelectedItem(b.distributionName());
            for (Map.Entry<String, JTextField> e : fields.entrySet()) {
                Double v = b.parameters().get(e.getKey());
                e.getValue().setText(v == null ? "" : Fmt.num(v));
            }
            showParametersOf(b.distributionName());
        } finally {
            updating = false;
        }
    }

    /** Shows the rows of the parameters the distribution takes, and of any other that holds text. */
    private void showParametersOf(String dist) {
        List<String> own = TypeB.parametersOf(dist);
        for (Map.Entry<String, JTextField> e : fields.entrySet()) {
            boolean on = own.contains(e.getKey()) || !e.getValue().getText().isBlank();
            e.getValue().setVisible(on);
            labels.get(e.getKey()).setVisible(on);
        }
        revalidate();
        repaint();
    }

    void setEditable(boolean on) {
        distribution.setEnabled(on);
        fields.values().forEach(f -> f.setEditable(on));
    }

    boolean isEditable() {
        return distribution.isEnabled();
    }

    /**
     * @return the evaluation the engine makes of the present text
     * @throws IllegalArgumentException with a message naming the parameter, when a text is no number or the
     *     engine refuses the parameters
     */
    TypeB read() {
        Map<String, Double> p = new LinkedHashMap<>();
        List<String> own = TypeB.parametersOf((String) distribution.getSelectedItem());
        for (Map.Entry<String, JTextField> e : fields.entrySet()) {
            String t = e.getValue().getText().trim();
            if (t.isEmpty()) {
                continue;
            }
            if (!own.contains(e.getKey())) {
                throw new IllegalArgumentException(TypeB.parameterScreenName(e.getKey()) + " does not belong to a "
                        + TypeB.screenName((String) distribution.getSelectedItem()) + " distribution; clear it");
            }
            try {
                p.put(e.getKey(), Fmt.parse(t));
            } catch (NumberFormatException x) {
                throw new IllegalArgumentException(TypeB.parameterScreenName(e.getKey()) + ": " + x.getMessage(), x);
            }
        }
        return TypeB.of((String) distribution.getSelectedItem(), p);
    }

    /** @return the form's text: the distribution under the key "", then each parameter's text */
    Map<String, String> texts() {
        Map<String, String> t = new LinkedHashMap<>();
        t.put("", (String) distribution.getSelectedItem());
        fields.forEach((k, f) -> t.put(k, f.getText()));
        return t;
    }

    /** Puts back text taken by {@link #texts()}. */
    void restore(Map<String, String> t) {
        updating = true;
        try {
            distribution.setSelectedItem(t.get(""));
            fields.forEach((k, f) -> f.setText(t.getOrDefault(k, "")));
            showParametersOf(t.get(""));
        } finally {
            updating = false;
        }
    }

    static List<String> parameterOrder() {
        return List.of("estimate", "standardUncertainty", "expandedUncertainty", "coverageFactor",
                "coverageProbability", "halfWidth", "lower", "upper", "beta", "halfWidthUncertainty", "scale", "dof",
                "relativeUncertaintyOfU");
    }
}
