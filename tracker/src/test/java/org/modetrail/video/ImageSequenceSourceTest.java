package org.modetrail.video;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;

import javax.imageio.ImageIO;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ImageSequenceSourceTest {
    @TempDir
    Path dir;

    private void image(String name, int w, int h, int rgb) throws Exception {
        BufferedImage img = new BufferedImage(w, h, BufferedImage.TYPE_INT_RGB);
        for (int y = 0; y < h; y++) {
            for (int x = 0; x < w; x++) {
                img.setRGB(x, y, rgb);
            }
        }
        ImageIO.write(img, "png", dir.resolve(name).toFile());
    }

    @Test
    void framesFollowTheNumbersInTheNamesNotTheirSpelling() throws Exception {
        image("shot_10.png", 8, 6, 0x0000FF);
        image("shot_9.png", 8, 6, 0x00FF00);
        image("shot_1.png", 8, 6, 0xFF0000);
        Files.writeString(dir.resolve("readme.txt"), "not an image");
        try (VideoSource v = VideoSource.open(dir, VideoOptions.defaults().withIndexCacheDir(null)
                .withImageSequenceFps(10))) {
            assertEquals(3, v.frameCount());
            assertEquals(0xFFFF0000, v.frame(0).rgbAt(0, 0));
            assertEquals(0xFF00FF00, v.frame(1).rgbAt(3, 3));
            assertEquals(0xFF0000FF, v.frame(2).rgbAt(7, 5));
            assertEquals(0.2, v.frame(2).timeSeconds(), 1e-9);
            assertEquals(3, v.info().keyframeCount());
        }
    }

    @Test
    void anImageOfAnotherSizeIsUnreadableAndNamed() throws Exception {
        image("f_0001.png", 8, 6, 0);
        image("f_0002.png", 9, 6, 0);
        image("f_0003.png", 8, 6, 0);
        try (VideoSource v = VideoSource.open(dir, VideoOptions.defaults().withIndexCacheDir(null))) {
            FrameUnreadableException e = assertThrows(FrameUnreadableException.class, () -> v.frame(1));
            assertTrue(e.getMessage().contains("f_0002.png") && e.getMessage().contains("9x6"), e.getMessage());
            assertEquals(0xFF000000, v.frame(2).rgbAt(0, 0));
            assertEquals(1, v.unreadableFrames().length);
        }
    }

    @Test
    void aFolderWithoutNumberedImagesIsRefused() throws Exception {
        Files.writeString(dir.resolve("a.txt"), "x");
        VideoException e = assertThrows(VideoException.class, () -> VideoSource.open(dir));
        assertTrue(e.getMessage().contains("no numbered PNG or JPEG"), e.getMessage());
    }
}
