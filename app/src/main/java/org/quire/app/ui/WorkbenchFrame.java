package org.quire.app.ui;

import java.awt.BorderLayout;
import java.awt.CardLayout;
import java.awt.Dimension;
import java.awt.event.WindowAdapter;
import java.awt.event.WindowEvent;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.BiConsumer;
import javax.swing.BorderFactory;
import javax.swing.JFrame;
import javax.swing.JLabel;
import javax.swing.JOptionPane;
import javax.swing.JPanel;
import javax.swing.JSplitPane;
import javax.swing.JTabbedPane;
import javax.swing.Timer;
import org.quire.app.ui.document.BudgetDocument;
import org.quire.app.ui.inspector.InspectorPanel;
import org.quire.app.ui.montecarlo.MonteCarloRunner;
import org.quire.app.ui.notebook.BudgetEditor;
import org.quire.app.ui.workspace.WorkspaceNavigator;
import org.quire.engine.budget.Budget;
import org.quire.engine.io.BudgetFormatException;
import org.quire.engine.io.BudgetJson;
import org.quire.engine.model.FunctionLibrary;

/**
 * The workbench window: the workspace navigator on the left, one notebook editor per open budget in tabs, the
 * inspector on the right and the problems list at the bottom. Panes can be hidden; the layout is remembered.
 */
public final class WorkbenchFrame extends JFrame {
    /** The demo budget opened when the workbench starts without a file. */
    public static final String DEMO = "/org/quire/app/demo/tarrow-vale-demo.json";

    private final WorkbenchPrefs prefs;
    private final FunctionLibrary library;
    private final Optional<MonteCarloRunner> runner;
    private final JTabbedPane tabs = new JTabbedPane();
    private final CardLayout inspectorCards = new CardLayout();
    private final JPanel inspectors = new JPanel(inspectorCards);
    private final ProblemsPanel problems;
    private final WorkspaceNavigator navigator;
    private final JLabel status = new JLabel(" ");
    private final PaneLayout panes;
    private final Map<BudgetEditor, InspectorPanel> editors = new LinkedHashMap<>();
    private final WorkbenchActions actions;
    private final Timer autosave;
    private BiConsumer<String, Boolean> statusHook = (m, e) -> { };

    public WorkbenchFrame(WorkbenchPrefs prefs, FunctionLibrary library, Optional<MonteCarloRunner> runner) {
        super("Quire");
        this.prefs = prefs;
        this.library = library;
        this.runner = runner;
        setName("workbench");
        setDefaultCloseOperation(DO_NOTHING_ON_CLOSE);
        problems = new ProblemsPanel(p -> activeEditor().ifPresent(e -> e.reveal(p)));
        navigator = new WorkspaceNavigator(this::openEntry, key -> tabs.setSelectedComponent((BudgetEditor) key));
        tabs.setName("tabs");
        tabs.putClientProperty("JTabbedPane.tabClosable", true);
        tabs.putClientProperty("JTabbedPane.tabCloseCallback",
                (java.util.function.IntConsumer) i -> close((BudgetEditor) tabs.getComponentAt(i)));
        tabs.addChangeListener(e -> activeChanged());
        inspectors.add(new JLabel("Nothing selected", JLabel.CENTER), "none");
        inspectors.setMinimumSize(new Dimension(0, 0));
        JSplitPane centre = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT, tabs, inspectors);
        centre.setResizeWeight(1);
        JSplitPane main = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT, navigator, centre);
        JSplitPane vertical = new JSplitPane(JSplitPane.VERTICAL_SPLIT, main, problems);
        vertical.setResizeWeight(1);
        panes = new PaneLayout(main, centre, vertical, prefs);
        status.setBorder(BorderFactory.createEmptyBorder(2, 8, 2, 8));
        status.setName("status");
        getContentPane().add(vertical, BorderLayout.CENTER);
        getContentPane().add(status, BorderLayout.SOUTH);
        actions = new WorkbenchActions(this);
        setJMenuBar(actions.menuBar());
        setTransferHandler(new FileDropHandler(this::open));
        addWindowListener(new WindowAdapter() {
            @Override
            public void windowClosing(WindowEvent e) {
                quit();
            }
        });
        autosave = new Timer(60_000, e -> autosaveAll());
        autosave.setRepeats(true);
        applyAutosave();
        refreshNavigator();
        setMinimumSize(new Dimension(800, 520));
    }

    WorkbenchPrefs prefs() { return prefs; }
    PaneLayout panes() { return panes; }

    /** Restores the window bounds (clamped to the screens) and the pane layout, then shows the window. */
    public void showRestored() {
        java.awt.Rectangle r = prefs.windowBounds();
        if (r != null) {
            setBounds(r);
        } else {
            setSize(1440, 900);
            setLocationRelativeTo(null);
        }
        if (prefs.windowMaximized()) {
            setExtendedState(MAXIMIZED_BOTH);
        }
        setVisible(true);
        validate();
        panes.restore();
        java.awt.EventQueue.invokeLater(panes::restore);
    }

    /** @return the editor of the selected tab */
    public Optional<BudgetEditor> activeEditor() {
        return Optional.ofNullable((BudgetEditor) tabs.getSelectedComponent());
    }

    /** @return the open editors in tab order */
    public List<BudgetEditor> editors() {
        return new ArrayList<>(editors.keySet());
    }

    /** Opens a budget document in a new tab and makes it active. */
    public BudgetEditor open(BudgetDocument doc) {
        BudgetEditor ed = new BudgetEditor(doc, library, runner);
        InspectorPanel insp = new InspectorPanel(ed);
        editors.put(ed, insp);
        inspectors.add(insp, String.valueOf(System.identityHashCode(ed)));
        tabs.addTab(doc.name(), ed);
        ed.addRecalculationListener(r -> {
            if (activeEditor().orElse(null) == ed) {
                problems.show(r.problems());
            }
        });
        ed.addStatusListener(this::status);
        doc.addListener(new BudgetDocument.Listener() {
            @Override
            public void budgetChanged(BudgetDocument d, Budget before, Budget after, String cause) {
                actions.update();
            }

            @Override
            public void documentStateChanged(BudgetDocument d) {
                updateTitle(ed);
                actions.update();
            }
        });
        tabs.setSelectedComponent(ed);
        updateTitle(ed);
        refreshNavigator();
        return ed;
    }

    /** Opens a budget file; reports an unreadable file in a message that says where and why. */
    public Optional<BudgetEditor> open(Path file) {
        for (BudgetEditor e : editors.keySet()) {
            if (file.toAbsolutePath().equals(e.document().file())) {
                tabs.setSelectedComponent(e);
                return Optional.of(e);
            }
        }
        try {
            BudgetDocument doc = BudgetDocument.open(file);
            prefs.addRecent(file.toAbsolutePath());
            actions.updateRecent();
            return Optional.of(open(doc));
        } catch (IOException | BudgetFormatException e) {
            JOptionPane.showMessageDialog(this, file + ":\n" + e.getMessage(), "Cannot open the budget",
                    JOptionPane.ERROR_MESSAGE);
            return Optional.empty();
        }
    }

    /** Opens the built-in demo budget of the Tarrow Vale Flow Laboratory. */
    public BudgetEditor openDemo() {
        try (InputStream in = WorkbenchFrame.class.getResourceAsStream(DEMO)) {
            if (in == null) {
                throw new IllegalStateException("the demo budget " + DEMO + " is missing from the application");
            }
            Budget b = BudgetJson.read(new String(in.readAllBytes(), StandardCharsets.UTF_8));
            return open(new BudgetDocument(b, null, "Tarrow Vale demo"));
        } catch (IOException | BudgetFormatException e) {
            throw new IllegalStateException("the demo budget cannot be read: " + e.getMessage(), e);
        }
    }

    /** Opens a new, empty budget with the evaluation settings of the preferences. */
    public BudgetEditor newBudget() {
        Budget b = Budget.of("", List.of(), List.of()).withTitle("New budget")
                .withSettings(prefs.newBudgetSettings());
        return open(new BudgetDocument(b, null, "new budget"));
    }

    private void openEntry(WorkspaceNavigator.Entry e) {
        if (!e.template()) {
            open(e.file());
            return;
        }
        try {
            Budget b = BudgetJson.read(e.file());
            open(new BudgetDocument(b, null, "new from " + e));
        } catch (IOException | BudgetFormatException x) {
            JOptionPane.showMessageDialog(this, e.file() + ":\n" + x.getMessage(), "Cannot open the template",
                    JOptionPane.ERROR_MESSAGE);
        }
    }

    /** Saves the active budget, asking for a file when it has none; @return whether it was saved */
    boolean save(BudgetEditor ed, boolean askForFile) {
        BudgetDocument doc = ed.document();
        Path target = doc.file();
        if (askForFile || target == null) {
            target = FileChooser.saveTarget(this, doc.name());
            if (target == null) {
                return false;
            }
        }
        try {
            doc.saveTo(target);
            prefs.addRecent(target);
            actions.updateRecent();
            status("Saved " + target, false);
            refreshNavigator();
            return true;
        } catch (IOException e) {
            JOptionPane.showMessageDialog(this, e.getMessage(), "The budget was not saved", JOptionPane.ERROR_MESSAGE);
            return false;
        }
    }

    /** Closes an editor, offering to save changes first; @return whether it closed */
    public boolean close(BudgetEditor ed) {
        if (ed.document().isDirty() && !ed.document().isReadOnly()) {
            tabs.setSelectedComponent(ed);
            int a = JOptionPane.showConfirmDialog(this, "Save the changes to " + ed.document().name() + "?",
                    "Close budget", JOptionPane.YES_NO_CANCEL_OPTION);
            if (a == JOptionPane.CANCEL_OPTION || a == JOptionPane.CLOSED_OPTION || (a == JOptionPane.YES_OPTION
                    && !save(ed, false))) {
                return false;
            }
        }
        forceClose(ed);
        return true;
    }

    /** Closes an editor without asking (the caller has dealt with unsaved changes). */
    public void forceClose(BudgetEditor ed) {
        ed.dispose();
        inspectors.remove(editors.remove(ed));
        tabs.remove(ed);
        refreshNavigator();
        activeChanged();
    }

    void quit() {
        for (BudgetEditor e : editors()) {
            if (!close(e)) {
                return;
            }
        }
        prefs.setWindowBounds(getExtendedState() == MAXIMIZED_BOTH ? getBounds() : getBounds(),
                getExtendedState() == MAXIMIZED_BOTH);
        panes.save();
        autosave.stop();
        dispose();
    }

    void status(String message, boolean error) {
        status.setText(message == null || message.isEmpty() ? " " : message);
        status.setForeground(Colors.get(error ? "Quire.error" : "Label.foreground"));
        statusHook.accept(message, error);
    }

    /** For tests: hears every status message. */
    public void setStatusHook(BiConsumer<String, Boolean> hook) {
        statusHook = hook;
    }

    private void activeChanged() {
        Optional<BudgetEditor> ed = activeEditor();
        if (ed.isPresent()) {
            inspectorCards.show(inspectors, String.valueOf(System.identityHashCode(ed.get())));
            problems.show(ed.get().latest() == null ? List.of() : ed.get().latest().problems());
        } else {
            inspectorCards.show(inspectors, "none");
            problems.show(List.of());
        }
        if (actions != null) {
            actions.update();
        }
        setTitle("Quire" + ed.map(e -> " \u2013 " + e.document().name()).orElse(""));
    }

    private void updateTitle(BudgetEditor ed) {
        int i = tabs.indexOfComponent(ed);
        if (i >= 0) {
            BudgetDocument d = ed.document();
            tabs.setTitleAt(i, (d.isDirty() ? "\u2022 " : "") + d.name() + (d.isReadOnly() ? " (review)" : ""));
            tabs.setToolTipTextAt(i, d.file() == null ? "not saved yet" : d.file().toString());
        }
        if (ed == activeEditor().orElse(null)) {
            setTitle("Quire \u2013 " + ed.document().name() + (ed.document().isDirty() ? " (changed)" : ""));
        }
    }

    void refreshNavigator() {
        List<WorkspaceNavigator.OpenItem> open = new ArrayList<>();
        for (BudgetEditor e : editors.keySet()) {
            open.add(new WorkspaceNavigator.OpenItem(e.document().name(), e));
        }
        Path examples = Path.of("worked-examples");
        List<Path> templateFolders = new ArrayList<>();
        Path shipped = Path.of("templates");
        if (Files.isDirectory(shipped)) {
            templateFolders.add(shipped.toAbsolutePath());
        }
        templateFolders.addAll(prefs.templateFolders());
        navigator.refresh(open, prefs.budgetFolders(), templateFolders,
                Files.isDirectory(examples) ? examples.toAbsolutePath() : null);
    }

    void applyAutosave() {
        int m = prefs.autosaveMinutes();
        autosave.stop();
        if (m > 0) {
            autosave.setDelay(m * 60_000);
            autosave.setInitialDelay(m * 60_000);
            autosave.start();
        }
    }

    private void autosaveAll() {
        for (BudgetEditor e : editors.keySet()) {
            BudgetDocument d = e.document();
            if (d.isDirty() && d.file() != null && !d.isReadOnly()) {
                try {
                    d.autosave();
                } catch (IOException x) {
                    status("Autosave of " + d.name() + " failed: " + x.getMessage(), true);
                }
            }
        }
    }

    ProblemsPanel problemsPanel() { return problems; }

    /** @return the problems list as shown, for tests */
    public List<org.quire.app.ui.document.Problem> shownProblems() {
        return problems.shown();
    }

    /** @return the status line text, for tests */
    public String statusText() {
        return status.getText();
    }
}
