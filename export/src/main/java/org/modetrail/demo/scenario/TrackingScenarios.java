package org.modetrail.demo.scenario;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.modetrail.demo.ClipOptions;
import org.modetrail.demo.ClipWriter;
import org.modetrail.demo.DemoClips;
import org.modetrail.demo.TruthCsv;
import org.modetrail.demo.TruthRow;

/**
 * The tracking benchmark scenarios: one short synthetic clip per {@link ScenarioKind}, each with exact ground
 * truth, for comparing trackers by their success over the clip.
 *
 * <p>Run as {@code java -cp export/target/classes org.modetrail.demo.scenario.TrackingScenarios DIR [SEED]} to
 * write every scenario as {@code DIR/<kind>.mp4} with {@code DIR/<kind>-truth.csv}.
 */
public final class TrackingScenarios {

    /** Object class in the truth file of object 0, the one a tracker is started on. */
    public static final String TARGET_CLASS = "target";
    /** Object class in the truth file of the second object of {@link ScenarioKind#CROSSING}. */
    public static final String DISTRACTOR_CLASS = "distractor";

    private TrackingScenarios() {
    }

    public static void main(String[] args) throws IOException {
        if (args.length < 1 || args.length > 2) {
            System.err.println("usage: TrackingScenarios OUTPUT_FOLDER [SEED]");
            System.exit(2);
        }
        long seed = args.length == 2 ? Long.parseLong(args[1]) : ScenarioConfig.DEFAULT_SEED;
        for (ScenarioKind kind : ScenarioKind.values()) {
            TrackingScenario s = create(kind, seed);
            writeClip(s, Path.of(args[0]).resolve(kind.slug() + ".mp4"), clipOptions(s));
        }
    }

    /** The scenario at the defaults of {@link ScenarioConfig#defaults()} with the given seed. */
    public static TrackingScenario create(ScenarioKind kind, long seed) {
        return create(kind, ScenarioConfig.defaults().withSeed(seed));
    }

    public static TrackingScenario create(ScenarioKind kind, ScenarioConfig config) {
        if (kind == null || config == null) {
            throw new IllegalArgumentException("kind and configuration are required");
        }
        return new SyntheticTrackingScenario(kind, config);
    }

    /** The encoding of the committed demo clips (H.264, crf 20, GOP 250, 3 B-frames) at the scenario's size. */
    public static ClipOptions clipOptions(TrackingScenario s) {
        return DemoClips.clipOptionsFor(s.width(), s.height(), s.fps(), s.frameCount());
    }

    /** Where {@link #writeClip} puts the truth of {@code clip}: {@code name.mp4} gives {@code name-truth.csv}. */
    public static Path truthPath(Path clip) {
        String name = clip.getFileName().toString();
        int dot = name.lastIndexOf('.');
        String stem = dot > 0 ? name.substring(0, dot) : name;
        return clip.resolveSibling(stem + "-truth.csv");
    }

    /**
     * Encodes every frame of {@code s} to {@code clip} through the ffmpeg command line ({@link ClipWriter}; the
     * container follows the extension) and writes the ground truth beside it in the demo truth format
     * ({@link TruthCsv#IMAGE_HEADER}; track id is object + 1). Both files appear only when complete.
     *
     * @return the truth file, {@link #truthPath(Path)} of the clip
     * @throws IllegalArgumentException when {@code options} disagree with the scenario's size, rate or length
     */
    public static Path writeClip(TrackingScenario s, Path clip, ClipOptions options) throws IOException {
        if (s.width() != options.width() || s.height() != options.height() || s.fps() != options.fps()
                || s.frameCount() != options.frameCount()) {
            throw new IllegalArgumentException("scenario is " + s.width() + "x" + s.height() + " at " + s.fps()
                    + " fps for " + s.frameCount() + " frames, but the clip options say " + options.width() + "x"
                    + options.height() + " at " + options.fps() + " fps for " + options.frameCount());
        }
        int[] rgb = new int[s.width() * s.height()];
        try (ClipWriter writer = ClipWriter.open(clip, options)) {
            for (int f = 0; f < s.frameCount(); f++) {
                s.render(f, rgb);
                writer.write(rgb);
            }
            writer.finish();
        }
        Path truth = truthPath(clip);
        TruthCsv.write(truth, truthRows(s), false);
        return truth;
    }

    /** Truth rows in frame order, objects in index order; an object wholly outside the frame has no row. */
    public static List<TruthRow> truthRows(TrackingScenario s) {
        List<TruthRow> rows = new ArrayList<>(s.frameCount() * s.objectCount());
        for (int f = 0; f < s.frameCount(); f++) {
            for (int k = 0; k < s.objectCount(); k++) {
                ScenarioBox b = s.truth(k, f);
                if (b.width() > 0 && b.height() > 0) {
                    rows.add(new TruthRow(k + 1, k == 0 ? TARGET_CLASS : DISTRACTOR_CLASS, f, (double) f / s.fps(),
                            b.x(), b.y(), b.width(), b.height(), b.visible(), Double.NaN, Double.NaN, Double.NaN));
                }
            }
        }
        return rows;
    }
}
