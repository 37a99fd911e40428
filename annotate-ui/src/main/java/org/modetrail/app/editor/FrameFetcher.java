package org.modetrail.app.editor;

import java.awt.image.BufferedImage;
import java.awt.image.DataBufferInt;
import java.util.ArrayDeque;
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
 * <p>A step back past the kept pictures decodes a block of the frames before it in the same forward run from the
 * keyframe, so only one step back in a block waits for the decoder.
 *
 * <p>Pictures are decoded straight into the pixel arrays of kept pictures, reusing the one the kept set last let
 * go of, and new pictures are made in idle moments after a request is served: stepping allocates nothing, where a
 * new 8 MB array per 1080p frame costs more than decoding it.
 */
final class FrameFetcher implements AutoCloseable {
    /** Memory the kept pictures may take: 24 pictures of 1080p (8 MB each), 6 of 4K. */
    private static final long KEPT_BYTES = 200L << 20;
    /** Decodes above which a request is answered with a stand-in picture first. */
    private static final int SLOW_DECODES = 3;

    /**
     * A picture for a request: frame {@code shown}'s picture, asked for frame {@code wanted}. The picture belongs to
     * the fetcher and is reused some frames later: copy it to keep it.
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
    /** Pictures made ahead, in idle moments, so that a step does not wait for 8 MB of fresh memory. */
    private final ArrayDeque<BufferedImage> made = new ArrayDeque<>();
    /** The last frame asked for, to tell a step back from a jump. Worker thread only. */
    private int lastWanted = -1;
    /** How many pictures are kept; at least 4, whatever the frame size. */
    private final int keep;
    /** Pictures decoded in one go on a step back past the kept ones: the steps back after it cost nothing. */
    private final int backBlock;
    private final Map<Integer, BufferedImage> kept;

    FrameFetcher(VideoSource video) {
        this.video = video;
        long pictureBytes = 4L * video.info().width() * video.info().height();
        this.keep = (int) Math.max(4, Math.min(64, KEPT_BYTES / Math.max(1, pictureBytes)));
        this.backBlock = Math.max(2, keep * 2 / 3);
        this.kept = new LinkedHashMap<>(keep, 0.75f, true) {
            @Override
            protected boolean removeEldestEntry(Map.Entry<Integer, BufferedImage> e) {
                if (size() > keep) {
                    spare = e.getValue();
                    return true;
                }
                return false;
            }
        };
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
        boolean stepBack = n == lastWanted - 1;
        lastWanted = n;
        BufferedImage img;
        synchronized (kept) {
            img = kept.get(n);
        }
        if (img != null) {
            deliver.accept(new Delivery(n, n, img));
            makeAhead(n);
            return;
        }
        try {
            if (stepBack && n > 0) {
                // A step back past the kept pictures: decode the frames before it too, in one forward run from
                // the keyframe (the decoder has to pass them anyway), so the next steps back are at hand. Never
                // from before that keyframe: those would cost a run from the keyframe before.
                int from = Math.max(video.index().keyframeAtOrBefore(n), n - backBlock + 1);
                for (int k = from; k < n; k++) {
                    if (wanted.get() != n) {
                        return;
                    }
                    if (!isKept(k)) {
                        decode(k);
                    }
                }
            }
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
            makeAhead(n);
        } catch (VideoException e) {
            failed.accept("frame " + n + ": " + e.getMessage());
        }
    }

    /** While no newer request waits, makes a picture for a later step, until there are enough. */
    private void makeAhead(int n) {
        int have;
        synchronized (kept) {
            have = kept.size() + made.size() + (spare != null ? 1 : 0);
        }
        if (have < keep + 1 && wanted.get() == n) {
            BufferedImage img = new BufferedImage(video.info().width(), video.info().height(),
                    BufferedImage.TYPE_INT_RGB);
            synchronized (kept) {
                made.add(img);
            }
        }
    }

    private boolean isKept(int k) {
        synchronized (kept) {
            return kept.containsKey(k);
        }
    }

    /** How many pictures are kept for stepping (depends on the frame size). */
    int keptCapacity() {
        return keep;
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
            reuse = spare != null ? spare : made.poll();
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
