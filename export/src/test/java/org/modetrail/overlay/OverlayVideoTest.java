package org.modetrail.overlay;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CancellationException;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.modetrail.model.Box;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.Project;
import org.modetrail.model.Track;
import org.modetrail.picture.TruthProjects;
import org.modetrail.video.Frame;
import org.modetrail.video.VideoOptions;
import org.modetrail.video.VideoSource;

/**
 * Overlays of the first 50 frames of the committed arena clip, checked against FFmpeg's ffprobe (stream facts,
 * frames counted by decoding) and read back through the tracker's VideoSource (FFmpeg's decoder) against the
 * source's own frames.
 */
class OverlayVideoTest {
    static final int FRAMES = 50;
    /** Magenta: far from every colour of the arena footage (grey, beige, red, blue and yellow animals). */
    static final int CLASS_COLOUR = 0xFF00FF;

    @TempDir
    static Path dir;
    static Project project;

    @BeforeAll
    static void setUp() throws Exception {
        Probe.requireTools();
        project = TruthProjects.arena(CLASS_COLOUR, 0, 449);
    }

    private static VideoOptions options() {
        return VideoOptions.defaults().withIndexCacheDir(dir.resolve("index-cache"));
    }

    private static OverlayResult write(Path out, OverlayCodec codec, OverlayProgress progress) throws Exception {
        try (VideoSource src = VideoSource.open(TruthProjects.ARENA, options())) {
            return OverlayVideo.write(src, project, out, OverlayStyle.defaults(),
                    OverlayEncoding.defaults().withCodec(codec), 0, FRAMES, progress, () -> false);
        }
    }

    @Test
    void mpeg4OverlayHasTheSourcesFramesSizeAndRate() throws Exception {
        Path out = dir.resolve("overlay-mpeg4.mp4");
        List<int[]> calls = new ArrayList<>();
        OverlayResult r = write(out, OverlayCodec.MPEG4, (done, total) -> calls.add(new int[] {done, total}));
        assertEquals("mpeg4", r.encoder());
        assertEquals(FRAMES, r.framesWritten());
        assertEquals(Files.size(out), r.bytes());
        // Progress: once per frame, counting up to the total.
        assertEquals(FRAMES, calls.size());
        for (int i = 0; i < FRAMES; i++) {
            assertEquals(i + 1, calls.get(i)[0]);
            assertEquals(FRAMES, calls.get(i)[1]);
        }
        // Reference: ffprobe, frames counted by decoding the whole stream.
        Map<String, String> s = Probe.stream(out);
        assertEquals("mpeg4", s.get("codec_name"), s.toString());
        assertEquals("640", s.get("width"));
        assertEquals("480", s.get("height"));
        assertEquals("25/1", s.get("r_frame_rate"));
        assertEquals("25/1", s.get("avg_frame_rate"));
        assertEquals(Integer.toString(FRAMES), s.get("nb_read_frames"));
        assertEquals("yuv420p", s.get("pix_fmt"));
        assertOverlayMatches(out);
    }

    @Test
    void automaticChoiceSaysWhichEncoderItUsed() throws Exception {
        Path out = dir.resolve("overlay-auto.mp4");
        OverlayResult r = write(out, OverlayCodec.AUTO, OverlayProgress.NONE);
        String expected = OverlayVideo.hasH264Encoder() ? "libopenh264" : "mpeg4";
        assertEquals(expected, r.encoder());
        // Reference: ffprobe names the stream's codec as the result does.
        Map<String, String> s = Probe.stream(out);
        assertEquals(r.codec(), s.get("codec_name"), s.toString());
        assertEquals(Integer.toString(FRAMES), s.get("nb_read_frames"));
        assertEquals("25/1", s.get("r_frame_rate"));
        assertOverlayMatches(out);
    }

    /**
     * Read back through VideoSource (FFmpeg's decoder): as many frames as written at 25 fps; pixels along the
     * middle of the keyframe boxes' left and right edges have the class colour; pixels away from every box, label
     * and trail match the source frame.
     */
    private static void assertOverlayMatches(Path out) throws Exception {
        try (VideoSource overlay = VideoSource.open(out, options());
             VideoSource source = VideoSource.open(TruthProjects.ARENA, options())) {
            assertEquals(FRAMES, overlay.frameCount());
            assertEquals(640, overlay.info().width());
            assertEquals(480, overlay.info().height());
            assertEquals(25.0, overlay.info().meanFrameRate(), 1e-6);
            for (int f : new int[] {0, 10, 20, 30, 40}) {
                Frame o = overlay.frame(f);
                Frame s = source.frame(f);
                int near = 0, samples = 0;
                double worst = 0;
                for (Track t : project.tracks()) {
                    FrameAnnotation a = t.at(f).orElseThrow();
                    if (!a.isVisible() || !a.isKeyframe()) {
                        continue;
                    }
                    Box b = a.box();
                    // The keyframe stroke (4 px) is centred on the edge: columns x-1 and x lie inside it.
                    int left = (int) Math.floor(b.x()), right = (int) Math.floor(b.right());
                    for (int y = (int) (b.y() + b.height() / 3); y < b.y() + 2 * b.height() / 3; y++) {
                        for (int x : new int[] {left - 1, left, right - 1, right}) {
                            double d = distance(o.rgbAt(x, y), CLASS_COLOUR);
                            worst = Math.max(worst, d);
                            samples++;
                            if (d <= COLOUR_TOLERANCE) {
                                near++;
                            }
                        }
                    }
                }
                if (f % 10 == 0) {
                    assertTrue(samples > 20, "frame " + f + ": too few edge samples " + samples);
                    assertTrue(near >= 0.9 * samples, "frame " + f + ": " + near + " of " + samples
                            + " keyframe edge pixels within " + COLOUR_TOLERANCE + " of the class colour; worst "
                            + worst);
                }
                double[] far = farDifference(o, s, f);
                assertTrue(far[2] > 0.5 * 640 * 480, "frame " + f + ": too few far pixels " + far[2]);
                assertTrue(far[0] <= FAR_MEAN_ABS, "frame " + f + ": mean abs difference " + far[0]
                        + " away from the drawing");
                assertTrue(far[1] >= FAR_PSNR, "frame " + f + ": PSNR " + far[1] + " dB away from the drawing");
            }
        }
    }

    /** Euclidean RGB distance; 60 allows for 4:2:0 chroma averaging of the thin line with its dark outline. */
    static final double COLOUR_TOLERANCE = 60;
    /**
     * Re-encoding the grainy H.264 source loses some of its grain: measured 2.1 levels and 39 dB (mpeg4, quantiser
     * 3) and 2.7 levels and 37 dB (libopenh264, 0.25 bit per pixel); allowed up to 4 levels and down to 33 dB.
     */
    static final double FAR_MEAN_ABS = 4.0;
    static final double FAR_PSNR = 33;

    static double distance(int rgb, int target) {
        int dr = ((rgb >> 16) & 0xFF) - ((target >> 16) & 0xFF);
        int dg = ((rgb >> 8) & 0xFF) - ((target >> 8) & 0xFF);
        int db = (rgb & 0xFF) - (target & 0xFF);
        return Math.sqrt(dr * dr + dg * dg + db * db);
    }

    /**
     * Mean absolute difference (per channel), PSNR and pixel count over the pixels outside every visible track's
     * box, label and trail (the box and trail points' bounds, widened by 16 px, and 40 px above for the label).
     */
    static double[] farDifference(Frame o, Frame s, int f) {
        int w = o.width(), h = o.height();
        boolean[] mask = new boolean[w * h];
        for (Track t : project.tracks()) {
            FrameAnnotation a = t.at(f).orElse(null);
            if (a == null || !a.isVisible()) {
                continue;
            }
            double x0 = a.box().x(), y0 = a.box().y() - 40, x1 = a.box().right() + 120, y1 = a.box().bottom();
            for (FrameAnnotation p : t.frames().subMap(Math.max(0, f - 25), true, f, true).values()) {
                if (p.isVisible()) {
                    x0 = Math.min(x0, p.box().x());
                    y0 = Math.min(y0, p.box().y());
                    x1 = Math.max(x1, p.box().right());
                    y1 = Math.max(y1, p.box().bottom());
                }
            }
            int ax = Math.max(0, (int) x0 - 16), ay = Math.max(0, (int) y0 - 16);
            int bx = Math.min(w, (int) x1 + 16), by = Math.min(h, (int) y1 + 16);
            for (int y = ay; y < by; y++) {
                for (int x = ax; x < bx; x++) {
                    mask[y * w + x] = true;
                }
            }
        }
        int[] op = o.rgb(), sp = s.rgb();
        long abs = 0, sq = 0, n = 0;
        for (int i = 0; i < w * h; i++) {
            if (mask[i]) {
                continue;
            }
            int a = op[i], b = sp[i];
            for (int shift = 0; shift <= 16; shift += 8) {
                int d = ((a >> shift) & 0xFF) - ((b >> shift) & 0xFF);
                abs += Math.abs(d);
                sq += (long) d * d;
            }
            n++;
        }
        double mean = abs / (3.0 * n);
        double mse = sq / (3.0 * n);
        double psnr = mse == 0 ? 99 : 10 * Math.log10(255.0 * 255.0 / mse);
        return new double[] {mean, psnr, n};
    }

    @Test
    void cancellingLeavesNoFileAndTheOldOneAlone() throws Exception {
        Path sub = Files.createDirectories(dir.resolve("cancel"));
        Path out = sub.resolve("overlay.mp4");
        Files.writeString(out, "an older file");
        int[] done = new int[1];
        try (VideoSource src = VideoSource.open(TruthProjects.ARENA, options())) {
            assertThrows(CancellationException.class, () -> OverlayVideo.write(src, project, out,
                    OverlayStyle.defaults(), OverlayEncoding.defaults(), 0, FRAMES,
                    (d, total) -> done[0] = d, () -> done[0] >= 10));
        }
        assertEquals(10, done[0]);
        assertEquals("an older file", Files.readString(out));
        try (Stream<Path> files = Files.list(sub)) {
            assertEquals(List.of(out), files.toList(), "only the older file is left");
        }
        Path fresh = sub.resolve("fresh.mp4");
        try (VideoSource src = VideoSource.open(TruthProjects.ARENA, options())) {
            assertThrows(CancellationException.class, () -> OverlayVideo.write(src, project, fresh,
                    OverlayStyle.defaults(), OverlayEncoding.defaults(), 0, FRAMES, OverlayProgress.NONE,
                    () -> true));
        }
        assertFalse(Files.exists(fresh));
        try (Stream<Path> files = Files.list(sub)) {
            assertEquals(List.of(out), files.toList(), "no partial file is left");
        }
    }

    @Test
    void aFailureMidwayLeavesNoFile() throws Exception {
        Path sub = Files.createDirectories(dir.resolve("fail"));
        Path out = sub.resolve("overlay.mp4");
        try (VideoSource src = VideoSource.open(TruthProjects.ARENA, options())) {
            IllegalStateException e = assertThrows(IllegalStateException.class, () -> OverlayVideo.write(src,
                    project, out, OverlayStyle.defaults(), OverlayEncoding.defaults(), 0, FRAMES, (d, total) -> {
                        if (d == 7) {
                            throw new IllegalStateException("disk full, say");
                        }
                    }, null));
            assertEquals("disk full, say", e.getMessage());
        }
        try (Stream<Path> files = Files.list(sub)) {
            assertEquals(List.of(), files.toList(), "no partial file is left");
        }
    }

    @Test
    void rangeAndProjectAreChecked() throws Exception {
        Path out = dir.resolve("bad.mp4");
        try (VideoSource src = VideoSource.open(TruthProjects.ARENA, options())) {
            assertThrows(IllegalArgumentException.class, () -> OverlayVideo.write(src, project, out,
                    OverlayStyle.defaults(), OverlayEncoding.defaults(), 10, 10, null, null));
            assertThrows(IllegalArgumentException.class, () -> OverlayVideo.write(src, project, out,
                    OverlayStyle.defaults(), OverlayEncoding.defaults(), 0, 451, null, null));
            Project other = new Project(new org.modetrail.model.VideoRef("x.mp4", 320, 240, 450, ""),
                    List.of(), List.of());
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                    () -> OverlayVideo.write(src, other, out, OverlayStyle.defaults(), null, null));
            assertTrue(e.getMessage().contains("320x240"), e.getMessage());
        }
        assertFalse(Files.exists(out));
    }
}
