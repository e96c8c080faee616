package org.quire.app.ui.notebook;

import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import javax.swing.JTable;
import javax.swing.table.DefaultTableCellRenderer;
import org.quire.app.ui.common.Colors;
import org.quire.app.ui.common.Fmt;

/** Draws an input's share of the combined variance as a bar with the percentage on it. */
final class ShareBarRenderer extends DefaultTableCellRenderer {
    private double share;

    @Override
    public java.awt.Component getTableCellRendererComponent(JTable t, Object value, boolean sel, boolean focus,
            int r, int c) {
        share = value instanceof Double ? (Double) value : 0;
        super.getTableCellRendererComponent(t, Fmt.percent(share), sel, focus, r, c);
        setHorizontalAlignment(RIGHT);
        return this;
    }

    @Override
    protected void paintComponent(Graphics g) {
        Graphics2D g2 = (Graphics2D) g.create();
        g2.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g2.setColor(getBackground());
        g2.fillRect(0, 0, getWidth(), getHeight());
        int w = (int) Math.round((getWidth() - 4) * Math.max(0, Math.min(1, share)));
        g2.setColor(Colors.get("Quire.bar.fill"));
        g2.fillRoundRect(2, 3, Math.max(w, share > 0 ? 2 : 0), getHeight() - 6, 4, 4);
        g2.dispose();
        setOpaque(false);
        super.paintComponent(g);
        setOpaque(true);
    }
}
