package org.quire.app.ui.calibration;

import java.awt.Component;
import java.awt.Font;
import java.util.function.IntConsumer;
import java.util.function.IntFunction;
import java.util.function.IntPredicate;
import javax.swing.JTable;
import javax.swing.table.DefaultTableCellRenderer;
import org.quire.app.ui.table.SpreadsheetTable;

/**
 * The table of points of the calibration view and the flow-range view: read-only, copied like a spreadsheet
 * (headers and the figures as shown), columns sized to their content, rows of points in bold with a tooltip
 * that offers the drill-down, and a double-click that opens a point's full budget.
 */
final class PointsTable {
    private PointsTable() {
    }

    /**
     * @param table the table, whose model returns the cells as shown (text)
     * @param rightAligned the columns of figures (view indices)
     * @param bold the rows shown in bold (the points)
     * @param tooltip the tooltip of a row, or null for none
     * @param drillDown told of the row double-clicked
     */
    static void install(JTable table, IntPredicate rightAligned, IntPredicate bold, IntFunction<String> tooltip,
            IntConsumer drillDown) {
        table.setAutoResizeMode(JTable.AUTO_RESIZE_OFF);
        table.setCellSelectionEnabled(true);
        SpreadsheetTable.install(table, c -> false, Runnable::run, m -> { });
        table.setDefaultRenderer(Object.class, new DefaultTableCellRenderer() {
            @Override
            public Component getTableCellRendererComponent(JTable t, Object v, boolean sel, boolean focus, int r,
                    int c) {
                super.getTableCellRendererComponent(t, v, sel, focus, r, c);
                setHorizontalAlignment(rightAligned.test(c) ? RIGHT : LEFT);
                setFont(getFont().deriveFont(bold.test(r) ? Font.BOLD : Font.PLAIN));
                setToolTipText(tooltip.apply(r));
                return this;
            }
        });
        table.addMouseListener(new java.awt.event.MouseAdapter() {
            @Override
            public void mouseClicked(java.awt.event.MouseEvent e) {
                int r = table.rowAtPoint(e.getPoint());
                if (e.getClickCount() == 2 && r >= 0) {
                    drillDown.accept(r);
                }
            }
        });
    }

    /** Sizes every column to its header and its widest cell, so that nothing is clipped. */
    static void fitColumns(JTable table) {
        org.quire.app.ui.table.SpreadsheetTable.fitColumnWidths(table, Integer.MAX_VALUE);
    }
}
