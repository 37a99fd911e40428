package org.modetrail.app.cli;

import java.io.IOException;
import java.nio.file.Path;

import org.modetrail.format.project.ProjectFile;
import org.modetrail.model.Project;

/** Writes the project file for commands that offer {@code --project}, atomically with a backup of the old one. */
final class ProjectWriting {
    private ProjectWriting() {
    }

    static void write(Project project, Path file) throws IOException {
        Path dir = file.toAbsolutePath().getParent();
        if (dir != null) {
            java.nio.file.Files.createDirectories(dir);
        }
        ProjectFile.write(project, file);
    }
}
