package org.quire.app.ui.common;

import java.awt.Component;
import java.awt.Container;
import java.awt.Dimension;
import java.awt.FlowLayout;
import java.awt.Insets;

/**
 * A flow layout whose preferred height counts the rows it wraps into at the container's present width, so that
 * a row of buttons or fields in a narrow pane grows downwards instead of being cut off.
 */
public final class WrapLayout extends FlowLayout {
    private static final long serialVersionUID = 1L;

    public WrapLayout(int align, int hgap, int vgap) {
        super(align, hgap, vgap);
    }

    @Override
    public Dimension preferredLayoutSize(Container target) {
        return size(target, true);
    }

    @Override
    public Dimension minimumLayoutSize(Container target) {
        Dimension d = size(target, false);
        d.width -= getHgap() + 1;
        return d;
    }

    private Dimension size(Container target, boolean preferred) {
        synchronized (target.getTreeLock()) {
            int width = target.getSize().width;
            Container c = target;
            while (width == 0 && c.getParent() != null) {
                c = c.getParent();
                width = c.getSize().width;
            }
            if (width == 0) {
                width = Integer.MAX_VALUE;
            }
            Insets in = target.getInsets();
            int max = width - (in.left + in.right + getHgap() * 2);
            Dimension out = new Dimension(0, 0);
            int rowWidth = 0;
            int rowHeight = 0;
            for (int i = 0; i < target.getComponentCount(); i++) {
                Component m = target.getComponent(i);
                if (!m.isVisible()) {
                    continue;
                }
                Dimension d = preferred ? m.getPreferredSize() : m.getMinimumSize();
                if (rowWidth + d.width > max && rowWidth > 0) {
                    out.width = Math.max(out.width, rowWidth);
                    out.height += rowHeight + getVgap();
                    rowWidth = 0;
                    rowHeight = 0;
                }
                rowWidth += d.width + (rowWidth > 0 ? getHgap() : 0);
                rowHeight = Math.max(rowHeight, d.height);
            }
            out.width = Math.max(out.width, rowWidth) + in.left + in.right + getHgap() * 2;
            out.height += rowHeight + in.top + in.bottom + getVgap() * 2;
            return out;
        }
    }
}
