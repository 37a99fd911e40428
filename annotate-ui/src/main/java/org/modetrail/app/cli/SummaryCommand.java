package org.modetrail.app.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;

import org.modetrail.format.project.ProjectFileException;
import org.modetrail.format.project.ZonesFile;
import org.modetrail.model.CountingLine;
import org.modetrail.model.Project;
import org.modetrail.model.Site;
import org.modetrail.model.Zone;
import org.modetrail.summary.CrossingDirection;
import org.modetrail.summary.MeasurementCaution;
import org.modetrail.summary.ProjectSummary;
import org.modetrail.summary.TrackSummaries;
import org.modetrail.summary.TrackSummary;
import org.modetrail.video.VideoSource;

import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code modetrail summary PROJECT.json [--out FILE.csv] [--zones FILE.json]}: per track its duration, path length,
 * speeds (with a calibration), time in each zone and counting-line crossings with direction.
 */
@Command(name = "summary", mixinStandardHelpOptions = true,
        description = {"Summarises each track: duration, path length, mean and peak speed (when the ground is "
                + "calibrated), time inside each zone and counting-line crossings with their direction.",
            "Zones and counting lines come from the project, or from a JSON file given with --zones (laid out as "
                + "the project's \"site\": {\"zones\": [...], \"lines\": [...]}, see docs/project-file.md)."},
        footer = {"", "Speeds are measurements from video with stated uncertainty; road-safety decisions need "
                + "local codes and licensed engineering practice."})
public final class SummaryCommand implements Callable<Integer> {
    @Parameters(index = "0", paramLabel = "PROJECT.json", description = "the project to summarise")
    Path projectFile;

    @Option(names = "--out", paramLabel = "FILE.csv", description = "also write the summary as CSV")
    Path out;

    @Option(names = "--zones", paramLabel = "FILE.json",
            description = "zones and counting lines to use instead of the project's")
    Path zones;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        PrintWriter err = spec.commandLine().getErr();
        PrintWriter stdout = spec.commandLine().getOut();
        Project project = ProjectOpening.read(projectFile, err);
        if (zones != null) {
            Site given;
            try {
                given = ZonesFile.read(zones);
            } catch (ProjectFileException e) {
                throw new BadInputException(e.getMessage(), e);
            }
            project = project.withSite(new Site(project.site().calibration(), given.zones(), given.lines()));
        }
        double[] times;
        try (VideoSource video = ProjectOpening.openVideo(project, projectFile)) {
            times = ProjectOpening.frameTimes(video);
        }
        ProjectSummary summary = ProjectSummary.of(project, times);
        print(stdout, project, summary.tracks(), summary.metres());
        if (out != null) {
            summary.writeCsv(out);
            stdout.println("summary written to " + out);
        }
        return ExitCodes.OK;
    }

    private static void print(PrintWriter w, Project project, List<TrackSummary> summaries, boolean metres) {
        Site site = project.site();
        for (TrackSummary s : summaries) {
            if (s.boxedFrames() == 0) {
                w.printf(Locale.ROOT, "track %d (%s): no boxes%n", s.trackId(), s.className());
                continue;
            }
            w.printf(Locale.ROOT, "track %d (%s): frames %d-%d, %.2f s, path %.1f px", s.trackId(), s.className(),
                    s.firstFrame(), s.lastFrame(), s.durationS(), s.pathLengthPx());
            if (metres && Double.isFinite(s.pathLengthM())) {
                w.printf(Locale.ROOT, " = %.2f m", s.pathLengthM());
                if (Double.isFinite(s.peakSpeedMs())) {
                    w.printf(Locale.ROOT, ", mean speed %.2f m/s, peak %.2f ± %.2f m/s", s.meanSpeedMs(),
                            s.peakSpeedMs(), s.peakSpeedSigmaMs());
                } else if (Double.isFinite(s.meanSpeedMs())) {
                    w.printf(Locale.ROOT, ", mean speed %.2f m/s, no peak speed", s.meanSpeedMs());
                } else {
                    w.print(", too short for a speed");
                }
            }
            if (metres && s.peakLeftOut() > 0) {
                w.printf(Locale.ROOT, " (%d frame%s left out of the peak: interpolated, or speed uncertain by more"
                        + " than %.0f%%)", s.peakLeftOut(), s.peakLeftOut() == 1 ? "" : "s",
                        100 * TrackSummaries.PEAK_MAX_RELATIVE_SIGMA);
            }
            w.println();
            for (Zone z : site.zones()) {
                w.printf(Locale.ROOT, "  in zone %s: %.2f s%n", z.name(), s.secondsInZone().get(z.name()));
            }
            for (CountingLine l : site.lines()) {
                w.printf(Locale.ROOT, "  line %s: %d left-to-right, %d right-to-left%n", l.name(),
                        s.crossingCount(l.name(), CrossingDirection.LEFT_TO_RIGHT),
                        s.crossingCount(l.name(), CrossingDirection.RIGHT_TO_LEFT));
            }
        }
        if (!metres) {
            w.println("(no ground calibration: distances in pixels only; run `modetrail calibrate` for metres and "
                    + "speeds)");
        } else {
            w.println();
            w.println("Caution: " + MeasurementCaution.TEXT);
        }
    }
}
