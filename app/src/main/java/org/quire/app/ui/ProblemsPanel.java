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
        add(title, BorderLayout.NORTH);
        add(new JScrollPane(list), BorderLayout.CENTER);
    }

    void show(List<Problem> problems) {
        model.clear();
        problems.forEach(model::addElement);
        long errors = problems.stream().filter(p -> p.severity() == Problem.Severity.ERROR).count();
        title.setText(" Problems: " + (problems.isEmpty() ? "none" : errors + " errors, " + (problems.size() - errors)
                + " warnings"));
    }

    /** @return the problems shown */
    List<Problem> shown() {
        return java.util.Collections.list(model.elements());
    }
}
