package org.modetrail.summary;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;

import org.modetrail.model.Project;
import org.modetrail.model.Site;

/**
 * A project's summary as the {@code summary} command and the editor's export screen make it: one
 * {@link TrackSummary} per track over the project's zones and counting lines, in metres and with speeds when the
 * ground is calibrated.
 *
 * @param tracks one per track, in the project's order
 * @param site   the zones and counting lines summarised (they name the CSV's extra columns)
 * @param metres whether ground lengths and speeds are in it
 */
public record ProjectSummary(List<TrackSummary> tracks, Site site, boolean metres) {
    public ProjectSummary {
        tracks = List.copyOf(tracks);
    }

    /** @param timeOfFrame every frame's time in seconds */
    public static ProjectSummary of(Project project, double[] timeOfFrame) {
        Map<Integer, GroundPath> paths = GroundPaths.of(project, timeOfFrame);
        return new ProjectSummary(TrackSummaries.of(project, timeOfFrame, paths), project.site(), !paths.isEmpty());
    }

    /** Writes it as {@link SummaryCsv}, replacing {@code out} atomically. */
    public void writeCsv(Path out) throws IOException {
        SummaryCsv.write(tracks, site, out);
    }
}
