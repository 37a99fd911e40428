package org.modetrail.overlay;

/** Which encoder writes the overlay video. */
public enum OverlayCodec {
    /** H.264 through libopenh264 when the FFmpeg build has it, MPEG-4 Part 2 otherwise. */
    AUTO,
    /** H.264 through libopenh264 (plays in browsers and most players); fails when the build lacks it. */
    H264,
    /** MPEG-4 Part 2 (FFmpeg's own mpeg4 encoder, always there), at a fixed quantiser. */
    MPEG4
}
