package org.modetrail.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.concurrent.CancellationException;

import org.junit.jupiter.api.Test;
import org.modetrail.model.Box;
import org.modetrail.model.BoxSource;
import org.modetrail.model.Edit;
import org.modetrail.model.Edits;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.ObjectClass;
import org.modetrail.model.Project;
import org.modetrail.model.Track;
import org.modetrail.model.VideoRef;

/** Keyframes to whole tracks on a video whose true boxes are known. */
class TrackRunnerTest {
    private static final ObjectClass ANIMAL = new ObjectClass("animal", 0xE69F00);

    private static Project projectFor(MovingTargetVideo v) {
        return Project.of(new VideoRef("moving-target", 480, 320, v.truth.length, ""));
    }

    @Test
    void oneKeyframeInTheMiddleGivesTheWholeTrackBothWays() throws Exception {
        MovingTargetVideo video = MovingTargetVideo.straightLine(80, null);
        Project p = Edits.newTrack(projectFor(video), ANIMAL, 40, video.truth[40]).project();
        Project done = new TrackRunner().trackAll(video, p, RunProgress.NONE, () -> false);
        Track t = done.track(1).orElseThrow();
        assertEquals(80, t.frames().size(), "every frame has a box");
        assertTrue(t.at(40).orElseThrow().isKeyframe());
        for (int f = 0; f < 80; f++) {
            FrameAnnotation a = t.at(f).orElseThrow();
            assertTrue(a.box().iou(video.truth[f]) > 0.7, "frame " + f + " IoU " + a.box().iou(video.truth[f]));
        }
        assertEquals(BoxSource.TRACKED, t.at(0).orElseThrow().source());
    }

    @Test
    void partialResultsShowTheTrackGrowingWithTrackedFramesOnly() throws Exception {
        MovingTargetVideo video = MovingTargetVideo.straightLine(80, null);
        Project p = Edits.newTrack(projectFor(video), ANIMAL, 40, video.truth[40]).project();
        java.util.List<Integer> sizes = new java.util.ArrayList<>();
        Project done = new TrackRunner().track(video, p, java.util.List.of(new Span(1, 0, 79)), RunProgress.NONE,
                () -> false, soFar -> {
                    Track t = soFar.track(1).orElseThrow();
                    assertTrue(t.frames().values().stream().allMatch(a -> a.isKeyframe()
                            || a.source() == BoxSource.TRACKED), "nothing stands in for frames not reached yet");
                    sizes.add(t.frames().size());
                }, java.time.Duration.ZERO);
        assertTrue(sizes.size() > 10, "published as it ran: " + sizes.size());
        for (int i = 1; i < sizes.size(); i++) {
            assertTrue(sizes.get(i) >= sizes.get(i - 1), "the track only grows: " + sizes);
        }
        assertTrue(sizes.get(sizes.size() - 1) <= done.track(1).orElseThrow().frames().size());
        assertEquals(80, done.track(1).orElseThrow().frames().size());
    }

    @Test
    void aHiddenStretchBetweenKeyframesIsInterpolatedAndMarkedSo() throws Exception {
        boolean[] hidden = new boolean[60];
        for (int f = 20; f < 40; f++) {
            hidden[f] = true;
        }
        MovingTargetVideo video = MovingTargetVideo.straightLine(60, hidden);
        Project p = Edits.newTrack(projectFor(video), ANIMAL, 0, video.truth[0]).project();
        p = Edits.setKeyframe(p, 1, 59, video.truth[59]).project();
        TrackRunner runner = new TrackRunner();
        Track t = runner.trackAll(video, p, RunProgress.NONE, () -> false).track(1).orElseThrow();
        assertEquals(60, t.frames().size());
        assertEquals(BoxSource.INTERPOLATED, t.at(30).orElseThrow().source(), "both passes lost it at frame 30");
        assertTrue(t.at(30).orElseThrow().box().iou(video.truth[30]) > 0.6, "straight motion interpolates well");
        assertEquals(BoxSource.TRACKED, t.at(10).orElseThrow().source());
    }

    @Test
    void severalTracksShareOneSequentialRead() throws Exception {
        MovingTargetVideo video = MovingTargetVideo.straightLine(50, null);
        Project p = Edits.newTrack(projectFor(video), ANIMAL, 0, video.truth[0]).project();
        p = Edits.newTrack(p, ANIMAL, 0, video.truth[0]).project();
        p = Edits.newTrack(p, ANIMAL, 0, video.truth[0]).project();
        new TrackRunner().trackAll(video, p, RunProgress.NONE, () -> false);
        assertEquals(50, video.framesRead, "three tracks forward from frame 0: one read of 50 frames");
    }

    @Test
    void afterAnEditOnlyItsSpanIsTrackedAgain() throws Exception {
        MovingTargetVideo video = MovingTargetVideo.straightLine(100, null);
        Project p = Edits.newTrack(projectFor(video), ANIMAL, 0, video.truth[0]).project();
        TrackRunner runner = new TrackRunner();
        p = runner.trackAll(video, p, RunProgress.NONE, () -> false);
        Edit e = Edits.setKeyframe(p, 1, 60, video.truth[60]);
        assertEquals(0, e.from());
        assertEquals(99, e.to());
        Edit inner = Edits.setKeyframe(e.project(), 1, 30, video.truth[30]);
        assertEquals(0, inner.from());
        assertEquals(60, inner.to());
        video.framesRead = 0;
        Project again = runner.track(video, inner.project(), List.of(new Span(1, inner.from(), inner.to())),
                RunProgress.NONE, () -> false);
        assertTrue(video.framesRead <= 61 + 61, "only frames 0..60 read, forward and back: " + video.framesRead);
        Track t = again.track(1).orElseThrow();
        assertTrue(t.at(45).orElseThrow().box().iou(video.truth[45]) > 0.7);
        assertTrue(t.at(30).orElseThrow().isKeyframe());
    }

    @Test
    void progressReachesTheTotalAndCancellingStops() throws Exception {
        MovingTargetVideo video = MovingTargetVideo.straightLine(40, null);
        Project p = Edits.newTrack(projectFor(video), ANIMAL, 20, video.truth[20]).project();
        long[] last = {0, 0};
        new TrackRunner().trackAll(video, p, (done, total) -> {
            last[0] = done;
            last[1] = total;
        }, () -> false);
        assertEquals(39, last[1], "19 frames forward and 20 back");
        assertEquals(last[1], last[0]);
        assertThrows(CancellationException.class,
                () -> new TrackRunner().trackAll(video, p, RunProgress.NONE, () -> true));
    }


    @Test
    void aTrackWhoseObjectHasGoneDoesNotTakeAnotherTracksObject() throws Exception {
        // Two look-alikes: A moves right and vanishes at frame 25; B stands still ahead of it, a track of its own.
        // Without the other track's claim, A's track coasts on its prediction into B and keeps it.
        boolean[] hidden = new boolean[90];
        for (int f = 25; f < 90; f++) {
            hidden[f] = true;
        }
        MovingTargetVideo video = MovingTargetVideo.straightLine(90, hidden);
        Box[] twin = new Box[90];
        java.util.Arrays.fill(twin, new Box(190, 100, 40, 30));
        video.twin = twin;
        Project p = Edits.newTrack(projectFor(video), ANIMAL, 0, video.truth[0]).project();
        p = Edits.newTrack(p, ANIMAL, 0, twin[0]).project();
        Project done = new TrackRunner().trackAll(video, p, RunProgress.NONE, () -> false);
        Track a = done.track(1).orElseThrow();
        Track b = done.track(2).orElseThrow();
        int onTwin = 0;
        for (int f = 25; f < 90; f++) {
            FrameAnnotation at = a.at(f).orElse(null);
            if (at != null && at.box() != null && at.source() == BoxSource.TRACKED && at.box().iou(twin[f]) > 0.3) {
                onTwin++;
            }
        }
        assertEquals(0, onTwin, "frames on which A's track sat on B");
        for (int f = 0; f < 90; f++) {
            assertTrue(b.at(f).orElseThrow().box().iou(twin[f]) > 0.7, "B's own track, frame " + f);
        }
    }
}
