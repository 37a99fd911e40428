package org.modetrail.format;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Locale;
import java.util.function.IntToDoubleFunction;

import org.modetrail.format.coco.CocoReader;
import org.modetrail.format.coco.CocoWriter;
import org.modetrail.format.csv.TracksCsv;
import org.modetrail.format.csv.TracksCsvReader;
import org.modetrail.format.mot.MotReader;
import org.modetrail.format.mot.MotWriter;
import org.modetrail.model.ObjectClass;
import org.modetrail.model.Project;
import org.modetrail.model.VideoRef;

/** The tracks formats Modetrail exports and imports, by the name the command line uses for them. */
public enum TracksFormat {
    /** TRACKS.csv: {@value TracksCsv#HEADER}; keeps sources and scores. */
    CSV,
    /** COCO object-detection JSON with the video extensions; keeps sources, scores and class colours. */
    COCO,
    /** MOTChallenge text (Milan et al. 2016); keeps ids, frames, boxes and scores, not classes or sources. */
    MOT;

    /** The format called {@code name} (csv, coco or mot, any case). */
    public static TracksFormat named(String name) {
        try {
            return valueOf(name.strip().toUpperCase(Locale.ROOT));
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("unknown format '" + name + "'; the formats are csv, coco and mot");
        }
    }

    /** The name on the command line: csv, coco or mot. */
    public String commandName() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** Writes the project's boxes to {@code out}, replacing it atomically. */
    public void write(Project project, IntToDoubleFunction timeOfFrame, Path out) throws IOException {
        switch (this) {
            case CSV -> TracksCsv.write(project, timeOfFrame, out);
            case COCO -> CocoWriter.write(project, timeOfFrame, out);
            case MOT -> MotWriter.write(project, out);
        }
    }

    /**
     * Reads {@code file} into a project on {@code video}.
     *
     * @param motClass the class every track of a MOT file gets (the format names none); unused for the others
     */
    public Project read(Path file, VideoRef video, ObjectClass motClass, ImportLimits limits) throws IOException {
        return switch (this) {
            case CSV -> TracksCsvReader.read(file, video, limits);
            case COCO -> CocoReader.read(file, video, limits);
            case MOT -> MotReader.read(file, video, motClass, limits);
        };
    }
}
