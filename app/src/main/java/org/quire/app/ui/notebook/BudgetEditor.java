package org.quire.app.ui.notebook;

import org.quire.app.ui.common.EditorContext;
import org.quire.app.ui.common.Section;
import java.awt.BorderLayout;
import java.awt.EventQueue;
import java.awt.FlowLayout;
import java.awt.Rectangle;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.function.Consumer;
import java.util.function.UnaryOperator;
import javax.swing.BorderFactory;
import javax.swing.Box;
import javax.swing.BoxLayout;
import javax.swing.JButton;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.Scrollable;
import javax.swing.SwingConstants;
import org.quire.app.ui.common.Colors;
import org.quire.app.ui.document.BudgetDocument;
import org.quire.app.ui.document.Problem;
import org.quire.app.ui.document.Recalculation;
import org.quire.app.ui.document.Recalculator;
import org.quire.app.ui.montecarlo.MonteCarloRunner;
import org.quire.app.ui.montecarlo.MonteCarloSection;
import org.quire.app.ui.review.ReviewPanel;
import org.quire.engine.budget.Budget;
import org.quire.engine.model.FunctionLibrary;

/**
 * The editor of one open budget: a notebook of collapsible sections with an outline to jump between them, a
 * banner when the budget is a review copy, and the background recalculation that keeps the results current.
 */
public final class BudgetEditor extends JPanel implements EditorContext {
    private final BudgetDocument doc;
    private final FunctionLibrary library;
    private final Recalculator recalculator;
    private final List<NotebookSection> sections = new ArrayList<>();
    private final PurposeSection purpose;
    private final ModelSection model;
    private final InputsSection inputs;
    private final CorrelationsSection correlations;
    private final ResultsSection results;
    private final MonteCarloSection monteCarlo;
    private final JLabel banner = new JLabel();
    private final ReviewPanel review;
    /** The notices above the notebook, one row each, newest last; hidden when there is none. */
    private final JPanel notices = new JPanel();
    /** The texts and action buttons of the notices shown, in order. */
    private final List<javax.swing.JTextArea> noticeTexts = new java.util.ArrayList<>();
    private final List<JButton> noticeActions = new java.util.ArrayList<>();
    private NotebookSection reviewSection;
    private JButton reviewJump;
    private final Page page = new Page();
    private final JScrollPane scroll = new JScrollPane(page);
    private final List<Consumer<Recalculation>> recalcListeners = new CopyOnWriteArrayList<>();
    private final List<Consumer<String>> selectionListeners = new CopyOnWriteArrayList<>();
    private final List<StatusListener> statusListeners = new CopyOnWriteArrayList<>();
    private final List<Consumer<String>> problemListeners = new CopyOnWriteArrayList<>();
    private Problem entryProblem;
    private Recalculation latest;
    private String selectedInput;
    private org.quire.engine.document.BudgetDocument shownContent;

    /** Hears of status messages (refused values and the like). */
    public interface StatusListener {
        void status(String message, boolean error);
    }

    public BudgetEditor(BudgetDocument doc, FunctionLibrary library, MonteCarloRunner runner) {
        super(new BorderLayout());
        this.doc = doc;
        this.library = library;
        setName("editor:" + doc.name());
        purpose = new PurposeSection(this);
        model = new ModelSection(this);
        inputs = new InputsSection(this);
        correlations = new CorrelationsSection(this);
        results = new ResultsSection(this);
        monteCarlo = new MonteCarloSection(runner, this);
        review = new ReviewPanel(this, java.time.Clock.systemUTC());
        page.setLayout(new BoxLayout(page, BoxLayout.Y_AXIS));
        JPanel outline = new JPanel(new org.quire.app.ui.common.WrapLayout(FlowLayout.LEFT, 2, 2));
        outline.add(new JLabel("Go to:"));
        for (Section s : List.of(purpose, model, inputs, correlations, results, monteCarlo, review)) {
            NotebookSection ns = new NotebookSection(s);
            sections.add(ns);
            page.add(ns);
            JButton jump = new JButton(s.title());
            if (s == review) {
                reviewSection = ns;
                reviewJump = jump;
            }
            jump.putClientProperty("JButton.buttonType", "borderless");
            jump.setForeground(Colors.get("Quire.outline.foreground"));
            jump.addActionListener(e -> reveal(ns));
            outline.add(jump);
        }
        page.add(Box.createVerticalGlue());
        scroll.getVerticalScrollBar().setUnitIncrement(24);
        scroll.setBorder(BorderFactory.createEmptyBorder());
        banner.setName("reviewBanner");
        banner.setOpaque(true);
        banner.setHorizontalAlignment(SwingConstants.CENTER);
        banner.setBackground(Colors.get("Quire.banner.background"));
        banner.setForeground(Colors.get("Quire.banner.foreground"));
        banner.setBorder(BorderFactory.createEmptyBorder(6, 8, 6, 8));
        banner.setText("Review copy: this budget is open read-only. Nothing in it can be changed.");
        notices.setName("templateNotice");
        notices.setLayout(new BoxLayout(notices, BoxLayout.Y_AXIS));
        notices.setOpaque(true);
        notices.setBackground(Colors.get("Quire.notice.background"));
        notices.setVisible(false);
        JPanel banners = new JPanel(new BorderLayout());
        banners.add(banner, BorderLayout.NORTH);
        banners.add(notices, BorderLayout.SOUTH);
        JPanel north = new JPanel(new BorderLayout());
        north.add(banners, BorderLayout.NORTH);
        north.add(outline, BorderLayout.SOUTH);
        outline.setBorder(BorderFactory.createMatteBorder(0, 0, 1, 0, Colors.get("Quire.section.rule")));
        // the wrapped rows of the outline depend on its width: a height worked out at an early, narrow width
        // (before the window is shown) is worked out again once it has its width
        outline.addComponentListener(new java.awt.event.ComponentAdapter() {
            @Override
            public void componentResized(java.awt.event.ComponentEvent e) {
                int wanted = outline.getLayout().preferredLayoutSize(outline).height;
                if (wanted != outline.getHeight()) {
                    outline.invalidate();
                    north.revalidate();
                }
            }
        });
        add(north, BorderLayout.NORTH);
        add(scroll, BorderLayout.CENTER);
        recalculator = new Recalculator(library, EventQueue::invokeLater, this::recalculated);
        doc.addListener(new BudgetDocument.Listener() {
            @Override
            public void budgetChanged(BudgetDocument d, Budget before, Budget after, String cause) {
                showBudget(after);
                recalculator.request(after);
            }

            @Override
            public void documentStateChanged(BudgetDocument d) {
                applyReadOnly();
                showDocument();
            }
        });
        showBudget(doc.budget());
        showDocument();
        applyReadOnly();
        recalculator.requestNow(doc.budget());
    }

    private void showBudget(Budget b) {
        for (NotebookSection s : sections) {
            s.section().budgetChanged(b);
        }
        if (selectedInput != null && b.input(selectedInput) == null) {
            selectInput(null);
        } else if (selectedInput != null) {
            selectionListeners.forEach(l -> l.accept(selectedInput));
        }
    }

    private void showDocument() {
        org.quire.engine.document.BudgetDocument c = doc.content();
        if (c == shownContent) {
            return;
        }
        shownContent = c;
        for (NotebookSection s : sections) {
            s.section().documentChanged(c);
        }
    }

    private void applyReadOnly() {
        boolean ro = doc.isReadOnly();
        banner.setVisible(ro);
        reviewSection.setVisible(ro);
        reviewJump.setVisible(ro);
        for (NotebookSection s : sections) {
            s.section().readOnlyChanged(ro);
        }
    }

    private void recalculated(Recalculation r) {
        if (!r.budget().equals(doc.budget())) {
            return;
        }
        latest = r;
        for (NotebookSection s : sections) {
            s.section().recalculated(r);
            long errors = r.problems().stream().filter(p -> p.severity() == Problem.Severity.ERROR
                    && belongs(p, s.section())).count();
            s.setNote(errors == 0 ? "" : errors + (errors == 1 ? " error" : " errors"), errors > 0);
        }
        recalcListeners.forEach(l -> l.accept(r));
    }

    private boolean belongs(Problem p, Section s) {
        switch (p.area()) {
            case MODEL: return s == model;
            case INPUTS: return s == inputs;
            case CORRELATIONS: return s == correlations;
            case ENTRY: return false;
            default: return s == results;
        }
    }

    /** Scrolls to a section and unfolds it. */
    private void reveal(NotebookSection ns) {
        ns.setOpen(true);
        page.revalidate();
        EventQueue.invokeLater(() -> page.scrollRectToVisible(new Rectangle(0, ns.getY(), 10, scroll.getViewport().getHeight())));
    }

    /** Scrolls to the place of a problem (the model line, the inputs, the correlations or the results). */
    public void reveal(Problem p) {
        Section target;
        switch (p.area()) {
            case MODEL: target = model; break;
            case INPUTS: case ENTRY: target = inputs; break;
            case CORRELATIONS: target = correlations; break;
            default: target = results;
        }
        for (NotebookSection ns : sections) {
            if (ns.section() == target) {
                reveal(ns);
            }
        }
        if (p.area() == Problem.Area.MODEL) {
            model.reveal(p);
        }
    }

    /** Folds or unfolds every section. */
    public void setAllOpen(boolean open) {
        sections.forEach(s -> s.setOpen(open));
        page.revalidate();
    }

    @Override public BudgetDocument document() { return doc; }
    @Override public FunctionLibrary library() { return library; }

    @Override
    public boolean edit(String name, String mergeKey, UnaryOperator<Budget> change) {
        try {
            boolean changed = doc.apply(name, mergeKey, change);
            clearEntryProblem(); // taken (or the same value again): the entry is fixed
            return changed;
        } catch (IllegalArgumentException | IllegalStateException e) {
            status(e.getMessage(), true);
            return false;
        }
    }

    @Override
    public boolean editDocument(String name, String mergeKey,
            UnaryOperator<org.quire.engine.document.BudgetDocument> change) {
        try {
            boolean changed = doc.applyToDocument(name, mergeKey, change);
            clearEntryProblem(); // taken (or the same value again): the entry is fixed
            return changed;
        } catch (IllegalArgumentException | IllegalStateException e) {
            status(e.getMessage(), true);
            return false;
        }
    }

    /**
     * Shows a message in the status line; an error (a value refused) is also kept in the problems list until the
     * entry is fixed: the next edit that the document takes, or the next message that is not an error, clears it.
     */
    @Override
    public void status(String message, boolean error) {
        statusListeners.forEach(l -> l.status(message, error));
        if (error) {
            java.awt.Toolkit.getDefaultToolkit().beep();
            entryProblem = Problem.of(Problem.Severity.ERROR, Problem.Area.ENTRY, message);
            problemListeners.forEach(l -> l.accept(null));
        } else {
            clearEntryProblem();
        }
    }

    private void clearEntryProblem() {
        if (entryProblem != null) {
            String cleared = entryProblem.message();
            entryProblem = null;
            problemListeners.forEach(l -> l.accept(cleared));
        }
    }

    /**
     * @return the problems to list: the engine's for the present budget (none before its first answer) and the
     *     last refused entry, if it is not fixed yet
     */
    public List<Problem> problems() {
        List<Problem> out = new ArrayList<>();
        if (entryProblem != null) {
            out.add(entryProblem);
        }
        if (latest != null) {
            out.addAll(latest.problems());
        }
        return out;
    }

    /**
     * Hears of changes of the refused entry: told the message of an entry error that was cleared (its field was
     * fixed), or null when a new one was kept.
     */
    public void addEntryProblemListener(Consumer<String> l) { problemListeners.add(l); }

    @Override
    public void selectInput(String name) {
        selectedInput = name;
        if (name != null) {
            inputs.select(name);
        }
        selectionListeners.forEach(l -> l.accept(name));
    }

    public String selectedInput() { return selectedInput; }

    public void addRecalculationListener(Consumer<Recalculation> l) { recalcListeners.add(l); }
    public void addSelectionListener(Consumer<String> l) { selectionListeners.add(l); }
    public void addStatusListener(StatusListener l) { statusListeners.add(l); }

    /** @return the engine's latest answer for the present budget, or null before the first */
    public Recalculation latest() { return latest; }

    /**
     * Shows a notice above the notebook with one action (a newer template version, for instance).
     *
     * @param text what the notice says
     * @param actionName the button's label
     * @param action what the button does; the notice is hidden first
     */
    public void showNotice(String text, String actionName, Runnable action) {
        showNotice(text, actionName, action, true);
    }

    /**
     * Shows a notice above the notebook with one action.
     *
     * @param hideOnAction whether the action hides the notice (an offer), or the notice stays (a finding that
     *     holds whatever the action does; Dismiss hides it)
     */
    public void showNotice(String text, String actionName, Runnable action, boolean hideOnAction) {
        JPanel row = new JPanel(new BorderLayout(8, 0));
        row.setOpaque(false);
        row.setBorder(BorderFactory.createEmptyBorder(4, 8, 4, 8));
        // the text wrapped onto as many lines as the notebook's width needs (never cut)
        javax.swing.JTextArea words = new javax.swing.JTextArea(text);
        words.setForeground(Colors.get("Quire.notice.foreground"));
        words.setLineWrap(true);
        words.setWrapStyleWord(true);
        words.setEditable(false);
        words.setOpaque(false);
        words.setBorder(BorderFactory.createEmptyBorder(3, 0, 3, 0));
        words.setFont(javax.swing.UIManager.getFont("Label.font"));
        row.add(words, BorderLayout.CENTER);
        JButton act = new JButton(actionName);
        act.setName("noticeAction");
        JButton dismiss = new JButton("Dismiss");
        Runnable remove = () -> {
            notices.remove(row);
            noticeTexts.remove(words);
            noticeActions.remove(act);
            notices.setVisible(notices.getComponentCount() > 0);
            revalidate();
            repaint();
        };
        act.addActionListener(e -> {
            if (hideOnAction) {
                remove.run();
            }
            action.run();
        });
        dismiss.addActionListener(e -> remove.run());
        JPanel buttons = new JPanel(new FlowLayout(FlowLayout.RIGHT, 4, 0));
        buttons.setOpaque(false);
        buttons.add(act);
        buttons.add(dismiss);
        row.add(buttons, BorderLayout.EAST);
        notices.add(row);
        noticeTexts.add(words);
        noticeActions.add(act);
        notices.setVisible(true);
        revalidate();
    }

    /** @return whether a notice is shown */
    public boolean noticeShown() { return notices.isVisible() && !noticeTexts.isEmpty(); }

    /** @return the texts of the notices above the notebook, one a line, oldest first */
    public String noticeText() {
        return String.join("\n", noticeTexts.stream().map(javax.swing.JTextArea::getText).toList());
    }

    /** @return the action button of the newest notice, for tests, or null */
    public JButton noticeAction() { return noticeActions.isEmpty() ? null : noticeActions.get(noticeActions.size() - 1); }

    /** @return the assessor's review section (shown on review copies) */
    public ReviewPanel reviewPanel() { return review; }

    /** @param opener shows the budget evaluated at its flow points (the Results section offers it) */
    public void setFlowRangeOpener(Runnable opener) { results.setFlowRangeOpener(opener); }

    /** Starts a Monte Carlo run, when one can start. */
    public void runMonteCarlo() { monteCarlo.start(); }

    /** @return the Monte Carlo outcome of exactly {@code b} from the last run, or null when there is none */
    public org.quire.engine.montecarlo.MonteCarloOutcome monteCarloOutcome(org.quire.engine.budget.Budget b) {
        return monteCarlo.outcomeFor(b);
    }

    /** Stops the background work of this editor. */
    public void dispose() {
        monteCarlo.stop();
        recalculator.close();
    }

    // views for tests and screenshots
    public javax.swing.JTable inputsTable() { return inputs.table(); }
    public javax.swing.JTextPane modelEditor() { return model.editor(); }
    public javax.swing.JComponent resultsPanel() { return results.body(); }
    public javax.swing.JComponent correlationsPanel() { return correlations.body(); }
    /** @return the summary text of an output's result, or null when none is shown */
    public String resultSummary(String output) {
        OutputResultPanel p = results.panel(output);
        return p == null ? null : p.summaryText();
    }

    /** Scrolls to the section titled {@code title}. */
    public void revealSection(String title) {
        for (NotebookSection ns : sections) {
            if (ns.section().title().equals(title)) {
                reveal(ns);
            }
        }
    }

    /** The scrolling page: tracks the viewport width so the sections reflow. */
    private static final class Page extends JPanel implements Scrollable {
        @Override public java.awt.Dimension getPreferredScrollableViewportSize() { return getPreferredSize(); }
        @Override public int getScrollableUnitIncrement(Rectangle r, int o, int d) { return 24; }
        @Override public int getScrollableBlockIncrement(Rectangle r, int o, int d) { return r.height - 24; }
        @Override public boolean getScrollableTracksViewportWidth() { return true; }
        @Override public boolean getScrollableTracksViewportHeight() { return false; }
    }
}
