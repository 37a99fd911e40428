package org.modetrail.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

/**
 * Checks truth boxes against the rendered image alone: on the flat background every pixel that is not
 * {@link RenderStyle#FLAT_BACKGROUND} belongs to some object. Independent of the renderer's own bookkeeping.
 */
final class PixelBoxes {

    private static final int MARGIN = 3;

    private PixelBoxes() {
    }

    /**
     * For objects whose boxes (grown by a margin) touch no other box, the extent of the non-background pixels
     * inside the grown box must be exactly the truth box. Every non-background pixel must lie in some box.
     *
     * @return how many boxes were checked against isolated pixels
     */
    static int check(int[] rgb, int width, int height, List<TruthRow> rows, String where) {
        for (int j = 0; j < height; j++) {
            for (int i = 0; i < width; i++) {
                if (rgb[j * width + i] != RenderStyle.FLAT_BACKGROUND) {
                    assertTrue(insideSome(rows, i, j),
                            where + ": object pixel (" + i + ", " + j + ") outside all boxes");
                }
            }
        }
        int checked = 0;
        for (TruthRow r : rows) {
            if (!isolated(r, rows)) {
                continue;
            }
            int x0 = Math.max(0, (int) r.x() - MARGIN);
            int y0 = Math.max(0, (int) r.y() - MARGIN);
            int x1 = Math.min(width - 1, (int) (r.x() + r.width()) + MARGIN);
            int y1 = Math.min(height - 1, (int) (r.y() + r.height()) + MARGIN);
            int minX = Integer.MAX_VALUE;
            int minY = Integer.MAX_VALUE;
            int maxX = -1;
            int maxY = -1;
            for (int j = y0; j <= y1; j++) {
                for (int i = x0; i <= x1; i++) {
                    if (rgb[j * width + i] != RenderStyle.FLAT_BACKGROUND) {
                        minX = Math.min(minX, i);
                        maxX = Math.max(maxX, i);
                        minY = Math.min(minY, j);
                        maxY = Math.max(maxY, j);
                    }
                }
            }
            String id = where + " track " + r.trackId();
            assertTrue(maxX >= 0, id + ": no object pixels in its box");
            // Pixel-edge convention: pixels minX..maxX make a box from minX of width maxX - minX + 1. Bodies are
            // not anti-aliased, so the box is exact; a 1 px slack would let an off-by-one through.
            assertEquals(minX, r.x(), 0, id + " x");
            assertEquals(minY, r.y(), 0, id + " y");
            assertEquals(maxX + 1 - minX, r.width(), 0, id + " width");
            assertEquals(maxY + 1 - minY, r.height(), 0, id + " height");
            assertEquals(1.0, r.visible(), 1e-12, id + ": nothing overlaps it, so it is fully visible");
            checked++;
        }
        return checked;
    }

    private static boolean insideSome(List<TruthRow> rows, int i, int j) {
        for (TruthRow r : rows) {
            if (i >= r.x() && i < r.x() + r.width() && j >= r.y() && j < r.y() + r.height()) {
                return true;
            }
        }
        return false;
    }

    private static boolean isolated(TruthRow r, List<TruthRow> rows) {
        for (TruthRow o : rows) {
            if (o != r && o.x() - MARGIN < r.x() + r.width() + MARGIN && r.x() - MARGIN < o.x() + o.width() + MARGIN
                    && o.y() - MARGIN < r.y() + r.height() + MARGIN && r.y() - MARGIN < o.y() + o.height() + MARGIN) {
                return false;
            }
        }
        return true;
    }
}
