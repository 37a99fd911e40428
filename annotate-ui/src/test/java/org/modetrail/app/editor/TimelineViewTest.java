package org.modetrail.app.editor;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.List;
import java.util.TreeMap;

import org.junit.jupiter.api.Test;
import org.modetrail.model.Box;
import org.modetrail.model.Edits;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.ObjectClass;
import org.modetrail.model.Project;
import org.modetrail.model.Track;
import org.modetrail.model.VideoRef;

/** The timeline's geometry and painting, without a display (a component painted into an image). */
class TimelineViewTest {
    private static final int LANES = 800;

    private static TimelineView view(Project p, int frames) {
        TimelineView v = new TimelineView();
        v.setSize(TimelineView.LABEL_WIDTH + LANES + TimelineView.RIGHT_MARGIN, 200);
        v.setProject(p, frames);
        return v;
    }

    @Test
    void pixelsAndFramesMapBothWays() {
        TimelineView v = view(TimelineDemo.project(null), TimelineDemo.FRAMES);
        // 450 frames over 800 columns: column c shows frame floor(c * 450 / 800).
        assertEquals(0, v.frameAtX(TimelineView.LABEL_WIDTH));
        assertEquals(225, v.frameAtX(TimelineView.LABEL_WIDTH + 400));
        assertEquals(449, v.frameAtX(10_000), "clamped to the last frame");
        assertEquals(0, v.frameAtX(0), "the label column counts as the first column");
        int[][] ranges = {{0, 450}, {100, 37}, {17, 10}, {0, 12}};
        for (int[] r : ranges) {
            v.setVisibleRange(r[0], r[1]);
            for (int f = r[0]; f < r[0] + r[1]; f++) {
                assertEquals(f, v.frameAtX(v.xOfFrame(f)), "frame " + f + " in " + r[0] + "+" + r[1]);
            }
        }
    }

    @Test
    void zoomKeepsTheFrameUnderThePointer() {
        TimelineView v = view(TimelineDemo.project(null), TimelineDemo.FRAMES);
        int x = TimelineView.LABEL_WIDTH + 200; // frame floor(200 * 450 / 800) = 112
        v.zoom(0.5, x);
        assertEquals(225, v.visibleSpan());
        assertEquals(112, v.frameAtX(x));
        assertEquals(112 - 56, v.visibleFirst()); // 200 columns of 225 / 800 frames
        v.zoom(0.01, x);
        assertEquals(TimelineView.MIN_SPAN, v.visibleSpan(), "no closer than the least span");
        assertEquals(112, v.frameAtX(x));
        v.zoom(100, x);
        assertEquals(450, v.visibleSpan());
        assertEquals(0, v.visibleFirst());
    }

    @Test
    void theViewFollowsTheCurrentFrame() {
        TimelineView v = view(TimelineDemo.project(null), TimelineDemo.FRAMES);
        v.setVisibleRange(0, 100);
        v.setCurrentFrame(50);
        assertEquals(0, v.visibleFirst(), "in view: no scrolling");
        v.setCurrentFrame(250);
        assertEquals(240, v.visibleFirst(), "a tenth of the view in from the left");
        v.setCurrentFrame(100);
        assertEquals(10, v.visibleFirst(), "a tenth of the view in from the right");
        v.setCurrentFrame(5_000);
        assertEquals(449, v.currentFrame(), "clamped to the video");
        assertEquals(350, v.visibleFirst());
    }

    @Test
    void lanesGoInIdOrderAndTracksAreFoundByHeight() {
        TimelineView v = view(TimelineDemo.project(null), TimelineDemo.FRAMES);
        assertEquals(List.of(1, 2, 3, 4), v.lanes().stream().map(LaneModel::trackId).toList());
        assertNull(v.trackAtY(5), "the ruler");
        assertEquals(1, v.trackAtY(TimelineView.RULER_HEIGHT));
        assertEquals(4, v.trackAtY(TimelineView.RULER_HEIGHT + 3 * 18 + 17));
        assertNull(v.trackAtY(TimelineView.RULER_HEIGHT + 4 * 18));
        assertEquals(TimelineView.RULER_HEIGHT + 18, v.laneTop(2));
        assertEquals(-1, v.laneTop(99));
    }

    @Test
    void anEditRebuildsOnlyTheLaneItChanged() {
        Project p = TimelineDemo.project(null);
        TimelineView v = view(p, TimelineDemo.FRAMES);
        List<LaneModel> before = v.lanes();
        Project edited = Edits.setKeyframe(p, 3, 10, new Box(1, 2, 30, 30)).project();
        v.setProject(edited, TimelineDemo.FRAMES);
        List<LaneModel> after = v.lanes();
        assertSame(before.get(0), after.get(0));
        assertSame(before.get(1), after.get(1));
        assertNotSame(before.get(2), after.get(2));
        assertSame(before.get(3), after.get(3));
        assertEquals(LaneModel.State.KEYFRAME, after.get(2).stateAt(10));
    }

    @Test
    void aSingleWeakFrameInAnHourIsPainted() {
        int n = 100_000;
        List<Track> tracks = new ArrayList<>();
        Box b = new Box(10, 10, 20, 20);
        for (int t = 1; t <= 50; t++) {
            TreeMap<Integer, FrameAnnotation> m = new TreeMap<>();
            for (int f = 0; f < n; f += 10) { // every tenth frame tracked, to keep the test's memory small
                m.put(f, FrameAnnotation.tracked(f, b, t == 50 && f == 61_230 ? 0.1 : 0.9));
            }
            tracks.add(new Track(t, "car", "", m));
        }
        Project p = new Project(new VideoRef("hour.mp4", 1920, 1080, n, ""), List.of(new ObjectClass("car", 0x0072B2)),
                tracks);
        TimelineView v = new TimelineView();
        v.setSize(TimelineView.LABEL_WIDTH + LANES + TimelineView.RIGHT_MARGIN,
                TimelineView.RULER_HEIGHT + 50 * TimelineView.LANE_HEIGHT);
        long t0 = System.nanoTime();
        v.setProject(p, n);
        BufferedImage img = new BufferedImage(v.getWidth(), v.getHeight(), BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        v.paint(g);
        g.dispose();
        System.out.printf("timeline of 50 tracks x %d frames: lanes and one paint in %.1f ms%n", n,
                (System.nanoTime() - t0) / 1e6);
        // Frame 61,230 is in column 489 (columns of 125 frames): lane 50, around the bar's middle.
        int x = TimelineView.LABEL_WIDTH + 489;
        int y = TimelineView.RULER_HEIGHT + 49 * TimelineView.LANE_HEIGHT + TimelineView.LANE_HEIGHT / 2;
        boolean weakColour = false;
        for (int dx = -2; dx <= 2; dx++) {
            for (int dy = -3; dy <= 3; dy++) {
                weakColour |= new Color(img.getRGB(x + dx, y + dy)).equals(LanePainter.VERMILLION)
                        || new Color(img.getRGB(x + dx, y + dy)).equals(LanePainter.ORANGE);
            }
        }
        assertTrue(weakColour, "the weak frame's mark is drawn");
        // Lane 49 at the same place is plain tracked.
        int y49 = y - TimelineView.LANE_HEIGHT;
        Color tracked = new Color(img.getRGB(x, y49));
        assertTrue(tracked.equals(LanePainter.BLUE) || tracked.equals(LanePainter.SKY_BLUE), "tracked: " + tracked);
    }
}
