package org.modetrail.app.editor;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.Paint;
import java.awt.Polygon;
import java.awt.Rectangle;
import java.awt.RenderingHints;
import java.awt.Stroke;
import java.awt.TexturePaint;
import java.awt.image.BufferedImage;

import javax.swing.UIManager;

import org.modetrail.app.editor.LaneModel.State;

/**
 * How the timeline draws each {@link State}: a colour from the colour-blind-safe palette of Okabe and Ito (2008,
 * "Color Universal Design") and, so that colour is never the only cue, a shape of its own:
 * <ul>
 * <li>tracked: a solid bar (blue);</li>
 * <li>keyframe: a diamond (yellow with a black edge) on the bar's top edge, over whatever the bar shows;</li>
 * <li>weak: a checked bar (vermillion on light themes, orange on dark ones);</li>
 * <li>interpolated: a bar of diagonal hatching (bluish green) between two thin rules;</li>
 * <li>hidden: the bar's outline only (reddish purple);</li>
 * <li>absent: a thin line along the middle of the lane (the text colour, faded);</li>
 * <li>empty: nothing.</li>
 * </ul>
 * The blue and the weak colour have a darker and a lighter member of the palette; the one that contrasts with the
 * theme's background is used. One painter per theme: make a new one when the look and feel changes.
 */
final class LanePainter {
    static final Color BLUE = new Color(0x0072B2);
    static final Color SKY_BLUE = new Color(0x56B4E9);
    static final Color BLUISH_GREEN = new Color(0x009E73);
    static final Color VERMILLION = new Color(0xD55E00);
    static final Color ORANGE = new Color(0xE69F00);
    static final Color REDDISH_PURPLE = new Color(0xCC79A7);
    static final Color YELLOW = new Color(0xF0E442);
    static final Color BLACK = new Color(0x000000);

    /** Runs of these states narrower than this are drawn this wide, so one frame in an hour still shows. */
    static final int MIN_MARK_WIDTH = 5;

    final boolean dark;
    final Color background;
    final Color text;
    final Color tracked;
    final Color weak;
    final Color absent;
    private final Paint weakPaint;
    private final Paint hatchPaint;
    private final BasicStroke outline = new BasicStroke(2f);

    LanePainter(Color background, Color text) {
        this.background = background;
        this.text = text;
        this.dark = luminance(background) < 0.4;
        this.tracked = dark ? SKY_BLUE : BLUE;
        this.weak = dark ? ORANGE : VERMILLION;
        this.absent = new Color(text.getRed(), text.getGreen(), text.getBlue(), 150);
        this.weakPaint = checks(weak);
        this.hatchPaint = hatching(BLUISH_GREEN);
    }

    /** A painter for the current look and feel's panel colours. */
    static LanePainter forTheme() {
        Color bg = UIManager.getColor("Panel.background");
        Color fg = UIManager.getColor("Label.foreground");
        return new LanePainter(bg == null ? Color.WHITE : bg, fg == null ? Color.BLACK : fg);
    }

    /** Relative luminance 0..1 (sRGB, WCAG's definition). */
    static double luminance(Color c) {
        return 0.2126 * linear(c.getRed()) + 0.7152 * linear(c.getGreen()) + 0.0722 * linear(c.getBlue());
    }

    private static double linear(int v) {
        double s = v / 255.0;
        return s <= 0.04045 ? s / 12.92 : Math.pow((s + 0.055) / 1.055, 2.4);
    }

    /** The colour that stands for {@code s} (for legends and tests); null for empty. */
    Color colourOf(State s) {
        return switch (s) {
            case KEYFRAME -> YELLOW;
            case TRACKED -> tracked;
            case WEAK -> weak;
            case INTERPOLATED -> BLUISH_GREEN;
            case HIDDEN -> REDDISH_PURPLE;
            case ABSENT -> absent;
            case EMPTY -> null;
        };
    }

    /**
     * Draws a run of columns {@code x .. x + width - 1} in state {@code s}, in a lane band whose bar spans
     * {@code top .. top + height - 1}. Keyframe diamonds ({@link #diamond}) are drawn afterwards, so that
     * neighbouring runs do not cover them.
     */
    void paintRun(Graphics2D g, State s, int x, int width, int top, int height) {
        if (s == State.EMPTY) {
            return;
        }
        if ((s == State.WEAK || s == State.HIDDEN) && width < MIN_MARK_WIDTH) {
            x -= (MIN_MARK_WIDTH - width) / 2;
            width = MIN_MARK_WIDTH;
        }
        switch (s) {
            case TRACKED, KEYFRAME -> {
                g.setColor(tracked);
                g.fillRect(x, top, width, height);
            }
            case WEAK -> {
                g.setPaint(weakPaint);
                g.fillRect(x, top, width, height);
                g.setColor(weak);
                g.drawLine(x, top, x + width - 1, top);
                g.drawLine(x, top + height - 1, x + width - 1, top + height - 1);
            }
            case INTERPOLATED -> {
                g.setPaint(hatchPaint);
                g.fillRect(x, top + 1, width, height - 2);
                g.setColor(BLUISH_GREEN);
                g.drawLine(x, top, x + width - 1, top);
                g.drawLine(x, top + height - 1, x + width - 1, top + height - 1);
            }
            case HIDDEN -> {
                g.setColor(REDDISH_PURPLE);
                Stroke before = g.getStroke();
                g.setStroke(outline);
                g.drawRect(x + 1, top + 1, Math.max(0, width - 3), height - 3);
                g.setStroke(before);
            }
            case ABSENT -> {
                g.setColor(absent);
                g.fillRect(x, top + height / 2 - 1, width, 2);
            }
            default -> throw new IllegalStateException("unknown state " + s);
        }
    }

    /** A keyframe's mark: a yellow diamond with a black edge, {@code size} px across, centred on (cx, cy). */
    void diamond(Graphics2D g, double cx, int cy, int size) {
        Object aa = g.getRenderingHint(RenderingHints.KEY_ANTIALIASING);
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        int r = size / 2;
        int x = (int) Math.round(cx);
        Polygon p = new Polygon(new int[] {x, x + r, x, x - r}, new int[] {cy - r, cy, cy + r, cy}, 4);
        g.setColor(YELLOW);
        g.fillPolygon(p);
        g.setColor(BLACK);
        g.drawPolygon(p);
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, aa);
    }

    /** A sample of state {@code s} in {@code r}, as the lanes draw it (for the legend). */
    void paintSample(Graphics2D g, State s, Rectangle r) {
        paintRun(g, s, r.x, r.width, r.y, r.height);
        if (s == State.KEYFRAME) {
            diamond(g, r.x + r.width / 2.0, r.y + 2, TimelineView.KEY_MARK_SIZE);
        }
    }

    /** Squares of 3 px in {@code c}, every other one clear: a checked fill. */
    private static Paint checks(Color c) {
        BufferedImage img = new BufferedImage(6, 6, BufferedImage.TYPE_INT_ARGB);
        int rgb = c.getRGB();
        for (int y = 0; y < 6; y++) {
            for (int x = 0; x < 6; x++) {
                if ((x < 3) == (y < 3)) {
                    img.setRGB(x, y, rgb);
                }
            }
        }
        return new TexturePaint(img, new Rectangle(0, 0, 6, 6));
    }

    /** Lines rising to the right, 2 px wide every 6 px, in {@code c}: a hatched fill. */
    private static Paint hatching(Color c) {
        int n = 6;
        BufferedImage img = new BufferedImage(n, n, BufferedImage.TYPE_INT_ARGB);
        int rgb = c.getRGB();
        for (int y = 0; y < n; y++) {
            for (int x = 0; x < n; x++) {
                int d = Math.floorMod(x + y, n);
                if (d < 2) {
                    img.setRGB(x, y, rgb);
                }
            }
        }
        return new TexturePaint(img, new Rectangle(0, 0, n, n));
    }
}
