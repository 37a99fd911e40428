package org.modetrail.app.bench;

import java.nio.ByteBuffer;
import java.nio.file.Path;
import java.util.Random;

import org.bytedeco.javacv.FrameGrabber;
import org.modetrail.video.Frame;
import org.modetrail.video.VideoException;
import org.modetrail.video.VideoOptions;
import org.modetrail.video.VideoSource;

/**
 * Random access on a fresh cache: for each random frame n, a newly opened VideoSource (index from the disk cache,
 * opening not timed) serves frame(n), then frame(n+1) and frame(n-1), the steps an editor makes next. The reference
 * is a newly started bare grabber going to the same n. Both sides get the same frames, back to back.
 */
final class RandomAccessBench {
    /** Pixels compared to tell whether the bare seek gave the same picture; colour conversions may differ by 2. */
    private static final int PROBES = 64;
    private static final int TOLERANCE = 2;
    private static final int WARM_UP_SAMPLES = 3;

    private RandomAccessBench() {
    }

    /**
     * Milliseconds per sample, and how many bare seeks gave the picture frame(n) gave.
     */
    record Result(int[] frames, double[] sourceMs, double[] stepForwardMs, double[] stepBackMs, double[] bareSeekMs,
                  int bareSeekExact) {
    }

    /** Random frames with a neighbour either side, the same for every run with the same seed. */
    static int[] pick(int frameCount, int samples, long seed) {
        if (frameCount < 3) {
            throw new IllegalArgumentException("random access needs at least 3 frames, the clip has " + frameCount);
        }
        Random random = new Random(seed);
        int[] n = new int[samples];
        for (int i = 0; i < samples; i++) {
            n[i] = 1 + random.nextInt(frameCount - 2);
        }
        return n;
    }

    static Result run(Path clip, VideoOptions options, int threads, int[] frames)
            throws VideoException, FrameGrabber.Exception {
        // Warm-up, untimed: besides the JIT, the Java heap must first grow to hold a random access's frames
        // (8 MB each at 1080p), and memory touched for the first time costs far more than the copies themselves
        // (up to 50 ms per frame measured in this VM); a few accesses grow it to its working size.
        for (int w = 0; w < WARM_UP_SAMPLES; w++) {
            sample(clip, options, threads, frames[w % frames.length], new double[4], w % 2 == 1);
        }
        int n = frames.length;
        double[] source = new double[n];
        double[] forward = new double[n];
        double[] back = new double[n];
        double[] bare = new double[n];
        int exact = 0;
        for (int i = 0; i < n; i++) {
            double[] ms = new double[4];
            // Alternating which side goes first keeps any order effect out of the paired ratios.
            if (sample(clip, options, threads, frames[i], ms, i % 2 == 1)) {
                exact++;
            }
            source[i] = ms[0];
            forward[i] = ms[1];
            back[i] = ms[2];
            bare[i] = ms[3];
        }
        return new Result(frames, source, forward, back, bare, exact);
    }

    /** Fills ms with frame(n), frame(n+1), frame(n-1) and the bare seek; returns whether the bare seek matched. */
    private static boolean sample(Path clip, VideoOptions options, int threads, int n, double[] ms,
                                  boolean bareFirst) throws VideoException, FrameGrabber.Exception {
        if (bareFirst) {
            BareSeek bare = bareSeek(clip, threads, n);
            Frame wanted = sourceAccess(clip, options, n, ms);
            ms[3] = bare.ms;
            return bare.sameAs(wanted);
        }
        Frame wanted = sourceAccess(clip, options, n, ms);
        BareSeek bare = bareSeek(clip, threads, n);
        ms[3] = bare.ms;
        return bare.sameAs(wanted);
    }

    /** frame(n), then n+1 and n-1, on a newly opened source; fills ms[0..2] and returns frame n. */
    private static Frame sourceAccess(Path clip, VideoOptions options, int n, double[] ms) throws VideoException {
        try (VideoSource s = VideoSource.open(clip, options)) {
            long t0 = System.nanoTime();
            Frame wanted = s.frame(n);
            long t1 = System.nanoTime();
            s.frame(n + 1);
            long t2 = System.nanoTime();
            s.frame(n - 1);
            long t3 = System.nanoTime();
            ms[0] = (t1 - t0) / 1e6;
            ms[1] = (t2 - t1) / 1e6;
            ms[2] = (t3 - t2) / 1e6;
            return wanted;
        }
    }

    /** The bare seek's time and a few of its pixels, taken before the grabber reuses its buffer. */
    private record BareSeek(double ms, int width, int height, int[] probes) {
        boolean sameAs(Frame ours) {
            if (probes == null || width != ours.width() || height != ours.height()) {
                return false;
            }
            int[] expected = probe(ours);
            for (int i = 0; i < probes.length; i++) {
                for (int shift = 0; shift <= 16; shift += 8) {
                    if (Math.abs(((probes[i] >> shift) & 0xFF) - ((expected[i] >> shift) & 0xFF)) > TOLERANCE) {
                        return false;
                    }
                }
            }
            return true;
        }
    }

    private static BareSeek bareSeek(Path clip, int threads, int n) throws FrameGrabber.Exception {
        try (BareGrabber g = BareGrabber.start(clip, threads)) {
            long t0 = System.nanoTime();
            org.bytedeco.javacv.Frame got = g.seekAndGrab(n);
            double ms = (System.nanoTime() - t0) / 1e6;
            if (got == null || got.image == null || got.imageChannels != 3) {
                return new BareSeek(ms, 0, 0, null);
            }
            return new BareSeek(ms, got.imageWidth, got.imageHeight, probe(got));
        }
    }

    /** The same spread of pixel positions for every picture of a given size. */
    private static int[][] positions(int width, int height) {
        Random spread = new Random(1);
        int[][] xy = new int[PROBES][];
        for (int i = 0; i < PROBES; i++) {
            xy[i] = new int[] {spread.nextInt(width), spread.nextInt(height)};
        }
        return xy;
    }

    /** Probed pixels of our frame, as 0xRRGGBB. */
    static int[] probe(Frame ours) {
        int[][] xy = positions(ours.width(), ours.height());
        int[] v = new int[PROBES];
        for (int i = 0; i < PROBES; i++) {
            v[i] = ours.rgbAt(xy[i][0], xy[i][1]) & 0xFFFFFF;
        }
        return v;
    }

    /** Probed pixels of the grabber's BGR24 image, as 0xRRGGBB. */
    static int[] probe(org.bytedeco.javacv.Frame theirs) {
        int[][] xy = positions(theirs.imageWidth, theirs.imageHeight);
        ByteBuffer bgr = (ByteBuffer) theirs.image[0];
        int[] v = new int[PROBES];
        for (int i = 0; i < PROBES; i++) {
            int at = xy[i][1] * theirs.imageStride + xy[i][0] * 3;
            v[i] = (bgr.get(at + 2) & 0xFF) << 16 | (bgr.get(at + 1) & 0xFF) << 8 | (bgr.get(at) & 0xFF);
        }
        return v;
    }
}
