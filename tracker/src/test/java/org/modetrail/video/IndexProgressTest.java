package org.modetrail.video;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The first scan of a file reports its progress through the file; a cached index reports nothing. */
class IndexProgressTest {
    @TempDir
    Path dir;

    @Test
    void theScanReportsBytesInOrderUpToTheWholeFileAndACachedIndexReportsNothing() throws Exception {
        // 5000 frames: more than two report intervals of packets.
        Path clip = NumberedClips.write(dir.resolve("long.mp4"), "mp4", 5000, 25, 0);
        long size = Files.size(clip);
        List<long[]> heard = new ArrayList<>();
        VideoOptions cached = VideoOptions.defaults().withIndexCacheDir(dir.resolve("index"));
        try (VideoSource v = VideoSource.open(clip, cached, (done, total) -> heard.add(new long[] {done, total}))) {
            assertEquals(5000, v.frameCount());
        }
        assertTrue(heard.size() >= 3, heard.size() + " reports");
        for (int i = 0; i < heard.size(); i++) {
            assertEquals(size, heard.get(i)[1]);
            assertTrue(heard.get(i)[0] > 0 && heard.get(i)[0] <= size);
            if (i > 0) {
                assertTrue(heard.get(i)[0] >= heard.get(i - 1)[0], "bytes only grow");
            }
        }
        assertEquals(size, heard.get(heard.size() - 1)[0], "the last report is the whole file");
        heard.clear();
        try (VideoSource v = VideoSource.open(clip, cached, (done, total) -> heard.add(new long[] {done, total}))) {
            assertEquals(5000, v.frameCount());
        }
        assertEquals(0, heard.size(), "the cached index needs no scan");
    }
}
