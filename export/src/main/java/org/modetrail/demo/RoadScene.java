package org.modetrail.demo;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;

/**
 * A road seen from a camera on a pole: the ground is rendered once through the exact pinhole model, then each frame
 * paints shadows and then road users as boxes, farthest first. The reference point of each user is the centre of
 * its footprint on the ground.
 */
public final class RoadScene implements SyntheticScene {

    /** Samples per pixel side for the static ground: markings far away are thinner than a pixel. */
    private static final int SUPERSAMPLE = 3;

    private final RoadConfig config;
    private final List<RoadUser> users;
    private final BoxPainter painter;
    private final Canvas canvas;
    private final int[] background;

    public RoadScene(RoadConfig config) {
        this.config = config;
        this.users = RoadTraffic.timetable(config.durationS());
        this.painter = new BoxPainter(config.camera());
        this.canvas = new Canvas(config.width(), config.height());
        this.background = new int[config.width() * config.height()];
        paintGround();
    }

    public RoadConfig config() {
        return config;
    }

    List<RoadUser> users() {
        return users;
    }

    @Override
    public int width() {
        return config.width();
    }

    @Override
    public int height() {
        return config.height();
    }

    @Override
    public int fps() {
        return config.fps();
    }

    @Override
    public int frameCount() {
        return config.frameCount();
    }

    @Override
    public boolean hasWorldCoordinates() {
        return true;
    }

    @Override
    public List<TruthRow> render(int frame, int[] rgb) {
        if (frame < 0 || frame >= config.frameCount()) {
            throw new IllegalArgumentException("frame " + frame + " outside 0.." + (config.frameCount() - 1));
        }
        double t = (double) frame / config.fps();
        canvas.beginFrame(rgb, background);
        List<RoadUser> present = new ArrayList<>();
        for (RoadUser u : users) {
            if (u.motion().present(t)) {
                present.add(u);
            }
        }
        // Painter's order: farthest footprint first, so nearer users hide farther ones.
        present.sort(Comparator.comparingDouble((RoadUser u) -> -painter.depth(u.motion().xM(t), u.motion().yM(t), 0)));
        if (config.style().shadows()) {
            for (RoadUser u : present) {
                LaneMotion m = u.motion();
                painter.shadow(canvas, m.xM(t), m.yM(t), m.directionX(), m.directionY(), u.lengthM(), u.widthM());
            }
        }
        Coverage[] covered = new Coverage[present.size()];
        for (int k = 0; k < present.size(); k++) {
            canvas.beginObject(k);
            paintUser(present.get(k), t);
            covered[k] = canvas.endObject();
        }
        int[] owned = canvas.ownedPixels(present.size());
        canvas.addSensorNoise(config.seed(), frame, config.style().sensorNoise());
        List<TruthRow> rows = new ArrayList<>();
        for (int k = 0; k < present.size(); k++) {
            if (covered[k].isEmpty()) {
                continue;
            }
            RoadUser u = present.get(k);
            LaneMotion m = u.motion();
            Coverage c = covered[k];
            rows.add(new TruthRow(u.trackId(), u.objectClass(), frame, t, c.x(), c.y(), c.width(), c.height(),
                    (double) owned[k] / c.pixels(), m.xM(t), m.yM(t), m.speedMS(t - m.startS())));
        }
        rows.sort(Comparator.comparingInt(TruthRow::trackId));
        return rows;
    }

    private void paintUser(RoadUser user, double t) {
        LaneMotion m = user.motion();
        double cx = m.xM(t);
        double cy = m.yM(t);
        double dx = m.directionX();
        double dy = m.directionY();
        BoxPart[] parts = user.parts().toArray(new BoxPart[0]);
        Arrays.sort(parts, Comparator.comparingInt(BoxPart::layer).thenComparingDouble(p -> {
            double mid = (p.rearM() + p.frontM()) / 2;
            return -painter.depth(cx + mid * dx, cy + mid * dy, (p.bottomM() + p.topM()) / 2);
        }));
        for (BoxPart part : parts) {
            if (!painter.paint(canvas, part, cx, cy, dx, dy)) {
                return;
            }
        }
    }

    /** Ground points of the calibration reference that fall inside the image, at least 4 px from its border. */
    public List<CalibrationPoint> calibrationPoints() {
        RoadCamera camera = config.camera();
        List<CalibrationPoint> points = new ArrayList<>();
        for (double[] p : RoadGround.landmarks()) {
            double[] uv = camera.project(p[0], p[1], 0);
            if (uv[0] >= 4 && uv[0] <= config.width() - 4 && uv[1] >= 4 && uv[1] <= config.height() - 4) {
                points.add(new CalibrationPoint(RoadGround.landmarkName(p), uv[0], uv[1], p[0], p[1]));
            }
        }
        return points;
    }

    /**
     * Intersects each sample's viewing ray with the ground ({@code z = 0}); rays that miss it see sky. Supersampled
     * so thin, distant markings come out as grey blends rather than broken dashes.
     */
    private void paintGround() {
        int w = config.width();
        int h = config.height();
        if (!config.style().texture()) {
            Arrays.fill(background, RenderStyle.FLAT_BACKGROUND);
            return;
        }
        RoadCamera cam = config.camera();
        double[] r = cam.rotation();
        double f = cam.focalPx();
        long seed = config.seed();
        int n = SUPERSAMPLE;
        for (int j = 0; j < h; j++) {
            for (int i = 0; i < w; i++) {
                int sr = 0;
                int sg = 0;
                int sb = 0;
                for (int sj = 0; sj < n; sj++) {
                    for (int si = 0; si < n; si++) {
                        double cx = (i + (si + 0.5) / n - cam.principalU()) / f;
                        double cy = (j + (sj + 0.5) / n - cam.principalV()) / f;
                        // Ray direction in the world: R^T (cx, cy, 1).
                        double wx = r[0] * cx + r[3] * cy + r[6];
                        double wy = r[1] * cx + r[4] * cy + r[7];
                        double wz = r[2] * cx + r[5] * cy + r[8];
                        int c;
                        if (wz < -1e-9) {
                            double lambda = cam.heightM() / -wz;
                            c = RoadGround.colour(seed, cam.xM() + lambda * wx, cam.yM() + lambda * wy);
                        } else {
                            c = RoadGround.sky();
                        }
                        sr += Rgb.red(c);
                        sg += Rgb.green(c);
                        sb += Rgb.blue(c);
                    }
                }
                int grain = (int) Math.round(3 * NoiseHash.signed(seed ^ 0x5EED, i, j));
                int samples = n * n;
                background[j * w + i] = Rgb.pack((sr + samples / 2) / samples + grain,
                        (sg + samples / 2) / samples + grain, (sb + samples / 2) / samples + grain);
            }
        }
    }
}
