package org.modetrail.trackbench;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.modetrail.evaluation.SingleObjectEvaluation;
import org.modetrail.picture.PlotFormat;
import org.modetrail.picture.PlotOptions;
import org.modetrail.picture.PlotSeries;
import org.modetrail.picture.Plots;

/** Writes the benchmark report: report.md (tables and success plots) and the machine-readable CSV files. */
final class BenchReportWriter {
    /** Okabe and Ito's eight colours (2008), then grey for interpolation. */
    private static final int[] COLOURS = {0xE69F00, 0x56B4E9, 0x009E73, 0xF0E442, 0x0072B2, 0xD55E00, 0xCC79A7,
        0x000000, 0x999999};

    private BenchReportWriter() {
    }

    static String label(String key) {
        return key.equals(ClipBench.INTERPOLATION) ? "linear interpolation (no tracker)" : PeerTrackers.label(key);
    }

    static void writeFigures(List<BenchSummary> summaries, Path file) throws IOException {
        StringBuilder csv = new StringBuilder("group,tracker,objects,seeds,mean_auc,worst_seed_auc,worst_seed,"
                + "precision20,frames_to_failure,ended_or_ballooned_share,wrong_reacquisitions_per_1000,"
                + "boxes_while_absent_per_1000,keyframes_per_1000,ms_per_frame,decode_ms_per_frame\n");
        for (BenchSummary s : summaries) {
            csv.append(String.format(Locale.ROOT, "%s,%s,%d,%d,%.4f,%.4f,%d,%.4f,%.1f,%.4f,%.3f,%.3f,%.2f,%.4f,%.4f%n",
                    s.group(), s.tracker(), s.objects(), s.seeds(), s.meanAuc(), s.worstSeedAuc(), s.worstSeed(),
                    s.precision20(), s.framesToFailure(), s.failedShare(), s.wrongPer1000(), s.absentPer1000(),
                    s.keyframesPer1000(), s.msPerFrame(), s.decodeMs()));
        }
        Files.writeString(file, csv, StandardCharsets.UTF_8);
    }

    static void writeObjects(List<ObjectFigures> rows, Path file) throws IOException {
        StringBuilder csv = new StringBuilder(ObjectFigures.HEADER).append('\n');
        rows.forEach(r -> csv.append(r.csv()).append('\n'));
        Files.writeString(file, csv, StandardCharsets.UTF_8);
    }

    /**
     * @param heading  the run's description (set, seeds, frames, machine, time), one paragraph
     * @param groups   the kinds' slugs in order, then {@code vtest} when it ran
     * @param realNote what to say about the real footage (why its rows are missing, or where its truth came from)
     */
    static void writeReport(Path dir, String heading, List<BenchSummary> summaries, List<String> groups,
                            List<String> trackers, String realNote) throws IOException {
        StringBuilder md = new StringBuilder("# Tracking benchmark\n\n").append(heading).append("\n\n");
        md.append("## Mean success AUC by kind\n\n");
        md.append("| kind |");
        trackers.forEach(t -> md.append(' ').append(label(t)).append(" |"));
        md.append("\n|---|");
        trackers.forEach(t -> md.append("---:|"));
        md.append('\n');
        for (String g : groups) {
            md.append("| ").append(groupName(g)).append(" |");
            for (String t : trackers) {
                BenchSummary s = find(summaries, g, t);
                md.append(s == null ? " - |" : String.format(Locale.ROOT, " %.3f |", s.meanAuc()));
            }
            md.append('\n');
        }
        md.append('\n').append(realNote).append("\n\n");
        md.append(DEFINITIONS).append("\n\n");
        for (String g : groups) {
            md.append("## ").append(groupName(g)).append("\n\n");
            md.append("| tracker | objects | mean AUC | worst-seed AUC (seed) | P@20 px | frames to 1st failure | "
                    + "ended or ballooned | wrong re-acq. / 1000 | boxes while absent / 1000 | keyframes / 1000 | "
                    + "ms / frame | decode ms / frame |\n");
            md.append("|---|---:|---:|---:|---:|---:|---:|---:|---:|---:|---:|---:|\n");
            List<PlotSeries> curves = new ArrayList<>();
            double[] xs = new double[SingleObjectEvaluation.SUCCESS_POINTS];
            for (int k = 0; k < xs.length; k++) {
                xs[k] = k / 20.0;
            }
            for (String t : trackers) {
                BenchSummary s = find(summaries, g, t);
                if (s == null) {
                    continue;
                }
                md.append(String.format(Locale.ROOT,
                        "| %s | %d | %.3f | %.3f (%s) | %.3f | %.0f | %.0f%% | %.2f | %.1f | %.1f | %s | %.3f |%n",
                        label(t), s.objects(), s.meanAuc(), s.worstSeedAuc(), g.equals(BenchReport.VTEST) ? "-"
                                : Long.toString(s.worstSeed()), s.precision20(), s.framesToFailure(),
                        100 * s.failedShare(), s.wrongPer1000(), s.absentPer1000(), s.keyframesPer1000(),
                        Double.isNaN(s.msPerFrame()) ? "-" : String.format(Locale.ROOT, "%.3f", s.msPerFrame()),
                        s.decodeMs()));
                int colour = COLOURS[Math.min(curves.size(), COLOURS.length - 1)];
                curves.add(new PlotSeries(curves.size() + 1, String.format(Locale.ROOT, "%s [AUC %.3f]", label(t),
                        s.meanAuc()), t.equals(ClipBench.INTERPOLATION) ? 0x999999 : colour, xs, xs, s.curve()));
            }
            String file = "success-" + g.replaceAll("[^a-z0-9-]", "-") + ".png";
            Plots.writeCurves(curves, "Success plot: " + groupName(g), "IoU threshold", "fraction of frames above it",
                    0, 1, 0, 1.02, new PlotOptions(800, 600, null, PlotOptions.DEFAULT_MARKERS), PlotFormat.PNG,
                    dir.resolve(file));
            md.append("\n![success plot, ").append(groupName(g)).append("](").append(file).append(")\n\n");
        }
        Files.writeString(dir.resolve(BenchReport.REPORT), md, StandardCharsets.UTF_8);
    }

    static String groupName(String g) {
        return g.equals(BenchReport.VTEST) ? "vtest (real)" : g;
    }

    static BenchSummary find(List<BenchSummary> summaries, String group, String tracker) {
        for (BenchSummary s : summaries) {
            if (s.group().equals(group) && s.tracker().equals(tracker)) {
                return s;
            }
        }
        return null;
    }

    static final String DEFINITIONS = """
            How it is measured. Every object of a clip is a run: one keyframe, its true box on the first frame on \
            which it is at least half visible (as a user would draw it), tracked to the clip's end. Generated clips \
            are rendered, encoded as H.264 with the ffmpeg command at the clip set's crf for that seed (GOP 250, 3 \
            B-frames, preset medium) and decoded with Modetrail's video access; every tracker runs on those decoded \
            frames. Modetrail runs as the product runs, all objects of a clip in one track run (frames it leaves empty \
            or marks hidden or absent have no box); each peer runs per object with its library's defaults (settings \
            in each adapter's comment), and a frame on which a peer reports failure has no box.

            - mean AUC: OTB success AUC (Wu, Lim and Yang 2013), the mean over IoU thresholds 0, 0.05, ..., 1 of the \
            share of frames whose IoU with the truth is above the threshold, over the frames after the keyframe on \
            which the object is at least half visible (a frame with no box scores IoU 0), averaged over objects. \
            worst-seed AUC: the lowest of the clips' mean AUC over their objects. P@20 px: share of those frames whose \
            box centre is within 20 px of the truth's.
            - frames to 1st failure: frames from the keyframe to the first scored frame with no box, IoU 0, or a box \
            of more than 4 times the truth's area (ballooned); to the last scored frame when there is none (mean). \
            ended or ballooned: share of objects with such a failure, i.e. whose track ended or ballooned before the \
            object left the view for good.
            - wrong re-acq. / 1000: frames on which the tracker reports a box after reporting none on the frame \
            before, while its object is in view, with IoU under 0.3 with that object's truth, per 1000 tracked \
            frames. boxes while absent / 1000: frames on which the tracker reports a box while its object is out of \
            the frame, per 1000 tracked frames. Both are false re-acquisitions; they are counted separately.
            - keyframes / 1000: a simulated annotator finds each object's first frame whose box has IoU under 0.5 \
            (no box counts as 0; frames under half visible are not judged), adds the true box there as a keyframe \
            and lets the tool fill again, until every judged frame passes; keyframes added per 1000 judged frames \
            (keyframe to clip end). Modetrail re-tracks the span each keyframe changes, as the editor does; peers are \
            restarted at each keyframe; linear interpolation holds the last keyframe's box after it.
            - ms / frame: peers, median time of one track() call (conversion into the library's image type not \
            included); Modetrail, the track runner's wall time over the clip's frames times its objects (it also \
            tracks backward from each keyframe to the clip's start). decode ms / frame: median time between \
            frames of one sequential decode of the same clip in the same run. Clips run on a small fixed thread \
            pool (see the heading), so two clips share the machine's cores while timed; medians over clips.""";
}
