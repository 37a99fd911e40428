package org.modetrail.app.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.Callable;

import org.modetrail.format.csv.CsvFormatException;
import org.modetrail.format.csv.KeyframeRow;
import org.modetrail.format.csv.KeyframesCsv;
import org.modetrail.format.csv.TracksCsv;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.ObjectClass;
import org.modetrail.model.Project;
import org.modetrail.model.Track;
import org.modetrail.model.VideoRef;
import org.modetrail.quality.TrackQualitySummary;
import org.modetrail.run.RunProgress;
import org.modetrail.run.TrackRunner;
import org.modetrail.video.VideoOptions;
import org.modetrail.video.VideoSource;

import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code modetrail track VIDEO --keyframes KEYS.csv --out TRACKS.csv [--project OUT.json] [--threads N]}: the
 * headless job, keyframes in, whole tracks out, all tracks in one sequential pass plus one backward pass.
 */
@Command(name = "track", mixinStandardHelpOptions = true,
        description = {"Follows every track of KEYS.csv through the video and writes whole tracks to TRACKS.csv.",
                "KEYS.csv: header track_id,frame,x,y,width,height with an optional class column; frames 0-based, "
                        + "boxes as top-left corner and size in pixels.",
                "TRACKS.csv: track_id,class,frame,time_s,x,y,width,height,source,score,uncertainty_px, one row per "
                        + "frame with a box; source is keyframe, tracked or interpolated; score the similarity 0-1; "
                        + "uncertainty_px the box's one-sigma uncertainty in pixels."})
public final class TrackCommand implements Callable<Integer> {
    /** Class colours for new classes: Okabe and Ito's colour-blind-safe palette ("Color Universal Design", 2002). */
    private static final int[] PALETTE = {0xE69F00, 0x56B4E9, 0x009E73, 0xF0E442, 0x0072B2, 0xD55E00, 0xCC79A7};

    @Parameters(index = "0", paramLabel = "VIDEO", description = "the video file, or a folder of numbered images")
    Path video;

    @Option(names = "--keyframes", required = true, paramLabel = "KEYS.csv", description = "the keyframes")
    Path keyframes;

    @Option(names = "--out", required = true, paramLabel = "TRACKS.csv", description = "where to write the tracks")
    Path out;

    @Option(names = "--project", paramLabel = "OUT.json", description = "also write a project file for the editor")
    Path project;

    @Option(names = "--threads", paramLabel = "N", defaultValue = "0",
            description = "decoder threads, 0 for one per core (default)")
    int threads;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        if (threads < 0) {
            throw new BadInputException("--threads must be 0 or more, got " + threads);
        }
        try (VideoSource source = VideoSource.open(video, VideoOptions.defaults().withDecoderThreads(threads))) {
            List<KeyframeRow> rows = KeyframesCsv.read(keyframes, source.info().width(), source.info().height(),
                    source.frameCount());
            Project keyed = projectOf(rows, source);
            PrintWriter err = spec.commandLine().getErr();
            RunProgress progress = ProgressLine.forTerminal(err, "tracking");
            Project tracked = new TrackRunner().trackAll(source, keyed, progress, () -> false);
            ProgressLine.finish(progress, err);
            TracksCsv.write(tracked, source.index()::timeSeconds, out);
            if (project != null) {
                ProjectWriting.write(tracked, project);
            }
            int rowsWritten = 0;
            for (Track t : tracked.tracks()) {
                rowsWritten += (int) t.frames().values().stream().filter(FrameAnnotation::isVisible).count();
            }
            PrintWriter stdout = spec.commandLine().getOut();
            stdout.printf(Locale.ROOT, "%d tracks, %d boxes written to %s%n", tracked.tracks().size(), rowsWritten,
                    out);
            for (Track t : tracked.tracks()) {
                stdout.println(QualityLine.of(t, TrackQualitySummary.defaults().of(t, source.frameCount())));
            }
        } catch (CsvFormatException e) {
            throw new BadInputException(e.getMessage(), e);
        }
        return ExitCodes.OK;
    }

    private Project projectOf(List<KeyframeRow> rows, VideoSource source) throws IOException {
        Map<String, ObjectClass> classes = new LinkedHashMap<>();
        Map<Integer, String> classOfTrack = new TreeMap<>();
        Map<Integer, Map<Integer, FrameAnnotation>> frames = new TreeMap<>();
        for (KeyframeRow r : rows) {
            String cls = r.className() != null ? r.className() : "object";
            String known = classOfTrack.putIfAbsent(r.trackId(), cls);
            if (known != null && !known.equals(cls)) {
                throw new CsvFormatException(keyframes, r.line(), "track " + r.trackId() + " was class '" + known
                        + "' on an earlier line and is '" + cls + "' here; a track has one class");
            }
            classes.computeIfAbsent(cls, n -> new ObjectClass(n, PALETTE[classes.size() % PALETTE.length]));
            frames.computeIfAbsent(r.trackId(), k -> new TreeMap<>())
                    .put(r.frame(), FrameAnnotation.keyframe(r.frame(), r.box()));
        }
        List<Track> tracks = new ArrayList<>();
        for (Map.Entry<Integer, Map<Integer, FrameAnnotation>> e : frames.entrySet()) {
            tracks.add(new Track(e.getKey(), classOfTrack.get(e.getKey()), "", e.getValue()));
        }
        VideoRef ref = VideoRefs.of(video, source, project != null ? project : out);
        return new Project(ref, new ArrayList<>(classes.values()), tracks);
    }
}
