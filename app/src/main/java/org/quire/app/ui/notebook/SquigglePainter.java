package org.quire.app.ui.notebook;

import java.awt.Color;
import java.awt.Graphics;
import java.awt.Rectangle;
import java.awt.Shape;
import javax.swing.text.BadLocationException;
import javax.swing.text.Highlighter;
import javax.swing.text.JTextComponent;
import javax.swing.text.Position;
import javax.swing.text.View;

/** Paints a wavy underline under a span of text, for problems in the model. */
final class SquigglePainter extends javax.swing.text.LayeredHighlighter.LayerPainter {
    private final Color color;

    SquigglePainter(Color color) {
        this.color = color;
    }

    @Override
    public void paint(Graphics g, int p0, int p1, Shape bounds, JTextComponent c) {
        // painted per view in paintLayer
    }

    @Override
    public Shape paintLayer(Graphics g, int p0, int p1, Shape viewBounds, JTextComponent c, View view) {
        Rectangle r;
        try {
            Shape s = view.modelToView(p0, Position.Bias.Forward, p1, Position.Bias.Backward, viewBounds);
            r = s instanceof Rectangle ? (Rectangle) s : s.getBounds();
        } catch (BadLocationException e) {
            return null;
        }
        g.setColor(color);
        int y = r.y + r.height - 2;
        int w = Math.max(r.width, 6);
        for (int x = r.x; x < r.x + w; x += 4) {
            g.drawLine(x, y, x + 2, y - 2);
            g.drawLine(x + 2, y - 2, x + 4, y);
        }
        return r;
    }

    static Highlighter.HighlightPainter of(Color c) {
        return new SquigglePainter(c);
    }
}
