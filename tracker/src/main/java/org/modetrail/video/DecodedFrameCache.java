package org.modetrail.video;

import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * Decoded frames kept for random access, bounded by a memory budget in bytes rather than a frame count, so the
 * same budget holds many small frames or a few 4K ones. Least recently used frames leave first.
 */
final class DecodedFrameCache {
    private final long budgetBytes;
    private final LinkedHashMap<Integer, Frame> frames = new LinkedHashMap<>(64, 0.75f, true);
    private long heldBytes;

    DecodedFrameCache(long budgetBytes) {
        this.budgetBytes = budgetBytes;
    }

    Frame get(int index) {
        return frames.get(index);
    }

    boolean contains(int index) {
        return frames.containsKey(index);
    }

    /** Adds a frame, evicting the least recently used ones until the budget holds. A frame over budget is not kept. */
    void put(Frame frame) {
        long size = frame.sizeInBytes();
        if (size > budgetBytes) {
            return;
        }
        Frame old = frames.put(frame.index(), frame);
        if (old != null) {
            heldBytes -= old.sizeInBytes();
        }
        heldBytes += size;
        Iterator<Map.Entry<Integer, Frame>> it = frames.entrySet().iterator();
        while (heldBytes > budgetBytes && it.hasNext()) {
            Map.Entry<Integer, Frame> eldest = it.next();
            if (eldest.getKey() == frame.index()) {
                continue;
            }
            heldBytes -= eldest.getValue().sizeInBytes();
            it.remove();
        }
    }

    /** How many frames of the given size fit in the budget. */
    int capacityFor(long frameBytes) {
        return frameBytes <= 0 ? 0 : (int) Math.min(Integer.MAX_VALUE, budgetBytes / frameBytes);
    }

    long heldBytes() {
        return heldBytes;
    }

    int size() {
        return frames.size();
    }

    void clear() {
        frames.clear();
        heldBytes = 0;
    }
}
