package org.modetrail.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Collections;
import java.util.List;
import org.junit.jupiter.api.Test;

class ClipOptionsTest {

    @Test
    void defaultsAreTheDocumentedOnes() {
        ClipOptions o = ClipOptions.defaults(640, 480, 100);
        assertEquals(25, o.fps());
        assertEquals(250, o.gopLength());
        // 3 B-frames and crf 23 are libx264's own defaults (x264 --fullhelp; from memory).
        assertEquals(3, o.bFrames());
        assertEquals(23, o.crf());
        assertEquals("yuv420p", o.pixelFormat());
        assertEquals(VideoCodec.H264, o.codec());
        assertTrue(o.fastStart());
    }

    @Test
    void invalidValuesAreRejectedOnCreation() {
        ClipOptions o = ClipOptions.defaults(640, 480, 100);
        assertThrows(IllegalArgumentException.class, () -> o.withSize(641, 480), "4:2:0 needs even sizes");
        assertThrows(IllegalArgumentException.class, () -> o.withTiming(0, 100));
        assertThrows(IllegalArgumentException.class, () -> o.withTiming(25, 0));
        assertThrows(IllegalArgumentException.class, () -> o.withGop(0, 3));
        assertThrows(IllegalArgumentException.class, () -> o.withGop(250, 17));
        assertThrows(IllegalArgumentException.class, () -> o.withQuality(52, 4, "medium"));
        assertThrows(IllegalArgumentException.class, () -> o.withQuality(23, 0, "medium"));
        assertThrows(IllegalArgumentException.class, () -> o.withQuality(23, 4, "quick"));
        assertThrows(IllegalArgumentException.class, () -> o.withPixelFormat("rgb24"));
        assertThrows(IllegalArgumentException.class, () -> o.withFfmpeg(" "));
    }

    @Test
    void commandCarriesGopBFramesAndFaststartForMp4Only() {
        ClipOptions o = ClipOptions.defaults(640, 480, 100).withGop(50, 2);
        List<String> mp4 = ClipWriter.command(o, VideoCodec.Container.MP4, Path.of("/tmp/x"));
        assertTrue(Collections.indexOfSubList(mp4, List.of("-g", "50")) >= 0, mp4.toString());
        assertTrue(Collections.indexOfSubList(mp4, List.of("-bf", "2")) >= 0, mp4.toString());
        assertTrue(Collections.indexOfSubList(mp4, List.of("-movflags", "+faststart")) >= 0, mp4.toString());
        assertTrue(Collections.indexOfSubList(mp4, List.of("-video_size", "640x480")) >= 0, mp4.toString());
        List<String> mkv = ClipWriter.command(o, VideoCodec.Container.MKV, Path.of("/tmp/x"));
        assertFalse(mkv.contains("-movflags"), mkv.toString());
        List<String> off = ClipWriter.command(o.withFastStart(false), VideoCodec.Container.MP4, Path.of("/tmp/x"));
        assertFalse(off.contains("-movflags"), off.toString());
        List<String> mjpeg = ClipWriter.command(o.withCodec(VideoCodec.MJPEG), VideoCodec.Container.AVI,
                Path.of("/tmp/x"));
        assertTrue(Collections.indexOfSubList(mjpeg, List.of("-c:v", "mjpeg")) >= 0, mjpeg.toString());
        assertFalse(mjpeg.contains("-bf"), "MJPEG has no B-frames");
    }

    @Test
    void containerFollowsTheExtension() {
        assertEquals(VideoCodec.Container.MKV, VideoCodec.Container.of("a.MKV"));
        assertEquals("matroska", VideoCodec.Container.of("a.mkv").muxer());
        assertEquals(VideoCodec.Container.AVI, VideoCodec.Container.of("dir.x/a.avi"));
        assertThrows(IllegalArgumentException.class, () -> VideoCodec.Container.of("clip"));
    }
}
