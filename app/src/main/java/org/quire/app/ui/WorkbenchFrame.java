package org.quire.app.ui;

import org.quire.app.ui.common.WorkbenchPrefs;
import org.quire.app.ui.common.Colors;
import org.quire.app.ui.common.FileDropHandler;
import java.awt.BorderLayout;
import java.awt.CardLayout;
import java.awt.Dimension;
import java.awt.EventQueue;
import java.time.Duration;
import java.time.Instant;
import java.time.LocalDate;
import java.util.concurrent.ExecutionException;
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
import javax.swing.SwingWorker;
import org.quire.app.compare.BudgetComparison;
import org.quire.app.compare.Comparison;
import org.quire.app.ui.compare.CompareWindow;
import org.quire.app.ui.document.BudgetDocument;
import org.quire.app.ui.document.RecoveryKeeper;
import org.quire.app.ui.export.ReportExport;
import org.quire.app.ui.templates.NewFromTemplateDialog;
import org.quire.app.ui.templates.TemplateCatalog;
import org.quire.app.ui.templates.TemplateUpdateDialog;
import org.quire.engine.document.DocumentStore;
import org.quire.engine.document.RecoveryStore;
import org.quire.engine.document.Template;
import org.quire.engine.document.TemplateChange;
import org.quire.engine.document.TemplateLibrary;
import org.quire.engine.gum.GumResult;
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
    private final MonteCarloRunner runner;
    private final JTabbedPane tabs = new JTabbedPane();
    private final CardLayout inspectorCards = new CardLayout();
    private final JPanel inspectors = new JPanel(inspectorCards);
    private final ProblemsPanel problems;
    private final WorkspaceNavigator navigator;
    private final JLabel status = new JLabel(" ");
    private final PaneLayout panes;
    private final Map<BudgetEditor, InspectorPanel> editors = new LinkedHashMap<>();
    private final WorkbenchActions actions;
    private final RecoveryKeeper recovery;
    private BiConsumer<String, Boolean> statusHook = (m, e) -> { };

    public WorkbenchFrame(WorkbenchPrefs prefs, FunctionLibrary library, MonteCarloRunner runner) {
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
        KeyBindings.yieldToMenu(getJMenuBar());
        setTransferHandler(new FileDropHandler(this::dropped));
        addWindowListener(new WindowAdapter() {
            @Override
            public void windowClosing(WindowEvent e) {
                quit();
            }
        });
        recovery = new RecoveryKeeper(RecoveryStore.of(prefs.recoveryFolder()), autosavePeriod(),
                (id, e) -> EventQueue.invokeLater(() -> status("Recovery copy not written: " + e.getMessage(), true)));
        refreshNavigator();
        setMinimumSize(new Dimension(760, 500));
    }

    WorkbenchPrefs prefs() { return prefs; }
    PaneLayout panes() { return panes; }

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
        recovery.track(doc);
        tabs.setSelectedComponent(ed);
        updateTitle(ed);
        refreshNavigator();
        checkTemplate(ed);
        return ed;
    }

    /** Opens a budget file; reports an unreadable file in a message that says where and why. */
    /** A file dropped on the window: a CSV file gives readings to the selected Type A input, others open. */
    void dropped(Path file) {
        if (file.getFileName().toString().toLowerCase(java.util.Locale.ROOT).endsWith(".csv")) {
            importReadings(file);
        } else {
            open(file);
        }
    }

    /**
     * Takes the readings in a CSV file as the Type A evaluation of the input selected in the active budget
     * (an undoable edit).
     *
     * @return whether the readings were taken
     */
    public boolean importReadings(Path file) {
        Optional<BudgetEditor> ed = activeEditor();
        String name = ed.map(BudgetEditor::selectedInput).orElse(null);
        if (ed.isEmpty() || name == null) {
            showError("Cannot import readings", "Select the input the readings in " + file.getFileName()
                    + " belong to, then drop the file again.");
            return false;
        }
        try {
            double[] r = org.quire.engine.csv.CsvReadings.read(file, org.quire.engine.csv.CsvOptions.defaults());
            org.quire.engine.budget.TypeA a = org.quire.engine.budget.TypeA.ofReadings(r);
            ed.get().edit("Import readings into " + name, "", b -> b.withInput(name,
                    b.input(name).withEvaluation(a)));
            return true;
        } catch (IOException | BudgetFormatException | IllegalArgumentException e) {
            showError("Cannot import readings", e instanceof org.quire.engine.csv.CsvException ? e.getMessage()
                    : file + ":\n" + e.getMessage());
            return false;
        }
    }

    public Optional<BudgetEditor> open(Path file) {
        for (BudgetEditor e : editors.keySet()) {
            if (file.toAbsolutePath().equals(e.document().file())) {
                tabs.setSelectedComponent(e);
                return Optional.of(e);
            }
        }
        try {
            BudgetDocument doc = BudgetDocument.open(file, prefs.userName());
            prefs.addRecent(file.toAbsolutePath());
            actions.updateRecent();
            BudgetEditor ed = open(doc);
            if (doc.content().migratedFrom() == 1) {
                status(file.getFileName() + " is a format version 1 file; it will be saved as version 2", false);
            }
            return Optional.of(ed);
        } catch (IOException | BudgetFormatException e) {
            showError("Cannot open the budget", file + ":\n" + e.getMessage());
            return Optional.empty();
        }
    }

    /** Opens the built-in demo budget of the Tarrow Vale Flow Laboratory. */
    public BudgetEditor openDemo() {
        try (InputStream in = WorkbenchFrame.class.getResourceAsStream(DEMO)) {
            if (in == null) {
                throw new IllegalStateException("the demo budget " + DEMO + " is missing from the application");
            }
            String user = prefs.userName();
            Instant now = Instant.now();
            org.quire.engine.document.BudgetDocument shipped = org.quire.engine.document.DocumentJson.read(
                    new String(in.readAllBytes(), StandardCharsets.UTF_8), now);
            org.quire.engine.document.BudgetDocument d = org.quire.engine.document.BudgetDocument
                    .newDraft(shipped.budget(), user, now)
                    .withDetails(shipped.laboratory(), shipped.deviceUnderTest(), user, user, now);
            return open(new BudgetDocument(d, null, "Tarrow Vale demo", user));
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

    /** @return the templates of the shipped folder and the personal and team folders of the preferences */
    public TemplateCatalog templates() {
        return TemplateCatalog.of(null, prefs.personalTemplates(), prefs.teamTemplates());
    }

    /**
     * File &gt; New from template: offers the catalogue, asks for the parameters, opens the new budget.
     *
     * @param preselect the file to select in the list, or null
     */
    public Optional<BudgetEditor> newFromTemplate(Path preselect) {
        TemplateCatalog.Listing listing;
        try {
            listing = templates().list();
        } catch (IOException e) {
            showError("Cannot list the templates", e.getMessage());
            return Optional.empty();
        }
        NewFromTemplateDialog dlg = new NewFromTemplateDialog(this, listing, prefs.userName());
        if (preselect != null) {
            dlg.select(preselect);
        }
        dlg.setVisible(true);
        if (dlg.created() == null) {
            return Optional.empty();
        }
        BudgetEditor ed = open(new BudgetDocument(dlg.created(), null, "new from " + shortName(dlg.createdFrom()),
                prefs.userName()));
        status("New budget from " + dlg.createdFrom().file().getFileName()
                + (dlg.createdFrom().isTemplate() ? "" : " (a plain budget: copied, no template origin recorded)"),
                false);
        return Optional.of(ed);
    }

    private static String shortName(TemplateCatalog.Entry e) {
        String n = String.valueOf(e.file().getFileName());
        return n.endsWith(".json") ? n.substring(0, n.length() - 5) : n;
    }

    /** Looks, off the event thread, for a newer version of the template the budget follows, and offers it. */
    private void checkTemplate(BudgetEditor ed) {
        org.quire.engine.document.BudgetDocument content = ed.document().content();
        if (content.templateOrigin() == null) {
            return;
        }
        TemplateCatalog catalog = templates();
        new SwingWorker<Optional<Template>, Void>() {
            @Override
            protected Optional<Template> doInBackground() throws Exception {
                return catalog.newerTemplate(content);
            }

            @Override
            protected void done() {
                try {
                    Optional<Template> newer = get();
                    if (newer.isPresent() && editors.containsKey(ed)) {
                        Template t = newer.get();
                        ed.showNotice("This budget follows template " + t.id() + " version "
                                + content.templateOrigin().version() + "; version " + t.version()
                                + " is in the library.", "Review the changes\u2026", () -> offerTemplateChanges(ed, t));
                    }
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                } catch (ExecutionException e) {
                    status("Cannot look for a newer template: " + e.getCause().getMessage(), true);
                }
            }
        }.execute();
    }

    /** Shows the changes a newer template brings, field by field, and takes the checked ones over. */
    void offerTemplateChanges(BudgetEditor ed, Template newer) {
        BudgetDocument doc = ed.document();
        List<TemplateChange> changes = TemplateLibrary.compare(doc.content(), newer);
        TemplateUpdateDialog dlg = new TemplateUpdateDialog(this, newer, doc.content().templateOrigin().version(),
                changes);
        dlg.setVisible(true);
        List<TemplateChange> chosen = dlg.chosen();
        if (!chosen.isEmpty()) {
            ed.editDocument("Take over " + chosen.size() + " change(s) of template " + newer.id(), "",
                    d -> TemplateLibrary.adopt(d, newer, chosen, doc.user(), doc.now()));
        }
    }

    private void openEntry(WorkspaceNavigator.Entry e) {
        if (!e.template()) {
            open(e.file());
        } else {
            newFromTemplate(e.file());
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
        return saveTo(ed, target);
    }

    /**
     * Saves a budget to {@code target}; a failure (read-only folder, full disk, a file in the way) is shown in a
     * message and the document stays open, changed, with its file as it was.
     *
     * @return whether it was saved
     */
    boolean saveTo(BudgetEditor ed, Path target) {
        BudgetDocument doc = ed.document();
        try {
            doc.saveTo(target);
            prefs.addRecent(target.toAbsolutePath());
            actions.updateRecent();
            status("Saved " + target, false);
            updateTitle(ed);
            refreshNavigator();
            return true;
        } catch (IOException e) {
            showError("The budget was not saved", e.getMessage() + "\n\nThe budget is still open with its changes; "
                    + "save it somewhere else with Save as.");
            return false;
        }
    }

    /** The answers of a prompt about unsaved changes, in the order shown. */
    static final String[] SAVE_CHOICES = {"Save", "Don't save", "Cancel"};

    /** @return 0 to save, 1 not to save, 2 to cancel (also when the prompt is closed) */
    private int askToSave(BudgetEditor ed, String title) {
        tabs.setSelectedComponent(ed);
        int a = JOptionPane.showOptionDialog(this, "Save the changes to " + ed.document().name() + "?", title,
                JOptionPane.YES_NO_CANCEL_OPTION, JOptionPane.WARNING_MESSAGE, null, SAVE_CHOICES, SAVE_CHOICES[0]);
        return a < 0 ? 2 : a;
    }

    /** Closes an editor, offering to save changes first; @return whether it closed */
    public boolean close(BudgetEditor ed) {
        if (ed.document().isDirty() && !ed.document().isReadOnly()) {
            int a = askToSave(ed, "Close budget");
            if (a == 2 || (a == 0 && !save(ed, false))) {
                return false;
            }
        }
        forceClose(ed);
        return true;
    }

    /** Closes an editor without asking (the caller has dealt with unsaved changes); its recovery copy goes. */
    public void forceClose(BudgetEditor ed) {
        ed.dispose();
        recovery.forget(ed.document());
        inspectors.remove(editors.remove(ed));
        tabs.remove(ed);
        refreshNavigator();
        activeChanged();
    }

    /**
     * Quits: asks about every changed budget first (Save, Don't save, Cancel) and closes none when the engineer
     * cancels or a save fails; then closes them all.
     */
    void quit() {
        List<BudgetEditor> toSave = new ArrayList<>();
        for (BudgetEditor e : editors()) {
            if (e.document().isDirty() && !e.document().isReadOnly()) {
                int a = askToSave(e, "Quit Quire");
                if (a == 2) {
                    return;
                }
                if (a == 0) {
                    toSave.add(e);
                }
            }
        }
        for (BudgetEditor e : toSave) {
            if (!save(e, false)) {
                return;
            }
        }
        for (BudgetEditor e : editors()) {
            forceClose(e);
        }
        prefs.setWindowBounds(getBounds(), getExtendedState() == MAXIMIZED_BOTH);
        panes.save();
        dispose();
    }

    /** Closes the window; copies of changed budgets still open are written to the recovery folder first. */
    @Override
    public void dispose() {
        recovery.close();
        super.dispose();
    }

    /** Shows an error in a message box (and in the status line). */
    void showError(String title, String message) {
        status(title + ": " + message.lines().findFirst().orElse(""), true);
        JOptionPane.showMessageDialog(this, message, title, JOptionPane.ERROR_MESSAGE);
    }

    // ----- recovery -------------------------------------------------------------------------------------------

    private Duration autosavePeriod() {
        int m = prefs.autosaveMinutes();
        return m > 0 ? Duration.ofMinutes(m) : null;
    }

    /** @return the keeper of recovery copies, for tests */
    public RecoveryKeeper recovery() {
        return recovery;
    }

    void applyAutosave() {
        recovery.setPeriod(autosavePeriod());
    }

    /**
     * Offers the recovery copies left by an earlier session (a crash, a power cut): a dialog lists each with its
     * file and time; the checked ones are opened as changed budgets, the others discarded.
     */
    public void offerRecovery() {
        List<String> unreadable = new ArrayList<>();
        List<RecoveryStore.Pending> pending;
        try {
            pending = recovery.pending(unreadable);
        } catch (IOException e) {
            status("Cannot read the recovery folder " + recovery.store().folder() + ": " + e.getMessage(), true);
            return;
        }
        if (!unreadable.isEmpty()) {
            status("Unreadable recovery copies in " + recovery.store().folder() + ": " + String.join("; ", unreadable),
                    true);
        }
        if (pending.isEmpty()) {
            return;
        }
        RecoveryDialog dlg = new RecoveryDialog(this, pending);
        dlg.setVisible(true);
        if (dlg.cancelled()) {
            return;
        }
        for (RecoveryStore.Pending p : pending) {
            if (dlg.restore().contains(p)) {
                restore(p);
            } else {
                try {
                    recovery.store().discard(p.id());
                } catch (IOException e) {
                    status("Cannot discard the recovery copy " + p.file() + ": " + e.getMessage(), true);
                }
            }
        }
    }

    /** Opens a recovery copy as a changed budget belonging to its original file. */
    Optional<BudgetEditor> restore(RecoveryStore.Pending p) {
        try {
            org.quire.engine.document.BudgetDocument content = p.load();
            BudgetDocument doc = new BudgetDocument(content, p.originalPath(), "recovered " + content.title(),
                    prefs.userName());
            doc.markRecovered(p.id());
            BudgetEditor ed = open(doc);
            status("Restored the copy of " + doc.name() + " kept at " + p.saved() + "; save it to keep it", false);
            return Optional.of(ed);
        } catch (IOException | BudgetFormatException e) {
            showError("Cannot restore the recovery copy", p.file() + ":\n" + e.getMessage());
            return Optional.empty();
        }
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

    // ----- report and comparison ------------------------------------------------------------------------------

    /** Budget &gt; Export report: asks for a .pdf or .html file and writes the report off the event thread. */
    void exportReport(BudgetEditor ed) {
        Path target = FileChooser.reportTarget(this, ed.document().name());
        if (target != null) {
            exportReport(ed, target);
        }
    }

    /** Writes the report of the editor's budget to {@code target} off the event thread. */
    public void exportReport(BudgetEditor ed, Path target) {
        org.quire.engine.document.BudgetDocument content = ed.document().content();
        if (ed.latest() == null || !ed.latest().budget().equals(content.budget()) || ed.latest().result() == null) {
            showError("No report", "The budget has no current GUM result (see the problems list); a report needs "
                    + "one.");
            return;
        }
        GumResult gum = ed.latest().result();
        org.quire.engine.montecarlo.MonteCarloOutcome mc = ed.monteCarloOutcome(content.budget());
        status("Writing the report to " + target + "\u2026", false);
        new SwingWorker<Void, Void>() {
            @Override
            protected Void doInBackground() throws Exception {
                ReportExport.write(content, gum, mc, target, LocalDate.now(), library);
                return null;
            }

            @Override
            protected void done() {
                try {
                    get();
                    status("Report written to " + target, false);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                } catch (ExecutionException e) {
                    showError("The report was not written", target + ":\n" + e.getCause().getMessage());
                }
            }
        }.execute();
    }

    /** Budget &gt; Compare with: asks for a second budget file and shows both side by side. */
    void compareWith(BudgetEditor ed) {
        Path other = FileChooser.openTarget(this, "Compare " + ed.document().name() + " with");
        if (other != null) {
            compareWith(ed, other);
        }
    }

    /**
     * Compares the budget in {@code other} (A, usually an earlier version) with the editor's budget (B), off the
     * event thread, and shows the two side by side.
     */
    public void compareWith(BudgetEditor ed, Path other) {
        Budget b = ed.document().budget();
        String nameB = ed.document().name() + " (open)";
        status("Comparing with " + other + "\u2026", false);
        new SwingWorker<Comparison, Void>() {
            @Override
            protected Comparison doInBackground() throws Exception {
                Budget a = DocumentStore.open(other).budget();
                return BudgetComparison.compare(a, b, library);
            }

            @Override
            protected void done() {
                try {
                    Comparison c = get();
                    status("Compared with " + other, false);
                    new CompareWindow(WorkbenchFrame.this, c, String.valueOf(other.getFileName()), nameB)
                            .setVisible(true);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                } catch (ExecutionException e) {
                    showError("Cannot compare", other + ":\n" + e.getCause().getMessage());
                }
            }
        }.execute();
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
        return status.getText();
    }
}
