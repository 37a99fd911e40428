package org.modetrail.tuning;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.io.File;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import javax.imageio.ImageIO;

import org.modetrail.model.Box;
import org.modetrail.tracking.MeanShiftTracker;
import org.modetrail.tracking.TrackStep;
import org.modetrail.video.VideoOptions;
import org.modetrail.video.VideoSource;

/** Scratch diagnosis: track boxes from a keys file on a video, print steps, draw a sheet. */
public final class Diag {
    public static void main(String[] args) throws Exception {
        Path video = Path.of(args[0]);
        List<String> lines = Files.readAllLines(Path.of(args[1]));
        int every = Integer.parseInt(args[2]);
        Path sheet = Path.of(args[3]);
        int last = args.length > 4 ? Integer.parseInt(args[4]) : Integer.MAX_VALUE;
        List<int[]> keys = new ArrayList<>();
        for (String l : lines.subList(1, lines.size())) {
            String[] f = l.split(",");
            keys.add(new int[] {Integer.parseInt(f[0]), Integer.parseInt(f[1]), Integer.parseInt(f[2]),
                Integer.parseInt(f[3]), Integer.parseInt(f[4]), Integer.parseInt(f[5])});
        }
        int n = keys.size();
        MeanShiftTracker[] trackers = new MeanShiftTracker[n];
        Box[] boxes = new Box[n];
        String[] status = new String[n];
        List<BufferedImage> tiles = new ArrayList<>();
        try (VideoSource src = VideoSource.open(video, VideoOptions.defaults())) {
            int end = Math.min(last, src.frameCount() - 1);
            src.read(0, end + 1, frame -> {
                int f = frame.index();
                StringBuilder sb = new StringBuilder(String.format(Locale.ROOT, "%4d", f));
                for (int k = 0; k < n; k++) {
                    int[] key = keys.get(k);
                    if (key[1] == f) {
                        trackers[k] = new MeanShiftTracker(Tune.config());
                        boxes[k] = new Box(key[2], key[3], key[4], key[5]);
                        trackers[k].start(frame, boxes[k]);
                        status[k] = "K";
                    } else if (trackers[k] != null && !trackers[k].isLost()) {
                        TrackStep s = trackers[k].track(frame);
                        boxes[k] = s.box();
                        status[k] = s.status().name().substring(0, 1);
                        sb.append(String.format(Locale.ROOT, " | %d %s %.2f %3.0f,%3.0f %3.0fx%3.0f", k + 1,
                                status[k], s.similarity(), s.box().centreX(), s.box().centreY(), s.box().width(),
                                s.box().height()));
                    }
                }
                if (f % every == 0) {
                    System.out.println(sb);
                    BufferedImage img = new BufferedImage(frame.width(), frame.height(), BufferedImage.TYPE_INT_RGB);
                    img.setRGB(0, 0, frame.width(), frame.height(), frame.rgb(), 0, frame.width());
                    Graphics2D g = img.createGraphics();
                    g.setStroke(new BasicStroke(2));
                    Color[] cs = {Color.ORANGE, Color.CYAN, Color.MAGENTA, Color.YELLOW, Color.GREEN, Color.RED,
                        Color.BLUE, Color.WHITE};
                    for (int k = 0; k < n; k++) {
                        if (boxes[k] != null && trackers[k] != null && !trackers[k].isLost()
                                && !trackers[k].isSearching()) {
                            g.setColor(cs[k % cs.length]);
                            Box b = boxes[k];
                            g.drawRect((int) b.x(), (int) b.y(), (int) b.width(), (int) b.height());
                            g.drawString((k + 1) + status[k], (int) b.x(), (int) b.y() - 2);
                        }
                    }
                    g.setColor(Color.WHITE);
                    g.drawString("f" + f, 5, 15);
                    g.dispose();
                    tiles.add(img);
                }
                return true;
            });
        }
        int cols = 4;
        int tw = tiles.get(0).getWidth() / 2;
        int th = tiles.get(0).getHeight() / 2;
        int rows = (tiles.size() + cols - 1) / cols;
        BufferedImage out = new BufferedImage(cols * tw, rows * th, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = out.createGraphics();
        for (int i = 0; i < tiles.size(); i++) {
            g.drawImage(tiles.get(i), (i % cols) * tw, (i / cols) * th, tw, th, null);
        }
        g.dispose();
        ImageIO.write(out, "png", sheet.toFile());
    }
}
