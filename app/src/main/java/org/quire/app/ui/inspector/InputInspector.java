package org.quire.app.ui.inspector;

import java.awt.CardLayout;
import java.awt.GridBagConstraints;
import java.awt.GridBagLayout;
import java.awt.Insets;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.Map;
import java.util.Set;
import java.util.function.Function;
import javax.swing.BoxLayout;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JTextField;
import javax.swing.event.DocumentEvent;
import javax.swing.event.DocumentListener;
import org.quire.app.ui.common.Colors;
import org.quire.app.ui.common.EditorContext;
import org.quire.engine.budget.Evaluation;
import org.quire.engine.budget.InputQuantity;
import org.quire.engine.budget.TypeA;
import org.quire.engine.budget.TypeB;

/**
 * Every option of the selected input, a small plot of its distribution, and its readings for a Type A.
 *
 * <p>The form is bound to one input by its name ({@link #bound}). Text typed into it belongs to that input: it
 * is applied when confirmed (Enter, leaving the field), and when the selection moves on before that, it is
 * applied to the input it was typed for, or, when the engine refuses it or it waits for a button (readings), kept
 * as a draft of that input, shown again when the input is selected again, and announced in the status line.
 * Text is never applied to another input and never dropped silently.
 */
final class InputInspector extends JPanel {
    private final EditorContext ctx;
    private final JLabel heading = new JLabel();
    private final DistributionPlot plot = new DistributionPlot();
    private final Map<String, JTextField> texts = new LinkedHashMap<>();
    private final Map<String, Function<InputQuantity, String>> getters = new HashMap<>();
    private final Map<String, Setter> setters = new HashMap<>();
    private final JLabel basis = new JLabel();
    private final JComboBox<String> type = new JComboBox<>(new String[] {"Type A (from observations)",
        "Type B (other information)"});
    private final CardLayout cards = new CardLayout();
    /** The form of the evaluation shown, only as tall as that form (a card layout sizes to its largest card). */
    private final JPanel evaluation = new JPanel(cards) {
        @Override
        public java.awt.Dimension getPreferredSize() {
            for (java.awt.Component c : getComponents()) {
                if (c.isVisible()) {
                    java.awt.Dimension d = c.getPreferredSize();
                    java.awt.Insets in = getInsets();
                    return new java.awt.Dimension(d.width + in.left + in.right, d.height + in.top + in.bottom);
                }
            }
            return super.getPreferredSize();
        }

        @Override
        public java.awt.Dimension getMaximumSize() {
            return new java.awt.Dimension(Integer.MAX_VALUE, getPreferredSize().height);
        }
    };
    private final TypeBForm typeB;
    private final TypeAForm typeA;
    private final JLabel problem = new JLabel();
    /** Says which fields of the shown input its template locks, and which template. */
    private final JLabel lock = new JLabel();
    /** The name of the input the form shows; its typed text belongs to it. */
    private String bound;
    /** The labels of the text fields typed into and not yet applied. */
    private final Set<String> pendingFields = new LinkedHashSet<>();
    private boolean pendingB;
    private boolean pendingA;
    /** Text not applied when its input was left, by input name. */
    private final Map<String, Draft> drafts = new HashMap<>();
    private boolean updating;
    private boolean leaving;

    /** What was typed for an input and not applied when the selection moved on. */
    private record Draft(Map<String, String> fields, boolean typeBShown, Map<String, String> typeB,
            TypeAForm.Texts typeA, String why) {
    }

    private interface Setter {
        InputQuantity set(InputQuantity q, String v);
    }

    InputInspector(EditorContext ctx) {
        this.ctx = ctx;
        setLayout(new BoxLayout(this, BoxLayout.Y_AXIS));
        heading.setFont(heading.getFont().deriveFont(java.awt.Font.BOLD, heading.getFont().getSize2D() + 2));
        typeB = new TypeBForm(() -> {
            if (!updating) {
                pendingB = true;
            }
        }, this::confirmTypeB);
        typeA = new TypeAForm(a -> {
            if (bound != null) {
                pendingA = false;
                apply(bound, a);
            }
        }, this::problem, () -> {
            if (!updating) {
                pendingA = true;
            }
        });
        JPanel fields = new JPanel(new GridBagLayout());
        GridBagConstraints c = new GridBagConstraints();
        c.insets = new Insets(2, 0, 2, 6);
        c.anchor = GridBagConstraints.WEST;
        c.gridy = 0;
        row(fields, c, "Name", InputQuantity::name, InputQuantity::withName);
        row(fields, c, "Description", InputQuantity::description, InputQuantity::withDescription);
        row(fields, c, "Unit", InputQuantity::unit, InputQuantity::withUnit);
        row(fields, c, "Source", InputQuantity::source, InputQuantity::withSource);
        row(fields, c, "Notes", InputQuantity::notes, InputQuantity::withNotes);
        c.gridy++;
        fields.add(new JLabel("Evaluation"), c);
        c.weightx = 1;
        c.fill = GridBagConstraints.HORIZONTAL;
        fields.add(type, c);
        type.setName("evaluationType");
        evaluation.add(typeA, "A");
        evaluation.add(typeB, "B");
        basis.setForeground(Colors.get("Label.disabledForeground"));
        problem.setForeground(Colors.get("Quire.error"));
        problem.setName("inspectorProblem");
        lock.setName("inspectorLock");
        lock.setVisible(false);
        for (javax.swing.JComponent j : new javax.swing.JComponent[] {heading, lock, basis, fields, problem,
            evaluation, plot}) {
            j.setAlignmentX(LEFT_ALIGNMENT);
            add(j);
        }
        type.addActionListener(e -> {
            if (!updating) {
                switchType();
            }
        });
    }

    private void row(JPanel p, GridBagConstraints c, String label, Function<InputQuantity, String> get, Setter set) {
        c.gridy++;
        c.weightx = 0;
        c.fill = GridBagConstraints.NONE;
        JLabel l = new JLabel(label);
        p.add(l, c);
        c.weightx = 1;
        c.fill = GridBagConstraints.HORIZONTAL;
        JTextField f = new JTextField(1); // a width of its own, not its text's: a long description never squeezes the labels
        l.setLabelFor(f);
        p.add(f, c);
        f.setName("inspector:" + label);
        texts.put(label, f);
        getters.put(label, get);
        setters.put(label, set);
        f.getDocument().addDocumentListener(new DocumentListener() {
            @Override public void insertUpdate(DocumentEvent e) { typed(); }
            @Override public void removeUpdate(DocumentEvent e) { typed(); }
            @Override public void changedUpdate(DocumentEvent e) { }

            private void typed() {
                if (!updating) {
                    pendingFields.add(label);
                }
            }
        });
        f.addActionListener(e -> confirmField(label));
        f.addFocusListener(new java.awt.event.FocusAdapter() {
            @Override public void focusLost(java.awt.event.FocusEvent e) { confirmField(label); }
        });
    }

    /** Applies a text field typed into to the bound input. */
    private void confirmField(String label) {
        if (bound == null || !pendingFields.remove(label)) {
            return;
        }
        String failed = applyField(bound, label, texts.get(label).getText().trim());
        if (failed != null) {
            pendingFields.add(label);
            problem(failed);
        } else if (label.equals("Name") && !leaving) {
            String v = texts.get(label).getText().trim();
            ctx.selectInput(ctx.document().budget().input(v) != null ? v : bound);
        }
    }

    /** @return null when applied (or nothing to do), else why not */
    private String applyField(String owner, String label, String v) {
        InputQuantity q = ctx.document().budget().input(owner);
        if (q == null) {
            return "the input " + owner + " is no longer in the budget";
        }
        if (v.equals(getters.get(label).apply(q))) {
            return null;
        }
        boolean ok;
        if (label.equals("Name")) {
            ok = ctx.edit("Rename " + owner + " to " + v, "", b -> org.quire.app.ui.notebook.Renames.input(b, owner, v));
        } else {
            ok = ctx.edit("Edit " + label.toLowerCase(java.util.Locale.ROOT) + " of " + owner, "",
                    b -> b.withInput(owner, setters.get(label).set(b.input(owner), v)));
        }
        return ok || ctx.document().budget().input(owner) != null
                && v.equals(getters.get(label).apply(ctx.document().budget().input(owner)))
                ? null : label + " of " + owner + " was refused";
    }

    /** Applies the Type B text to the bound input, when it has been typed into. */
    private void confirmTypeB() {
        if (bound == null || !pendingB || !typeB.isEditable()) {
            return;
        }
        try {
            TypeB b = typeB.read();
            pendingB = false;
            problem(null);
            apply(bound, b);
        } catch (IllegalArgumentException x) {
            problem(x.getMessage());
        }
    }

    private void problem(String message) {
        problem.setText(message == null ? "" : "<html>" + message.replace("<", "&lt;") + "</html>");
    }

    private void apply(String owner, Evaluation e) {
        if (ctx.document().budget().input(owner) == null) {
            return;
        }
        ctx.edit("Change evaluation of " + owner, "", b -> b.withInput(owner, b.input(owner).withEvaluation(e)));
    }

    private void switchType() {
        InputQuantity shown = bound == null ? null : ctx.document().budget().input(bound);
        if (shown == null) {
            return;
        }
        boolean wantA = type.getSelectedIndex() == 0;
        Evaluation e = shown.evaluation();
        updating = true;
        try {
            if (wantA && e instanceof TypeB) {
                typeA.show(null, e.estimate());
                showCard("A");
                pendingB = false;
            } else if (!wantA && e instanceof TypeA) {
                typeB.show(TypeB.of("normal", java.util.Map.of("estimate", e.estimate(),
                        "standardUncertainty", e.standardUncertainty())));
                showCard("B");
                pendingA = false;
                problem("Shown as a normal distribution with the present estimate and u; change a value and press "
                        + "Enter to make it a Type B evaluation.");
            }
        } finally {
            updating = false;
        }
    }

    /**
     * Leaves the bound input before another is shown (or none): its typed text is applied to it, or kept as
     * its draft when it cannot be applied yet.
     */
    void leave() {
        if (bound == null || leaving) {
            return;
        }
        String owner = bound;
        leaving = true;
        try {
            String why = null;
            Map<String, String> fieldTexts = new LinkedHashMap<>();
            texts.forEach((k, f) -> fieldTexts.put(k, f.getText()));
            Map<String, String> bTexts = typeB.texts();
            TypeAForm.Texts aTexts = typeA.texts();
            boolean bShown = type.getSelectedIndex() == 1;
            if (pendingB && typeB.isEditable()) {
                try {
                    TypeB b = typeB.read();
                    pendingB = false;
                    apply(owner, b);
                } catch (IllegalArgumentException x) {
                    why = x.getMessage();
                }
            }
            if (pendingA) {
                why = why == null ? "the readings or summary wait for Use readings or Use summary" : why;
            }
            Set<String> failedFields = new LinkedHashSet<>();
            String finalName = owner;
            for (String label : new java.util.ArrayList<>(pendingFields)) {
                if (label.equals("Name")) {
                    continue;
                }
                String f = applyField(owner, label, fieldTexts.get(label).trim());
                if (f != null) {
                    failedFields.add(label);
                    why = why == null ? f : why;
                }
            }
            if (pendingFields.contains("Name")) {
                String v = fieldTexts.get("Name").trim();
                String f = applyField(owner, "Name", v);
                if (f != null) {
                    failedFields.add("Name");
                    why = why == null ? f : why;
                } else if (ctx.document().budget().input(v) != null) {
                    finalName = v;
                }
            }
            if (why != null) {
                drafts.put(finalName, new Draft(fieldTexts, bShown, pendingB ? bTexts : null,
                        pendingA ? aTexts : null, why));
                ctx.status("Not applied to " + finalName + " (kept in its inspector): " + why, true);
            }
        } finally {
            pendingFields.clear();
            pendingA = false;
            pendingB = false;
            bound = null;
            leaving = false;
        }
    }

    /**
     * Shows an input: the one the form is bound to again (after a change of the budget), or another, after
     * leaving the bound one.
     */
    void show(InputQuantity q) {
        if (leaving) {
            return;
        }
        if (bound != null && !bound.equals(q.name())) {
            leave();
            q = ctx.document().budget().input(q.name());
            if (q == null) {
                return;
            }
        }
        boolean fresh = bound == null;
        bound = q.name();
        updating = true;
        try {
            heading.setText("Input " + q.name());
            plot.show(q.evaluation().distribution(), q.name(), q.unit());
            basis.setText(q.evaluation().basis());
            for (Map.Entry<String, JTextField> e : texts.entrySet()) {
                if (!pendingFields.contains(e.getKey())) {
                    e.getValue().setText(getters.get(e.getKey()).apply(q));
                }
            }
            if (!pendingA && !pendingB) {
                if (q.evaluation() instanceof TypeA) {
                    type.setSelectedIndex(0);
                    typeA.show((TypeA) q.evaluation(), q.evaluation().estimate());
                    showCard("A");
                } else {
                    type.setSelectedIndex(1);
                    typeB.show((TypeB) q.evaluation());
                    showCard("B");
                }
            }
            if (fresh) {
                problem(null);
                Draft d = drafts.remove(q.name());
                if (d != null) {
                    restore(d);
                }
            }
            boolean ro = ctx.readOnly();
            org.quire.engine.document.TemplateOrigin origin = ctx.document().content().templateOrigin();
            java.util.List<String> lockedHere = new java.util.ArrayList<>();
            for (Map.Entry<String, JTextField> e : texts.entrySet()) {
                boolean lk = origin != null && (e.getKey().equals("Name") ? origin.locksAnyOf(q.name())
                        : origin.isLocked(q.name(), e.getKey().toLowerCase(java.util.Locale.ROOT)));
                e.getValue().setEditable(!ro && !lk);
                e.getValue().setToolTipText(lk ? origin.lockReason() : null);
                if (lk) {
                    lockedHere.add(e.getKey().toLowerCase(java.util.Locale.ROOT));
                }
            }
            boolean evLocked = origin != null && (origin.isLocked(q.name(), "evaluation")
                    || origin.isLocked(q.name(), "estimate"));
            if (evLocked) {
                lockedHere.add("evaluation");
            }
            type.setEnabled(!ro && !evLocked);
            type.setToolTipText(evLocked ? origin.lockReason() : null);
            typeA.setEditable(!ro && !evLocked);
            typeB.setEditable(!ro && !evLocked);
            lock.setText(lockedHere.isEmpty() ? "" : "<html>" + capital(origin.lockReason()) + ":<br>"
                    + String.join(", ", lockedHere) + " read-only (values of the method)</html>");
            lock.setToolTipText(lockedHere.isEmpty() ? null : origin.lockReason());
            lock.setVisible(!lockedHere.isEmpty());
        } finally {
            updating = false;
        }
    }

    private void restore(Draft d) {
        InputQuantity q = ctx.document().budget().input(bound);
        d.fields().forEach((k, v) -> {
            if (!v.equals(getters.get(k).apply(q))) {
                texts.get(k).setText(v);
                pendingFields.add(k);
            }
        });
        if (d.typeB() != null) {
            type.setSelectedIndex(1);
            typeB.restore(d.typeB());
            showCard("B");
            pendingB = true;
        } else if (d.typeA() != null) {
            type.setSelectedIndex(0);
            typeA.restore(d.typeA());
            showCard("A");
            pendingA = true;
        }
        problem("Not applied yet: " + d.why());
    }

    private static String capital(String s) {
        return org.quire.app.ui.common.Fmt.sentence(s);
    }

    /** @return the name of the input the form is bound to, or null */
    String bound() {
        return bound;
    }

    private void showCard(String name) {
        cards.show(evaluation, name);
        evaluation.revalidate();
    }
}
