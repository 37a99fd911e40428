package org.modetrail.trackbench;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.Supplier;

import org.modetrail.evaluation.SingleObjectEvaluation;
import org.modetrail.model.Box;
import org.modetrail.picture.PlotFormat;
import org.modetrail.picture.PlotOptions;
import org.modetrail.picture.PlotSeries;
import org.modetrail.picture.Plots;

/**
 * The benchmark report: on every generated scenario, Modetrail against BoofCV's mean-shift tracker (Comaniciu
 * 2003) and OpenCV's CamShift, all in one run, on success AUC and precision at 20 px (Wu, Lim and Yang 2013), the
 * keyframes per 1000 frames a simulated annotator adds ({@link EffortSimulation}), and median milliseconds per
 * frame beside the time to decode the same clip as H.264 in the same run. Writes {@value #REPORT} (the tables) and
 * a success plot per scenario into the folder given. {@code --quick} runs the first {@value #QUICK_FRAMES} frames
 * of each scenario (CI runs it, so the report cannot rot); the full run takes every frame.
 *
 * <pre>
 * mvn -B -q install -DskipTests
 * mvn -B -q -pl tests verify -P bench-report -Dbench.out=$PWD/bench-report [-Dbench.mode=--quick]
 * </pre>
 */
public final class BenchReport {
    static final String REPORT = "report.md";
    static final int QUICK_FRAMES = 90;
    static final List<String> TRACKERS = List.of("Modetrail", "BoofCV mean-shift", "OpenCV CamShift");

    private BenchReport() {
    }

    /** One tracker on one scenario. */
    record Row(String scenario, String tracker, double successAuc, double precision20, double keyframesPer1000,
               double msPerFrame, double decodeMsPerFrame, double[] successCurve) {
    }

    public static void main(String[] args) throws Exception {
        Path out = null;
        boolean quick = false;
        for (int i = 0; i < args.length; i++) {
            switch (args[i]) {
                case "--out" -> out = Path.of(args[++i]);
                case "--quick" -> quick = true;
                default -> throw new IllegalArgumentException("unknown argument '" + args[i]
                        + "'; the arguments are --out DIR [--quick]");
            }
        }
        if (out == null) {
            throw new IllegalArgumentException("give the report's folder with --out DIR");
        }
        long t0 = System.nanoTime();
        List<Row> rows = run(quick);
        write(rows, out, quick, Duration.ofNanos(System.nanoTime() - t0));
        System.out.println("wrote " + out.resolve(REPORT));
    }

    static List<Row> run(boolean quick) throws Exception {
        List<BenchClip> clips = new ArrayList<>();
        for (BenchClip c : ScenarioClips.all()) {
            clips.add(quick ? new FirstFrames(c, QUICK_FRAMES) : c);
        }
        List<Supplier<BoxTracker>> trackers = TrackBench.trackers();
        List<EffortSimulation.Filler> fillers = List.of(EffortSimulation.modetrail(),
                EffortSimulation.restarted("BoofCV", BoofComaniciuTracker::new),
                EffortSimulation.restarted("CamShift", OpenCvCamShiftTracker::new));
        Path scratch = Files.createTempDirectory("modetrail-bench-report");
        List<Row> rows = new ArrayList<>();
        try {
            for (Supplier<BoxTracker> make : trackers) {
                TrackBench.measured(make, clips.get(0)); // JIT warm-up, not reported
            }
            for (BenchClip clip : clips) {
                double decode = DecodeTiming.medianMillis(clip, scratch);
                RenderedVideo video = new RenderedVideo(clip);
                for (int k = 0; k < trackers.size(); k++) {
                    TrackRun run = TrackBench.measured(trackers.get(k), clip);
                    double effort = EffortSimulation.keyframesPer1000(clip, video, fillers.get(k));
                    rows.add(new Row(clip.name(), TRACKERS.get(k), run.score().successAuc(),
                            run.score().precision20(), effort, run.medianMillis(), decode, successCurve(run, clip)));
                }
                System.out.printf(Locale.ROOT, "%s done%n", clip.name());
            }
        } finally {
            try (var files = Files.walk(scratch)) {
                files.sorted(java.util.Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
            }
        }
        return rows;
    }

    /** The success plot of one run, scored as {@link TrackMetrics} scores it (frame 0 given, half visible on). */
    static double[] successCurve(TrackRun run, BenchClip clip) {
        double[] curve = new double[SingleObjectEvaluation.SUCCESS_POINTS];
        int n = 0;
        for (int f = 1; f < clip.frameCount(); f++) {
            TruthBox t = clip.truth(f);
            if (t.visible() < TrackMetrics.MIN_VISIBLE) {
                continue;
            }
            Box b = run.boxes().get(f);
            double iou = b.iou(t.box());
            for (int i = 0; i < curve.length; i++) {
                if (iou > i / 20.0) {
                    curve[i]++;
                }
            }
            n++;
        }
        for (int i = 0; i < curve.length && n > 0; i++) {
            curve[i] /= n;
        }
        return curve;
    }

    static void write(List<Row> rows, Path dir, boolean quick, Duration took) throws IOException {
        Files.createDirectories(dir);
        StringBuilder md = new StringBuilder();
        md.append("# Tracking benchmark\n\n");
        md.append(String.format(Locale.ROOT, "%s run: %s of each generated scenario (seed %d), one keyframe on frame "
                        + "0 (the true box of object 0); %s %s, %d cores; took %d s.%n%n", quick ? "Quick" : "Full",
                quick ? "the first " + QUICK_FRAMES + " frames" : "every frame", ScenarioClips.SEED,
                System.getProperty("java.vm.name"), System.getProperty("java.version"),
                Runtime.getRuntime().availableProcessors(), took.toSeconds()));
        md.append("| scenario | tracker | success AUC | precision @ 20 px | keyframes / 1000 frames | ms / frame | "
                + "ms / frame over decoding |\n");
        md.append("|---|---|---:|---:|---:|---:|---:|\n");
        for (Row r : rows) {
            md.append(String.format(Locale.ROOT, "| %s | %s | %.3f | %.3f | %.0f | %.3f | %.2f |%n", r.scenario(),
                    r.tracker(), r.successAuc(), r.precision20(), r.keyframesPer1000(), r.msPerFrame(),
                    r.msPerFrame() / r.decodeMsPerFrame()));
        }
        md.append("\nDecoding (H.264 through Modetrail's video access, same run), ms per frame: ");
        List<String> decodes = new ArrayList<>();
        for (int i = 0; i < rows.size(); i += TRACKERS.size()) {
            decodes.add(String.format(Locale.ROOT, "%s %.3f", rows.get(i).scenario(), rows.get(i).decodeMsPerFrame()));
        }
        md.append(String.join(", ", decodes)).append(".\n\n");
        md.append("Success AUC: mean over IoU thresholds 0, 0.05, ..., 1 of the fraction of frames whose IoU with the"
                + " truth is above the threshold (Wu, Lim and Yang 2013); frames under half visible are not scored."
                + " Keyframes / 1000 frames: a simulated annotator adds the true box at the first frame under IoU"
                + " 0.5 and lets the tool fill the rest again (Modetrail between keyframes, the references restarted"
                + " at each). ms / frame: median time of one tracking step after a warm-up pass; the references and"
                + " Modetrail run on the same rendered frames, decoding is measured separately.\n\n");
        for (int i = 0; i < rows.size(); i += TRACKERS.size()) {
            String scenario = rows.get(i).scenario();
            String file = "success-" + scenario.replaceAll("[^a-z0-9-]", "-") + ".png";
            md.append("![success plot, ").append(scenario).append("](").append(file).append(")\n");
            List<PlotSeries> curves = new ArrayList<>();
            double[] xs = new double[SingleObjectEvaluation.SUCCESS_POINTS];
            for (int k = 0; k < xs.length; k++) {
                xs[k] = k / 20.0;
            }
            int[] colours = {0xE69F00, 0x0072B2, 0x009E73}; // Okabe and Ito's orange, blue, bluish green
            for (int k = 0; k < TRACKERS.size(); k++) {
                Row r = rows.get(i + k);
                curves.add(new PlotSeries(k + 1, String.format(Locale.ROOT, "%s [AUC %.3f]", r.tracker(),
                        r.successAuc()), colours[k], xs, xs, r.successCurve()));
            }
            Plots.writeCurves(curves, "Success plot: " + scenario, "IoU threshold", "fraction of frames above it", 0,
                    1, 0, 1.02, new PlotOptions(800, 600, null, PlotOptions.DEFAULT_MARKERS), PlotFormat.PNG,
                    dir.resolve(file));
        }
        Files.writeString(dir.resolve(REPORT), md, StandardCharsets.UTF_8);
    }
}
