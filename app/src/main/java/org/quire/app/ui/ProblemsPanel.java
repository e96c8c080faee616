package org.quire.app.ui;

import org.quire.app.ui.common.Colors;
import java.awt.BorderLayout;
import java.awt.Component;
import java.awt.event.MouseAdapter;
import java.awt.event.MouseEvent;
import java.util.List;
import java.util.function.Consumer;
import javax.swing.DefaultListCellRenderer;
import javax.swing.DefaultListModel;
import javax.swing.JLabel;
import javax.swing.JList;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import org.quire.app.ui.document.Problem;

/** The problems of the active budget, from the engine's latest answer; double-click or Enter goes there. */
final class ProblemsPanel extends JPanel {
    private final DefaultListModel<Problem> model = new DefaultListModel<>();
    private final JList<Problem> list = new JList<>(model);
    private final JLabel title = new JLabel(" Problems");
    private final JScrollPane scroll = new JScrollPane(list);

    ProblemsPanel(Consumer<Problem> reveal) {
        super(new BorderLayout());
        setName("problems");
        list.setName("problemList");
        list.setCellRenderer(new DefaultListCellRenderer() {
            @Override
            public Component getListCellRendererComponent(JList<?> l, Object v, int i, boolean sel, boolean focus) {
                Problem p = (Problem) v;
                String where = p.area().name().charAt(0) + p.area().name().substring(1).toLowerCase(java.util.Locale.ROOT)
                        + (p.where().isEmpty() ? "" : ", " + p.where());
                super.getListCellRendererComponent(l, (p.severity() == Problem.Severity.ERROR ? "\u2716 " : "\u26a0 ")
                        + where + ": " + p.message(), i, sel, focus);
                if (!sel) {
                    setForeground(Colors.get(p.severity() == Problem.Severity.ERROR ? "Quire.error" : "Quire.warning"));
                }
                return this;
            }
        });
        list.addMouseListener(new MouseAdapter() {
            @Override
            public void mouseClicked(MouseEvent e) {
                if (e.getClickCount() == 2 && list.getSelectedValue() != null) {
                    reveal.accept(list.getSelectedValue());
                }
            }
        });
        list.getInputMap().put(javax.swing.KeyStroke.getKeyStroke("ENTER"), "reveal");
        list.getActionMap().put("reveal", new javax.swing.AbstractAction() {
            @Override
            public void actionPerformed(java.awt.event.ActionEvent e) {
                if (list.getSelectedValue() != null) {
                    reveal.accept(list.getSelectedValue());
                }
            }
        });
        title.setName("problemsTitle");
        title.setBorder(javax.swing.BorderFactory.createEmptyBorder(2, 4, 2, 4));
        add(title, BorderLayout.NORTH);
        add(scroll, BorderLayout.CENTER);
        setMinimumSize(new java.awt.Dimension(0, title.getPreferredSize().height));
    }

    /** Lists the problems; the list is hidden when there are none (the title alone says so). */
    void show(List<Problem> problems) {
        model.clear();
        problems.forEach(model::addElement);
        long errors = problems.stream().filter(p -> p.severity() == Problem.Severity.ERROR).count();
        title.setText(" Problems: " + summary(errors, problems.size() - errors));
        scroll.setVisible(!problems.isEmpty());
        revalidate();
    }

    /** @return "none", "1 error", "2 errors, 1 warning" ... */
    static String summary(long errors, long warnings) {
        if (errors == 0 && warnings == 0) {
            return "none";
        }
        String e = errors + (errors == 1 ? " error" : " errors");
        String w = warnings + (warnings == 1 ? " warning" : " warnings");
        return errors == 0 ? w : warnings == 0 ? e : e + ", " + w;
    }

    /** @return the height the panel needs with its list hidden: the title line */
    int collapsedHeight() {
        java.awt.Insets in = getInsets();
        return title.getPreferredSize().height + in.top + in.bottom;
    }

    /** @return the title line's text, for tests */
    String titleText() {
        return title.getText();
    }

    /** @return the problems shown */
    List<Problem> shown() {
        return java.util.Collections.list(model.elements());
    }
}
