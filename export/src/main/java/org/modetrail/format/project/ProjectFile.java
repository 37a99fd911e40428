package org.modetrail.format.project;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.File;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.NoSuchFileException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.function.UnaryOperator;
import org.modetrail.model.Project;

/**
 * Reads and writes project files (JSON, layout in docs/project-file.md). Reading never changes anything on disk;
 * writing replaces the file atomically and keeps the previous version as NAME.bak.
 */
public final class ProjectFile {
    /** The schema this version writes; it reads this one and every older one. */
    public static final int CURRENT_SCHEMA = 3;
    /**
     * Schemas from this one on are read by the streaming reader as they are (each is a later one without its
     * optional additions), so their errors keep line and column; older ones go through the upgrade chain.
     */
    static final int STREAMED_FROM = 2;

    private ProjectFile() {
    }

    public static Project read(Path file) throws ProjectFileException {
        return read(file, ProjectLimits.DEFAULT);
    }

    public static Project read(Path file, ProjectLimits limits) throws ProjectFileException {
        checkSize(file, limits);
        JsonFactory factory = ProjectJson.factory(limits);
        File input = file.toFile();
        // Each pass's parser is remembered so a parse error can report where that parser stopped.
        JsonParser[] last = new JsonParser[1];
        try {
            ProjectReader reader = new ProjectReader(() -> last[0] = factory.createParser(input), file, limits);
            int schema = reader.schema();
            if (schema > CURRENT_SCHEMA) {
                throw new ProjectFileException(file, 0, 0, "written by a newer Modetrail (schema " + schema
                        + "); this version reads schema " + CURRENT_SCHEMA + " and older: update Modetrail");
            }
            if (schema >= STREAMED_FROM) {
                return reader.read(schema);
            }
            ObjectMapper mapper = ProjectJson.treeMapper(limits);
            JsonNode tree;
            try (JsonParser p = factory.createParser(input)) {
                last[0] = p;
                tree = mapper.readTree(p);
            }
            ObjectNode root = (ObjectNode) tree; // the schema pass has checked that it is an object
            SchemaUpgrades.upgrade(root, schema, file);
            return new ProjectReader(() -> last[0] = mapper.treeAsTokens(root), file, limits).read();
        } catch (ProjectFileException e) {
            throw e;
        } catch (JsonProcessingException e) {
            throw JacksonErrors.translate(file, e, last[0] == null ? null : last[0].currentLocation(), limits);
        } catch (IOException e) {
            throw new ProjectFileException(file, 0, 0, "cannot be read (" + e.getMessage() + ")", e);
        }
    }

    private static void checkSize(Path file, ProjectLimits limits) throws ProjectFileException {
        long size;
        try {
            size = Files.size(file);
        } catch (NoSuchFileException e) {
            throw new ProjectFileException(file, 0, 0, "there is no such file", e);
        } catch (IOException e) {
            throw new ProjectFileException(file, 0, 0, "cannot be read (" + e.getMessage() + ")", e);
        }
        if (size > limits.maxDocumentBytes()) {
            throw new ProjectFileException(file, 0, 0, "the file has " + size + " bytes, more than the "
                    + limits.maxDocumentBytes() + " a project may have; it is not a project Modetrail wrote");
        }
    }

    /** Writes {@code project} to {@code file} atomically, keeping the file's previous version as NAME.bak. */
    public static void write(Project project, Path file) throws IOException {
        write(project, file, true, UnaryOperator.identity());
    }

    /** As {@link #write(Project, Path)}; without a backup for files that are copies already (recovery files). */
    static void write(Project project, Path file, boolean keepBackup, UnaryOperator<OutputStream> wrap)
            throws IOException {
        String stored = storedVideoPath(project.video().path(), file);
        AtomicWrite.replace(file, keepBackup, out -> ProjectWriter.write(project, stored, out), wrap);
    }

    /** Where the previous version is kept by {@link #write(Project, Path)}. */
    public static Path backupFile(Path projectFile) {
        return AtomicWrite.backupOf(projectFile);
    }

    /** The video's absolute path: the stored path resolved against the project file's folder. */
    public static Path videoPath(Project project, Path projectFile) {
        Path video = Path.of(project.video().path());
        if (video.isAbsolute()) {
            return video;
        }
        return projectFile.toAbsolutePath().getParent().resolve(video).normalize();
    }

    /**
     * The path as the file stores it: relative to the project's folder when the video is on the same drive, with
     * '/' between names so the file reads the same on every system; absolute otherwise.
     */
    static String storedVideoPath(String path, Path projectFile) {
        try {
            Path video = Path.of(path);
            if (video.isAbsolute()) {
                Path folder = projectFile.toAbsolutePath().getParent();
                if (video.getRoot().equals(folder.getRoot())) {
                    video = folder.relativize(video.normalize());
                } else {
                    return path;
                }
            }
            return video.toString().replace(File.separatorChar, '/');
        } catch (IllegalArgumentException e) { // InvalidPathException among them
            return path; // not a path this system understands: keep what the user gave
        }
    }
}
