package org.quire.app.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Component;
import java.awt.Rectangle;
import java.util.ArrayList;
import java.util.List;
import javax.swing.JComponent;
import javax.swing.SwingUtilities;
import org.junit.jupiter.api.Test;
import org.quire.app.ui.notebook.BudgetEditor;

/**
 * The first window on a 1366 x 768 screen: it fits, and every settings control of the results and the Monte Carlo
 * sections is inside the visible width of the notebook (nothing hidden past the right edge).
 */
class SmallScreenGuiTest extends GuiTestSupport {

    @Test
    void everySettingsControlIsVisibleInA1366By768Window() throws Exception {
        onEdt(() -> {
            frame.setExtendedState(java.awt.Frame.NORMAL);
            frame.setBounds(WorkbenchFrame.clamp(new Rectangle(0, 0, 1366, 768), new Rectangle(0, 0, 1366, 768)));
            frame.validate();
            return null;
        });
        BudgetEditor ed = openDemo();
        assertEquals(1366, (int) onEdt(frame::getWidth));
        assertEquals(768, (int) onEdt(frame::getHeight));
        for (String section : List.of("Results (GUM)", "Monte Carlo check")) {
            onEdt(() -> { ed.revealSection(section); return null; });
            Thread.sleep(200);
            List<String> hidden = onEdt(() -> {
                ed.validate();
                List<String> out = new ArrayList<>();
                Rectangle view = ed.getVisibleRect();
                for (String name : List.of("coverageProbability", "significantDigits", "mcTrials", "mcSeed",
                        "mcAdaptive", "mcRun", "mcCancel")) {
                    Component c = WorkbenchEditingTest.find(ed, name);
                    if (c == null) {
                        out.add(name + " missing");
                        continue;
                    }
                    Rectangle r = SwingUtilities.convertRectangle(c.getParent(), c.getBounds(), ed);
                    if (r.x < 0 || r.x + r.width > view.width || c.getWidth() == 0) {
                        out.add(name + " at " + r + " outside the editor's width " + view.width);
                    }
                }
                return out;
            });
            assertEquals(List.of(), hidden, "in the section " + section);
        }
        assertTrue(onEdt(() -> ((JComponent) WorkbenchEditingTest.find(frame.getContentPane(), "inspector"))
                .getWidth()) > 200, "the inspector has room");
    }

    /**
     * The results table of the six-point Tarrow Vale budget (invented data), whose columns at their natural widths
     * are wider than the notebook of a 1366 x 768 window: every column is inside the visible width (no sideways
     * scrolling), the headers wrap onto more lines, and each header and cell has its full text as tooltip.
     */
    @Test
    void theResultsTableShowsEveryColumnInA1366By768Window() throws Exception {
        onEdt(() -> {
            frame.setExtendedState(java.awt.Frame.NORMAL);
            frame.setBounds(WorkbenchFrame.clamp(new Rectangle(0, 0, 1366, 768), new Rectangle(0, 0, 1366, 768)));
            frame.validate();
            return null;
        });
        BudgetEditor six = await(onEdt(() -> frame.open(java.nio.file.Path.of("..", "worked-examples",
                "tarrow-vale-emf-six-point.json")))).orElseThrow();
        waitForCurrentResult(six);
        fitsTheWidth(six, true);
        // the demo budget has 13 inputs with long estimates: even its headers' longest words are too wide
        fitsTheWidth(openDemo(), false);
    }

    private void fitsTheWidth(BudgetEditor ed, boolean wider) throws Exception {
        // the inspector keeps its default width (PaneLayout: 340 px with its divider) whatever widths the window
        // passed through on its way to 1366 px; it once kept some 65 px more now and then
        waitFor("the inspector at its default width", () -> {
            Component inspector = WorkbenchEditingTest.find(frame.getContentPane(), "inspector");
            javax.swing.JSplitPane split = (javax.swing.JSplitPane) SwingUtilities.getAncestorOfClass(
                    javax.swing.JSplitPane.class, inspector);
            return split.getWidth() - split.getDividerLocation() == 340;
        });
        onEdt(() -> {
            ed.revealSection("Results (GUM)");
            return null;
        });
        // the layout settles (the frame's new size, then the split positions, then the columns) in events of
        // its own: wait until the view has its width and the columns have followed it, at most WAIT_MILLIS
        try {
            waitFor("the results table fitted to its view", () -> {
                ed.validate();
                javax.swing.JTable t = named(ed, "budget:E");
                return t.getParent() != null && t.getPreferredSize().width <= t.getParent().getWidth();
            });
        } catch (AssertionError e) {
            // not fitted in time: the assertions below say by how much
        }
        onEdt(() -> {
            ed.validate();
            javax.swing.JTable t = named(ed, "budget:E");
            javax.swing.JViewport view = (javax.swing.JViewport) t.getParent();
            javax.swing.JScrollPane sp = (javax.swing.JScrollPane) view.getParent();
            int natural = 0;
            for (int c = 0; c < t.getColumnCount(); c++) {
                int w = 0;
                // the header as the model writes it, on its lines (<br>), and every cell
                for (String l : t.getColumnName(c).replaceAll("</?html>", "").split("<br>")) {
                    w = Math.max(w, t.getFontMetrics(t.getTableHeader().getFont()).stringWidth(l));
                }
                // every cell on one line: its full text (its tooltip), as the renderer would need it
                for (int r = 0; r < t.getRowCount(); r++) {
                    JComponent k = (JComponent) t.prepareRenderer(t.getCellRenderer(r, c), r, c);
                    String full = k.getToolTipText() == null ? "" : k.getToolTipText();
                    w = Math.max(w, k.getFontMetrics(k.getFont()).stringWidth(full) + k.getInsets().left
                            + k.getInsets().right);
                }
                natural += w;
            }
            if (wider) {
                assertTrue(natural > view.getWidth(), "the case needs a table wider than the view: " + natural + " > "
                        + view.getWidth());
            }
            assertEquals(9, t.getColumnCount());
            assertTrue(t.getPreferredSize().width <= view.getWidth(), "table " + t.getPreferredSize().width
                    + " px in a view of " + view.getWidth() + " px (frame " + frame.getWidth() + ", inspector "
                    + WorkbenchEditingTest.find(frame.getContentPane(), "inspector").getWidth() + ", editor "
                    + ed.getWidth() + ")");
            assertTrue(!sp.getHorizontalScrollBar().isVisible(), "no sideways scrolling");
            for (int c = 0; c < t.getColumnCount(); c++) {
                Rectangle cell = t.getCellRect(0, c, true);
                assertTrue(cell.x + cell.width <= view.getWidth() && cell.width > 0, "column " + c + " is visible");
            }
            int line = t.getFontMetrics(t.getTableHeader().getFont()).getHeight();
            assertTrue(t.getTableHeader().getHeight() >= 2 * line, "headers wrap: " + t.getTableHeader().getHeight());
            Rectangle h = t.getTableHeader().getHeaderRect(4);
            assertEquals(t.getColumnName(4), t.getTableHeader().getToolTipText(new java.awt.event.MouseEvent(
                    t.getTableHeader(), java.awt.event.MouseEvent.MOUSE_MOVED, 0, 0, h.x + 2, h.y + 2, 0, false)));
            Component cell = t.prepareRenderer(t.getCellRenderer(0, 5), 0, 5);
            assertEquals(lines(((javax.swing.JLabel) cell).getText()).stream().collect(
                    java.util.stream.Collectors.joining(" ")), ((JComponent) cell).getToolTipText(),
                    "a cell has its full text as tooltip");
            noCellIsCut(ed, t);
            noCellIsCut(ed, named(ed, "budgetTotal:E"));
            return null;
        });
    }

    /** @return the lines a cell's text is written in (an HTML text split at its line breaks), tags removed */
    private static List<String> lines(String text) {
        List<String> out = new ArrayList<>();
        for (String l : text.replaceAll("(?i)</?html>", "").split("(?i)<br>")) {
            out.add(l.replaceAll("<[^>]*>", "").replace("&lt;", "<").replace("&amp;", "&").strip());
        }
        return out;
    }

    /**
     * Every cell of a results table shows its whole text: each of its lines is as wide as its column at most (no
     * "…"), and the figure in it is the engine's, written by the one rule ({@link org.quire.app.ui.common.Fmt},
     * which calls {@link org.quire.engine.gum.Figures}), followed by its unit (on the same line or the next).
     */
    private static void noCellIsCut(BudgetEditor ed, javax.swing.JTable t) {
        org.quire.engine.gum.OutputResult o = ed.latest().result().output("E");
        boolean total = t.getName().startsWith("budgetTotal");
        for (int r = 0; r < t.getRowCount(); r++) {
            org.quire.engine.gum.Contribution k = null;
            if (!total) {
                String input = lines(((javax.swing.JLabel) t.prepareRenderer(t.getCellRenderer(r, 0), r, 0)).getText())
                        .get(0);
                for (org.quire.engine.gum.Contribution x : o.contributions()) {
                    k = x.input().equals(input) ? x : k;
                }
                assertTrue(k != null, "row " + r + " is the input " + input);
            }
            for (int c = 0; c < t.getColumnCount(); c++) {
                javax.swing.JLabel cell = (javax.swing.JLabel) t.prepareRenderer(t.getCellRenderer(r, c), r, c);
                int width = t.getColumnModel().getColumn(c).getWidth();
                java.awt.Insets in = cell.getInsets();
                java.awt.FontMetrics fm = cell.getFontMetrics(cell.getFont());
                List<String> shown = lines(cell.getText());
                String where = t.getName() + " row " + r + " column " + c + " " + shown + " in " + width + " px";
                assertTrue(!cell.getText().contains("\u2026"), where);
                assertTrue(cell.getPreferredSize().width <= width, where + ": needs " + cell.getPreferredSize().width);
                for (String l : shown) {
                    assertTrue(fm.stringWidth(l) + in.left + in.right <= width, where + ": the line " + l);
                }
                String number = total ? totalFigure(o, c) : figure(k, c);
                if (number != null) {
                    String joined = String.join(" ", shown);
                    assertTrue(joined.equals(number) || joined.startsWith(number + " "), where + " shows the figure "
                            + number);
                    assertTrue(shown.get(0).equals(number) || shown.get(0).startsWith(number + " "), where
                            + ": the figure whole on the first line");
                }
            }
        }
    }

    /** @return the figure a column shows for a contribution, by the one rule; null for a column of words */
    private static String figure(org.quire.engine.gum.Contribution k, int c) {
        switch (c) {
            case 3: return org.quire.app.ui.common.Fmt.num(k.estimate());
            case 4: return org.quire.app.ui.common.Fmt.working(k.standardUncertainty());
            case 5: return org.quire.app.ui.common.Fmt.working(k.sensitivity());
            case 6: return org.quire.app.ui.common.Fmt.working(k.contribution());
            case 7: return org.quire.app.ui.common.Fmt.dof(k.dof());
            case 8: return org.quire.app.ui.common.Fmt.percent(k.share()).replace(" %", "");
            default: return null;
        }
    }

    /** @return the figure the total row shows in a column, by the one rule; null where it shows none */
    private static String totalFigure(org.quire.engine.gum.OutputResult o, int c) {
        switch (c) {
            case 6: return org.quire.app.ui.common.Fmt.working(o.standardUncertainty());
            case 7: return org.quire.app.ui.common.Fmt.dof(o.effectiveDof());
            default: return null;
        }
    }

    @Test
    void boundsLargerThanTheScreenAreClampedIntoIt() {
        Rectangle screen = new Rectangle(0, 0, 1366, 728);
        assertEquals(new Rectangle(0, 0, 1366, 728), WorkbenchFrame.clamp(new Rectangle(100, 50, 1440, 900), screen));
        assertEquals(new Rectangle(566, 328, 800, 400), WorkbenchFrame.clamp(new Rectangle(900, 500, 800, 400), screen));
    }
}
