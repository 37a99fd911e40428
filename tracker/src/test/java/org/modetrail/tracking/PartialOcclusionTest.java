package org.modetrail.tracking;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.modetrail.model.Box;
import org.modetrail.video.Frame;

class PartialOcclusionTest {
    private static final int RED = 0xFFC04030;

    private static PartialOcclusion builtOn(SyntheticScene scene, Box box) {
        PartialOcclusion o = new PartialOcclusion(RgbBinning.DEFAULT.binCount());
        o.build(load(scene.frame(0, box), box), box);
        // A few frames of the whole object teach it the usual difference between the halves.
        for (int i = 1; i <= 8; i++) {
            assertFalse(o.oneSideCovered(load(scene.frame(i, box), box), box));
            o.learnUsual();
        }
        return o;
    }

    private static BinImage load(Frame frame, Box around) {
        BinImage image = new BinImage(RgbBinning.DEFAULT);
        image.load(frame, (int) around.x() - 20, (int) around.y() - 20, (int) around.right() + 20,
                (int) around.bottom() + 20, null);
        return image;
    }

    @Test
    void aPostOverOneSideIsNoticed() {
        SyntheticScene scene = new SyntheticScene(320, 240, RED, 21);
        Box box = new Box(100, 80, 60, 40);
        PartialOcclusion o = builtOn(scene, box);
        // The right 40% of the body behind a post.
        Frame covered = scene.frameBehindPost(9, box, 136, 200);
        assertTrue(o.oneSideCovered(load(covered, box), box));
        assertTrue(o.similarity(0) > o.similarity(1) + PartialOcclusion.ASYMMETRY, "left half clear, right covered");
    }

    @Test
    void theWholeObjectInViewIsNotCoveredEvenWhenSmaller() {
        SyntheticScene scene = new SyntheticScene(320, 240, RED, 22);
        Box box = new Box(100, 80, 60, 40);
        PartialOcclusion o = builtOn(scene, box);
        assertFalse(o.oneSideCovered(load(scene.frame(9, box), box), box));
        // The object shrunk to 70% about the same centre: both halves lose the same, nothing is covered.
        Box smaller = Box.centredAt(box.centreX(), box.centreY(), 42, 28);
        assertFalse(o.oneSideCovered(load(scene.frame(10, smaller), box), box));
        assertEquals(o.similarity(0), o.similarity(1), PartialOcclusion.ASYMMETRY);
    }
}
