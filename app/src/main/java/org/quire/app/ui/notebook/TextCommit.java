package org.quire.app.ui.notebook;

import java.util.function.Consumer;
import javax.swing.event.DocumentEvent;
import javax.swing.event.DocumentListener;
import javax.swing.text.JTextComponent;

/**
 * Connects a text field to the budget: every change of the text becomes an edit (merged while typing), and a
 * change of the budget puts its text back without echoing an edit.
 */
final class TextCommit implements DocumentListener {
    private final JTextComponent field;
    private final Consumer<String> commit;
    private boolean updating;

    private TextCommit(JTextComponent field, Consumer<String> commit) {
        this.field = field;
        this.commit = commit;
    }

    static TextCommit bind(JTextComponent field, Consumer<String> commit) {
        TextCommit t = new TextCommit(field, commit);
        field.getDocument().addDocumentListener(t);
        return t;
    }

    /** Shows {@code text} unless the field already holds it. */
    void show(String text) {
        if (field.getText().equals(text)) {
            return;
        }
        updating = true;
        try {
            int caret = Math.min(field.getCaretPosition(), text.length());
            field.setText(text);
            field.setCaretPosition(caret);
        } finally {
            updating = false;
        }
    }

    boolean isUpdating() { return updating; }

    private void changed() {
        if (!updating) {
            commit.accept(field.getText());
        }
    }

    @Override public void insertUpdate(DocumentEvent e) { changed(); }
    @Override public void removeUpdate(DocumentEvent e) { changed(); }
    @Override public void changedUpdate(DocumentEvent e) { }
}
