package org.modetrail.summary;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.junit.jupiter.api.Test;
import org.modetrail.model.Box;
import org.modetrail.model.CountingLine;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.ObjectClass;
import org.modetrail.model.PixelPoint;
import org.modetrail.model.Presence;
import org.modetrail.model.Project;
import org.modetrail.model.Site;
import org.modetrail.model.Track;
import org.modetrail.model.VideoRef;
import org.modetrail.model.Zone;

/** Summaries worked by hand on a track whose box moves 1 px a frame to the right at 10 frames per second. */
class TrackSummariesTest {
    private static final int FRAMES = 101;

    private static double[] times() {
        double[] t = new double[FRAMES];
        for (int i = 0; i < FRAMES; i++) {
            t[i] = i / 10.0;
        }
        return t;
    }

    /** Box x = frame, 10 x 20, bottom centre at (frame + 5, 120); frames 0..80, hidden 81..85, back 86..100. */
    private static Project project(Site site) {
        Map<Integer, FrameAnnotation> f = new TreeMap<>();
        for (int i = 0; i < FRAMES; i++) {
            if (i > 80 && i <= 85) {
                f.put(i, FrameAnnotation.markedBy(i, Presence.HIDDEN));
            } else {
                f.put(i, FrameAnnotation.keyframe(i, new Box(i, 100, 10, 20)));
            }
        }
        return new Project(new VideoRef("v.mp4", 200, 200, FRAMES, ""), List.of(new ObjectClass("car", 0xFF0000)),
                List.of(new Track(1, "car", "", f)), site);
    }

    @Test
    void durationPathZonesAndCrossingsAsWorkedByHand() {
        Zone zone = new Zone("middle", List.of(new PixelPoint(29.5, 0), new PixelPoint(60.5, 0), new PixelPoint(60.5, 200),
                new PixelPoint(29.5, 200)));
        // Pointing down the image: looking along it, the left is the image's right (x growing).
        CountingLine down = new CountingLine("down", new PixelPoint(50, 0), new PixelPoint(50, 200));
        CountingLine up = new CountingLine("up", new PixelPoint(70, 200), new PixelPoint(70, 0));
        CountingLine shortLine = new CountingLine("short", new PixelPoint(40, 0), new PixelPoint(40, 110));
        CountingLine inGap = new CountingLine("gap", new PixelPoint(88, 0), new PixelPoint(88, 200));
        TrackSummary s = TrackSummaries.of(project(new Site(null, List.of(zone), List.of(down, up, shortLine,
                inGap))), times(), Map.of()).get(0);
        assertEquals(0, s.firstFrame());
        assertEquals(100, s.lastFrame());
        assertEquals(96, s.boxedFrames());
        assertEquals(10.1, s.durationS(), 1e-9, "frame 0 to the end of frame 100");
        // 80 steps of 1 px before the gap and 14 after it; the jump across the hidden frames is not path.
        assertEquals(94, s.pathLengthPx(), 1e-9);
        // Contact x = frame + 5 inside [29.5, 60.5]: frames 25..55, 31 frames of 0.1 s.
        assertEquals(3.1, s.secondsInZone().get("middle"), 1e-9);
        // Contact x reaches 50 at frame 45 (on the line, skipped) and 51 at frame 46: one crossing from the
        // line's right (x < 50) to its left.
        assertEquals(List.of(new LineCrossing("down", 46, 4.6, CrossingDirection.RIGHT_TO_LEFT),
                new LineCrossing("up", 66, 6.6, CrossingDirection.LEFT_TO_RIGHT)), s.crossings(),
                "the short line ends above the contact point's row (y 120), and the crossing of x 88 fell in the "
                        + "hidden frames, so neither counts");
        assertTrue(Double.isNaN(s.pathLengthM()) && Double.isNaN(s.peakSpeedMs()), "no calibration, no metres");
    }

    @Test
    void aGroundPathGivesLengthAndSpeeds() {
        int[] frames = {0, 1, 2, 3, 90};
        GroundPath p = new GroundPath(1, frames, new double[] {0, 3, 6, 10, 50}, new double[] {0, 4, 8, 8, 8},
                new double[] {Double.NaN, 50, 40, Double.NaN, Double.NaN}, new double[] {0, 0.5, 0.4, 0, 0});
        TrackSummary s = TrackSummaries.of(project(Site.NONE), times(), Map.of(1, p)).get(0);
        assertEquals(14, s.pathLengthM(), 1e-12, "5 + 5 + 4 m; nothing across the gap to frame 90");
        assertEquals(45, s.meanSpeedMs(), 1e-12);
        assertEquals(50, s.peakSpeedMs(), 1e-12);
        assertEquals(0.5, s.peakSpeedSigmaMs(), 1e-12);
        assertEquals(0, s.peakLeftOut());
    }

    @Test
    void theTopSpeedOfADoubtfulFrameIsLeftOutOfThePeakAndCounted() {
        // Frame 2 has the largest speed but a sigma of 20% of it (above the 10% bound), frame 3 is interpolated:
        // the peak is frame 1's, and the two are counted as left out. The mean keeps all four.
        Map<Integer, FrameAnnotation> f = new TreeMap<>();
        for (int i = 0; i < 5; i++) {
            Box b = new Box(i, 100, 10, 20);
            f.put(i, i == 3 ? FrameAnnotation.interpolated(i, b, 4) : FrameAnnotation.tracked(i, b, 0.9, 1));
        }
        Project p = new Project(new VideoRef("v.mp4", 200, 200, FRAMES, ""), List.of(new ObjectClass("car", 0)),
                List.of(new Track(1, "car", "", f)), Site.NONE);
        GroundPath path = new GroundPath(1, new int[] {0, 1, 2, 3, 4}, new double[] {0, 1, 2, 3, 4}, new double[5],
                new double[] {10, 12, 20, 30, Double.NaN}, new double[] {0.5, 1.2, 4, 1, Double.NaN});
        TrackSummary s = TrackSummaries.of(p, times(), Map.of(1, path)).get(0);
        assertEquals(12, s.peakSpeedMs(), 1e-12, "1.2 is exactly at the bound, so frame 1 stays");
        assertEquals(1.2, s.peakSpeedSigmaMs(), 1e-12);
        assertEquals(2, s.peakLeftOut());
        assertEquals(18, s.meanSpeedMs(), 1e-12);
    }
}
