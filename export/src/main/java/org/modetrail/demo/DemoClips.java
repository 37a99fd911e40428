package org.modetrail.demo;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * Writes the demo clips with their ground truth: the committed set in {@code clips/}, or single scenarios with
 * custom encoding for tests and benchmarks. Everything here is generated from a seed; nothing is recorded.
 *
 * <p>Run as {@code java -cp export/target/classes org.modetrail.demo.DemoClips clips} to regenerate the set.
 */
public final class DemoClips {

    public static final String ARENA_CLIP = "arena.mp4";
    public static final String ARENA_TRUTH = "arena-truth.csv";
    public static final String ROAD_CLIP = "road.mp4";
    public static final String ROAD_TRUTH = "road-truth.csv";
    public static final String ROAD_CALIBRATION = "road-calibration.csv";
    /** Quality of the committed clips: visibly clean, while keeping the pair under about 6 MB. */
    public static final int COMMITTED_CRF = 20;

    /** What a write produced. */
    public record Written(Path clip, Path truth, int frames, int truthRows) {
    }

    private DemoClips() {
    }

    public static void main(String[] args) throws IOException {
        if (args.length != 1) {
            System.err.println("usage: DemoClips OUTPUT_FOLDER   (writes " + ARENA_CLIP + ", " + ARENA_TRUTH + ", "
                    + ROAD_CLIP + ", " + ROAD_TRUTH + ", " + ROAD_CALIBRATION + ")");
            System.exit(2);
        }
        writeAll(Path.of(args[0]));
    }

    /** Writes the committed demo set into {@code dir}. */
    public static void writeAll(Path dir) throws IOException {
        ArenaConfig arena = ArenaConfig.defaults();
        writeArena(dir.resolve(ARENA_CLIP), dir.resolve(ARENA_TRUTH), arena, clipOptionsFor(arena.width(),
                arena.height(), arena.fps(), arena.frameCount()));
        RoadConfig road = RoadConfig.defaults();
        writeRoad(dir.resolve(ROAD_CLIP), dir.resolve(ROAD_TRUTH), dir.resolve(ROAD_CALIBRATION), road,
                clipOptionsFor(road.width(), road.height(), road.fps(), road.frameCount()));
    }

    /** The encoding of the committed set: H.264, GOP 250, 3 B-frames, crf {@value #COMMITTED_CRF}, faststart. */
    public static ClipOptions clipOptionsFor(int width, int height, int fps, int frameCount) {
        return ClipOptions.defaults(width, height, frameCount).withTiming(fps, frameCount)
                .withQuality(COMMITTED_CRF, ClipOptions.DEFAULT_QSCALE, ClipOptions.DEFAULT_PRESET);
    }

    /** The arena scenario at the size, rate and length of {@code options}, with the given seed. */
    public static Written writeArena(Path clip, Path truth, ClipOptions options, long seed) throws IOException {
        ArenaConfig scene = ArenaConfig.defaults().withSize(options.width(), options.height())
                .withTiming(options.fps(), options.frameCount()).withSeed(seed);
        return write(new ArenaScene(scene), clip, truth, options);
    }

    public static Written writeArena(Path clip, Path truth, ArenaConfig scene, ClipOptions options)
            throws IOException {
        return write(new ArenaScene(scene), clip, truth, options);
    }

    /**
     * The road scenario at the size, rate and length of {@code options}, with the given seed; the calibration
     * reference is written too unless {@code calibration} is null.
     */
    public static Written writeRoad(Path clip, Path truth, Path calibration, ClipOptions options, long seed)
            throws IOException {
        RoadConfig scene = RoadConfig.defaults().withSize(options.width(), options.height())
                .withTiming(options.fps(), options.frameCount()).withSeed(seed);
        return writeRoad(clip, truth, calibration, scene, options);
    }

    public static Written writeRoad(Path clip, Path truth, Path calibration, RoadConfig scene, ClipOptions options)
            throws IOException {
        RoadScene road = new RoadScene(scene);
        Written written = write(road, clip, truth, options);
        if (calibration != null) {
            CalibrationCsv.write(calibration, scene.camera(), road.calibrationPoints());
        }
        return written;
    }

    /**
     * Renders every frame of {@code scene} into one reused buffer, encodes it to {@code clip}, and writes the ground
     * truth to {@code truth} unless that is null.
     */
    public static Written write(SyntheticScene scene, Path clip, Path truth, ClipOptions options)
            throws IOException {
        if (scene.width() != options.width() || scene.height() != options.height()
                || scene.fps() != options.fps() || scene.frameCount() != options.frameCount()) {
            throw new IllegalArgumentException("scene is " + scene.width() + "x" + scene.height() + " at "
                    + scene.fps() + " fps for " + scene.frameCount() + " frames, but the clip options say "
                    + options.width() + "x" + options.height() + " at " + options.fps() + " fps for "
                    + options.frameCount());
        }
        int[] rgb = new int[scene.width() * scene.height()];
        List<TruthRow> rows = new ArrayList<>();
        try (ClipWriter writer = ClipWriter.open(clip, options)) {
            for (int f = 0; f < scene.frameCount(); f++) {
                rows.addAll(scene.render(f, rgb));
                writer.write(rgb);
            }
            writer.finish();
        }
        if (truth != null) {
            TruthCsv.write(truth, rows, scene.hasWorldCoordinates());
        }
        return new Written(clip, truth, scene.frameCount(), rows.size());
    }
}
