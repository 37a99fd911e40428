package org.modetrail.app.bench;

import java.nio.ByteBuffer;
import java.nio.file.Path;

import org.bytedeco.javacv.FFmpegFrameGrabber;
import org.bytedeco.javacv.Frame;
import org.bytedeco.javacv.FrameGrabber;

/**
 * The reference the video layer is held against: JavaCV's own {@link FFmpegFrameGrabber} with its default settings
 * (BGR24 output through swscale bicubic, into a native buffer that JavaCV reuses; nothing is copied to the Java
 * heap), given only the same decoder thread count as the source under test.
 */
final class BareGrabber implements AutoCloseable {
    private final FFmpegFrameGrabber grabber;

    private BareGrabber(FFmpegFrameGrabber grabber) {
        this.grabber = grabber;
    }

    static BareGrabber start(Path clip, int threads) throws FrameGrabber.Exception {
        FFmpegFrameGrabber g = new FFmpegFrameGrabber(clip.toFile());
        if (threads > 0) {
            // JavaCV asks for automatic threads itself; the codec option given at open wins over that.
            g.setVideoOption("threads", Integer.toString(threads));
        }
        g.start();
        return new BareGrabber(g);
    }

    /** grabImage() until the end: demux, decode, convert to BGR24. Returns the number of pictures. */
    int readAll() throws FrameGrabber.Exception {
        int count = 0;
        long touched = 0;
        Frame f;
        while ((f = grabber.grabImage()) != null) {
            touched += ((ByteBuffer) f.image[0]).get(0);
            count++;
        }
        return touched == Long.MIN_VALUE ? -1 : count; // keeps the pixel read from being optimised away
    }

    /** setVideoFrameNumber(n) then grabImage(): JavaCV's way to frame n, converted to BGR24. */
    Frame seekAndGrab(int n) throws FrameGrabber.Exception {
        grabber.setVideoFrameNumber(n);
        return grabber.grabImage();
    }

    @Override
    public void close() throws FrameGrabber.Exception {
        grabber.stop();
        grabber.release();
    }
}
