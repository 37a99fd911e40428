package org.modetrail.groundtruth;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.NavigableMap;
import java.util.TreeMap;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.modetrail.evaluation.Annotations;
import org.modetrail.evaluation.LabelledBox;
import org.modetrail.format.csv.EvaluationCsv;
import org.modetrail.model.Box;
import org.modetrail.testsupport.RefData;

/**
 * The committed truth of vtest.avi's pedestrians (tests/src/test/resources/org/modetrail/vtest/vtest-truth.csv):
 * that it reads with the evaluation's reader, keeps the rules it was made by, agrees with a pedestrian measured by
 * hand independently of it, and is what {@link VtestTruth} makes from the video and the correction table.
 */
class VtestTruthTest {
    static final String RESOURCE = "/org/modetrail/vtest/vtest-truth.csv";
    static final int WIDTH = 768;
    static final int HEIGHT = 576;
    /** The figures README.md (beside the CSV) gives. */
    static final int TRACKS = 16;
    static final int ROWS = 2047;

    /**
     * The pedestrian of org.modetrail.tracking.VtestPedestrianTest (the man in the red-and-navy jacket), boxes placed
     * by eye on ffmpeg-extracted frames, before and apart from this truth; copied here, the same values.
     */
    static final Map<Integer, Box> BY_HAND = new TreeMap<>(Map.of(
            50, new Box(507, 217, 33, 93),
            75, new Box(441, 183, 30, 80),
            100, new Box(495, 149, 22, 72),
            125, new Box(579, 126, 21, 62)));

    @TempDir
    Path cacheDir;

    static Path committed() throws Exception {
        return Path.of(VtestTruthTest.class.getResource(RESOURCE).toURI());
    }

    @Test
    void readsWithTheEvaluationReaderAndKeepsItsRules() throws Exception {
        Annotations truth = EvaluationCsv.read(committed(), "the vtest truth");
        assertEquals(TRACKS, truth.ids().size(), "tracks");
        assertEquals(ROWS, truth.count(), "rows");
        List<String> problems = new ArrayList<>();
        for (int id : truth.ids()) {
            NavigableMap<Integer, LabelledBox> life = truth.ofId(id);
            int span = life.lastKey() - life.firstKey() + 1;
            if (life.size() < VtestTruth.MIN_FRAMES) {
                problems.add("track " + id + " has " + life.size() + " frames");
            }
            if (span != life.size()) {
                problems.add("track " + id + " misses frames inside its life");
            }
            for (LabelledBox b : life.values()) {
                Box x = b.box();
                if (x.x() < 0 || x.y() < 0 || x.right() > WIDTH || x.bottom() > HEIGHT || b.frame() >= 795) {
                    problems.add("track " + id + " frame " + b.frame() + " box " + x + " leaves the frame");
                }
                boolean edge = VtestTruth.touches(x, WIDTH, HEIGHT);
                if (!edge && b.visible() < 1 && b.visible() > 0.99) {
                    problems.add("track " + id + " frame " + b.frame() + " visible " + b.visible());
                }
            }
        }
        assertTrue(problems.isEmpty(), String.join("\n", problems));
    }

    @Test
    void agreesWithTheHandMeasuredPedestrian() throws Exception {
        Annotations truth = EvaluationCsv.read(committed(), "the vtest truth");
        // the truth track nearest to the first hand box, then the same track at every hand frame
        int first = BY_HAND.keySet().iterator().next();
        LabelledBox nearest = truth.onFrame(first).stream()
                .min((a, b) -> Double.compare(a.box().centreDistance(BY_HAND.get(first)),
                        b.box().centreDistance(BY_HAND.get(first))))
                .orElseThrow();
        for (Map.Entry<Integer, Box> e : BY_HAND.entrySet()) {
            LabelledBox t = truth.ofId(nearest.id()).get(e.getKey());
            assertTrue(t != null && t.box().iou(e.getValue()) > 0.5, "frame " + e.getKey() + ": truth track "
                    + nearest.id() + " " + (t == null ? "absent" : t.box() + " IoU " + t.box().iou(e.getValue()))
                    + " against the hand box " + e.getValue());
        }
    }

    /**
     * Remaking the truth gives the committed file: the same tracks and frames, each box within 1 px. (Not byte
     * equality: FFmpeg builds may differ by a level or two in a few pixels of this MS-MPEG-4 clip, see
     * RealFootageVtestTest, which could move a threshold crossing by a pixel.)
     */
    @Test
    void isWhatTheMethodMakes() throws Exception {
        Path video = RefData.vtest();
        List<VtestTruth.TruthTrack> made = VtestTruth.make(video, cacheDir, VtestCorrections.TABLE);
        Annotations truth = EvaluationCsv.read(committed(), "the vtest truth");
        assertEquals(truth.ids().size(), made.size(), "tracks");
        List<String> problems = new ArrayList<>();
        for (VtestTruth.TruthTrack t : made) {
            NavigableMap<Integer, LabelledBox> c = truth.ofId(t.id());
            if (!c.keySet().equals(t.boxes().keySet())) {
                problems.add("track " + t.id() + ": frames " + t.boxes().firstKey() + "-" + t.boxes().lastKey()
                        + " made, " + (c.isEmpty() ? "none" : c.firstKey() + "-" + c.lastKey()) + " committed");
                continue;
            }
            for (Map.Entry<Integer, Box> e : t.boxes().entrySet()) {
                Box a = e.getValue();
                Box b = c.get(e.getKey()).box();
                double d = Math.max(Math.max(Math.abs(a.x() - b.x()), Math.abs(a.y() - b.y())),
                        Math.max(Math.abs(a.right() - b.right()), Math.abs(a.bottom() - b.bottom())));
                if (d > 1) {
                    problems.add("track " + t.id() + " frame " + e.getKey() + ": made " + a + ", committed " + b);
                }
            }
        }
        assertTrue(problems.isEmpty(), problems.size() + " differences, first: "
                + String.join("\n", problems.subList(0, Math.min(10, problems.size()))));
    }
}
