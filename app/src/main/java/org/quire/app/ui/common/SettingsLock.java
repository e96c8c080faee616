package org.quire.app.ui.common;

import java.util.LinkedHashMap;
import java.util.Map;
import javax.swing.JComponent;
import javax.swing.JLabel;
import org.quire.engine.document.TemplateOrigin;

/**
 * The note beside settings that a budget's template locks ({@code BudgetDocument.settingsLockedBy}, the engine's
 * rule): a line saying which settings are read-only and why, and on each guarded field the reason as its tooltip
 * in place of its own, which comes back when the lock is lifted. Whether a field can be edited is left to the
 * section (a text field is made read-only, a choice disabled).
 */
public final class SettingsLock {
    private final JLabel label = new JLabel();
    private final String settings;
    private final Map<JComponent, String> tips = new LinkedHashMap<>();

    /**
     * @param name the label's component name (for tests)
     * @param settings what the line names, e.g. "Trials, seed and adaptive mode"
     * @param guarded the fields the lock covers, with their tooltips as they are now
     */
    public SettingsLock(String name, String settings, JComponent... guarded) {
        this.settings = settings;
        label.setName(name);
        label.setForeground(Colors.get("Quire.warning"));
        label.setVisible(false);
        for (JComponent c : guarded) {
            tips.put(c, c.getToolTipText());
        }
    }

    /** @return the line to place beside the settings */
    public JLabel label() {
        return label;
    }

    /** @return the guarded fields */
    public Iterable<JComponent> guarded() {
        return tips.keySet();
    }

    /** Shows the lock of {@code origin}, or none when it is null. */
    public void show(TemplateOrigin origin) {
        for (Map.Entry<JComponent, String> e : tips.entrySet()) {
            e.getKey().setToolTipText(origin == null ? e.getValue() : origin.lockReason() + " (a setting of the method)");
        }
        String text = origin == null ? "" : settings + ": " + origin.lockReason() + ", read-only.";
        if (!text.equals(label.getText())) {
            label.setText(text);
            label.setToolTipText(origin == null ? null : "The settings are values of the method: " + origin.lockReason());
        }
        label.setVisible(origin != null);
    }
}
