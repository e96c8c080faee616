package org.quire.app.ui.workspace;

import java.awt.BorderLayout;
import java.awt.event.MouseAdapter;
import java.awt.event.MouseEvent;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.function.Consumer;
import java.util.stream.Stream;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTree;
import javax.swing.tree.DefaultMutableTreeNode;
import javax.swing.tree.DefaultTreeModel;
import javax.swing.tree.TreePath;

/**
 * The workspace on the left: open budgets, the budget folders and template folders from the preferences, and
 * the worked examples. Double-click or Enter opens a file; a template opens as a new, unsaved budget.
 */
public final class WorkspaceNavigator extends JPanel {

    /** A file shown in the tree, and whether it is a template. */
    public record Entry(Path file, boolean template) {
        @Override
        public String toString() {
            String n = String.valueOf(file.getFileName());
            return n.endsWith(".json") ? n.substring(0, n.length() - 5) : n;
        }
    }

    /** An open budget shown in the tree. */
    public record OpenItem(String name, Object key) {
        @Override
        public String toString() { return name; }
    }

    private final DefaultMutableTreeNode root = new DefaultMutableTreeNode("Workspace");
    private final DefaultTreeModel model = new DefaultTreeModel(root);
    private final JTree tree = new JTree(model);
    private final Consumer<Entry> open;
    private final Consumer<Object> activate;

    public WorkspaceNavigator(Consumer<Entry> open, Consumer<Object> activate) {
        super(new BorderLayout());
        this.open = open;
        this.activate = activate;
        setName("navigator");
        tree.setRootVisible(false);
        tree.setShowsRootHandles(true);
        add(new JLabel(" Workspace"), BorderLayout.NORTH);
        add(new JScrollPane(tree), BorderLayout.CENTER);
        tree.addMouseListener(new MouseAdapter() {
            @Override
            public void mouseClicked(MouseEvent e) {
                if (e.getClickCount() == 2) {
                    openSelected();
                }
            }
        });
        tree.getInputMap().put(javax.swing.KeyStroke.getKeyStroke("ENTER"), "openEntry");
        tree.getActionMap().put("openEntry", new javax.swing.AbstractAction() {
            @Override
            public void actionPerformed(java.awt.event.ActionEvent e) {
                openSelected();
            }
        });
    }

    private void openSelected() {
        TreePath p = tree.getSelectionPath();
        if (p == null) {
            return;
        }
        Object v = ((DefaultMutableTreeNode) p.getLastPathComponent()).getUserObject();
        if (v instanceof Entry) {
            open.accept((Entry) v);
        } else if (v instanceof OpenItem) {
            activate.accept(((OpenItem) v).key());
        }
    }

    /**
     * Rebuilds the tree.
     *
     * @param openBudgets the budgets open in editors
     * @param budgetFolders folders of budgets
     * @param templateFolders folders of templates
     * @param examples the worked-examples folder, or null
     */
    public void refresh(List<OpenItem> openBudgets, List<Path> budgetFolders, List<Path> templateFolders, Path examples) {
        root.removeAllChildren();
        DefaultMutableTreeNode open = new DefaultMutableTreeNode("Open budgets");
        openBudgets.forEach(o -> open.add(new DefaultMutableTreeNode(o)));
        root.add(open);
        DefaultMutableTreeNode budgets = new DefaultMutableTreeNode("Budgets");
        budgetFolders.forEach(f -> budgets.add(folder(f, false)));
        root.add(budgets);
        DefaultMutableTreeNode templates = new DefaultMutableTreeNode("Templates");
        templateFolders.forEach(f -> templates.add(folder(f, true)));
        root.add(templates);
        if (examples != null) {
            root.add(folder(examples, false, "Worked examples"));
        }
        model.reload();
        for (int i = 0; i < tree.getRowCount(); i++) {
            tree.expandRow(i);
        }
    }

    private static DefaultMutableTreeNode folder(Path dir, boolean template) {
        return folder(dir, template, String.valueOf(dir.getFileName()));
    }

    private static DefaultMutableTreeNode folder(Path dir, boolean template, String label) {
        DefaultMutableTreeNode n = new DefaultMutableTreeNode(label);
        try (Stream<Path> files = Files.list(dir)) {
            files.filter(f -> f.toString().endsWith(".json")).sorted()
                    .forEach(f -> n.add(new DefaultMutableTreeNode(new Entry(f, template))));
        } catch (IOException e) {
            n.add(new DefaultMutableTreeNode("(cannot read " + dir + ")"));
        }
        return n;
    }
}
