package org.modetrail.overlay;

import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;

/**
 * Where the label tags of the boxes on one picture go, so that tags do not cover each other: above the box's
 * top-left corner; where that would leave the picture or cover a tag placed before, below the box, then inside its
 * top, then stacked one and two rows higher; when every place is taken, the first that fits in the picture. Used
 * for overlay videos and for the editor's canvas alike (in the picture's pixels or the view's). Start each picture
 * with {@link #clear()}.
 */
public final class TagPlacement {
    private final List<Rectangle2D> placed = new ArrayList<>();

    /** Forgets the tags placed so far: a new picture. */
    public void clear() {
        placed.clear();
    }

    /** Keeps a rectangle clear of the tags placed after it (a note already on the picture). */
    public void reserve(Rectangle2D r) {
        placed.add(r);
    }

    /**
     * The place for a tag of {@code tagWidth} x {@code tagHeight} for the box from ({@code boxX}, {@code boxY}) to
     * the bottom {@code boxBottom}, {@code gap} away from the box's line, inside a picture of {@code width} x
     * {@code height}; the place is kept clear of the tags placed after this one.
     */
    public Rectangle2D.Double place(double boxX, double boxY, double boxBottom, double gap, double tagWidth,
                                    double tagHeight, double width, double height) {
        double x = Math.max(0, Math.min(Math.floor(boxX - gap), width - tagWidth));
        double above = Math.floor(boxY - gap - tagHeight);
        double[] rows = {above, Math.ceil(boxBottom + gap), Math.ceil(boxY + gap), above - tagHeight - 1,
            above - 2 * (tagHeight + 1)};
        Rectangle2D.Double tag = null;
        for (double y : rows) {
            if (y < 0 || y + tagHeight > height) {
                continue;
            }
            Rectangle2D.Double r = new Rectangle2D.Double(x, y, tagWidth, tagHeight);
            if (tag == null) {
                tag = r;
            }
            if (free(r)) {
                tag = r;
                break;
            }
        }
        if (tag == null) {
            tag = new Rectangle2D.Double(x, Math.max(0, Math.min(above, height - tagHeight)), tagWidth, tagHeight);
        }
        placed.add(tag);
        return tag;
    }

    private boolean free(Rectangle2D r) {
        for (Rectangle2D other : placed) {
            if (other.intersects(r)) {
                return false;
            }
        }
        return true;
    }
}
