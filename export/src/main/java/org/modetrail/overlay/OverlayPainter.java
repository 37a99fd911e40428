package org.modetrail.overlay;

import java.awt.AlphaComposite;
import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Composite;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.Stroke;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.modetrail.model.Box;
import org.modetrail.model.BoxSource;
import org.modetrail.model.ContactPoint;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.ObjectClass;
import org.modetrail.model.PixelPoint;
import org.modetrail.model.Project;
import org.modetrail.model.Track;

/**
 * Draws one frame's tracks onto a picture with Java2D: trails first, then boxes, then labels, so labels stay
 * readable where tracks cross. Every coloured stroke lies on a wider halo of the opposite lightness (near-black
 * under light class colours, white under dark ones), so a box is seen on light ground and on dark ground alike.
 */
final class OverlayPainter {
    /** Opacity of the halo under every coloured stroke. */
    static final int HALO_ALPHA = 210;
    private static final int UNKNOWN_CLASS = 0x9A9A9A;

    private final OverlayStyle style;
    private final int width;
    private final int height;
    private final List<Painted> tracks = new ArrayList<>();
    private final Font font;
    private final Stroke keyStroke, keyOutline, trackedStroke, trackedOutline, dashStroke, dashOutline;
    private final Stroke trailStroke, trailOutline;
    private final Stroke tagStroke = new BasicStroke(1f);
    private final Line2D.Double line = new Line2D.Double();
    private final Rectangle2D.Double rect = new Rectangle2D.Double();
    private final Ellipse2D.Double dot = new Ellipse2D.Double();
    /** The label tags drawn so far on the current frame. */
    private final TagPlacement tags = new TagPlacement();

    /** A track with what drawing it needs, worked out once. */
    private record Painted(Track track, Color colour, Color text, Color halo, ContactPoint trailPoint,
                           String label) {
    }

    OverlayPainter(Project project, OverlayStyle style, int width, int height) {
        this.style = style;
        this.width = width;
        this.height = height;
        for (Track t : project.tracks()) {
            int rgb = project.objectClass(t.className()).map(ObjectClass::colour).orElse(UNKNOWN_CLASS);
            ContactPoint p = style.trailPoint() == OverlayStyle.TrailPoint.CENTRE ? ContactPoint.CENTRE
                    : project.contactPoint(t.className());
            Color text = textColourOn(rgb);
            Color halo = new Color(text.getRed(), text.getGreen(), text.getBlue(), HALO_ALPHA);
            tracks.add(new Painted(t, new Color(rgb), text, halo, p, t.id() + " " + t.className()));
        }
        font = new Font(Font.SANS_SERIF, Font.BOLD, style.fontSize());
        float w = style.lineWidth(), k = style.keyframeLineWidth(), o = outlineExtra(w);
        keyStroke = new BasicStroke(k, BasicStroke.CAP_SQUARE, BasicStroke.JOIN_MITER);
        keyOutline = new BasicStroke(k + outlineExtra(k), BasicStroke.CAP_SQUARE, BasicStroke.JOIN_MITER);
        trackedStroke = new BasicStroke(w, BasicStroke.CAP_SQUARE, BasicStroke.JOIN_MITER);
        trackedOutline = new BasicStroke(w + o, BasicStroke.CAP_SQUARE, BasicStroke.JOIN_MITER);
        float[] dash = {Math.max(4, 4 * w), Math.max(3, 2.5f * w)};
        dashStroke = new BasicStroke(w, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10, dash, 0);
        dashOutline = new BasicStroke(w + o, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10, dash, 0);
        trailStroke = new BasicStroke(w, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
        trailOutline = new BasicStroke(w + o, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
    }

    /** The halo is this much wider than the stroke it lies under: a pixel each side, more for thick lines. */
    static float outlineExtra(float lineWidth) {
        return Math.max(2f, lineWidth * 0.5f);
    }

    /** The text and halo colour that reads on {@code rgb} ({@link Contrast}). */
    static Color textColourOn(int rgb) {
        return Contrast.textColourOn(rgb);
    }

    void paint(Graphics2D g, int frame) {
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
        Composite plain = g.getComposite();
        if (style.trailLength() > 0) {
            for (Painted p : tracks) {
                FrameAnnotation now = p.track().frames().get(frame);
                if (now != null && now.isVisible()) {
                    trail(g, p, frame);
                }
            }
            g.setComposite(plain);
        }
        for (Painted p : tracks) {
            FrameAnnotation a = p.track().frames().get(frame);
            if (a != null && a.isVisible()) {
                box(g, p, a);
            }
        }
        if (style.showLabels()) {
            tags.clear();
            g.setFont(font);
            FontMetrics fm = g.getFontMetrics();
            for (Painted p : tracks) {
                FrameAnnotation a = p.track().frames().get(frame);
                if (a != null && a.isVisible()) {
                    label(g, fm, p, a.box());
                }
            }
        }
    }

    private void box(Graphics2D g, Painted p, FrameAnnotation a) {
        Box b = a.box();
        rect.setRect(b.x(), b.y(), b.width(), b.height());
        Stroke under, over;
        if (a.source() == BoxSource.KEYFRAME) {
            under = keyOutline;
            over = keyStroke;
        } else if (a.source() == BoxSource.INTERPOLATED) {
            under = dashOutline;
            over = dashStroke;
        } else {
            under = trackedOutline;
            over = trackedStroke;
        }
        g.setColor(p.halo());
        g.setStroke(under);
        g.draw(rect);
        g.setColor(p.colour());
        g.setStroke(over);
        g.draw(rect);
    }

    /** The last {@code trailLength} frames' points, joined where the track was visible on consecutive frames. */
    private void trail(Graphics2D g, Painted p, int frame) {
        int from = Math.max(0, frame - style.trailLength());
        Map<Integer, FrameAnnotation> recent = p.track().frames().subMap(from, true, frame, true);
        double span = Math.max(1, frame - from);
        for (int pass = 0; pass < 2; pass++) {
            g.setStroke(pass == 0 ? trailOutline : trailStroke);
            g.setColor(pass == 0 ? p.halo() : p.colour());
            PixelPoint last = null;
            int lastFrame = Integer.MIN_VALUE;
            for (FrameAnnotation a : recent.values()) {
                if (!a.isVisible()) {
                    last = null;
                    continue;
                }
                PixelPoint q = p.trailPoint().on(a.box());
                if (last != null && a.frame() == lastFrame + 1) {
                    // Older parts fade: from a third opaque at the far end to fully opaque at the box.
                    float alpha = (float) (0.3 + 0.7 * (1 - (frame - a.frame()) / span));
                    g.setComposite(AlphaComposite.getInstance(AlphaComposite.SRC_OVER, alpha));
                    line.setLine(last.x(), last.y(), q.x(), q.y());
                    g.draw(line);
                }
                last = q;
                lastFrame = a.frame();
            }
        }
        g.setComposite(AlphaComposite.SrcOver);
        FrameAnnotation now = p.track().frames().get(frame);
        PixelPoint q = p.trailPoint().on(now.box());
        double r = style.lineWidth() + 1.5;
        dot.setFrame(q.x() - r - 1, q.y() - r - 1, 2 * r + 2, 2 * r + 2);
        g.setColor(p.halo());
        g.fill(dot);
        dot.setFrame(q.x() - r, q.y() - r, 2 * r, 2 * r);
        g.setColor(p.colour());
        g.fill(dot);
    }

    /**
     * The id and class on a tag of the class colour, placed by {@link TagPlacement}.
     */
    private void label(Graphics2D g, FontMetrics fm, Painted p, Box b) {
        int pad = Math.max(2, style.fontSize() / 5);
        int tw = fm.stringWidth(p.label()) + 2 * pad;
        int th = fm.getAscent() + fm.getDescent() + pad;
        double half = style.keyframeLineWidth() / 2 + 1;
        Rectangle2D.Double tag = tags.place(b.x(), b.y(), b.bottom(), half, tw, th, width, height);
        g.setColor(p.colour());
        g.fill(tag);
        g.setStroke(tagStroke);
        g.setColor(p.halo());
        rect.setRect(tag.x - 0.5, tag.y - 0.5, tw + 1, th + 1);
        g.draw(rect);
        g.setColor(p.text());
        g.drawString(p.label(), (float) (tag.x + pad), (float) (tag.y + pad / 2.0 + fm.getAscent()));
    }

}
