package org.modetrail.video;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class DecodedFrameCacheTest {
    private static Frame frame(int index, int width, int height) {
        return new Frame(index, index / 25.0, width, height, new int[width * height]);
    }

    @Test
    void holdsNoMoreBytesThanItsBudget() {
        long frameBytes = 100 * 100 * 4;
        DecodedFrameCache cache = new DecodedFrameCache(frameBytes * 3);
        for (int i = 0; i < 10; i++) {
            cache.put(frame(i, 100, 100));
            assertTrue(cache.heldBytes() <= frameBytes * 3);
        }
        assertEquals(3, cache.size());
        assertTrue(cache.contains(9) && cache.contains(8) && cache.contains(7));
    }

    @Test
    void evictsTheLeastRecentlyUsedFrame() {
        DecodedFrameCache cache = new DecodedFrameCache(3 * 40_000L);
        cache.put(frame(0, 100, 100));
        cache.put(frame(1, 100, 100));
        cache.put(frame(2, 100, 100));
        cache.get(0); // 1 is now the eldest
        cache.put(frame(3, 100, 100));
        assertFalse(cache.contains(1));
        assertTrue(cache.contains(0));
    }

    @Test
    void aBudgetCountsBytesNotFrames() {
        DecodedFrameCache cache = new DecodedFrameCache(4 * 40_000L);
        assertEquals(4, cache.capacityFor(40_000));
        assertEquals(16, cache.capacityFor(10_000));
        cache.put(frame(0, 400, 400)); // 640 kB: over budget, not kept, nothing else lost
        assertNull(cache.get(0));
    }

    @Test
    void replacingAFrameDoesNotCountItTwice() {
        DecodedFrameCache cache = new DecodedFrameCache(1_000_000);
        Frame second = frame(5, 10, 10);
        cache.put(frame(5, 10, 10));
        cache.put(second);
        assertEquals(400, cache.heldBytes());
        assertSame(second, cache.get(5));
    }
}
