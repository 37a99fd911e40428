package org.modetrail.overlay;

import java.nio.file.Path;

/**
 * What an overlay run wrote.
 *
 * @param file          the video file
 * @param firstFrame    the source frame the video starts with
 * @param framesWritten frames in the video
 * @param encoder       FFmpeg's name of the encoder used: "libopenh264" or "mpeg4"
 * @param codec         the stream's codec as ffprobe names it: "h264" or "mpeg4"
 * @param width         picture width (the source's, made even)
 * @param height        picture height (the source's, made even)
 * @param frameRate     frames per second
 * @param bytes         file size
 * @param repeatedFrames source frames that could not be decoded, filled with the picture before them so the
 *                       timing holds
 */
public record OverlayResult(Path file, int firstFrame, int framesWritten, String encoder, String codec, int width,
                            int height, double frameRate, long bytes,
                            int repeatedFrames) {
}
