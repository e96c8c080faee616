package org.quire.app.ui.notebook;

import org.quire.app.ui.common.Section;
import java.awt.BorderLayout;
import java.awt.Cursor;
import java.awt.Dimension;
import java.awt.Font;
import java.awt.event.MouseAdapter;
import java.awt.event.MouseEvent;
import javax.swing.BorderFactory;
import javax.swing.JLabel;
import javax.swing.JPanel;
import org.quire.app.ui.common.Colors;

/** A collapsible frame around one {@link Section}: a heading that folds and unfolds the body. */
final class NotebookSection extends JPanel {
    private final Section section;
    private final JLabel heading = new JLabel();
    private final JLabel note = new JLabel();
    private boolean open = true;

    NotebookSection(Section section) {
        super(new BorderLayout());
        this.section = section;
        setName("section:" + section.title());
        JPanel head = new JPanel(new BorderLayout());
        head.setBackground(Colors.get("Quire.section.headerBackground"));
        head.setBorder(BorderFactory.createCompoundBorder(
                BorderFactory.createMatteBorder(1, 0, 0, 0, Colors.get("Quire.section.rule")),
                BorderFactory.createEmptyBorder(5, 8, 5, 8)));
        heading.setFont(heading.getFont().deriveFont(Font.BOLD, heading.getFont().getSize2D() + 1f));
        heading.setForeground(Colors.get("Quire.section.headerForeground"));
        note.setForeground(Colors.get("Label.disabledForeground"));
        head.add(heading, BorderLayout.WEST);
        head.add(note, BorderLayout.EAST);
        head.setCursor(Cursor.getPredefinedCursor(Cursor.HAND_CURSOR));
        head.setToolTipText("Click to fold or unfold this section");
        head.addMouseListener(new MouseAdapter() {
            @Override
            public void mouseClicked(MouseEvent e) {
                setOpen(!open);
            }
        });
        add(head, BorderLayout.NORTH);
        section.body().setBorder(BorderFactory.createEmptyBorder(6, 10, 12, 10));
        add(section.body(), BorderLayout.CENTER);
        updateHeading();
    }

    Section section() { return section; }

    boolean isOpen() { return open; }

    void setOpen(boolean on) {
        open = on;
        section.body().setVisible(on);
        updateHeading();
        revalidate();
    }

    /** Sets a short note at the right of the heading, e.g. "2 errors". */
    void setNote(String text, boolean error) {
        note.setText(text);
        note.setForeground(error ? Colors.get("Quire.error") : Colors.get("Label.disabledForeground"));
    }

    private void updateHeading() {
        heading.setText((open ? "\u25be  " : "\u25b8  ") + section.title());
    }

    @Override
    public Dimension getMaximumSize() {
        return new Dimension(Integer.MAX_VALUE, getPreferredSize().height);
    }
}
