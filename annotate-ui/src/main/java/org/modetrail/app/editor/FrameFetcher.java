package org.modetrail.app.editor;

import java.awt.image.BufferedImage;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.BiConsumer;
import java.util.function.Consumer;

import org.modetrail.video.Frame;
import org.modetrail.video.VideoException;
import org.modetrail.video.VideoSource;

/**
 * Decodes the frames the window asks for on one worker thread, off the event thread. Only the newest request is
 * served (dragging through the timeline never queues up decodes); the last few pictures are kept, so stepping back
 * and forth over them costs nothing. Results are handed to {@code deliver} on the worker thread; the window passes
 * them on to the event thread.
 */
final class FrameFetcher implements AutoCloseable {
    /** Pictures kept: a 1080p picture is 8 MB. */
    private static final int KEPT = 16;
    private final VideoSource video;
    private final ExecutorService worker = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "editor-decoder");
        t.setDaemon(true);
        return t;
    });
    private final AtomicInteger wanted = new AtomicInteger(-1);
    /** The picture the kept set last let go of, reused for the next frame (saves allocating 8 MB a step). */
    private BufferedImage spare;
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

    /** Asks for frame {@code n}; {@code deliver} gets it (frame, picture), {@code failed} a message instead. */
    void request(int n, BiConsumer<Integer, BufferedImage> deliver, Consumer<String> failed) {
        wanted.set(n);
        worker.submit(() -> {
            if (wanted.get() != n) {
                return; // a newer request is queued
            }
            BufferedImage img;
            synchronized (kept) {
                img = kept.get(n);
            }
            if (img == null) {
                try {
                    Frame f = video.frame(n);
                    BufferedImage reuse;
                    synchronized (kept) {
                        reuse = spare;
                        spare = null;
                    }
                    img = picture(f, reuse);
                } catch (VideoException e) {
                    failed.accept("frame " + n + ": " + e.getMessage());
                    return;
                }
                synchronized (kept) {
                    kept.put(n, img);
                }
            }
            deliver.accept(n, img);
        });
    }

    /**
     * The frame as a picture: one bulk copy into the picture's own pixel array (TYPE_INT_RGB ignores alpha), into
     * {@code reuse} when it has the frame's size. The picture reused is one no longer kept: sixteen frames ago at
     * least, never the one on screen.
     */
    static BufferedImage picture(Frame f, BufferedImage reuse) {
        BufferedImage img = reuse != null && reuse.getWidth() == f.width() && reuse.getHeight() == f.height()
                ? reuse : new BufferedImage(f.width(), f.height(), BufferedImage.TYPE_INT_RGB);
        int[] pixels = ((java.awt.image.DataBufferInt) img.getRaster().getDataBuffer()).getData();
        System.arraycopy(f.rgb(), 0, pixels, 0, pixels.length);
        return img;
    }

    @Override
    public void close() {
        worker.submit(video::close);
        worker.shutdown();
    }
}
