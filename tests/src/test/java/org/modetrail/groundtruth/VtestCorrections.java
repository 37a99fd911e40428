package org.modetrail.groundtruth;

import java.util.List;

import org.modetrail.groundtruth.Correction.Create;
import org.modetrail.groundtruth.Correction.Crowd;
import org.modetrail.groundtruth.Correction.Cut;
import org.modetrail.groundtruth.Correction.Drop;
import org.modetrail.groundtruth.Correction.Join;
import org.modetrail.groundtruth.Correction.Key;
import org.modetrail.groundtruth.Correction.Limit;
import org.modetrail.groundtruth.Correction.Pick;
import org.modetrail.groundtruth.Correction.Split;
import org.modetrail.groundtruth.Correction.Visible;
import org.modetrail.model.Box;

/**
 * The hand corrections of vtest.avi's truth, as data, each with its reason. Made by looking at the contact sheets
 * ({@link ContactSheets}) and applied in order by {@link VtestTruth}. Coordinates are pixels of the 768x576 frame;
 * frames are Modetrail's (0-based presentation order).
 */
final class VtestCorrections {
    private VtestCorrections() {
    }

    static Pick at(int frame, int x, int y) {
        return new Pick(frame, x, y);
    }

    static Box box(int x, int y, int w, int h) {
        return new Box(x, y, w, h);
    }

    static final List<Correction> TABLE = List.of(
            // the man in the red-and-navy jacket and the woman in black: in together from the right, up past the
            // sign, out at the top right, back in at frame 168 and down to the right edge
            new Crowd(at(50, 540, 260), 2, 9, 155, "man in red jacket and woman in black walk in together,"
                    + " one region until frame 155"),
            new Limit(at(88, 469, 197), 18, 159, "frames 9-17: at the edge the columns do not part them;"
                    + " from 160 the region is the woman and a passer-by"),
            new Limit(at(88, 495, 200), 18, 155, "frames 9-17: at the edge the columns do not part them"),
            new Crowd(at(271, 627, 164), 2, 168, 366, "the same pair coming back, one region until frame 366"),
            new Join(at(100, 506, 185), at(200, 688, 125), "the man in the red jacket, lost for 8 frames at the"
                    + " top right"),
            new Join(at(100, 528, 185), at(200, 712, 125), "the woman in black, lost for 12 frames at the top right"),
            // lives cut where the region became a group the columns could not part (seen on the sheets)
            new Limit(at(103, 612, 190), 39, 159, "man in black walking up the right side; from 160 merged with"
                    + " the pair coming down"),
            new Limit(at(201, 643, 324), 173, 246, "man in black jacket crossing to the right; before 173 the"
                    + " box is a group at the sign"),
            new Limit(at(265, 517, 287), 226, 299, "man with white paper going up-left; from 300 the box holds two"),
            new Limit(at(270, 300, 235), 244, 290, "man in brown jacket going up-left; from 291 merged with a"
                    + " man walking the other way"),
            new Limit(at(599, 589, 245), 569, 625, "man in black going up; from 626 half behind the sign"),
            // not persons, or boxes the sheets showed to be wrong for most of the life (left out, listed as
            // missing in README.md)
            new Drop(at(91, 251, 20), "a reflection in the building's window, not a person"),
            new Drop(at(94, 382, 209), "the group at the sign: the box wanders between four people"),
            new Drop(at(123, 548, 258), "switches from a man in black to a woman in black at frame ~125"),
            new Drop(at(140, 433, 224), "legs behind the sign, then another man"),
            new Drop(at(413, 589, 169), "mixes two men in black (a group split by columns that swapped them)"),
            new Drop(at(411, 577, 174), "a sliver beside a man in black, then a girl in red"),
            new Drop(at(445, 600, 298), "not checked on the sheets"),
            new Drop(at(529, 403, 480), "not checked on the sheets"),
            new Drop(at(667, 255, 190), "not checked on the sheets"),
            new Drop(at(717, 497, 220), "not checked on the sheets"),
            new Drop(at(713, 612, 252), "not checked on the sheets"),
            new Drop(at(754, 749, 75), "not checked on the sheets")
    );
}
