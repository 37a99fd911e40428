package org.modetrail.demo.scenario;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import javax.imageio.ImageIO;

/**
 * Contact sheets of the scenario family, for looking at: per kind, a row per seed of a few frames with every
 * object's truth box drawn (solid when at least half the body is seen, dashed otherwise) and its visible fraction.
 * A test-scope tool: {@code mvn -B -q -o -pl export -am test-compile exec:java
 * -Dexec.mainClass=org.modetrail.demo.scenario.FamilySheets -Dexec.classpathScope=test -Dexec.args="DIR [KIND] [SEED...]"};
 * {@code DIR frame KIND SEED FRAME} writes that one frame at full size.
 */
public final class FamilySheets {

    private static final int TILE_WIDTH = 400;
    private static final Color[] COLOURS = {Color.MAGENTA, Color.CYAN, Color.YELLOW, Color.GREEN, Color.ORANGE,
        Color.PINK, Color.WHITE, Color.BLUE, Color.RED};

    private FamilySheets() {
    }

    public static void main(String[] args) throws IOException {
        if (args.length < 1) {
            System.err.println("usage: FamilySheets OUTPUT_FOLDER [KIND] [SEED...]");
            System.exit(2);
        }
        Path dir = Path.of(args[0]);
        Files.createDirectories(dir);
        if (args.length >= 5 && args[1].equals("frame")) {
            // One frame at full size, without boxes: FOLDER frame KIND SEED FRAME [X Y W H ZOOM].
            TrackingScenario s = ScenarioFamily.create(FamilyKind.ofSlug(args[2]), Long.parseLong(args[3]));
            int f = Integer.parseInt(args[4]);
            int[] rgb = new int[s.width() * s.height()];
            s.render(f, rgb);
            BufferedImage image = new BufferedImage(s.width(), s.height(), BufferedImage.TYPE_INT_RGB);
            image.setRGB(0, 0, s.width(), s.height(), rgb, 0, s.width());
            if (args.length == 10) {
                int x = Integer.parseInt(args[5]);
                int y = Integer.parseInt(args[6]);
                int w = Integer.parseInt(args[7]);
                int h = Integer.parseInt(args[8]);
                int zoom = Integer.parseInt(args[9]);
                BufferedImage crop = new BufferedImage(w * zoom, h * zoom, BufferedImage.TYPE_INT_RGB);
                Graphics2D g = crop.createGraphics();
                g.drawImage(image.getSubimage(x, y, w, h), 0, 0, w * zoom, h * zoom, null);
                g.dispose();
                image = crop;
            }
            Path out = dir.resolve(s.name() + "-f" + f + ".png");
            ImageIO.write(image, "png", out.toFile());
            System.out.println(out);
            return;
        }
        int at = 1;
        FamilyKind only = null;
        if (args.length > 1 && !args[1].matches("-?\\d+")) {
            only = FamilyKind.ofSlug(args[1]);
            at = 2;
        }
        long[] seeds = args.length > at ? java.util.Arrays.stream(args, at, args.length).mapToLong(Long::parseLong)
                .toArray() : new long[] {1, 2};
        for (FamilyKind kind : FamilyKind.values()) {
            if (only != null && kind != only) {
                continue;
            }
            Path out = dir.resolve(kind.slug() + ".png");
            ImageIO.write(sheet(kind, seeds, 4), "png", out.toFile());
            System.out.println(out);
        }
    }

    /** A row per seed of {@code columns} frames spread over the clip. */
    static BufferedImage sheet(FamilyKind kind, long[] seeds, int columns) {
        TrackingScenario first = ScenarioFamily.create(kind, seeds[0]);
        int tileHeight = TILE_WIDTH * first.height() / first.width();
        BufferedImage sheet = new BufferedImage(TILE_WIDTH * columns, (tileHeight + 16) * seeds.length,
                BufferedImage.TYPE_INT_RGB);
        Graphics2D g = sheet.createGraphics();
        g.setRenderingHint(RenderingHints.KEY_INTERPOLATION, RenderingHints.VALUE_INTERPOLATION_BILINEAR);
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 11));
        for (int row = 0; row < seeds.length; row++) {
            TrackingScenario s = row == 0 ? first : ScenarioFamily.create(kind, seeds[row]);
            int th = TILE_WIDTH * s.height() / s.width();
            int[] rgb = new int[s.width() * s.height()];
            BufferedImage frame = new BufferedImage(s.width(), s.height(), BufferedImage.TYPE_INT_RGB);
            int y0 = row * (tileHeight + 16);
            g.setColor(Color.WHITE);
            g.drawString(s.name() + "  " + s.width() + "x" + s.height() + "  " + s.frameCount() + " frames  crf "
                    + ScenarioFamily.crf(kind, seeds[row]), 4, y0 + 12);
            for (int c = 0; c < columns; c++) {
                int f = (int) Math.round((double) c / (columns - 1) * (s.frameCount() - 1) * 0.96);
                s.render(f, rgb);
                frame.setRGB(0, 0, s.width(), s.height(), rgb, 0, s.width());
                int x0 = c * TILE_WIDTH;
                g.drawImage(frame, x0, y0 + 16, TILE_WIDTH, th, null);
                double k = (double) TILE_WIDTH / s.width();
                for (int o = 0; o < s.objectCount(); o++) {
                    ScenarioBox b = s.truth(o, f);
                    if (b.width() == 0) {
                        continue;
                    }
                    g.setColor(COLOURS[o % COLOURS.length]);
                    g.setStroke(b.visible() >= 0.5 ? new BasicStroke(1f) : new BasicStroke(1f, BasicStroke.CAP_BUTT,
                            BasicStroke.JOIN_MITER, 4f, new float[] {3f, 3f}, 0f));
                    g.drawRect((int) Math.round(x0 + b.x() * k), (int) Math.round(y0 + 16 + b.y() * k),
                            (int) Math.round(b.width() * k), (int) Math.round(b.height() * k));
                    g.drawString(o + ":" + Math.round(b.visible() * 100), (int) Math.round(x0 + b.x() * k),
                            (int) Math.round(y0 + 16 + b.y() * k) - 2);
                }
                g.setColor(Color.WHITE);
                g.drawString("f" + f, x0 + TILE_WIDTH - 40, y0 + 12);
            }
        }
        g.dispose();
        return sheet;
    }
}
