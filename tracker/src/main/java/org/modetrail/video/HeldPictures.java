package org.modetrail.video;

import static org.bytedeco.ffmpeg.global.avutil.av_frame_free;

import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.Map;

import org.bytedeco.ffmpeg.avutil.AVFrame;

/**
 * Decoded pictures kept as they come out of the decoder (reference-counted YUV, not yet converted to RGB) for the
 * frames passed on the way to a random access. Holding a reference costs no copy; converting one costs a few
 * milliseconds and happens only if the user steps back to it. Bounded by a count; the oldest leave first and are
 * freed. Every picture handed out by {@link #take} belongs to the caller, who frees it.
 */
final class HeldPictures {
    private final int capacity;
    private final LinkedHashMap<Integer, AVFrame> pictures = new LinkedHashMap<>();

    HeldPictures(int capacity) {
        this.capacity = capacity;
    }

    /** Keeps a picture for frame {@code index}, freeing the oldest held when full, or the picture itself if none fit. */
    void hold(int index, AVFrame picture) {
        if (picture == null || picture.isNull()) {
            return;
        }
        if (capacity == 0) {
            av_frame_free(picture);
            return;
        }
        AVFrame old = pictures.remove(index);
        if (old != null) {
            av_frame_free(old);
        }
        pictures.put(index, picture);
        Iterator<Map.Entry<Integer, AVFrame>> it = pictures.entrySet().iterator();
        while (pictures.size() > capacity && it.hasNext()) {
            av_frame_free(it.next().getValue());
            it.remove();
        }
    }

    /** The picture held for frame {@code index}, removed from here, or null. */
    AVFrame take(int index) {
        return pictures.remove(index);
    }

    int size() {
        return pictures.size();
    }

    void clear() {
        for (AVFrame f : pictures.values()) {
            av_frame_free(f);
        }
        pictures.clear();
    }
}
