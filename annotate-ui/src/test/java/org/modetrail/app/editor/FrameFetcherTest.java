package org.modetrail.app.editor;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.Test;
import org.modetrail.video.Frame;
import org.modetrail.video.FrameIndex;
import org.modetrail.video.FrameSink;
import org.modetrail.video.VideoException;
import org.modetrail.video.VideoInfo;
import org.modetrail.video.VideoSource;

/**
 * The frame supply's rules, on a video whose every pixel holds its frame number and which counts the pictures the
 * decoder is made to produce: decoding from the keyframe as a real decoder does.
 */
class FrameFetcherTest {
    private static final int FRAMES = 300;
    private static final int GOP = 100;

    @Test
    void aJumpShowsTheNearestKeptPictureThenTheKeyframeThenTheExactFrame() throws Exception {
        CountingVideo video = new CountingVideo();
        try (FrameFetcher f = new FrameFetcher(video)) {
            fetch(f, 10);
            video.decodedSince();
            List<FrameFetcher.Delivery> got = fetch(f, 180);
            assertEquals(List.of(10, 100, 180), shown(got), "kept picture at once, keyframe 100, then frame 180");
            for (FrameFetcher.Delivery d : got) {
                assertEquals(180, d.wanted());
                assertEquals(d.shown(), pixel(d.image()), "each picture is the frame it says it is");
            }
            assertTrue(got.get(2).exact());
            assertEquals(81, video.decodedSince(), "frames 100 to 180 decoded once: the keyframe is not decoded twice");
        }
    }

    @Test
    void aJumpNearAKeptPictureShowsOnlyThatOnTheWay() throws Exception {
        CountingVideo video = new CountingVideo();
        try (FrameFetcher f = new FrameFetcher(video)) {
            fetch(f, 150);
            assertEquals(List.of(150, 140), shown(fetch(f, 140)), "kept 150 is nearer than keyframe 100");
        }
    }

    @Test
    void stepsForwardComeWithoutStandIns() throws Exception {
        CountingVideo video = new CountingVideo();
        try (FrameFetcher f = new FrameFetcher(video)) {
            fetch(f, 120);
            for (int n = 121; n < 130; n++) {
                assertEquals(List.of(n), shown(fetch(f, n)), "step to " + n);
            }
        }
    }

    @Test
    void aStepBackPastTheKeptPicturesDecodesABlockSoTheNextStepsBackDecodeNothing() throws Exception {
        CountingVideo video = new CountingVideo();
        try (FrameFetcher f = new FrameFetcher(video)) {
            fetch(f, 260);
            fetch(f, 259); // decoded from keyframe 200, with the block before it
            video.decodedSince();
            int block = f.keptCapacity() * 2 / 3;
            for (int n = 258; n > 259 - block; n--) {
                assertEquals(List.of(n), shown(fetch(f, n)));
            }
            assertEquals(0, video.decodedSince(), "the steps back within the block were at hand");
        }
    }

    @Test
    void theBlockNeverReachesBackPastTheKeyframe() throws Exception {
        CountingVideo video = new CountingVideo();
        try (FrameFetcher f = new FrameFetcher(video)) {
            fetch(f, 203);
            video.decodedSince();
            fetch(f, 202);
            assertEquals(3, video.decodedSince(), "frames 200 to 202 only, not a run from keyframe 100");
        }
    }

    @Test
    void picturesAreReusedNotMadeAnewForEveryStep() throws Exception {
        CountingVideo video = new CountingVideo();
        try (FrameFetcher f = new FrameFetcher(video)) {
            List<BufferedImage> seen = new ArrayList<>();
            for (int n = 0; n < 3 * f.keptCapacity(); n++) {
                BufferedImage img = fetch(f, n).get(0).image();
                if (seen.stream().noneMatch(s -> s == img)) {
                    seen.add(img);
                }
                assertEquals(n, pixel(img));
            }
            assertTrue(seen.size() <= f.keptCapacity() + 2, seen.size() + " pictures for " + 3 * f.keptCapacity()
                    + " steps");
        }
    }

    private static List<Integer> shown(List<FrameFetcher.Delivery> got) {
        return got.stream().map(FrameFetcher.Delivery::shown).toList();
    }

    private static int pixel(BufferedImage img) {
        return img.getRGB(0, 0) & 0xFFFFFF;
    }

    /** Everything delivered for one request, up to the exact picture. */
    private static List<FrameFetcher.Delivery> fetch(FrameFetcher f, int n) throws InterruptedException {
        List<FrameFetcher.Delivery> got = new ArrayList<>();
        CountDownLatch done = new CountDownLatch(1);
        f.request(n, d -> {
            synchronized (got) {
                got.add(d);
            }
            if (d.exact()) {
                done.countDown();
            }
        }, msg -> done.countDown());
        assertTrue(done.await(10, TimeUnit.SECONDS), "frame " + n + " came");
        synchronized (got) {
            return List.copyOf(got);
        }
    }

    /** Frames that show their own number; decoding goes on from the last frame or starts again at a keyframe. */
    private static final class CountingVideo implements VideoSource {
        private final FrameIndex index;
        private int position = -1;
        private int decoded;

        CountingVideo() {
            long[] pts = new long[FRAMES];
            boolean[] key = new boolean[FRAMES];
            for (int i = 0; i < FRAMES; i++) {
                pts[i] = i;
                key[i] = i % GOP == 0;
            }
            index = new FrameIndex(pts, key, 1, 25);
        }

        synchronized int decodedSince() {
            int d = decoded;
            decoded = 0;
            return d;
        }

        @Override
        public Path path() {
            return Path.of("counting.mp4");
        }

        @Override
        public VideoInfo info() {
            return new VideoInfo(8, 4, FRAMES, FRAMES / 25.0, 25, false, FRAMES / GOP, "test", "test");
        }

        @Override
        public FrameIndex index() {
            return index;
        }

        @Override
        public Frame frame(int n) throws VideoException {
            return frame(n, new int[32]);
        }

        @Override
        public synchronized Frame frame(int n, int[] into) {
            int key = index.keyframeAtOrBefore(n);
            if (position < 0 || position >= n || key > position) {
                position = key - 1; // a seek
            }
            decoded += n - position;
            position = n;
            Arrays.fill(into, 0, 32, 0xFF000000 | n);
            return new Frame(n, n / 25.0, 8, 4, into);
        }

        @Override
        public void read(int from, int to, FrameSink sink) {
            throw new UnsupportedOperationException();
        }

        @Override
        public int[] unreadableFrames() {
            return new int[0];
        }

        @Override
        public void close() {
        }
    }
}
