package org.quire.app.ui;

import java.awt.BorderLayout;
import java.awt.FlowLayout;
import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JProgressBar;
import org.quire.app.ui.common.Colors;

/**
 * The line at the foot of the window: the last message (an error in the error colour) and, while a file is read
 * or written in the background, a progress bar with Cancel when the work can be stopped.
 */
final class StatusBar extends JPanel {
    private final JLabel text = new JLabel(" ");
    private final JPanel task = new JPanel(new FlowLayout(FlowLayout.RIGHT, 6, 0));
    private final JProgressBar progress = new JProgressBar();
    private final JButton cancel = new JButton("Cancel");
    private Runnable onCancel;
    private boolean error;

    StatusBar() {
        super(new BorderLayout(8, 0));
        setBorder(BorderFactory.createEmptyBorder(2, 8, 2, 8));
        text.setName("status");
        progress.setName("fileProgress");
        progress.setIndeterminate(true);
        progress.setPreferredSize(new java.awt.Dimension(120, progress.getPreferredSize().height));
        cancel.setName("cancelFileTask");
        cancel.putClientProperty("JButton.buttonType", "borderless");
        cancel.addActionListener(e -> {
            if (onCancel != null) {
                onCancel.run();
            }
        });
        task.setOpaque(false);
        task.add(progress);
        task.add(cancel);
        task.setVisible(false);
        add(text, BorderLayout.CENTER);
        add(task, BorderLayout.EAST);
    }

    void show(String message, boolean isError) {
        text.setText(message == null || message.isEmpty() ? " " : message);
        text.setForeground(Colors.get(isError ? "Quire.error" : "Label.foreground"));
        error = isError;
    }

    /** Clears the line when it shows the error {@code message} (the entry it was about was fixed). */
    void clearError(String message) {
        if (error && text.getText().equals(message)) {
            show(" ", false);
        }
    }

    /**
     * Shows that background work runs.
     *
     * @param cancelWith what Cancel does; null when the work cannot be stopped (no Cancel button)
     */
    void startTask(Runnable cancelWith) {
        onCancel = cancelWith;
        cancel.setVisible(cancelWith != null);
        task.setVisible(true);
        revalidate();
    }

    void endTask() {
        onCancel = null;
        task.setVisible(false);
        revalidate();
    }

    String text() {
        return text.getText();
    }

    boolean taskShown() {
        return task.isVisible();
    }
}
