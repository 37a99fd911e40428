package org.modetrail.app.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;

import org.modetrail.format.project.ProjectAutosave;
import org.modetrail.format.project.ProjectFile;
import org.modetrail.format.project.ProjectFileException;
import org.modetrail.model.Project;
import org.modetrail.model.VideoRef;
import org.modetrail.video.VideoException;
import org.modetrail.video.VideoSource;

/**
 * How the commands that take a PROJECT.json open it: a damaged file is bad input (its message names the line), a
 * recovery file with newer unsaved edits is pointed out (commands read the saved project, never the recovery), and
 * the project's video, when a command needs it, must still be the one the project annotates.
 */
final class ProjectOpening {
    private ProjectOpening() {
    }

    static Project read(Path file, PrintWriter err) throws BadInputException, IOException {
        if (!Files.isRegularFile(file)) {
            throw new BadInputException(file + ": no such project file; make one with `modetrail track ... "
                    + "--project " + file.getFileName() + "` or in the editor");
        }
        Project p;
        try {
            p = ProjectFile.read(file);
        } catch (ProjectFileException e) {
            throw new BadInputException(e.getMessage(), e);
        }
        Optional<Path> recovery = ProjectAutosave.findRecovery(file);
        if (recovery.isPresent()) {
            err.println("note: " + recovery.get() + " holds edits newer than " + file.getFileName()
                    + " that were never saved; this command reads the saved project. Open it in the editor to "
                    + "recover them.");
        }
        return p;
    }

    /** Opens the project's video and checks that it is the one annotated (same size and frame count). */
    static VideoSource openVideo(Project project, Path projectFile) throws BadInputException {
        Path video = ProjectFile.videoPath(project, projectFile);
        if (!Files.isRegularFile(video)) {
            throw new BadInputException(projectFile + ": its video " + video + " is not there; put the video back "
                    + "or correct \"video\".\"path\" in the project");
        }
        VideoSource source;
        try {
            source = VideoSource.open(video);
        } catch (VideoException e) {
            throw new BadInputException(video + ": " + e.getMessage(), e);
        }
        VideoRef ref = project.video();
        if (source.info().width() != ref.width() || source.info().height() != ref.height()
                || source.frameCount() != ref.frameCount()) {
            String found = source.info().width() + "x" + source.info().height() + ", " + source.frameCount()
                    + " frames";
            source.close();
            throw new BadInputException(video + " is " + found + " but " + projectFile + " annotates a video of "
                    + ref.width() + "x" + ref.height() + ", " + ref.frameCount() + " frames; it was replaced. "
                    + "Put the original back or correct the project's video path");
        }
        return source;
    }

    /** The presentation time of every frame, in seconds. */
    static double[] frameTimes(VideoSource source) {
        return source.index().timesSeconds();
    }
}
