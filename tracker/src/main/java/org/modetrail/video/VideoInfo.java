package org.modetrail.video;

/**
 * What a user needs to know about a video before working on it. Counts and rates come from the frame index, not
 * from the container's header.
 *
 * @param width             frame width in pixels
 * @param height            frame height in pixels
 * @param frameCount        frames in presentation order
 * @param durationSeconds   first frame's start to last frame's end
 * @param meanFrameRate     frames per second averaged over the file
 * @param variableFrameRate whether frame intervals vary (see {@link FrameIndex#isVariableFrameRate()})
 * @param keyframeCount     frames where decoding can start
 * @param codec             the decoder's short name, e.g. h264, mjpeg, or "png-sequence"
 * @param container         the container format's short name, e.g. mov,mp4,m4a,3gp,3g2,mj2, avi, or "folder"
 */
public record VideoInfo(int width, int height, int frameCount, double durationSeconds, double meanFrameRate,
                        boolean variableFrameRate, int keyframeCount, String codec, String container) {

    static VideoInfo of(int width, int height, FrameIndex index, String codec, String container) {
        return new VideoInfo(width, height, index.frameCount(), index.durationSeconds(), index.meanFrameRate(),
                index.isVariableFrameRate(), index.keyframeCount(), codec, container);
    }
}
