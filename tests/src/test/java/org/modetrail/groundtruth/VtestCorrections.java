package org.modetrail.groundtruth;

import java.util.List;

import org.modetrail.groundtruth.Correction.Create;
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
    );
}
