package org.modetrail.tuning;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.io.File;

import javax.imageio.ImageIO;

import org.modetrail.demo.scenario.FamilyKind;
import org.modetrail.demo.scenario.ScenarioBox;
import org.modetrail.demo.scenario.ScenarioFamily;
import org.modetrail.demo.scenario.TrackingScenario;
import org.modetrail.model.Box;
import org.modetrail.tracking.MeanShiftTracker;
import org.modetrail.tracking.TrackStep;
import org.modetrail.video.Frame;

/**
 * A contact sheet for looking at one object's track: crops round the true box on every STEP-th frame from FROM to
 * TO, the truth in green, the tracker's box in magenta. The tracker runs on raw frames, as in {@link FamilyTrace}.
 * Args: KIND SEED OBJECT FROM TO STEP OUT.png.
 */
public final class FamilySheet {
    public static void main(String[] args) throws Exception {
        FamilyKind kind = FamilyKind.ofSlug(args[0]);
        TrackingScenario s = ScenarioFamily.create(kind, Long.parseLong(args[1]));
        int k = Integer.parseInt(args[2]);
        int from = Integer.parseInt(args[3]);
        int to = Integer.parseInt(args[4]);
        int step = Integer.parseInt(args[5]);
        int w = s.width();
        int h = s.height();
        int cell = 160;
        int cols = 8;
        int n = (to - from) / step + 1;
        BufferedImage sheet = new BufferedImage(cols * cell, ((n + cols - 1) / cols) * cell,
                BufferedImage.TYPE_INT_RGB);
        Graphics2D g = sheet.createGraphics();
        int[] rgb = new int[w * h];
        MeanShiftTracker t = null;
        int shown = 0;
        for (int f = 0; f <= to; f++) {
            s.render(f, rgb);
            Frame frame = new Frame(f, 0, w, h, rgb);
            ScenarioBox tb = s.truth(k, f);
            Box truth = tb.width() > 0 ? new Box(tb.x(), tb.y(), tb.width(), tb.height()) : null;
            Box box = null;
            if (t == null) {
                if (truth != null && tb.visible() >= 0.5) {
                    t = new MeanShiftTracker(Tune.config());
                    t.start(frame, truth);
                    box = truth;
                }
            } else if (!t.isLost()) {
                TrackStep st = t.track(frame);
                box = st.status().found() ? st.box() : null;
            }
            if (f < from || (f - from) % step != 0) {
                continue;
            }
            Box centre = truth != null ? truth : box;
            double cx = centre == null ? w / 2.0 : centre.centreX();
            double cy = centre == null ? h / 2.0 : centre.centreY();
            double zoom = 1.0;
            if (centre != null) {
                zoom = Math.max(0.25, Math.min(4, cell / (3.0 * Math.max(centre.width(), centre.height()))));
            }
            BufferedImage crop = new BufferedImage(cell, cell, BufferedImage.TYPE_INT_RGB);
            for (int y = 0; y < cell; y++) {
                for (int x = 0; x < cell; x++) {
                    int sx = (int) Math.floor(cx + (x - cell / 2.0) / zoom);
                    int sy = (int) Math.floor(cy + (y - cell / 2.0) / zoom);
                    crop.setRGB(x, y, sx >= 0 && sy >= 0 && sx < w && sy < h ? rgb[sy * w + sx] : 0);
                }
            }
            Graphics2D cg = crop.createGraphics();
            cg.setStroke(new BasicStroke(1.5f));
            draw(cg, truth, cx, cy, zoom, cell, Color.GREEN);
            draw(cg, box, cx, cy, zoom, cell, Color.MAGENTA);
            cg.setColor(Color.WHITE);
            cg.drawString(f + (truth == null ? " out" : String.format(" v%.2f", tb.visible())), 3, 12);
            cg.dispose();
            g.drawImage(crop, (shown % cols) * cell, (shown / cols) * cell, null);
            shown++;
        }
        g.dispose();
        ImageIO.write(sheet, "png", new File(args[6]));
    }

    private static void draw(Graphics2D g, Box b, double cx, double cy, double zoom, int cell, Color c) {
        if (b == null) {
            return;
        }
        g.setColor(c);
        g.drawRect((int) Math.round((b.x() - cx) * zoom + cell / 2.0), (int) Math.round((b.y() - cy) * zoom + cell / 2.0),
                (int) Math.round(b.width() * zoom), (int) Math.round(b.height() * zoom));
    }
}
