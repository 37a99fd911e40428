package org.modetrail.groundtruth;

import org.modetrail.model.Box;

/**
 * One hand correction of the automatic pass, with its reason. A person is named by a {@link Pick}: a point on a
 * frame inside the person's box as it stands when the correction is applied (corrections apply in table order), so
 * the table does not depend on the numbering of the automatic pass.
 */
sealed interface Correction {
    String why();

    /** A point (x, y) on a frame, inside the box of the person meant. */
    record Pick(int frame, int x, int y) {
        @Override
        public String toString() {
            return "(frame " + frame + ", " + x + "," + y + ")";
        }
    }

    /** Not a person (or a part of one counted twice): removed. */
    record Drop(Pick who, String why) implements Correction {
    }

    /** Two pieces of one person's life: the second's boxes go to the first, the gap between is interpolated. */
    record Join(Pick first, Pick second, String why) implements Correction {
    }

    /** The measured boxes of frames {@code from..to} are wrong (merged with a neighbour): interpolate instead. */
    record Cut(Pick who, int from, int to, String why) implements Correction {
    }

    /** A hand keyframe: the box drawn by hand on a frame, which wins over what was measured. */
    record Key(Pick who, int frame, Box box, String why) implements Correction {
    }

    /** A person the automatic pass never saw alone: made from a first hand keyframe. */
    record Create(int frame, Box box, String why) implements Correction {
    }

    /** The person's boxes outside {@code first..last} are thrown out (what lies there is another object or nothing). */
    record Limit(Pick who, int first, int last, String why) implements Correction {
    }

    /** Frames {@code from..to} the person is partly hidden (behind another person or a post): visible fraction. */
    record Visible(Pick who, int from, int to, double fraction, String why) implements Correction {
    }

    /**
     * What was taken for one person on frames {@code from..to} is {@code count} people side by side (they came
     * into view together): the regions are split by columns ({@link GroupSplit}) into that many persons, left to
     * right; the picked person keeps the leftmost part.
     */
    record Crowd(Pick who, int count, int from, int to, String why) implements Correction {
    }

    /** Splits a person's life at {@code frame}: frames from there on become a new person (an identity switch). */
    record Split(Pick who, int frame, String why) implements Correction {
    }
}
