package org.modetrail.trackbench;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.Supplier;

import org.modetrail.tracking.HueSaturationBinning;
import org.modetrail.tracking.RgbBinning;
import org.modetrail.tracking.ScaleMethod;
import org.modetrail.tracking.TrackerConfig;

/**
 * The tracking benchmark: per scenario kind, from the truth box of object 0 on frame 0, Modetrail's tracker against
 * BoofCV's Comaniciu 2003 and OpenCV's CamShift, all in this one run: OTB success AUC, precision at 20 px, frames
 * until the first failure, median milliseconds per tracked frame (after a full warm-up pass over the same clip), the
 * speed ratios against the references, and Modetrail's tracking time over the time to decode the same clip as H.264
 * through {@link org.modetrail.video.VideoSource}.
 *
 * <p>Run it (after {@code mvn -B -q install -DskipTests -pl tracker,export,annotate-ui}):
 * <pre>
 * mvn -B -q -pl tests test-compile exec:java -Dexec.mainClass=org.modetrail.trackbench.TrackBench \
 *     -Dexec.classpathScope=test
 * </pre>
 * Not part of {@code mvn verify}: it prints figures and asserts nothing; the accuracy assertions are in
 * {@code org.modetrail.tracking.ScenarioAccuracyTest}. The targets are marked in the output.
 */
public final class TrackBench {
    private TrackBench() {
    }

    static List<Supplier<BoxTracker>> trackers() {
        return List.of(ModetrailTracker::new, BoofComaniciuTracker::new, OpenCvCamShiftTracker::new);
    }

    /** Warm-up pass, then the measured pass. */
    static TrackRun measured(Supplier<BoxTracker> make, BenchClip clip) {
        try (BoxTracker warm = make.get()) {
            TrackRun.of(warm, clip);
        }
        try (BoxTracker t = make.get()) {
            return TrackRun.of(t, clip);
        }
    }

    /**
     * Each default of {@link TrackerConfig} against its alternatives, by success AUC on every scenario: the evidence
     * the defaults were chosen on (one setting changed at a time from the defaults).
     */
    static List<ModetrailTracker> settings() {
        TrackerConfig d = TrackerConfig.defaults();
        return List.of(
                new ModetrailTracker(d, "defaults"),
                new ModetrailTracker(d.withScale(ScaleMethod.TEN_PERCENT), "scale +-10%"),
                new ModetrailTracker(d.withScale(ScaleMethod.FIXED), "scale fixed"),
                new ModetrailTracker(d.withBinning(RgbBinning.COMANICIU), "RGB 16^3"),
                new ModetrailTracker(d.withBinning(HueSaturationBinning.defaults()), "hue-sat"),
                new ModetrailTracker(d.withBackgroundWeighting(false), "no CBWH"),
                new ModetrailTracker(d.withLightingCompensation(false), "no light comp"),
                new ModetrailTracker(d.withModelUpdateRate(0.02), "update 0.02"),
                new ModetrailTracker(d.withSearchRadius(0), "no wide search"));
    }

    private static void printSettingsTable(List<BenchClip> clips) {
        List<ModetrailTracker> variants = settings();
        System.out.println();
        System.out.println("Modetrail's settings, success AUC (one change from the defaults per column):");
        StringBuilder head = new StringBuilder(String.format(Locale.ROOT, "%-16s", "scenario"));
        for (ModetrailTracker v : variants) {
            head.append(String.format(Locale.ROOT, " %14s", v.name()));
        }
        System.out.println(head);
        double[] total = new double[variants.size()];
        for (BenchClip clip : clips) {
            StringBuilder row = new StringBuilder(String.format(Locale.ROOT, "%-16s", clip.name()));
            for (int i = 0; i < variants.size(); i++) {
                ModetrailTracker v = variants.get(i);
                double auc;
                try (BoxTracker t = new ModetrailTracker(v.config(), v.name())) {
                    auc = TrackRun.of(t, clip).score().successAuc();
                }
                total[i] += auc;
                row.append(String.format(Locale.ROOT, " %14.3f", auc));
            }
            System.out.println(row);
        }
        StringBuilder mean = new StringBuilder(String.format(Locale.ROOT, "%-16s", "mean"));
        for (double t : total) {
            mean.append(String.format(Locale.ROOT, " %14.3f", t / clips.size()));
        }
        System.out.println(mean);
    }

    public static void main(String[] args) throws Exception {
        Path dir = Files.createTempDirectory("modetrail-trackbench");
        List<BenchClip> clips = ScenarioClips.all();
        System.out.printf(Locale.ROOT, "Tracking benchmark: %d clips, seed %d, one keyframe (object 0, frame 0); "
                + "%s, %d cores%n", clips.size(), ScenarioClips.SEED, System.getProperty("java.vm.name") + " "
                + System.getProperty("java.version"), Runtime.getRuntime().availableProcessors());
        System.out.printf(Locale.ROOT, "%-16s %-21s %6s %6s %9s %8s %6s%n", "scenario", "tracker", "AUC", "P@20",
                "untilFail", "ms/frame", "timed");
        // Global warm-up: every tracker over the first clip, so the first row is not measured on a cold JIT.
        for (Supplier<BoxTracker> make : trackers()) {
            measured(make, clips.get(0));
        }
        List<String> summary = new ArrayList<>();
        for (BenchClip clip : clips) {
            List<TrackRun> runs = new ArrayList<>();
            for (Supplier<BoxTracker> make : trackers()) {
                TrackRun run = measured(make, clip);
                runs.add(run);
                TrackScore s = run.score();
                System.out.printf(Locale.ROOT, "%-16s %-21s %6.3f %6.3f %5d/%-3d %8.3f %6d%n", clip.name(),
                        run.tracker(), s.successAuc(), s.precision20(), s.framesUntilFailure(), s.trackedFrames(),
                        run.medianMillis(), run.nanos().length);
            }
            double decode = DecodeTiming.medianMillis(clip, dir);
            TrackRun mt = runs.get(0);
            TrackRun boof = runs.get(1);
            TrackRun cam = runs.get(2);
            boolean beatsBoth = mt.score().successAuc() > boof.score().successAuc()
                    && mt.score().successAuc() > cam.score().successAuc();
            summary.add(String.format(Locale.ROOT,
                    "%-16s %9.1fx %11.2fx %9.3f %12.2f  %-10s %-8s %-8s", clip.name(),
                    boof.medianMillis() / mt.medianMillis(), cam.medianMillis() / mt.medianMillis(), decode,
                    mt.medianMillis() / decode,
                    beatsBoth ? "yes" : "NO",
                    mt.score().successAuc() >= 0.80 ? "yes" : "NO",
                    boof.medianMillis() >= 10 * mt.medianMillis() && cam.medianMillis() >= mt.medianMillis()
                            ? "yes" : "NO"));
            System.out.flush();
        }
        System.out.println();
        System.out.printf(Locale.ROOT, "%-16s %10s %12s %9s %12s  %-10s %-8s %-8s%n", "scenario", "BoofCV/MT",
                "CamShift/MT", "decode ms", "MT/decode", "AUC>both", "AUC>=.8", "speed");
        summary.forEach(System.out::println);
        System.out.println("ms/frame: median over the frames timed (a tracker that declared its track lost is not "
                + "timed after that). untilFail: frames tracked before the first IoU 0 on a frame at least half "
                + "visible.");
        System.out.println("Ratios are of median ms per frame in this run (X/MT > 1: Modetrail faster). Targets "
                + "(issue): AUC above both references (required on fast motion, clutter, occlusion), AUC >= 0.80, "
                + "BoofCV/MT >= 10 and CamShift/MT >= 1.");
        printSettingsTable(clips);
        try (var files = Files.walk(dir)) {
            files.sorted(java.util.Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
        }
    }
}
