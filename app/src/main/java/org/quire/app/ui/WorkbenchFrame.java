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
import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.CompletableFuture;
import java.util.function.BiConsumer;
import javax.swing.JFrame;
import javax.swing.JLabel;
import javax.swing.JOptionPane;
import javax.swing.JPanel;
import javax.swing.JSplitPane;
import javax.swing.JTabbedPane;
import org.quire.app.ui.common.FileDropHandler;
import org.quire.app.ui.common.WorkbenchPrefs;
import org.quire.app.ui.document.BudgetDocument;
import org.quire.app.ui.document.RecoveryKeeper;
import org.quire.app.ui.inspector.InspectorPanel;
import org.quire.app.ui.montecarlo.MonteCarloRunner;
import org.quire.app.ui.notebook.BudgetEditor;
import org.quire.app.ui.templates.TemplateCatalog;
import org.quire.app.ui.workspace.WorkspaceNavigator;
import org.quire.engine.budget.Budget;
import org.quire.engine.document.Template;
import org.quire.engine.io.BudgetFormatException;
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
    private final MonteCarloRunner runner;
    private final JTabbedPane tabs = new JTabbedPane();
    private final CardLayout inspectorCards = new CardLayout();
    private final JPanel inspectors = new JPanel(inspectorCards);
    private final ProblemsPanel problems;
    private final WorkspaceNavigator navigator;
    private final StatusBar status = new StatusBar();
    private final PaneLayout panes;
    private final Map<BudgetEditor, InspectorPanel> editors = new LinkedHashMap<>();
    private final WorkbenchActions actions;
    private final WorkbenchRecovery recovery;
    private final WorkbenchFiles files;
    private final WorkbenchReportExport reports = new WorkbenchReportExport(this);
    private final WorkbenchCompare compare = new WorkbenchCompare(this);
    private CompletableFuture<Void> recoveryClosed;
    private final WorkbenchTemplates templates;
    private BiConsumer<String, Boolean> statusHook = (m, e) -> { };

    public WorkbenchFrame(WorkbenchPrefs prefs, FunctionLibrary library, MonteCarloRunner runner) {
        this(prefs, library, runner, null);
    }

    /**
     * @param claimed the recovery folder claimed off the event thread before (the start does so), or null to
     *     claim it here
     */
    WorkbenchFrame(WorkbenchPrefs prefs, FunctionLibrary library, MonteCarloRunner runner,
            WorkbenchRecovery.Claimed claimed) {
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
        getContentPane().add(vertical, BorderLayout.CENTER);
        getContentPane().add(status, BorderLayout.SOUTH);
        files = new WorkbenchFiles(this, prefs, status);
        templates = new WorkbenchTemplates(this, prefs);
        actions = new WorkbenchActions(this);
        setJMenuBar(actions.menuBar());
        KeyBindings.yieldToMenu(getJMenuBar());
        setTransferHandler(new FileDropHandler(files::dropped));
        addWindowListener(new WindowAdapter() {
            @Override
            public void windowClosing(WindowEvent e) {
                quit();
            }
        });
        recovery = new WorkbenchRecovery(this, prefs, claimed);
        refreshNavigator();
        setMinimumSize(new Dimension(760, 500));
    }

    WorkbenchPrefs prefs() { return prefs; }
    PaneLayout panes() { return panes; }
    WorkbenchActions actions() { return actions; }
    WorkbenchFiles files() { return files; }
    WorkbenchTemplates templateUse() { return templates; }

    /** Restores the window bounds (clamped to the screens) and the pane layout, then shows the window. */
    public void showRestored() {
        java.awt.Rectangle screen = usableScreen();
        java.awt.Rectangle r = prefs.windowBounds();
        if (r == null) {
            r = new java.awt.Rectangle(0, 0, Math.min(1440, screen.width), Math.min(900, screen.height));
            r.setLocation(screen.x + (screen.width - r.width) / 2, screen.y + (screen.height - r.height) / 2);
        }
        setBounds(r.intersection(screen).isEmpty() ? new java.awt.Rectangle(screen.x, screen.y,
                Math.min(r.width, screen.width), Math.min(r.height, screen.height)) : clamp(r, screen));
        if (prefs.windowMaximized()) {
            setExtendedState(MAXIMIZED_BOTH);
        }
        setVisible(true);
        validate();
        panes.restore();
        java.awt.EventQueue.invokeLater(panes::restore);
    }

    /** @return the part of the default screen that windows may use (without task bars) */
    private java.awt.Rectangle usableScreen() {
        java.awt.GraphicsConfiguration gc = java.awt.GraphicsEnvironment.getLocalGraphicsEnvironment()
                .getDefaultScreenDevice().getDefaultConfiguration();
        java.awt.Rectangle b = gc.getBounds();
        java.awt.Insets in = java.awt.Toolkit.getDefaultToolkit().getScreenInsets(gc);
        return new java.awt.Rectangle(b.x + in.left, b.y + in.top, b.width - in.left - in.right,
                b.height - in.top - in.bottom);
    }

    /** @return {@code r} made to fit inside {@code screen}: no larger, and moved inside */
    static java.awt.Rectangle clamp(java.awt.Rectangle r, java.awt.Rectangle screen) {
        int w = Math.min(r.width, screen.width);
        int h = Math.min(r.height, screen.height);
        int x = Math.max(screen.x, Math.min(r.x, screen.x + screen.width - w));
        int y = Math.max(screen.y, Math.min(r.y, screen.y + screen.height - h));
        return new java.awt.Rectangle(x, y, w, h);
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
        ed.reviewPanel().useTemplates(() -> templates().library());
        ed.setFlowRangeOpener(() -> openFlowRange(ed, w -> { }));
        InspectorPanel insp = new InspectorPanel(ed);
        editors.put(ed, insp);
        inspectors.add(insp, String.valueOf(System.identityHashCode(ed)));
        tabs.addTab(doc.name(), ed);
        ed.addRecalculationListener(r -> {
            if (activeEditor().orElse(null) == ed) {
                showProblems(ed);
            }
        });
        ed.addStatusListener(this::status);
        ed.addEntryProblemListener(cleared -> {
            if (cleared != null) {
                status.clearError(cleared);
            }
            if (activeEditor().orElse(null) == ed) {
                showProblems(ed);
            }
        });
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
        recovery.keeper().track(doc);
        tabs.setSelectedComponent(ed);
        updateTitle(ed);
        refreshNavigator();
        templates.checkTemplate(ed);
        return ed;
    }

    /** Makes {@code ed} the selected tab. */
    void select(BudgetEditor ed) {
        tabs.setSelectedComponent(ed);
    }

    /** After a save: the tab's title, the navigator. */
    void documentSaved(BudgetEditor ed) {
        updateTitle(ed);
        refreshNavigator();
    }

    // ----- files (WorkbenchFiles does the work off the event thread) -------------------------------------------

    /**
     * Opens a budget file off the event thread; an unreadable file is reported in a message that says where and
     * why.
     *
     * @return completed on the event thread with the editor, or empty when the file was not opened
     */
    public CompletableFuture<Optional<BudgetEditor>> open(Path file) {
        return files.open(file, false);
    }

    /** As {@link #open(Path)}, as a review copy when {@code readOnly}. */
    public CompletableFuture<Optional<BudgetEditor>> open(Path file, boolean readOnly) {
        return files.open(file, readOnly);
    }

    /** Takes the readings of a CSV file as the Type A evaluation of the selected input; @return whether taken */
    public CompletableFuture<Boolean> importReadings(Path file) {
        return files.importReadings(file);
    }

    /** Saves a budget to {@code target} off the event thread; @return completed with whether it was saved */
    public CompletableFuture<Boolean> saveTo(BudgetEditor ed, Path target) {
        return files.saveTo(ed, target);
    }

    /** Closes an editor, offering to save changes first; @return completed with whether it closed */
    public CompletableFuture<Boolean> close(BudgetEditor ed) {
        return files.close(ed);
    }

    /** Quits: asks about every changed budget first and closes none when the engineer cancels or a save fails. */
    void quit() {
        files.quit();
    }

    /** Closes every editor (their changes were dealt with), remembers the layout and closes the window. */
    void closeAllAndDispose() {
        for (BudgetEditor e : editors()) {
            forceClose(e);
        }
        prefs.setWindowBounds(getBounds(), getExtendedState() == MAXIMIZED_BOTH);
        panes.save();
        dispose();
    }

    /** @return whether a file is being read or written in the background */
    public boolean fileTaskRunning() {
        return files.busy();
    }

    // ----- templates ------------------------------------------------------------------------------------------

    /** @return the templates of the shipped folder and the personal and team folders of the preferences */
    public TemplateCatalog templates() {
        return templates.templates();
    }

    /**
     * File &gt; New from template, the templates listed off the event thread first.
     *
     * @param preselect the file to select in the list, or null
     */
    public void newFromTemplate(Path preselect) {
        templates.newFromTemplate(preselect);
    }

    /** Shows the changes a newer template brings, field by field, and takes the checked ones over. */
    void offerTemplateChanges(BudgetEditor ed, Template newer) {
        templates.offerTemplateChanges(ed, newer);
    }

    // ----- recovery -------------------------------------------------------------------------------------------

    /** @return the keeper of this workbench's recovery copies, for tests */
    public RecoveryKeeper recovery() {
        return recovery.keeper();
    }

    void applyAutosave() {
        recovery.applyPeriod();
    }

    /**
     * @return done once the recovery copies of a disposed window are written and its folder released (off the
     *     event thread), or null while the window is open; for tests
     */
    public CompletableFuture<Void> recoveryClosed() {
        return recoveryClosed;
    }

    /** Offers the recovery copies left by workbenches that are no longer running. */
    public void offerRecovery() {
        recovery.offer();
    }

    /** Opens the built-in demo budget of the Tarrow Vale Flow Laboratory. */
    public BudgetEditor openDemo() {
        return openDemo(readDemo());
    }

    /**
     * Opens the demo budget read by {@link #readDemo()} (which the start-up reads off the event thread while the
     * look and feel is set up) as a new draft of this user.
     */
    public BudgetEditor openDemo(org.quire.engine.document.BudgetDocument shipped) {
        String user = prefs.userName();
        Instant now = Instant.now();
        org.quire.engine.document.BudgetDocument d = org.quire.engine.document.BudgetDocument
                .newDraft(shipped.budget(), user, now)
                .withDetails(shipped.laboratory(), shipped.deviceUnderTest(), user, user, now);
        return open(new BudgetDocument(d, null, "Tarrow Vale demo", user));
    }

    /**
     * @return the demo budget as shipped; may be called on any thread
     * @throws IllegalStateException when it is missing or cannot be read (a fault of the build)
     */
    public static org.quire.engine.document.BudgetDocument readDemo() {
        try (InputStream in = WorkbenchFrame.class.getResourceAsStream(DEMO)) {
            if (in == null) {
                throw new IllegalStateException("the demo budget " + DEMO + " is missing from the application");
            }
            return org.quire.engine.document.DocumentJson.read(new String(in.readAllBytes(), StandardCharsets.UTF_8),
                    Instant.now());
        } catch (IOException | BudgetFormatException e) {
            throw new IllegalStateException("the demo budget cannot be read: " + e.getMessage(), e);
        }
    }

    /** Opens a new, empty budget with the evaluation settings of the preferences. */
    public BudgetEditor newBudget() {
        Budget b = Budget.of("", List.of(), List.of()).withTitle("New budget")
                .withSettings(prefs.newBudgetSettings());
        return open(BudgetDocument.ofBudget(b, "new budget", prefs.userName()));
    }

    /** @return the function set every budget of this window is evaluated, simulated and reported with */
    public FunctionLibrary library() {
        return library;
    }

    private void openEntry(WorkspaceNavigator.Entry e) {
        if (!e.template()) {
            open(e.file());
        } else {
            newFromTemplate(e.file());
        }
    }

    /** Closes an editor without asking (the caller has dealt with unsaved changes); its recovery copy goes. */
    public void forceClose(BudgetEditor ed) {
        ed.dispose();
        recovery.keeper().forget(ed.document());
        inspectors.remove(editors.remove(ed));
        tabs.remove(ed);
        refreshNavigator();
        activeChanged();
    }

    /** Closes the window; copies of changed budgets still open are written to the recovery folder first. */
    @Override
    public void dispose() {
        if (recoveryClosed == null) {
            recoveryClosed = recovery.close();
        }
        files.cancelAll();
        super.dispose();
    }

    /** Shows an error in a message box (and in the status line). */
    void showError(String title, String message) {
        status(title + ": " + message.lines().findFirst().orElse(""), true);
        JOptionPane.showMessageDialog(this, message, title, JOptionPane.ERROR_MESSAGE);
    }

    // ----- calibration -----------------------------------------------------------------------------------------

    /** File &gt; Open calibration: asks for a calibration file and shows it in its own window. */
    void openCalibration() {
        Path p = FileChooser.openTarget(this, "Open calibration");
        if (p != null) {
            openCalibration(p, w -> { });
        }
    }

    /**
     * Opens a calibration file off the event thread and shows it; a point's budget opens here as a review copy.
     *
     * @param shown told of the window once it is shown
     */
    public void openCalibration(Path file, java.util.function.Consumer<org.quire.app.ui.calibration.CalibrationWindow> shown) {
        status("Opening " + file.getFileName() + "\u2026", false);
        org.quire.app.ui.calibration.CalibrationOpener.open(file, library, p -> {
            BudgetEditor ed = open(BudgetDocument.ofBudget(p.budget(), "point " + p.label() + " of "
                    + file.getFileName(), prefs.userName()));
            ed.document().setReadOnly(true);
            toFront();
        }, w -> {
            status("Opened the calibration " + file.getFileName(), false);
            shown.accept(w);
        }, this::showError);
    }

    /** Budget &gt; Flow range: the active budget evaluated at each of its flow points, in its own window. */
    void openFlowRange() {
        activeEditor().ifPresent(ed -> openFlowRange(ed, w -> { }));
    }

    /**
     * Shows the editor's budget evaluated at its flow points (off the event thread); a point's full budget opens
     * here as a review copy.
     *
     * @param shown told of the window once it is shown
     */
    public void openFlowRange(BudgetEditor ed, java.util.function.Consumer<org.quire.app.ui.calibration.FlowRangeWindow> shown) {
        if (ed.document().budget().flowPoints() == null) {
            status(org.quire.app.ui.common.Fmt.sentence(org.quire.engine.gum.FlowRange.NO_FLOW_POINTS), true);
            return;
        }
        String name = ed.document().name();
        org.quire.app.ui.calibration.FlowRangeWindow w = new org.quire.app.ui.calibration.FlowRangeWindow(name,
                () -> ed.document().budget(), library, (p, b) -> {
                    BudgetEditor point = open(BudgetDocument.ofBudget(b, p + " of " + name,
                            prefs.userName()));
                    point.document().setReadOnly(true);
                    toFront();
                });
        // figures of an earlier budget are marked as such while the window is open
        BudgetDocument.Listener changed = new BudgetDocument.Listener() {
            @Override
            public void budgetChanged(BudgetDocument d, org.quire.engine.budget.Budget before,
                    org.quire.engine.budget.Budget after, String cause) {
                w.sourceChanged();
            }

            @Override
            public void documentStateChanged(BudgetDocument d) {
            }
        };
        ed.document().addListener(changed);
        w.addWindowListener(new java.awt.event.WindowAdapter() {
            @Override
            public void windowClosed(java.awt.event.WindowEvent e) {
                ed.document().removeListener(changed);
            }
        });
        w.setLocationRelativeTo(this);
        w.setVisible(true);
        shown.accept(w);
    }

    // ----- report and comparison ------------------------------------------------------------------------------

    /** Budget &gt; Export report: asks for a .pdf or .html file and writes the report off the event thread. */
    void exportReport(BudgetEditor ed) {
        reports.exportReport(ed);
    }

    /** Writes the report of the editor's budget to {@code target} off the event thread. */
    public void exportReport(BudgetEditor ed, Path target) {
        reports.exportReport(ed, target);
    }

    /** Budget &gt; Compare with: asks for a second budget file and shows both side by side. */
    void compareWith(BudgetEditor ed) {
        compare.compareWith(ed);
    }

    /**
     * Compares the budget in {@code other} (A, usually an earlier version) with the editor's budget (B), off the
     * event thread, and shows the two side by side.
     */
    public void compareWith(BudgetEditor ed, Path other) {
        compare.compareWith(ed, other);
    }

    void status(String message, boolean error) {
        status.show(message, error);
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
            showProblems(ed.get());
        } else {
            inspectorCards.show(inspectors, "none");
            showProblems(null);
        }
        if (actions != null) {
            actions.update();
        }
        setTitle("Quire" + ed.map(e -> " \u2013 " + e.document().name()).orElse(""));
    }

    /** Lists the editor's problems (none for null); the pane shrinks to its title line when there are none. */
    private void showProblems(BudgetEditor ed) {
        List<org.quire.app.ui.document.Problem> list = ed == null ? List.of() : ed.problems();
        problems.show(list);
        panes.collapseProblems(list.isEmpty() ? problems.collapsedHeight() : 0);
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
        for (Path p : new Path[] {TemplateCatalog.shippedFolder(), prefs.personalTemplates(), prefs.teamTemplates()}) {
            if (p != null && Files.isDirectory(p)) {
                templateFolders.add(p);
            }
        }
        navigator.refresh(open, prefs.budgetFolders(), templateFolders,
                Files.isDirectory(examples) ? examples.toAbsolutePath() : null);
    }

    ProblemsPanel problemsPanel() { return problems; }

    /** @return the problems list as shown, for tests */
    public List<org.quire.app.ui.document.Problem> shownProblems() {
        return problems.shown();
    }

    /** @return the status line text, for tests */
    public String statusText() {
        return status.text();
    }
}
