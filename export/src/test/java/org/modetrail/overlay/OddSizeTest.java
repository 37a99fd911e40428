package org.modetrail.overlay;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.modetrail.model.Box;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.ObjectClass;
import org.modetrail.model.Project;
import org.modetrail.model.Track;
import org.modetrail.model.VideoRef;
import org.modetrail.video.Frame;
import org.modetrail.video.VideoOptions;
import org.modetrail.video.VideoSource;

/** A source of odd size (a folder of 63 x 47 PNGs at 10 fps) gives a 64 x 48 video, checked with ffprobe. */
class OddSizeTest {
    @TempDir
    Path dir;

    @Test
    void oddSizeIsPaddedToEven() throws Exception {
        Probe.requireTools();
        Path frames = Files.createDirectories(dir.resolve("frames"));
        for (int i = 0; i < 6; i++) {
            BufferedImage img = new BufferedImage(63, 47, BufferedImage.TYPE_INT_RGB);
            for (int y = 0; y < 47; y++) {
                for (int x = 0; x < 63; x++) {
                    img.setRGB(x, y, 0x404040 + (x * 2 << 8));
                }
            }
            ImageIO.write(img, "png", frames.resolve(String.format("frame%03d.png", i)).toFile());
        }
        VideoOptions options = VideoOptions.defaults().withIndexCacheDir(dir.resolve("cache")).withImageSequenceFps(10);
        Track t = new Track(1, "dot", "", Map.of(2, FrameAnnotation.keyframe(2, new Box(20, 15, 20, 15))));
        Project p = new Project(new VideoRef("frames", 63, 47, 6, ""), List.of(new ObjectClass("dot", 0x00FF00)),
                List.of(t));
        Path out = dir.resolve("odd.mp4");
        OverlayResult r;
        try (VideoSource src = VideoSource.open(frames, options)) {
            r = OverlayVideo.write(src, p, out, OverlayStyle.defaults().withLabels(false), OverlayEncoding.defaults()
                    .withCodec(OverlayCodec.MPEG4), 0, 6, null, null);
        }
        assertEquals(64, r.width());
        assertEquals(48, r.height());
        assertEquals(10.0, r.frameRate());
        // Reference: ffprobe.
        Map<String, String> s = Probe.stream(out);
        assertEquals("64", s.get("width"));
        assertEquals("48", s.get("height"));
        assertEquals("10/1", s.get("r_frame_rate"));
        assertEquals("6", s.get("nb_read_frames"));
        // Read back (FFmpeg's decoder through VideoSource): the box's left edge on frame 2 is green, not on frame 1.
        try (VideoSource back = VideoSource.open(out, options)) {
            Frame f2 = back.frame(2), f1 = back.frame(1);
            assertEquals(0x00FF00, nearest(f2.rgbAt(20, 22)), Integer.toHexString(f2.rgbAt(20, 22)));
            assertEquals(0x404040, nearest(f1.rgbAt(20, 22)), Integer.toHexString(f1.rgbAt(20, 22)));
        }
    }

    /** Which of green or the background's grey the pixel is nearer. */
    private static int nearest(int rgb) {
        return OverlayVideoTest.distance(rgb, 0x00FF00) < OverlayVideoTest.distance(rgb, 0x404040 + (40 << 8))
                ? 0x00FF00 : 0x404040;
    }
}
