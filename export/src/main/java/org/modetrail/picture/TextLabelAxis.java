package org.modetrail.picture;

import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.geom.AffineTransform;
import java.awt.geom.Rectangle2D;
import org.jfree.chart.axis.AxisState;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.RectangleInsets;

/**
 * A number axis whose label on the left edge is drawn as rotated text rather than as glyph outlines, so the SVG
 * keeps it as a {@code <text>} element (searchable, selectable, scalable like the other labels). JFreeChart's own
 * rotated text goes through a TextLayout, which SVG output turns into shapes.
 */
final class TextLabelAxis extends NumberAxis {
    private static final long serialVersionUID = 1L;

    TextLabelAxis(String label) {
        super(label);
    }

    @Override
    protected AxisState drawLabel(String label, Graphics2D g2, Rectangle2D plotArea, Rectangle2D dataArea,
                                  RectangleEdge edge, AxisState state) {
        if (edge != RectangleEdge.LEFT || label == null || label.isEmpty() || getLabelAngle() != 0) {
            return super.drawLabel(label, g2, plotArea, dataArea, edge, state);
        }
        g2.setFont(getLabelFont());
        g2.setPaint(getLabelPaint());
        FontMetrics fm = g2.getFontMetrics();
        RectangleInsets insets = getLabelInsets();
        double textWidth = fm.getStringBounds(label, g2).getWidth();
        double textHeight = fm.getAscent() + fm.getDescent();
        // Centred on the data area's height, just left of where the tick labels end (the state's cursor).
        double cx = state.getCursor() - insets.getRight() - textHeight / 2;
        double cy = dataArea.getCenterY();
        AffineTransform saved = g2.getTransform();
        g2.rotate(-Math.PI / 2, cx, cy);
        g2.drawString(label, (float) (cx - textWidth / 2), (float) (cy + (fm.getAscent() - fm.getDescent()) / 2.0));
        g2.setTransform(saved);
        state.cursorLeft(insets.getLeft() + textHeight + insets.getRight());
        return state;
    }
}
