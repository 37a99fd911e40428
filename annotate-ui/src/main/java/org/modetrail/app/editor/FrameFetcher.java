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
    private final Map<Integer, BufferedImage> kept = new LinkedHashMap<>(KEPT, 0.75f, true) {
        @Override
        protected boolean removeEldestEntry(Map.Entry<Integer, BufferedImage> e) {
            return size() > KEPT;
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
                    img = new BufferedImage(f.width(), f.height(), BufferedImage.TYPE_INT_RGB);
                    img.setRGB(0, 0, f.width(), f.height(), f.rgb(), 0, f.width());
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

    @Override
    public void close() {
        worker.submit(video::close);
        worker.shutdown();
    }
}
