package org.modetrail.video;

/** Receives frames during sequential reading. */
@FunctionalInterface
public interface FrameSink {
    /**
     * Called once per frame in presentation order. The frame's pixel buffer is reused by the next call: copy what
     * you keep.
     *
     * @return true to go on reading, false to stop early
     */
    boolean accept(Frame frame) throws VideoException;

    /** Called instead of {@link #accept} for a frame that the decoder could not produce. Ignored by default. */
    default void unreadable(int index, String reason) {
    }
}
