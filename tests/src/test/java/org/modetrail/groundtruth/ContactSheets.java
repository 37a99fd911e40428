package org.modetrail.groundtruth;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import javax.imageio.ImageIO;

import org.modetrail.model.Box;
import org.modetrail.video.VideoOptions;
import org.modetrail.video.VideoSource;

/**
 * Pictures to check the truth by eye, written as PNGs: per track, crops of every {@value #CROP_EVERY}th frame of its
 * life (and its last) with the box drawn (green measured, orange measured by splitting a group's region, yellow interpolated, magenta hand keyframe; other tracks'
 * boxes thin blue), and whole-frame overviews every {@value #OVERVIEW_EVERY} frames with every box and id (persons
 * shorter than {@value VtestTruth#MIN_FRAMES} frames, which the truth leaves out, dashed grey).
 */
final class ContactSheets {
    static final int CROP_EVERY = 10;
    static final int OVERVIEW_EVERY = 50;
    static final int CROP_H = 170;
    static final int CROP_W = 110;
    static final int COLUMNS = 12;

    private ContactSheets() {
    }

    static void write(Path video, Path cache, Path dir, List<VtestTruth.TruthTrack> tracks, List<Person> persons,
                      VtestTruth.Pass pass) throws Exception {
        Files.createDirectories(dir);
        Map<Integer, BufferedImage> sheets = new HashMap<>();
        Map<Integer, List<Integer>> sampled = new HashMap<>();
        for (VtestTruth.TruthTrack t : tracks) {
            List<Integer> fs = new ArrayList<>();
            int first = t.boxes().firstKey();
            int last = t.boxes().lastKey();
            for (int f = first; f <= last; f += CROP_EVERY) {
                fs.add(f);
            }
            if (fs.get(fs.size() - 1) != last) {
                fs.add(last);
            }
            sampled.put(t.id(), fs);
            int rows = (fs.size() + COLUMNS - 1) / COLUMNS;
            BufferedImage s = new BufferedImage(COLUMNS * CROP_W, rows * CROP_H + 18, BufferedImage.TYPE_INT_RGB);
            Graphics2D g = s.createGraphics();
            g.setColor(Color.DARK_GRAY);
            g.fillRect(0, 0, s.getWidth(), s.getHeight());
            g.setColor(Color.WHITE);
            g.drawString("track " + t.id() + ": frames " + first + "-" + last, 4, 13);
            g.dispose();
            sheets.put(t.id(), s);
        }
        List<Person> shortOnes = persons.stream().filter(p -> p.last() - p.first() + 1 < VtestTruth.MIN_FRAMES)
                .toList();
        try (VideoSource src = VideoSource.open(video, VideoOptions.defaults().withIndexCacheDir(cache))) {
            int w = src.info().width();
            int h = src.info().height();
            BufferedImage frameImage = new BufferedImage(w, h, BufferedImage.TYPE_INT_RGB);
            src.read(0, src.frameCount(), frame -> {
                int f = frame.index();
                boolean overview = f % OVERVIEW_EVERY == 0;
                boolean any = overview;
                for (VtestTruth.TruthTrack t : tracks) {
                    any |= sampled.get(t.id()).contains(f);
                }
                if (!any) {
                    return true;
                }
                frameImage.setRGB(0, 0, w, h, frame.rgb(), 0, w);
                for (VtestTruth.TruthTrack t : tracks) {
                    int k = sampled.get(t.id()).indexOf(f);
                    if (k >= 0) {
                        crop(sheets.get(t.id()), k, frameImage, t, tracks, f);
                    }
                }
                if (overview) {
                    try {
                        overview(dir.resolve(String.format("overview-%03d.png", f)), frameImage, tracks, shortOnes, f);
                    } catch (IOException e) {
                        throw new IllegalStateException(e);
                    }
                }
                return true;
            });
        }
        for (Map.Entry<Integer, BufferedImage> e : sheets.entrySet()) {
            ImageIO.write(e.getValue(), "png", dir.resolve(String.format("track-%02d.png", e.getKey())).toFile());
        }
    }

    private static Color colour(char source) {
        return switch (source) {
            case 'K' -> Color.MAGENTA;
            case 'I' -> Color.YELLOW;
            case 'S' -> Color.ORANGE;
            default -> Color.GREEN;
        };
    }

    private static void crop(BufferedImage sheet, int k, BufferedImage frame, VtestTruth.TruthTrack t,
                             List<VtestTruth.TruthTrack> all, int f) {
        Box b = t.boxes().get(f);
        // a region of the cell's aspect around the box, with a margin, scaled to the cell
        double scale = Math.min((CROP_H - 14) / (b.height() * 1.5), CROP_W / (b.width() * 2.0));
        scale = Math.min(scale, 4);
        double rw = CROP_W / scale;
        double rh = (CROP_H - 14) / scale;
        double rx = b.centreX() - rw / 2;
        double ry = b.centreY() - rh / 2;
        int cx = (k % COLUMNS) * CROP_W;
        int cy = 18 + (k / COLUMNS) * CROP_H;
        Graphics2D g = sheet.createGraphics();
        g.setClip(cx, cy, CROP_W, CROP_H);
        g.setRenderingHint(RenderingHints.KEY_INTERPOLATION, RenderingHints.VALUE_INTERPOLATION_BILINEAR);
        g.drawImage(frame, (int) Math.round(cx - rx * scale), (int) Math.round(cy - ry * scale),
                (int) Math.round(frame.getWidth() * scale), (int) Math.round(frame.getHeight() * scale), null);
        g.setStroke(new BasicStroke(1f));
        for (VtestTruth.TruthTrack o : all) {
            Box ob = o.boxes().get(f);
            if (o != t && ob != null) {
                g.setColor(new Color(80, 140, 255));
                g.drawRect((int) Math.round(cx + (ob.x() - rx) * scale), (int) Math.round(cy + (ob.y() - ry) * scale),
                        (int) Math.round(ob.width() * scale), (int) Math.round(ob.height() * scale));
            }
        }
        g.setColor(colour(t.source().get(f)));
        g.drawRect((int) Math.round(cx + (b.x() - rx) * scale), (int) Math.round(cy + (b.y() - ry) * scale),
                (int) Math.round(b.width() * scale), (int) Math.round(b.height() * scale));
        g.setColor(Color.BLACK);
        g.fillRect(cx, cy + CROP_H - 14, CROP_W, 14);
        g.setColor(Color.WHITE);
        g.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 11));
        g.drawString("f" + f + " " + t.source().get(f) + " v" + t.visible().get(f), cx + 2, cy + CROP_H - 3);
        g.dispose();
    }

    private static void overview(Path file, BufferedImage frame, List<VtestTruth.TruthTrack> tracks,
                                 List<Person> shortOnes, int f) throws IOException {
        BufferedImage im = new BufferedImage(frame.getWidth(), frame.getHeight(), BufferedImage.TYPE_INT_RGB);
        Graphics2D g = im.createGraphics();
        g.drawImage(frame, 0, 0, null);
        g.setFont(new Font(Font.SANS_SERIF, Font.BOLD, 12));
        g.setStroke(new BasicStroke(1f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 1f, new float[] {3, 3}, 0));
        for (Person p : shortOnes) {
            Box b = p.boxes().get(f);
            if (b != null) {
                g.setColor(Color.LIGHT_GRAY);
                g.drawRect((int) b.x(), (int) b.y(), (int) b.width(), (int) b.height());
                g.drawString("s" + p.id, (int) b.x(), (int) b.bottom() + 12);
            }
        }
        g.setStroke(new BasicStroke(1f));
        for (VtestTruth.TruthTrack t : tracks) {
            Box b = t.boxes().get(f);
            if (b != null) {
                g.setColor(colour(t.source().get(f)));
                g.drawRect((int) b.x(), (int) b.y(), (int) b.width() - 1, (int) b.height() - 1);
                g.setColor(Color.BLACK);
                g.drawString(String.valueOf(t.id()), (int) b.x() + 1, (int) b.y() - 2 + 1);
                g.setColor(Color.WHITE);
                g.drawString(String.valueOf(t.id()), (int) b.x(), (int) b.y() - 2);
            }
        }
        g.setColor(Color.WHITE);
        g.drawString("frame " + f, 6, 16);
        g.dispose();
        ImageIO.write(im, "png", file.toFile());
    }
}
