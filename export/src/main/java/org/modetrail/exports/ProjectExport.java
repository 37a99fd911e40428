package org.modetrail.exports;

import java.io.IOException;
import java.nio.file.Path;
import java.util.function.IntToDoubleFunction;
import org.modetrail.calibration.TrajectoryConfig;
import org.modetrail.format.ExportProgress;
import org.modetrail.format.TracksFormat;
import org.modetrail.format.coco.CocoFrameImages;
import org.modetrail.format.coco.CocoSummary;
import org.modetrail.format.coco.CocoWriter;
import org.modetrail.format.csv.TracksCsv;
import org.modetrail.format.mot.MotWriter;
import org.modetrail.model.Project;
import org.modetrail.summary.GroundPaths;
import org.modetrail.video.VideoSource;

/**
 * One export of a project: the tracks in the chosen format (CSV with ground positions and speeds where the ground
 * is calibrated; COCO optionally with the annotated frames as PNG files; MOTChallenge text) and its notes beside it
 * ({@link ExportNotes}). Both files are replaced atomically; the notes are written after the data.
 */
public final class ProjectExport {
    /** What was written. */
    public record Result(Path file, Path notes, boolean groundColumns, CocoSummary coco) {
    }

    private ProjectExport() {
    }

    /**
     * @param video     the project's video: its frame times, and its frames when {@code framesDir} is given
     * @param framesDir for COCO only, where to write the annotated frames as PNG files; null for none
     * @param software  name and version for the notes
     */
    public static Result write(Project project, VideoSource video, TracksFormat format, Path out, Path framesDir,
                               String software, ExportProgress progress) throws IOException {
        if (framesDir != null && format != TracksFormat.COCO) {
            throw new IllegalArgumentException("frame images go with the COCO format only");
        }
        IntToDoubleFunction time = video.index()::timeSeconds;
        TrajectoryConfig trajectory = TrajectoryConfig.defaults();
        boolean ground = format == TracksFormat.CSV && project.site().calibration() != null;
        CocoSummary coco = null;
        switch (format) {
            case CSV -> TracksCsv.write(project, time, ground ? GroundPaths.samples(project, time, trajectory) : null, out);
            case COCO -> coco = CocoWriter.write(project, time, out,
                    framesDir == null ? null : new CocoFrameImages(video, framesDir), progress);
            case MOT -> MotWriter.write(project, out);
        }
        Path notes = ExportNotes.fileFor(out);
        ExportNotes.write(notes, out, project, video.path(), format, software, ground, trajectory);
        return new Result(out, notes, ground, coco);
    }
}
