package org.modetrail.trackbench;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;

import javax.imageio.ImageIO;

import org.modetrail.model.Box;

/**
 * A contact sheet for looking at one object's track during tuning: crops round the true box (or the tracked box when
 * there is no truth), 8 to a row, the truth in green, the tracker's box in magenta, the frame number and a label.
 */
public final class ContactSheet {
    private static final int CELL = 160;
    private static final int COLUMNS = 8;
    private final BufferedImage sheet;
    private final Graphics2D g;
    private int shown;

    public ContactSheet(int cells) {
        sheet = new BufferedImage(COLUMNS * CELL, Math.max(1, (cells + COLUMNS - 1) / COLUMNS) * CELL,
                BufferedImage.TYPE_INT_RGB);
        g = sheet.createGraphics();
    }

    /** Adds one cell: {@code rgb} is the frame (packed RGB, {@code width} x {@code height}). */
    public void add(int[] rgb, int width, int height, Box truth, Box tracked, String label) {
        Box centre = truth != null ? truth : tracked;
        double cx = centre == null ? width / 2.0 : centre.centreX();
        double cy = centre == null ? height / 2.0 : centre.centreY();
        double zoom = centre == null ? 1
                : Math.max(0.25, Math.min(4, CELL / (3.0 * Math.max(centre.width(), centre.height()))));
        BufferedImage crop = new BufferedImage(CELL, CELL, BufferedImage.TYPE_INT_RGB);
        for (int y = 0; y < CELL; y++) {
            for (int x = 0; x < CELL; x++) {
                int sx = (int) Math.floor(cx + (x - CELL / 2.0) / zoom);
                int sy = (int) Math.floor(cy + (y - CELL / 2.0) / zoom);
                crop.setRGB(x, y, sx >= 0 && sy >= 0 && sx < width && sy < height ? rgb[sy * width + sx] : 0);
            }
        }
        Graphics2D cg = crop.createGraphics();
        cg.setStroke(new BasicStroke(1.5f));
        draw(cg, truth, cx, cy, zoom, Color.GREEN);
        draw(cg, tracked, cx, cy, zoom, Color.MAGENTA);
        cg.setColor(Color.WHITE);
        cg.drawString(label, 3, 12);
        cg.dispose();
        g.drawImage(crop, (shown % COLUMNS) * CELL, (shown / COLUMNS) * CELL, null);
        shown++;
    }

    public void write(Path png) throws IOException {
        g.dispose();
        ImageIO.write(sheet, "png", png.toFile());
    }

    private static void draw(Graphics2D g, Box b, double cx, double cy, double zoom, Color c) {
        if (b == null) {
            return;
        }
        g.setColor(c);
        g.drawRect((int) Math.round((b.x() - cx) * zoom + CELL / 2.0), (int) Math.round((b.y() - cy) * zoom + CELL / 2.0),
                (int) Math.round(b.width() * zoom), (int) Math.round(b.height() * zoom));
    }
}
