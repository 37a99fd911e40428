package org.modetrail.demo.scenario;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.LongStream;
import org.modetrail.demo.ClipOptions;
import org.modetrail.demo.NoiseHash;

/**
 * The scenario family: for each {@link FamilyKind}, any number of clips drawn from seeds, each with exact ground
 * truth for every object. Defaults of the tracker are to be chosen on {@link #tuningSeeds} only; reports give
 * {@link #reportSeeds} only. A clip is encoded with H.264 at the quality {@link #crf} draws for it.
 *
 * <p>Run as {@code java -cp export/target/classes org.modetrail.demo.scenario.ScenarioFamily OUTPUT_FOLDER KIND
 * SEED} to write {@code KIND-SEED.mp4} and {@code KIND-SEED-truth.csv}; KIND may be {@code all}, SEED may be
 * {@code tuning} or {@code report} for the whole set.
 */
public final class ScenarioFamily {

    /** Tuning seeds per kind: 1 to this. */
    static final int TUNING_SEEDS = 12;
    /** Report seeds per kind: from {@value #FIRST_REPORT_SEED}, this many. */
    static final int REPORT_SEEDS = 20;
    static final long FIRST_REPORT_SEED = 1001;
    /** Best and worst H.264 quality drawn: crf 18 is near transparent, 34 shows blocking on texture and edges. */
    static final int MIN_CRF = 18;
    static final int MAX_CRF = 34;

    private ScenarioFamily() {
    }

    /** The clip of {@code kind} drawn from {@code seed}; the same seed gives the same clip on every JVM. */
    public static TrackingScenario create(FamilyKind kind, long seed) {
        return new FamilyScenario(FamilyPlans.plan(kind, seed), FamilyRendering.FULL);
    }

    /** Package-private for tests: the clip with some layers turned off. */
    static FamilyScenario create(FamilyKind kind, long seed, FamilyRendering rendering) {
        return new FamilyScenario(FamilyPlans.plan(kind, seed), rendering);
    }

    /** Seeds to choose defaults and thresholds on: 1 to 12, the same for every kind. */
    public static long[] tuningSeeds(FamilyKind kind) {
        requireKind(kind);
        return LongStream.rangeClosed(1, TUNING_SEEDS).toArray();
    }

    /** Seeds to report on, disjoint from the tuning seeds: 1001 to 1020, the same for every kind. */
    public static long[] reportSeeds(FamilyKind kind) {
        requireKind(kind);
        return LongStream.range(FIRST_REPORT_SEED, FIRST_REPORT_SEED + REPORT_SEEDS).toArray();
    }

    /**
     * The H.264 constant rate factor the clip of {@code kind} and {@code seed} is encoded at: 18 to 34, the mean of
     * two uniform draws (so mid values, 23 to 29, are the common ones, as in footage from phones and surveillance
     * recorders; common practice, no source), drawn apart from the scene so a new quality does not change it.
     */
    public static int crf(FamilyKind kind, long seed) {
        requireKind(kind);
        long h = NoiseHash.hash(seed, kind.ordinal(), 0xC7FL);
        double u = (NoiseHash.unit(h) + NoiseHash.unit(NoiseHash.mix(h))) / 2;
        return MIN_CRF + (int) Math.round(u * (MAX_CRF - MIN_CRF));
    }

    /** The encoding of a family clip: H.264 at {@link #crf}, GOP 250, 3 B-frames, preset medium. */
    public static ClipOptions clipOptions(FamilyKind kind, long seed, TrackingScenario s) {
        return ClipOptions.defaults(s.width(), s.height(), s.frameCount()).withTiming(s.fps(), s.frameCount())
                .withQuality(crf(kind, seed), ClipOptions.DEFAULT_QSCALE, ClipOptions.DEFAULT_PRESET);
    }

    /** Writes {@code DIR/KIND-SEED.mp4} and its truth; returns the clip's path. */
    public static Path write(Path folder, FamilyKind kind, long seed) throws IOException {
        TrackingScenario s = create(kind, seed);
        Path clip = folder.resolve(kind.slug() + "-" + seed + ".mp4");
        TrackingScenarios.writeClip(s, clip, clipOptions(kind, seed, s));
        return clip;
    }

    public static void main(String[] args) throws IOException {
        if (args.length != 3) {
            System.err.println("usage: ScenarioFamily OUTPUT_FOLDER KIND|all SEED|tuning|report");
            System.exit(2);
        }
        List<FamilyKind> kinds;
        try {
            kinds = args[1].equals("all") ? List.of(FamilyKind.values()) : List.of(FamilyKind.ofSlug(args[1]));
        } catch (IllegalArgumentException e) {
            System.err.println(e.getMessage());
            System.exit(2);
            return;
        }
        for (FamilyKind kind : kinds) {
            long[] seeds;
            switch (args[2]) {
                case "tuning" -> seeds = tuningSeeds(kind);
                case "report" -> seeds = reportSeeds(kind);
                default -> {
                    try {
                        seeds = new long[] {Long.parseLong(args[2])};
                    } catch (NumberFormatException e) {
                        System.err.println("SEED must be a whole number, 'tuning' or 'report', got '" + args[2] + "'");
                        System.exit(2);
                        return;
                    }
                }
            }
            for (long seed : seeds) {
                Path clip = write(Path.of(args[0]), kind, seed);
                System.out.println(clip + " (crf " + crf(kind, seed) + ")");
            }
        }
    }

    private static void requireKind(FamilyKind kind) {
        if (kind == null) {
            throw new IllegalArgumentException("kind is required");
        }
    }
}
