package org.quire.app.ui.chart;

import java.awt.Dimension;
import java.awt.Rectangle;
import javax.swing.BorderFactory;
import javax.swing.Box;
import javax.swing.BoxLayout;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.Scrollable;

/**
 * Charts one above the other, each as wide as the column and as tall as it needs at the UI font size, in a
 * column that scrolls vertically when they do not all fit (the text of a chart is never shrunk to make it fit).
 */
public final class ChartStack extends JPanel implements Scrollable {
    private ChartStack(ChartView... charts) {
        setLayout(new BoxLayout(this, BoxLayout.Y_AXIS));
        setBorder(BorderFactory.createEmptyBorder(4, 4, 4, 4));
        for (int i = 0; i < charts.length; i++) {
            if (i > 0) {
                add(Box.createVerticalStrut(10));
            }
            charts[i].setAlignmentX(LEFT_ALIGNMENT);
            add(charts[i]);
        }
    }

    /** @return the charts stacked in a scroll pane that scrolls vertically only */
    public static JScrollPane of(ChartView... charts) {
        JScrollPane sp = new JScrollPane(new ChartStack(charts), JScrollPane.VERTICAL_SCROLLBAR_AS_NEEDED,
                JScrollPane.HORIZONTAL_SCROLLBAR_NEVER);
        sp.setBorder(BorderFactory.createEmptyBorder());
        sp.getVerticalScrollBar().setUnitIncrement(24);
        return sp;
    }

    @Override public Dimension getPreferredScrollableViewportSize() { return getPreferredSize(); }
    @Override public int getScrollableUnitIncrement(Rectangle r, int o, int d) { return 24; }
    @Override public int getScrollableBlockIncrement(Rectangle r, int o, int d) { return Math.max(24, r.height - 24); }
    @Override public boolean getScrollableTracksViewportWidth() { return true; }
    @Override public boolean getScrollableTracksViewportHeight() { return false; }
}
