package org.modetrail.app.editor;

import java.awt.image.BufferedImage;
import java.awt.image.DataBufferInt;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.Consumer;

import org.modetrail.video.VideoException;
import org.modetrail.video.VideoSource;

/**
 * Decodes the frames the window asks for on one worker thread, off the event thread. Only the newest request is
 * served (dragging through the timeline never queues up decodes); the last few pictures are kept, so stepping back
 * and forth over them costs nothing. Results are handed to {@code deliver} on the worker thread; the window passes
 * them on to the event thread.
 *
 * <p>A request that needs more than a few decodes (a jump) is answered at once with the nearest picture already
 * at hand, and, when the keyframe the decoder starts from is nearer still, with that keyframe as soon as it is
 * decoded, on the way to the exact frame (no extra seek: the decoder goes on from the keyframe). Each of these
 * comes as a {@link Delivery} whose {@code shown} frame is not the {@code wanted} one; the exact picture follows.
 *
 * <p>Pictures are decoded straight into the pixel arrays of kept pictures, reusing the one the kept set last let
 * go of: stepping allocates nothing, where a new 8 MB array per 1080p frame would cost more than decoding it.
 */
final class FrameFetcher implements AutoCloseable {
    /** Pictures kept: a 1080p picture is 8 MB. */
    private static final int KEPT = 16;
    /** Decodes above which a request is answered with a stand-in picture first. */
    private static final int SLOW_DECODES = 3;

    /**
     * A picture for a request: frame {@code shown}'s picture, asked for frame {@code wanted}. The picture belongs to
     * the fetcher and is reused sixteen frames later: copy it to keep it.
     */
    record Delivery(int wanted, int shown, BufferedImage image) {
        /** Whether this is the frame asked for, not a stand-in on the way to it. */
        boolean exact() {
            return wanted == shown;
        }
    }

    private final VideoSource video;
    private final ExecutorService worker = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "editor-decoder");
        t.setDaemon(true);
        return t;
    });
    private final AtomicInteger wanted = new AtomicInteger(-1);
    /** The picture the kept set last let go of, reused for the next frame decoded. */
    private BufferedImage spare;
    /** The last frame decoded: the decoder goes on from there without a seek. Worker thread only. */
    private int lastDecoded = -1;
    private final Map<Integer, BufferedImage> kept = new LinkedHashMap<>(KEPT, 0.75f, true) {
        @Override
        protected boolean removeEldestEntry(Map.Entry<Integer, BufferedImage> e) {
            if (size() > KEPT) {
                spare = e.getValue();
                return true;
            }
            return false;
        }
    };

    FrameFetcher(VideoSource video) {
        this.video = video;
    }

    VideoSource video() {
        return video;
    }

    /**
     * Asks for frame {@code n}. {@code deliver} gets stand-ins (see the class comment) and then the exact picture,
     * or {@code failed} a message instead; nothing more comes once a newer request was made.
     */
    void request(int n, Consumer<Delivery> deliver, Consumer<String> failed) {
        wanted.set(n);
        worker.submit(() -> serve(n, deliver, failed));
    }

    private void serve(int n, Consumer<Delivery> deliver, Consumer<String> failed) {
        if (wanted.get() != n) {
            return; // a newer request is queued
        }
        BufferedImage img;
        synchronized (kept) {
            img = kept.get(n);
        }
        if (img != null) {
            deliver.accept(new Delivery(n, n, img));
            return;
        }
        try {
            int decodes = decodesFor(n);
            if (decodes > SLOW_DECODES) {
                int near = nearestKept(n);
                int key = video.index().keyframeAtOrBefore(n);
                if (near >= 0) {
                    deliver.accept(new Delivery(n, near, keptPicture(near)));
                }
                boolean keyNearer = near < 0 || n - key < Math.abs(n - near);
                if (keyNearer && key != n && key != lastDecoded && n - key > SLOW_DECODES) {
                    BufferedImage keyPicture = decode(key);
                    if (wanted.get() != n) {
                        return;
                    }
                    deliver.accept(new Delivery(n, key, keyPicture));
                }
            }
            if (wanted.get() != n) {
                return;
            }
            deliver.accept(new Delivery(n, n, decode(n)));
        } catch (VideoException e) {
            failed.accept("frame " + n + ": " + e.getMessage());
        }
    }

    /** About how many pictures the decoder must make to reach frame n from where it is. */
    private int decodesFor(int n) {
        int key = video.index().keyframeAtOrBefore(n);
        if (lastDecoded >= 0 && lastDecoded < n && key <= lastDecoded) {
            return n - lastDecoded;
        }
        return n - key + 1;
    }

    private int nearestKept(int n) {
        synchronized (kept) {
            int best = -1;
            for (int k : kept.keySet()) {
                if (best < 0 || Math.abs(k - n) < Math.abs(best - n)) {
                    best = k;
                }
            }
            return best;
        }
    }

    private BufferedImage keptPicture(int k) {
        synchronized (kept) {
            return kept.get(k);
        }
    }

    /** Decodes frame k into a reused picture and keeps it. */
    private BufferedImage decode(int k) throws VideoException {
        BufferedImage reuse;
        synchronized (kept) {
            reuse = spare;
            spare = null;
        }
        BufferedImage img = reuse != null && reuse.getWidth() == video.info().width()
                && reuse.getHeight() == video.info().height() ? reuse
                : new BufferedImage(video.info().width(), video.info().height(), BufferedImage.TYPE_INT_RGB);
        try {
            // TYPE_INT_RGB ignores the alpha byte of the packed 0xFFRRGGBB pixels, so they go in as they are.
            video.frame(k, ((DataBufferInt) img.getRaster().getDataBuffer()).getData());
        } catch (VideoException e) {
            synchronized (kept) {
                spare = img;
            }
            throw e;
        }
        lastDecoded = k;
        synchronized (kept) {
            kept.put(k, img);
        }
        return img;
    }

    @Override
    public void close() {
        worker.submit(video::close);
        worker.shutdown();
    }
}
