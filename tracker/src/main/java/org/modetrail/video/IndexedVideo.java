package org.modetrail.video;

/** What one scan of a video file finds and the on-disk cache keeps: the frame index and the facts around it. */
record IndexedVideo(FrameIndex index, PacketStamps stamps, int width, int height, String codec, String container) {
}
