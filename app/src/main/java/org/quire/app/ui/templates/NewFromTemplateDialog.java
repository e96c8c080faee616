package org.quire.app.ui.templates;

import java.awt.BorderLayout;
import java.awt.FlowLayout;
import java.awt.GridBagConstraints;
import java.awt.GridBagLayout;
import java.awt.Insets;
import java.awt.Window;
import java.time.Instant;
import java.util.LinkedHashMap;
import java.util.Map;
import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JDialog;
import javax.swing.JLabel;
import javax.swing.JList;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JSplitPane;
import javax.swing.JTextArea;
import javax.swing.JTextField;
import javax.swing.ListSelectionModel;
import org.quire.app.ui.common.Colors;
import org.quire.app.ui.common.Fmt;
import org.quire.engine.document.BudgetDocument;
import org.quire.engine.document.TemplateParameter;

/**
 * File &gt; New from template: the catalogue's templates and plain budgets on the left; on the right what the
 * selected one is and, for a template, a field for each parameter (with its unit, description and default; a
 * readings parameter takes the readings, separated by ';', tabs, spaces or line breaks, each read by the one
 * CSV number rule), and the new budget's laboratory and device under test (the template's own are not carried
 * over). The budget is made by the engine's one path ({@link TemplateCatalog#create}); a value it refuses is
 * reported in the dialog, which stays open.
 */
public final class NewFromTemplateDialog extends JDialog {
    private static final long serialVersionUID = 1L;
    private final JList<TemplateCatalog.Entry> list;
    private final JPanel form = new JPanel(new GridBagLayout());
    private final JTextArea about = new JTextArea(4, 40);
    private final JLabel error = new JLabel(" ");
    private final Map<String, JTextField> fields = new LinkedHashMap<>();
    /** The parameters that take readings (a list), by name. */
    private final java.util.Set<String> readingsFields = new java.util.HashSet<>();
    private final JTextField laboratory = new JTextField(24);
    private final JTextField device = new JTextField(24);
    private final String author;
    private BudgetDocument created;
    private TemplateCatalog.Entry createdFrom;

    /**
     * @param owner the workbench window
     * @param listing what to offer
     * @param author who the new budget's author is
     */
    public NewFromTemplateDialog(Window owner, TemplateCatalog.Listing listing, String author) {
        super(owner, "New budget from a template", ModalityType.APPLICATION_MODAL);
        this.author = author;
        setName("newFromTemplate");
        list = new JList<>(listing.entries().toArray(new TemplateCatalog.Entry[0]));
        list.setName("templates");
        list.setSelectionMode(ListSelectionModel.SINGLE_SELECTION);
        list.setCellRenderer(new javax.swing.DefaultListCellRenderer() {
            private static final long serialVersionUID = 1L;

            @Override
            public java.awt.Component getListCellRendererComponent(JList<?> l, Object v, int i, boolean sel,
                    boolean focus) {
                TemplateCatalog.Entry e = (TemplateCatalog.Entry) v;
                String kind = e.isTemplate() ? "template " + e.template().id() + " v" + e.template().version()
                        : "budget";
                return super.getListCellRendererComponent(l, "<html>" + esc(e.title()) + "<br><small>"
                        + e.folder().name().toLowerCase(java.util.Locale.ROOT) + " \u00b7 " + kind + " \u00b7 "
                        + esc(String.valueOf(e.file().getFileName())) + "</small></html>", i, sel, focus);
            }
        });
        list.addListSelectionListener(e -> {
            if (!e.getValueIsAdjusting()) {
                showSelected();
            }
        });
        about.setEditable(false);
        about.setLineWrap(true);
        about.setWrapStyleWord(true);
        about.setName("about");
        JPanel right = new JPanel(new BorderLayout(0, 8));
        right.setBorder(BorderFactory.createEmptyBorder(6, 10, 6, 6));
        right.add(new JScrollPane(about), BorderLayout.NORTH);
        JPanel formHolder = new JPanel(new BorderLayout());
        formHolder.add(form, BorderLayout.NORTH);
        right.add(new JScrollPane(formHolder), BorderLayout.CENTER);
        error.setName("error");
        error.setForeground(Colors.get("Quire.error"));
        right.add(error, BorderLayout.SOUTH);
        JSplitPane split = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT, new JScrollPane(list), right);
        split.setResizeWeight(0.45);
        JButton create = new JButton("Create budget");
        create.setName("create");
        create.addActionListener(e -> create());
        JButton cancel = new JButton("Cancel");
        cancel.addActionListener(e -> dispose());
        JPanel buttons = new JPanel(new FlowLayout(FlowLayout.RIGHT));
        buttons.add(create);
        buttons.add(cancel);
        JPanel problems = new JPanel(new BorderLayout());
        if (!listing.problems().isEmpty()) {
            JLabel p = new JLabel("<html>Not offered: " + esc(String.join("; ", listing.problems())) + "</html>");
            p.setForeground(Colors.get("Label.disabledForeground"));
            problems.add(p, BorderLayout.CENTER);
        }
        JPanel south = new JPanel(new BorderLayout());
        south.add(problems, BorderLayout.CENTER);
        south.add(buttons, BorderLayout.EAST);
        getContentPane().add(split, BorderLayout.CENTER);
        getContentPane().add(south, BorderLayout.SOUTH);
        getRootPane().setDefaultButton(create);
        setSize(900, 520);
        setLocationRelativeTo(owner);
        if (!listing.entries().isEmpty()) {
            list.setSelectedIndex(0);
        } else {
            about.setText("No templates found. Set your personal and team template folders in the preferences.");
            create.setEnabled(false);
        }
    }

    private static String esc(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;");
    }

    private void showSelected() {
        TemplateCatalog.Entry e = list.getSelectedValue();
        form.removeAll();
        fields.clear();
        readingsFields.clear();
        error.setText(" ");
        if (e == null) {
            return;
        }
        if (e.isTemplate()) {
            String d = e.template().spec().description();
            about.setText(e.title() + (d.isBlank() ? "" : "\n\n" + d));
            GridBagConstraints c = new GridBagConstraints();
            c.insets = new Insets(3, 0, 3, 8);
            c.anchor = GridBagConstraints.WEST;
            c.gridy = 0;
            laboratory.setName("laboratory");
            device.setName("device");
            c.gridx = 0;
            form.add(new JLabel("Laboratory"), c);
            c.gridx = 1;
            c.gridwidth = 2;
            form.add(laboratory, c);
            c.gridwidth = 1;
            c.gridy++;
            c.gridx = 0;
            form.add(new JLabel("Device under test"), c);
            c.gridx = 1;
            c.gridwidth = 2;
            form.add(device, c);
            c.gridwidth = 1;
            c.gridy++;
            for (TemplateParameter p : e.template().spec().parameters()) {
                JTextField f = new JTextField(p.hasDefault() ? Fmt.num(p.defaultValue()) : "", p.isReadings() ? 24 : 12);
                f.setName("param:" + p.name());
                fields.put(p.name(), f);
                if (p.isReadings()) {
                    readingsFields.add(p.name());
                    f.setToolTipText("the readings, separated by ';', tabs or spaces (a pasted column works too)");
                }
                c.gridx = 0;
                form.add(new JLabel(p.name() + (p.unit().isEmpty() ? "" : " (" + p.unit() + ")")), c);
                c.gridx = 1;
                form.add(f, c);
                c.gridx = 2;
                String range = Double.isInfinite(p.minimum()) && Double.isInfinite(p.maximum()) ? ""
                        : "  [" + Fmt.num(p.minimum()) + " \u2026 " + Fmt.num(p.maximum()) + "]";
                form.add(new JLabel((p.isReadings() ? "readings: " : "") + p.description() + range), c);
                c.gridy++;
            }
            if (fields.isEmpty()) {
                form.add(new JLabel("This template has no parameters."), c);
            }
        } else {
            about.setText(e.title() + "\n\nA plain budget: the new budget is a copy of it, a draft of your own. It "
                    + "records no template origin, since the file has no template section (id and version).");
        }
        about.setCaretPosition(0);
        form.revalidate();
        form.repaint();
    }

    private void create() {
        TemplateCatalog.Entry e = list.getSelectedValue();
        if (e == null) {
            error.setText("Choose a template first.");
            return;
        }
        Map<String, Double> values = new LinkedHashMap<>();
        Map<String, double[]> readings = new LinkedHashMap<>();
        for (Map.Entry<String, JTextField> f : fields.entrySet()) {
            String t = f.getValue().getText().trim();
            if (t.isEmpty()) {
                continue;
            }
            try {
                if (readingsFields.contains(f.getKey())) {
                    // one reading a line, each by the one CSV number rule
                    readings.put(f.getKey(), org.quire.engine.csv.CsvReadings.parse("readings of " + f.getKey(),
                            String.join("\n", t.split("[;\\s]+")), org.quire.engine.csv.CsvOptions.defaults()));
                } else {
                    values.put(f.getKey(), Fmt.parse(t));
                }
            } catch (org.quire.engine.csv.CsvException x) {
                error.setText("<html>" + esc(f.getKey() + ": " + x.getMessage()) + "</html>");
                return;
            } catch (IllegalArgumentException x) {
                error.setText("<html>" + esc(f.getKey() + ": " + x.getMessage()) + "</html>");
                return;
            }
        }
        org.quire.engine.document.TemplateValues given = org.quire.engine.document.TemplateValues.of(values)
                .withLaboratory(laboratory.getText()).withDeviceUnderTest(device.getText());
        for (Map.Entry<String, double[]> r : readings.entrySet()) {
            given = given.withReadings(r.getKey(), r.getValue());
        }
        try {
            created = TemplateCatalog.create(e, given, author, Instant.now());
            createdFrom = e;
            dispose();
        } catch (IllegalArgumentException x) {
            error.setText("<html>" + esc(x.getMessage()) + "</html>");
        }
    }

    /** Selects the entry of {@code file}, when it is offered. */
    public void select(java.nio.file.Path file) {
        for (int i = 0; i < list.getModel().getSize(); i++) {
            if (list.getModel().getElementAt(i).file().toAbsolutePath().equals(file.toAbsolutePath())) {
                list.setSelectedIndex(i);
                list.ensureIndexIsVisible(i);
            }
        }
    }

    /** @return the entry selected in the list, or null */
    public TemplateCatalog.Entry selected() {
        return list.getSelectedValue();
    }

    /** Selects the template of this id and version in the list, when it is there (wherever its file is). */
    public void selectTemplate(String id, int version) {
        for (int i = 0; i < list.getModel().getSize(); i++) {
            TemplateCatalog.Entry e = list.getModel().getElementAt(i);
            if (e.isTemplate() && e.template().id().equals(id) && e.template().version() == version) {
                list.setSelectedIndex(i);
                list.ensureIndexIsVisible(i);
                return;
            }
        }
    }

    /** @return the document made, or null when the dialog was cancelled */
    public BudgetDocument created() {
        return created;
    }

    /** @return the entry the document was made from, or null */
    public TemplateCatalog.Entry createdFrom() {
        return createdFrom;
    }
}
