package org.modetrail.app.editor;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.Shape;
import java.awt.Stroke;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.geom.RoundRectangle2D;
import java.util.List;

import org.modetrail.model.PixelPoint;
import org.modetrail.overlay.Contrast;

/**
 * How zones and counting lines look on the canvas, drawn so they are not taken for track boxes (which are
 * rectangles in their class colour with square-cornered tags): in one neutral colour, white, over a halo in the
 * colour that contrasts with it by {@link Contrast} (black), so they read on light and dark footage alike and
 * carry no hue a colour-blind user must tell apart.
 *
 * <ul>
 *   <li>A zone: its outline, a light diagonal hatch inside (each hatch line white on a faint dark line), a dot on
 *   every corner, and its name on a rounded label at the middle of its corners.</li>
 *   <li>A counting line: a thick bar with a short cross-bar at each end, a small arrow across its middle from its
 *   left side, marked L, to its right side, marked R (a crossing along the arrow counts as left to right), and its
 *   name on a rounded label beyond its first end.</li>
 *   <li>The selected one: wider strokes, larger corner or end dots (its grips), its label inverted.</li>
 *   <li>A shape being drawn: a dashed line over a solid halo, as the rubber band of a box.</li>
 * </ul>
 * Widths are in view pixels, the same at every zoom.
 */
final class SitePainter {
    private static final int SITE = 0xFFFFFF;
    private static final Color LIGHT = new Color(SITE);
    private static final Color DARK = Contrast.textColourOn(SITE);
    private static final Color HALO = withAlpha(DARK, 200);
    private static final Color HATCH_LIGHT = withAlpha(LIGHT, 150);
    private static final Color HATCH_DARK = withAlpha(DARK, 60);
    private static final int HATCH_SPACING = 11;
    /** Half the length of a line's end bars, and of the arrow across it (view pixels). */
    private static final double CAP = 9, ARROW = 20;

    private final Stroke[] outline = {round(2f), round(3.5f)};
    private final Stroke[] outlineHalo = {round(5f), round(7f)};
    private final Stroke[] bar = {butt(4f), butt(5.5f)};
    private final Stroke[] barHalo = {butt(8f), butt(10f)};
    private final Stroke capStroke = round(3f), capHalo = round(6.5f);
    private final Stroke arrowStroke = round(1.75f), arrowHalo = round(4.5f);
    private final Stroke hatchLight = new BasicStroke(1f), hatchDark = new BasicStroke(3f);
    private final Stroke thin = new BasicStroke(1.25f);
    private final Stroke bandHalo = new BasicStroke(3f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
    private final Stroke bandLight = new BasicStroke(1f);
    private final Stroke band = new BasicStroke(1f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10,
            new float[] {5, 4}, 0);
    private final Line2D.Double segment = new Line2D.Double();
    private final Ellipse2D.Double dot = new Ellipse2D.Double();
    private Font font, small;
    private int viewWidth, viewHeight;

    private static Stroke round(float w) {
        return new BasicStroke(w, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
    }

    private static Stroke butt(float w) {
        return new BasicStroke(w, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND);
    }

    private static Color withAlpha(Color c, int alpha) {
        return new Color(c.getRed(), c.getGreen(), c.getBlue(), alpha);
    }

    /** Before painting: the label font and the view's size (labels are kept inside it). */
    void begin(Graphics2D g, Font labelFont, int width, int height) {
        if (font != labelFont) {
            font = labelFont;
            small = labelFont.deriveFont(Font.BOLD, Math.max(9f, labelFont.getSize2D() - 2));
        }
        viewWidth = width;
        viewHeight = height;
    }

    void zone(Graphics2D g, ViewTransform t, String name, List<PixelPoint> corners, boolean selected) {
        int s = selected ? 1 : 0;
        Path2D.Double path = path(t, corners, true);
        if (!path.intersects(-CAP, -CAP, viewWidth + 2 * CAP, viewHeight + 2 * CAP)) {
            return; // out of view, and so is its label
        }
        Shape clip = g.getClip();
        g.clip(path);
        // Hatch only what is in view: zoomed in, a zone can be many times the view's size.
        java.awt.Rectangle b = path.getBounds().intersection(new java.awt.Rectangle(0, 0, viewWidth, viewHeight));
        // Diagonal hatch, "/": lines of slope -1 spaced along x, anchored to the view so it does not crawl.
        int first = Math.floorDiv(b.x - b.height, HATCH_SPACING) * HATCH_SPACING;
        for (int pass = 0; pass < 2; pass++) {
            g.setStroke(pass == 0 ? hatchDark : hatchLight);
            g.setColor(pass == 0 ? HATCH_DARK : HATCH_LIGHT);
            for (int x = first; x <= b.x + b.width; x += HATCH_SPACING) {
                segment.setLine(x, b.y + b.height, x + b.height, b.y);
                g.draw(segment);
            }
        }
        g.setClip(clip);
        g.setColor(HALO);
        g.setStroke(outlineHalo[s]);
        g.draw(path);
        g.setColor(LIGHT);
        g.setStroke(outline[s]);
        g.draw(path);
        double r = selected ? 5.5 : 3.5;
        double cx = 0, cy = 0;
        for (PixelPoint p : corners) {
            paintDot(g, t.toViewX(p.x()), t.toViewY(p.y()), r);
            cx += t.toViewX(p.x());
            cy += t.toViewY(p.y());
        }
        label(g, font, name, cx / corners.size(), cy / corners.size(), selected);
    }

    void line(Graphics2D g, ViewTransform t, String name, PixelPoint from, PixelPoint to, boolean selected) {
        int s = selected ? 1 : 0;
        double ax = t.toViewX(from.x()), ay = t.toViewY(from.y());
        double bx = t.toViewX(to.x()), by = t.toViewY(to.y());
        double len = Math.hypot(bx - ax, by - ay);
        if (len == 0) {
            return;
        }
        if (!new Line2D.Double(ax, ay, bx, by).intersects(-ARROW, -ARROW, viewWidth + 2 * ARROW,
                viewHeight + 2 * ARROW)) {
            return;
        }
        double dx = (bx - ax) / len, dy = (by - ay) / len;
        // The left of the direction from -> to, with y down: the summary's "left" side.
        double lx = dy, ly = -dx;
        segment.setLine(ax, ay, bx, by);
        g.setColor(HALO);
        g.setStroke(barHalo[s]);
        g.draw(segment);
        for (double[] end : new double[][] {{ax, ay}, {bx, by}}) {
            segment.setLine(end[0] + lx * CAP, end[1] + ly * CAP, end[0] - lx * CAP, end[1] - ly * CAP);
            g.setStroke(capHalo);
            g.draw(segment);
        }
        g.setColor(LIGHT);
        for (double[] end : new double[][] {{ax, ay}, {bx, by}}) {
            segment.setLine(end[0] + lx * CAP, end[1] + ly * CAP, end[0] - lx * CAP, end[1] - ly * CAP);
            g.setStroke(capStroke);
            g.draw(segment);
        }
        segment.setLine(ax, ay, bx, by);
        g.setStroke(bar[s]);
        g.draw(segment);
        paintSides(g, (ax + bx) / 2, (ay + by) / 2, dx, dy, lx, ly);
        if (selected) {
            paintDot(g, ax, ay, 6);
            paintDot(g, bx, by, 6);
        }
        FontMetrics fm = g.getFontMetrics(font);
        double w = fm.stringWidth(name) + 12, h = fm.getAscent() + fm.getDescent() + 2;
        // Beyond the first end, clear of its end bar: as far out as the label's half-extent along the line.
        double out = Math.abs(dx) * w / 2 + Math.abs(dy) * h / 2 + CAP;
        label(g, font, name, ax - dx * out, ay - dy * out, selected);
    }

    /** The arrow across a line's middle from its left side (L) to its right side (R). */
    private void paintSides(Graphics2D g, double mx, double my, double dx, double dy, double lx, double ly) {
        double tailX = mx + lx * ARROW, tailY = my + ly * ARROW;
        double headX = mx - lx * ARROW, headY = my - ly * ARROW;
        Path2D.Double head = new Path2D.Double();
        head.moveTo(headX, headY);
        head.lineTo(headX + lx * 7 + dx * 4.5, headY + ly * 7 + dy * 4.5);
        head.lineTo(headX + lx * 7 - dx * 4.5, headY + ly * 7 - dy * 4.5);
        head.closePath();
        segment.setLine(tailX, tailY, headX + lx * 5, headY + ly * 5);
        g.setColor(HALO);
        g.setStroke(arrowHalo);
        g.draw(segment);
        g.draw(head);
        g.setColor(LIGHT);
        g.setStroke(arrowStroke);
        g.draw(segment);
        g.fill(head);
        g.draw(head);
        double away = ARROW + 10;
        badge(g, "L", mx + lx * away, my + ly * away);
        badge(g, "R", mx - lx * away, my - ly * away);
    }

    /** A letter in a small round badge centred on (x, y). */
    private void badge(Graphics2D g, String letter, double x, double y) {
        FontMetrics fm = g.getFontMetrics(small);
        double r = Math.max(fm.getAscent(), fm.stringWidth(letter)) / 2.0 + 3;
        paintDot(g, x, y, r);
        g.setColor(DARK);
        g.setFont(small);
        g.drawString(letter, (float) (x - fm.stringWidth(letter) / 2.0), (float) (y + fm.getAscent() / 2.0 - 1));
    }

    /**
     * A shape being drawn (or drawn and waiting for its name): its points joined by a dashed band, with a band on to
     * the pointer at (px, py) when given; a zone's band closes back to its first corner, ringed when a click there
     * would close it.
     */
    void draft(Graphics2D g, ViewTransform t, List<PixelPoint> points, boolean zone, double px, double py,
               boolean closing) {
        if (points.isEmpty()) {
            return;
        }
        Path2D.Double path = path(t, points, false);
        boolean toPointer = Double.isFinite(px) && !closing;
        if (toPointer) {
            path.lineTo(px, py);
        }
        if (zone && (points.size() >= 3 || toPointer && points.size() >= 2)) {
            path.closePath();
        }
        g.setColor(HALO);
        g.setStroke(bandHalo);
        g.draw(path);
        g.setColor(LIGHT);
        g.setStroke(bandLight);
        g.draw(path);
        g.setColor(DARK);
        g.setStroke(band);
        g.draw(path);
        for (PixelPoint p : points) {
            paintDot(g, t.toViewX(p.x()), t.toViewY(p.y()), 3.5);
        }
        if (closing) {
            double x = t.toViewX(points.get(0).x()), y = t.toViewY(points.get(0).y());
            dot.setFrame(x - 9, y - 9, 18, 18);
            g.setColor(HALO);
            g.setStroke(outlineHalo[0]);
            g.draw(dot);
            g.setColor(LIGHT);
            g.setStroke(outline[0]);
            g.draw(dot);
        }
    }

    private static Path2D.Double path(ViewTransform t, List<PixelPoint> points, boolean closed) {
        Path2D.Double path = new Path2D.Double();
        for (int i = 0; i < points.size(); i++) {
            double x = t.toViewX(points.get(i).x()), y = t.toViewY(points.get(i).y());
            if (i == 0) {
                path.moveTo(x, y);
            } else {
                path.lineTo(x, y);
            }
        }
        if (closed) {
            path.closePath();
        }
        return path;
    }

    private void paintDot(Graphics2D g, double x, double y, double r) {
        dot.setFrame(x - r, y - r, 2 * r, 2 * r);
        g.setColor(LIGHT);
        g.fill(dot);
        g.setColor(HALO);
        g.setStroke(thin);
        g.draw(dot);
    }

    /** A name on a rounded label centred on (x, y), kept inside the view; inverted for the selected item. */
    private void label(Graphics2D g, Font f, String text, double x, double y, boolean inverted) {
        FontMetrics fm = g.getFontMetrics(f);
        double w = fm.stringWidth(text) + 12, h = fm.getAscent() + fm.getDescent() + 2;
        double left = Math.max(1, Math.min(viewWidth - w - 1, x - w / 2));
        double top = Math.max(1, Math.min(viewHeight - h - 1, y - h / 2));
        RoundRectangle2D.Double r = new RoundRectangle2D.Double(left, top, w, h, h, h);
        g.setColor(inverted ? DARK : LIGHT);
        g.fill(r);
        g.setColor(inverted ? LIGHT : HALO);
        g.setStroke(thin);
        g.draw(r);
        g.setColor(inverted ? LIGHT : DARK);
        g.setFont(f);
        g.drawString(text, (float) (left + 6), (float) (top + 1 + fm.getAscent()));
    }
}
