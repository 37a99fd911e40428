package org.modetrail.trackbench;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.NavigableMap;

import org.modetrail.evaluation.Annotations;
import org.modetrail.evaluation.LabelledBox;
import org.modetrail.format.csv.EvaluationCsv;
import org.modetrail.model.Box;

/** The truth of every object of a clip, for the first frames the benchmark runs. */
final class BenchClips {
    /** Where the real footage's truth lives, on the test classpath (tests/src/test/resources). */
    static final String VTEST_TRUTH_RESOURCE = "/org/modetrail/vtest/vtest-truth.csv";

    private BenchClips() {
    }

    /** Every object of a generated clip, over its first {@code frames} frames. */
    static List<ObjectTruth> objects(MultiClip clip, int frames) {
        int n = Math.min(frames, clip.frameCount());
        List<ObjectTruth> out = new ArrayList<>();
        for (int k = 0; k < clip.objectCount(); k++) {
            TruthBox[] t = new TruthBox[n];
            for (int f = 0; f < n; f++) {
                t[f] = clip.truth(k, f);
            }
            out.add(new ObjectTruth(k, t));
        }
        return out;
    }

    /**
     * Every track of a truth file in the evaluation layout ({@link EvaluationCsv}: track_id, frame, x, y, width,
     * height, optional visible), over the first {@code frames} frames; a frame with no row for a track is one on
     * which that object is out of view.
     */
    static List<ObjectTruth> objects(Path truthCsv, int frames) throws IOException {
        Annotations truth = EvaluationCsv.read(truthCsv, "the real footage's truth");
        List<ObjectTruth> out = new ArrayList<>();
        TruthBox out0 = new TruthBox(new Box(0, 0, 0, 0), 0);
        for (int id : truth.ids()) {
            TruthBox[] t = new TruthBox[frames];
            Arrays.fill(t, out0);
            NavigableMap<Integer, LabelledBox> boxes = truth.ofId(id);
            for (LabelledBox b : boxes.headMap(frames, false).values()) {
                t[b.frame()] = new TruthBox(b.box(), b.visible());
            }
            out.add(new ObjectTruth(id, t));
        }
        return out;
    }
}
