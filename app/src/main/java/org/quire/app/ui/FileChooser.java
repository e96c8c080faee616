package org.quire.app.ui;

import java.awt.Component;
import java.nio.file.Path;
import javax.swing.JFileChooser;
import javax.swing.JOptionPane;
import javax.swing.filechooser.FileNameExtensionFilter;

/** File dialogs for budget files. */
final class FileChooser {
    private static Path lastFolder;

    private FileChooser() {
    }

    static Path openTarget(Component parent, String title) {
        JFileChooser c = chooser(title);
        if (c.showOpenDialog(parent) != JFileChooser.APPROVE_OPTION) {
            return null;
        }
        lastFolder = c.getSelectedFile().toPath().getParent();
        return c.getSelectedFile().toPath();
    }

    static Path saveTarget(Component parent, String name) {
        JFileChooser c = chooser("Save budget as");
        String n = name.endsWith(".json") ? name : name.replaceAll("[^\\w.-]+", "-") + ".json";
        c.setSelectedFile(lastFolder == null ? new java.io.File(n) : lastFolder.resolve(n).toFile());
        if (c.showSaveDialog(parent) != JFileChooser.APPROVE_OPTION) {
            return null;
        }
        Path p = c.getSelectedFile().toPath();
        if (!p.getFileName().toString().endsWith(".json")) {
            p = p.resolveSibling(p.getFileName() + ".json");
        }
        if (java.nio.file.Files.exists(p) && JOptionPane.showConfirmDialog(parent, p + " exists. Replace it?",
                "Save budget as", JOptionPane.YES_NO_OPTION) != JOptionPane.YES_OPTION) {
            return null;
        }
        lastFolder = p.getParent();
        return p;
    }

    /** @return where to write a report (.pdf or .html, PDF when no extension is typed), or null */
    static Path reportTarget(Component parent, String name) {
        JFileChooser c = new JFileChooser(lastFolder == null ? null : lastFolder.toFile());
        c.setDialogTitle("Export report");
        FileNameExtensionFilter pdf = new FileNameExtensionFilter("PDF report (*.pdf)", "pdf");
        c.addChoosableFileFilter(pdf);
        c.addChoosableFileFilter(new FileNameExtensionFilter("HTML report (*.html)", "html", "htm"));
        c.setFileFilter(pdf);
        String base = name.endsWith(".json") ? name.substring(0, name.length() - 5) : name.replaceAll("[^\\w.-]+", "-");
        c.setSelectedFile(lastFolder == null ? new java.io.File(base + ".pdf") : lastFolder.resolve(base + ".pdf").toFile());
        if (c.showSaveDialog(parent) != JFileChooser.APPROVE_OPTION) {
            return null;
        }
        Path p = c.getSelectedFile().toPath();
        String n = p.getFileName().toString().toLowerCase(java.util.Locale.ROOT);
        if (!n.endsWith(".pdf") && !n.endsWith(".html") && !n.endsWith(".htm")) {
            boolean html = c.getFileFilter() != pdf && c.getFileFilter() instanceof FileNameExtensionFilter;
            p = p.resolveSibling(p.getFileName() + (html ? ".html" : ".pdf"));
        }
        if (java.nio.file.Files.exists(p) && JOptionPane.showConfirmDialog(parent, p + " exists. Replace it?",
                "Export report", JOptionPane.YES_NO_OPTION) != JOptionPane.YES_OPTION) {
            return null;
        }
        lastFolder = p.getParent();
        return p;
    }

    private static JFileChooser chooser(String title) {
        JFileChooser c = new JFileChooser(lastFolder == null ? null : lastFolder.toFile());
        c.setDialogTitle(title);
        c.setFileFilter(new FileNameExtensionFilter("Quire budgets (*.json)", "json"));
        return c;
    }
}
